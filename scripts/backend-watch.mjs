// The API in watch mode for `npm run dev`: tsc recompiles on change, node restarts on new output.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { rootDir } from './lib/project.mjs';

const backend = join(rootDir, 'backend');
const tsc = spawn(process.execPath, [join(rootDir, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', 'tsconfig.build.json', '--watch', '--preserveWatchOutput'], { cwd: backend, stdio: 'inherit' });
const server = spawn(process.execPath, ['--watch-path=dist', '--watch-preserve-output', 'dist/main.js'], { cwd: backend, stdio: 'inherit' });

const stop = () => {
  tsc.kill('SIGTERM');
  server.kill('SIGTERM');
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
server.on('exit', (code) => {
  tsc.kill('SIGTERM');
  process.exit(code ?? 0);
});
