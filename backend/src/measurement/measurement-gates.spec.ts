import { describe, expect, it } from '@jest/globals';
import { deflateSync } from 'node:zlib';
import * as zlib from 'node:zlib';
import type { MeasurementErrorCode } from './measurement-issue';
import { renderScene, type SceneOptions } from './testing/photo-scene';
import { runMeasureCli } from './testing/run-measure-cli';

const base: SceneOptions = {
  kind: 'match',
  swatches: [{ L: 52, a: 28, b: 38 }],
  width: 1600,
  height: 1200,
  cardFraction: 0.4,
  rotation: 12,
  tiltX: 10,
  tiltY: -8,
  ev: 0,
  cast: 'warm',
  crossTalk: 0.01,
  flare: 0.01,
  vignetting: 0.1,
  noise: 1.5,
  jpegQuality: 85,
  seed: 7,
};

/** A PNG chunk: length, type, data, CRC-32 (ISO/IEC 15948 §5.3). */
function chunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'latin1');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(
    (zlib as unknown as { crc32(b: Buffer): number }).crc32(
      Buffer.concat([head.subarray(4), data]),
    ) >>> 0,
  );
  return Buffer.concat([head, data, crc]);
}

/** A decompression bomb: a 40 000 × 40 000 PNG header over a tiny compressed stream. */
function pngBomb(): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(40000, 0);
  ihdr.writeUInt32BE(40000, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.alloc(120001 * 8))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Error codes and exit code of the measure CLI for a file. */
async function codes(bytes: Buffer, name?: string): Promise<[MeasurementErrorCode[], number]> {
  const { result, code } = await runMeasureCli(bytes, name);
  return [result.errors.map((e) => e.code), code];
}

describe('quality gates', () => {
  it('measures the clean base scene without errors', async () => {
    const { result, code, stdout } = await runMeasureCli((await renderScene(base)).jpeg);
    expect(result.errors).toEqual([]);
    expect(result.ok).toBe(true);
    expect(code).toBe(0);
    // Exactly one JSON document on stdout, nothing else.
    expect(JSON.parse(stdout)).toEqual(result);
    expect(result.readings[0].window).toBe(0);
  }, 120_000);

  it.each<[string, Partial<SceneOptions>, MeasurementErrorCode]>([
    [
      'card cut off by the frame edge',
      { offset: [0.42, 0], cardFraction: 0.35 },
      'CARD_PARTLY_OUTSIDE',
    ],
    ['glare on the window', { glare: { x: 95, y: 64, radius: 6, peak: 3 } }, 'GLARE'],
    ['too dark (paper below code 40)', { ev: -7 }, 'TOO_DARK'],
    ['too bright', { ev: 3.5 }, 'TOO_BRIGHT'],
    ['unpainted window', { swatches: [{ L: 97, a: 0, b: 1.5 }] }, 'WINDOW_NOT_PAINTED'],
    ['light much stronger on one side', { lightGradient: 1.8 }, 'UNEVEN_LIGHT'],
  ])(
    '%s',
    async (_, change, code) => {
      const [found, exit] = await codes((await renderScene({ ...base, ...change })).jpeg);
      expect(found).toContain(code);
      expect(exit).toBe(1);
    },
    120_000,
  );

  it('warns, but measures, when the photo is dark yet readable', async () => {
    const { result, code } = await runMeasureCli((await renderScene({ ...base, ev: -5.5 })).jpeg);
    expect(code).toBe(0);
    expect(result.warnings.map((w) => w.code)).toContain('TOO_DARK');
  }, 120_000);

  it('finds no card in a photo without one', async () => {
    const { jpeg } = await renderScene({ ...base, offset: [3, 3] });
    expect(await codes(jpeg)).toEqual([['CARD_NOT_FOUND'], 1]);
  }, 120_000);

  it('rejects a truncated JPEG, a PNG bomb, a text file named .jpg and a HEIC file', async () => {
    const { jpeg } = await renderScene({ ...base, width: 800, height: 600 });
    expect(await codes(Buffer.from(jpeg.subarray(0, jpeg.length >> 1)))).toEqual([
      ['FILE_UNREADABLE'],
      2,
    ]);
    expect(await codes(pngBomb(), 'bomb.png')).toEqual([['FILE_TOO_LARGE'], 2]);
    expect(await codes(Buffer.from('this is not a photo\n'), 'notes.jpg')).toEqual([
      ['FILE_UNREADABLE'],
      2,
    ]);
    const heic = Buffer.concat([
      Buffer.from([0, 0, 0, 24]),
      Buffer.from('ftypheic\0\0\0\0mif1heic', 'latin1'),
    ]);
    const { result, code } = await runMeasureCli(heic, 'photo.heic');
    expect([result.errors[0].code, code]).toEqual(['FILE_UNSUPPORTED', 2]);
    expect(result.errors[0].message).toMatch(/as a JPEG/);
  }, 120_000);

  it('gives the same reading for the same photo', async () => {
    const { jpeg } = await renderScene({ ...base, seed: 11 });
    const first = await runMeasureCli(jpeg);
    const second = await runMeasureCli(jpeg);
    expect(second.stdout).toBe(first.stdout);
    expect(first.result.readings).toHaveLength(1);
  }, 120_000);
});
