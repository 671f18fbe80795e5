import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const backendDir = fileURLToPath(new URL('../../backend', import.meta.url));

/**
 * A phone-like photo of a painted swatch under the reference card, rendered by the backend's
 * own scene generator (compiled to backend/dist, which the global setup builds). It runs in a
 * child Node process: the backend is CommonJS with its own module resolution (sharp, common).
 */
export function renderSyntheticPhoto(options: Record<string, unknown>): Buffer {
  const out = join(mkdtempSync(join(tmpdir(), 'mixmark-e2e-')), 'swatch.jpg');
  const script = `
    const { renderScene } = require('./dist/measurement/testing/photo-scene.js');
    const { writeFileSync } = require('node:fs');
    const [options, out] = [JSON.parse(process.argv[1]), process.argv[2]];
    renderScene(options).then(({ jpeg }) => writeFileSync(out, jpeg)).catch((e) => { console.error(e); process.exit(1); });
  `;
  execFileSync(process.execPath, ['-e', script, JSON.stringify(options), out], { cwd: backendDir, stdio: ['ignore', 'inherit', 'inherit'] });
  return readFileSync(out);
}
