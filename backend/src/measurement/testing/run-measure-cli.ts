import { execFile } from 'node:child_process';
import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { basename, join, resolve } from 'node:path';
import type { MeasurementResult } from '../measure-photo';

/** The backend folder, whether the tests run from it or from the repository root. */
const backendDir =
  basename(process.cwd()) === 'backend' ? process.cwd() : resolve(process.cwd(), 'backend');

let folder: Promise<string> | undefined;

/**
 * Measures a photo through the real command-line tool in a plain Node process (built when
 * stale by scripts/run-built.mjs): the contract is tested as users call it, and jsQR runs
 * at full speed (inside jest's ESM VM every `Math` lookup is slow, and jsQR makes millions).
 *
 * @param bytes - the photo file
 * @param name - file name to write it under (the extension is not trusted by the tool)
 * @returns the exit code, the parsed stdout document and the raw stdout
 */
export async function runMeasureCli(bytes: Buffer, name = 'photo.jpg', args: string[] = []) {
  folder ??= mkdtemp(join(tmpdir(), 'mixmark-measure-'));
  const file = join(await folder, `${Date.now()}-${Math.random().toString(36).slice(2)}-${name}`);
  await writeFile(file, bytes);
  return new Promise<{ code: number; result: MeasurementResult; stdout: string }>((done, fail) => {
    execFile(
      process.execPath,
      [
        resolve(backendDir, '../scripts/run-built.mjs'),
        'dist/measurement/measure.cli.js',
        file,
        ...args,
      ],
      { cwd: backendDir, maxBuffer: 1 << 24 },
      (error, stdout) => {
        const code = error ? Number((error as { code?: number }).code ?? 1) : 0;
        try {
          done({ code, result: JSON.parse(stdout) as MeasurementResult, stdout });
        } catch {
          fail(new Error(`measure printed no JSON (exit ${code}): ${stdout.slice(0, 500)}`));
        }
      },
    );
  });
}
