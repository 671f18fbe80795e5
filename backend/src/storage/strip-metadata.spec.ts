import { describe, expect, it } from '@jest/globals';
import exifr from 'exifr';
import sharp from 'sharp';
import { decodePhoto } from '../measurement/decode-photo';
import { MalformedImageError, stripMetadata, type StrippableFormat } from './strip-metadata';
import {
  afterIhdr,
  afterSoi,
  jpegSegment,
  phonePhoto,
  pngChunk,
  privateStrings,
  webpChunkTypes,
} from './testing/metadata-fixtures';

/** The decoded pixels as stored (no turn, no colour conversion), with their size. */
async function pixels(bytes: Buffer) {
  const { data, info } = await sharp(bytes).raw().toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height, channels: info.channels };
}

/** EXIF as an independent reader (exifr) sees it; for WebP, on the EXIF block sharp extracts. */
async function exifOf(bytes: Buffer, format: StrippableFormat) {
  let source: Buffer | undefined = bytes;
  if (format === 'webp') {
    const exif = (await sharp(bytes).metadata()).exif;
    source = exif && exif.subarray(exif.indexOf('Exif\0\0') === 0 ? 6 : 0); // a bare TIFF for exifr
  }
  if (!source) return { gps: undefined, orientation: undefined, all: undefined };
  return {
    gps: await exifr.gps(source).catch(() => undefined),
    orientation: await exifr.orientation(source).catch(() => undefined),
    all: await exifr
      .parse(source, { ihdr: false, tiff: true, exif: true, gps: true, xmp: true, iptc: true })
      .catch(() => undefined),
  };
}

function expectNoPrivateStrings(bytes: Buffer) {
  const text = bytes.toString('latin1');
  for (const value of privateStrings)
    expect({ value, found: text.includes(value) }).toEqual({ value, found: false });
}

describe.each(['jpeg', 'png', 'webp'] as const)('stripMetadata on a %s phone photo', (format) => {
  it('should drop GPS, EXIF and XMP, keep the ICC profile and the orientation, and leave the pixels identical', async () => {
    const photo = await phonePhoto(format, { orientation: 6 });
    const before = await sharp(photo).metadata();
    // The fixture does carry what must go (so the checks below can fail).
    expect(before).toMatchObject({ format, orientation: 6, hasProfile: true });
    expect(before.xmp).toBeDefined();
    expect((await exifOf(photo, format)).gps).toEqual({
      latitude: expect.closeTo(51.5034, 3),
      longitude: expect.closeTo(-0.1275, 3),
    });

    const stripped = stripMetadata(photo, format, { orientation: before.orientation });
    const after = await sharp(stripped).metadata();
    expect(after).toMatchObject({
      format,
      width: before.width,
      height: before.height,
      orientation: 6,
      hasProfile: true,
    });
    expect(after.icc!.equals(before.icc!)).toBe(true);
    expect(after.xmp).toBeUndefined();
    expect(after.iptc).toBeUndefined();
    const exif = await exifOf(stripped, format);
    expect(exif.gps).toBeUndefined();
    expect(exif.orientation).toBe(6);
    // Of all the EXIF, only the orientation is left.
    expect(Object.keys(exif.all ?? {})).toEqual(['Orientation']);
    expectNoPrivateStrings(stripped);

    // Lossless: the same decoded pixels, and the same upright working raster for measurement.
    const [want, got] = await Promise.all([pixels(photo), pixels(stripped)]);
    expect({ ...got, data: undefined }).toEqual({ ...want, data: undefined });
    expect(got.data.equals(want.data)).toBe(true);
    const [measuredBefore, measuredAfter] = await Promise.all([
      decodePhoto(photo),
      decodePhoto(stripped),
    ]);
    expect([measuredAfter.width, measuredAfter.height]).toEqual([before.height, before.width]); // turned upright
    expect(
      Buffer.from(measuredAfter.raster.data).equals(Buffer.from(measuredBefore.raster.data)),
    ).toBe(true);
  });

  it('should write no EXIF at all for a photo that is already upright', async () => {
    const photo = await phonePhoto(format);
    expect((await sharp(photo).metadata()).exif).toBeDefined();
    const stripped = stripMetadata(photo, format, { orientation: 1 });
    const after = await sharp(stripped).metadata();
    expect(after.exif).toBeUndefined();
    expect(after.orientation).toBeUndefined();
    expect(after.hasProfile).toBe(true);
    expect(await exifOf(stripped, format)).toEqual({
      gps: undefined,
      orientation: undefined,
      all: undefined,
    });
    expectNoPrivateStrings(stripped);
    expect((await pixels(stripped)).data.equals((await pixels(photo)).data)).toBe(true);
  });

  it('should refuse every truncated copy rather than return part of a file', async () => {
    const photo = await phonePhoto(format, { orientation: 3 });
    const cuts = [
      1,
      3,
      7,
      11,
      20,
      40,
      100,
      300,
      photo.length >> 2,
      photo.length >> 1,
      photo.length - 40,
      photo.length - 2,
      photo.length - 1,
    ];
    for (const cut of cuts) {
      expect({
        cut,
        error: catchError(() => stripMetadata(photo.subarray(0, cut), format, { orientation: 3 })),
      }).toEqual({
        cut,
        error: expect.any(MalformedImageError),
      });
    }
  });
});

