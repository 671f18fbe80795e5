import { existsSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { run } from './proc.mjs';

/** Newest modification time (ms) of the files under the given paths, skipping build output. */
export function newestMtime(paths) {
  let newest = 0;
  const visit = (path) => {
    if (!existsSync(path)) return;
    const stat = statSync(path);
    if (stat.isDirectory()) {
      for (const entry of readdirSync(path)) {
        if (entry === 'node_modules' || entry === 'dist') continue;
        visit(join(path, entry));
      }
    } else if (stat.mtimeMs > newest) {
      newest = stat.mtimeMs;
    }
  };
  paths.forEach(visit);
  return newest;
}

/**
 * The workspaces' builds in dependency order. Each is skipped when its stamp is newer than every
 * input, so a second start does not rebuild what did not change.
 */
export function buildSteps(rootDir) {
  const ws = (name, ...files) => files.map((file) => join(rootDir, name, file));
  return [
    { name: 'common', inputs: ws('common', 'src', 'package.json', 'tsconfig.json', 'tsconfig.build.json'), out: join(rootDir, 'common/dist') },
    { name: 'backend', inputs: [...ws('backend', 'src', 'package.json', 'tsconfig.json', 'tsconfig.build.json'), join(rootDir, 'common/dist')], out: join(rootDir, 'backend/dist') },
    { name: 'frontend', inputs: [...ws('frontend', 'src', 'index.html', 'public', 'package.json', 'vite.config.ts', 'tsconfig.json'), join(rootDir, 'common/dist')], out: join(rootDir, 'frontend/dist') },
  ];
}

export async function buildIfStale(rootDir, names, { log = console.log, force = false } = {}) {
  for (const step of buildSteps(rootDir).filter((s) => names.includes(s.name))) {
    const stamp = join(step.out, '.build-stamp');
    const built = existsSync(stamp) ? statSync(stamp).mtimeMs : 0;
    if (!force && built > newestMtime(step.inputs)) continue;
    log(`Building ${step.name}...`);
    // Always a production build: a caller's NODE_ENV (vitest sets `test`) would make Vite bundle
    // React's development code, which `npm start` would then serve and bench:web would measure.
    const env = { ...process.env, NODE_ENV: 'production' };
    await run('npm', ['run', '-s', 'build', '-w', step.name], { cwd: rootDir, env, capture: true, label: `the ${step.name} build` });
    writeFileSync(stamp, new Date().toISOString());
  }
}
