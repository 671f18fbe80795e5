/**
 * Measures a photo of a reference card:
 *   npm run -s measure -w backend -- <photo> [--overlay out.png]
 * Prints exactly one JSON document on stdout: { ok, errors, warnings, card, readings }.
 * Exit 0 when measured, 1 on a quality error, 2 on an unusable file (or bad arguments).
 */
import { readFile, writeFile } from 'node:fs/promises';
import { parseArgs } from 'node:util';
import { fileErrorCodes } from './measurement-issue';
import { measurePhoto, type MeasurementResult } from './measure-photo';
import { renderOverlay } from './render-overlay';

function print(result: MeasurementResult): void {
  process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
}

async function main(): Promise<number> {
  let photoPath: string;
  let overlay: string | undefined;
  try {
    const { values, positionals } = parseArgs({
      options: { overlay: { type: 'string' } },
      allowPositionals: true,
      strict: true,
    });
    if (positionals.length !== 1) throw new Error('usage: measure <photo> [--overlay out.png]');
    photoPath = positionals[0];
    overlay = values.overlay;
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    print({
      ok: false,
      errors: [{ code: 'FILE_UNREADABLE', message }],
      warnings: [],
      card: null,
      readings: [],
    });
    return 2;
  }
  let bytes: Buffer;
  try {
    bytes = await readFile(photoPath);
  } catch {
    print({
      ok: false,
      errors: [{ code: 'FILE_UNREADABLE', message: `The file ${photoPath} cannot be opened.` }],
      warnings: [],
      card: null,
      readings: [],
    });
    return 2;
  }
  const detail = await measurePhoto(bytes);
  if (overlay && detail.photo) await writeFile(overlay, await renderOverlay(detail));
  print(detail.result);
  if (detail.result.ok) return 0;
  return detail.result.errors.some((e) => fileErrorCodes.has(e.code)) ? 2 : 1;
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error);
    process.exit(2);
  },
);