function catchError(run: () => unknown): unknown {
  try {
    run();
  } catch (error) {
    return error;
  }
  return undefined;
}

describe('stripMetadata, JPEG segments', () => {
  it('should drop IPTC (APP13), comments, other APPn and what follows EOI, and keep JFIF and Adobe', async () => {
    const photo = await phonePhoto('jpeg');
    const jfif = jpegSegment(
      0xe0,
      Buffer.from([...Buffer.from('JFIF\0', 'latin1'), 1, 2, 0, 0, 1, 0, 1, 0, 0]),
    );
    const adobe = jpegSegment(
      0xee,
      Buffer.from([...Buffer.from('Adobe', 'latin1'), 0, 100, 0, 0, 0, 0, 1]),
    );
    const iptc = jpegSegment(
      0xed,
      'Photoshop 3.0\x008BIM\x04\x04\0\0\0\0\0\x10\x1c\x02\x50\0\x0cSN-0042 Alice',
    );
    const comment = jpegSegment(0xfe, 'shot by Alice Example at 51.5034 N');
    const mpf = jpegSegment(0xe2, 'MPF\0PhoneCo depth map follows');
    const trailer = Buffer.from('ftypmp42 motion photo by PhoneCo', 'latin1');
    const input = Buffer.concat([afterSoi(photo, jfif, iptc, comment, mpf, adobe), trailer]);

    const stripped = stripMetadata(input, 'jpeg');
    expectNoPrivateStrings(stripped);
    expect(stripped.includes('Photoshop 3.0')).toBe(false);
    expect(stripped.includes('MPF\0')).toBe(false);
    expect(
      stripped
        .subarray(0, 2 + jfif.length)
        .equals(Buffer.concat([Buffer.from([0xff, 0xd8]), jfif])),
    ).toBe(true);
    expect(stripped.includes(adobe)).toBe(true);
    expect(stripped.subarray(-2).equals(Buffer.from([0xff, 0xd9]))).toBe(true);
    expect((await pixels(stripped)).data.equals((await pixels(input)).data)).toBe(true);
  });

  it('should put the orientation-only EXIF after a leading JFIF segment', async () => {
    const photo = await phonePhoto('jpeg', { orientation: 8 });
    const jfif = jpegSegment(
      0xe0,
      Buffer.from([...Buffer.from('JFIF\0', 'latin1'), 1, 2, 0, 0, 1, 0, 1, 0, 0]),
    );
    const stripped = stripMetadata(afterSoi(photo, jfif), 'jpeg', { orientation: 8 });
    expect(stripped.subarray(2, 2 + jfif.length).equals(jfif)).toBe(true);
    expect(stripped.toString('latin1', 2 + jfif.length + 4, 2 + jfif.length + 10)).toBe('Exif\0\0');
    expect(await exifr.orientation(stripped)).toBe(8);
  });

  it('should refuse markers it does not know and a missing SOI', async () => {
    const photo = await phonePhoto('jpeg');
    expect(() => stripMetadata(afterSoi(photo, Buffer.from([0xff, 0x01])), 'jpeg')).toThrow(
      MalformedImageError,
    );
    expect(() => stripMetadata(afterSoi(photo, jpegSegment(0xf7, 'JPEG-LS')), 'jpeg')).toThrow(
      /unexpected marker FFF7/,
    );
    expect(() => stripMetadata(photo.subarray(2), 'jpeg')).toThrow(/no SOI/);
    expect(() => stripMetadata(photo, 'jpeg', { orientation: 9 })).toThrow(/orientation 9/);
  });
});

