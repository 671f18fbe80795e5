// Installs dependencies when node_modules is missing or stale. Node built-ins only: this runs
// before anything is installed.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { run } from './proc.mjs';

const MANIFESTS = [
  'package.json',
  'package-lock.json',
  'common/package.json',
  'backend/package.json',
  'frontend/package.json',
  'docs/package.json',
];

const INSTALL_FIELDS = ['dependencies', 'devDependencies', 'optionalDependencies', 'peerDependencies', 'overrides', 'workspaces', 'allowScripts'];

/**
 * A fingerprint of everything that decides what `npm ci` installs: the lock file, and the
 * dependency fields of each package.json (a changed script does not call for a reinstall).
 */
export function dependencyStamp(rootDir) {
  const hash = createHash('sha256');
  hash.update(process.version);
  for (const file of MANIFESTS) {
    const path = join(rootDir, file);
    hash.update(file);
    if (!existsSync(path)) continue;
    const text = readFileSync(path, 'utf8');
    if (file.endsWith('package-lock.json')) {
      hash.update(text);
      continue;
    }
    try {
      const manifest = JSON.parse(text);
      hash.update(JSON.stringify(INSTALL_FIELDS.map((field) => manifest[field] ?? null)));
    } catch {
      hash.update(text);
    }
  }
  return hash.digest('hex');
}

/** Runs `npm ci` unless node_modules was installed from exactly these manifests. */
export async function ensureDependencies(rootDir, { log = console.log } = {}) {
  const stampFile = join(rootDir, 'node_modules', '.mixmark-install-stamp');
  const wanted = dependencyStamp(rootDir);
  if (existsSync(stampFile) && readFileSync(stampFile, 'utf8') === wanted) return false;
  const hasLock = existsSync(join(rootDir, 'package-lock.json'));
  log(`Installing dependencies (${hasLock ? 'npm ci' : 'npm install'}); this takes a minute or two the first time...`);
  await run('npm', [hasLock ? 'ci' : 'install', '--no-audit', '--no-fund', '--loglevel=error'], {
    cwd: rootDir,
    label: 'npm ci',
  });
  writeFileSync(stampFile, wanted);
  return true;
}
