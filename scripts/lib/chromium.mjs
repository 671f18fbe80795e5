import { existsSync } from 'node:fs';
import { SetupError } from './errors.mjs';
import { isRoot, run } from './proc.mjs';

export const chromiumPath = process.env.MIXMARK_CHROMIUM ?? '/usr/bin/chromium';

/** Makes sure Debian's Chromium is there for the browser tests (never a downloaded browser). */
export async function ensureChromium({ log = console.log, root = isRoot() } = {}) {
  if (existsSync(chromiumPath)) return chromiumPath;
  if (!root) {
    throw new SetupError(
      `Chromium was not found at ${chromiumPath}. Install Debian's package with "sudo apt-get install chromium", ` +
        'or set MIXMARK_CHROMIUM to its path',
    );
  }
  log("Chromium is missing: installing Debian's chromium package for the browser tests (one time)...");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  await run('apt-get', ['update', '-qq'], { env, capture: true, label: 'apt-get update' });
  await run('apt-get', ['install', '-y', '-qq', 'chromium'], { env, capture: true, label: 'apt-get install chromium' });
  if (!existsSync(chromiumPath)) throw new SetupError(`apt-get installed chromium but ${chromiumPath} is still missing`);
  return chromiumPath;
}
