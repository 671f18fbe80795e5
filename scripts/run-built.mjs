// Runs a compiled backend entry point after making sure common and backend are built.
// Used by the backend's command-line tools (`npm run -s measure -w backend -- photo.jpg`):
// build notes go to stderr, so stdout carries only what the tool itself prints.
import { spawn } from 'node:child_process';
import { resolve } from 'node:path';
import { buildIfStale } from './lib/builds.mjs';
import { runMain } from './lib/errors.mjs';
import { rootDir } from './lib/project.mjs';

runMain(async () => {
  const [entry, ...args] = process.argv.slice(2);
  if (!entry) throw new Error('usage: run-built.mjs <compiled entry> [args...]');
  await buildIfStale(rootDir, ['common', 'backend'], { log: (line) => console.error(line) });
  // Node flags given to this wrapper (e.g. --expose-gc for benchmarks) go to the tool.
  const child = spawn(process.execPath, [...process.execArgv, resolve(entry), ...args], { stdio: "inherit" });
  const forward = (signal) => child.kill(signal);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
});