describe('stripMetadata, PNG chunks', () => {
  it('should drop tEXt, zTXt, iTXt, tIME and private chunks, keep gAMA, cHRM and the ICC profile', async () => {
    const photo = await phonePhoto('png');
    const gama = pngChunk('gAMA', Buffer.from([0, 0, 0xb1, 0x8f]));
    const chrm = pngChunk('cHRM', Buffer.alloc(32, 1));
    const text = pngChunk('tEXt', 'Author\0Alice Example');
    const ztxt = pngChunk('zTXt', 'Comment\0\0x');
    const itxt = pngChunk('iTXt', 'Location\0\0\0\0\0SN-0042 at 51.5034 N');
    const time = pngChunk('tIME', Buffer.from([7, 234, 3, 14, 15, 9, 26]));
    const privateChunk = pngChunk('prIv', 'PhoneCo tracking');
    const input = afterIhdr(photo, gama, chrm, text, ztxt, itxt, time, privateChunk);
    expect((await sharp(input).metadata()).comments?.length).toBeGreaterThan(0);

    const stripped = stripMetadata(input, 'png');
    const after = await sharp(stripped).metadata();
    expect(after.comments).toBeUndefined();
    expect(after.hasProfile).toBe(true);
    expectNoPrivateStrings(stripped);
    for (const kept of [gama, chrm]) expect(stripped.includes(kept)).toBe(true);
    for (const dropped of ['tEXt', 'zTXt', 'iTXt', 'tIME', 'prIv', 'eXIf'])
      expect({ dropped, found: stripped.includes(dropped) }).toEqual({ dropped, found: false });
    expect((await pixels(stripped)).data.equals((await pixels(input)).data)).toBe(true);
  });

  it('should refuse a wrong CRC and an unknown critical chunk', async () => {
    const photo = await phonePhoto('png');
    const damaged = Buffer.from(photo);
    damaged[33 + 20] ^= 0xff; // inside the first chunk after IHDR
    expect(() => stripMetadata(damaged, 'png')).toThrow(/wrong CRC/);
    expect(() => stripMetadata(afterIhdr(photo, pngChunk('QQQQ', 'x')), 'png')).toThrow(
      /unknown critical chunk QQQQ/,
    );
  });
});

describe('stripMetadata, WebP chunks', () => {
  it('should clear the EXIF and XMP flags and rewrite the RIFF size', async () => {
    const photo = await phonePhoto('webp');
    expect(webpChunkTypes(photo)).toEqual(expect.arrayContaining(['VP8X', 'ICCP', 'EXIF', 'XMP ']));
    const stripped = stripMetadata(photo, 'webp');
    expect(webpChunkTypes(stripped)).toEqual(
      webpChunkTypes(photo).filter((type) => type !== 'EXIF' && type !== 'XMP '),
    );
    expect(stripped[20] & 0x0c).toBe(0); // VP8X flags: EXIF (0x08) and XMP (0x04) cleared
    expect(stripped[20] & 0x20).toBe(0x20); // ICC kept
    expect(stripped.readUInt32LE(4)).toBe(stripped.length - 8);

    const turned = stripMetadata(await phonePhoto('webp', { orientation: 5 }), 'webp', {
      orientation: 5,
    });
    expect(turned[20] & 0x0c).toBe(0x08);
    expect((await sharp(turned).metadata()).orientation).toBe(5);
  });

  it('should refuse an orientation in a simple (VP8-only) WebP, which cannot hold one', async () => {
    const simple = await sharp(Buffer.alloc(16 * 16 * 3, 90), {
      raw: { width: 16, height: 16, channels: 3 },
    })
      .webp()
      .toBuffer();
    expect(webpChunkTypes(simple)).toEqual(['VP8 ']);
    expect(stripMetadata(simple, 'webp').equals(simple)).toBe(true);
    expect(() => stripMetadata(simple, 'webp', { orientation: 6 })).toThrow(/without a VP8X/);
  });
});
