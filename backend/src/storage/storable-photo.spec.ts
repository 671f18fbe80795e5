import { describe, expect, it } from '@jest/globals';
import exifr from 'exifr';
import sharp from 'sharp';
import { PhotoFileError } from '../measurement/measurement-issue';
import { photoContentType, storablePhoto } from './storable-photo';
import { afterSoi, phonePhoto, privateStrings } from './testing/metadata-fixtures';

const limits = { maxBytes: 20 * 1024 * 1024, maxPixels: 100_000_000 };

async function rejection(promise: Promise<unknown>): Promise<unknown> {
  return promise.then(
    () => undefined,
    (error: unknown) => error,
  );
}

describe('storablePhoto', () => {
  it.each([
    ['jpeg', 'jpg', 'image/jpeg'],
    ['png', 'png', 'image/png'],
    ['webp', 'webp', 'image/webp'],
  ] as const)(
    'should keep a %s in its own format, stripped without re-encoding',
    async (format, extension, contentType) => {
      const photo = await phonePhoto(format, { orientation: 6 });
      const stored = await storablePhoto(photo, limits);
      expect(stored).toMatchObject({ format, extension, contentType, method: 'stripped' });
      expect(photoContentType(stored.bytes)).toBe(contentType);
      const meta = await sharp(stored.bytes).metadata();
      expect(meta).toMatchObject({ format, orientation: 6, hasProfile: true });
      expect(meta.xmp).toBeUndefined();
      const text = stored.bytes.toString('latin1');
      expect(privateStrings.filter((value) => text.includes(value))).toEqual([]);
      if (format !== 'webp')
        expect(await exifr.gps(stored.bytes).catch(() => undefined)).toBeUndefined();
      const [want, got] = await Promise.all([
        sharp(photo).raw().toBuffer(),
        sharp(stored.bytes).raw().toBuffer(),
      ]);
      expect(got.equals(want)).toBe(true);
    },
  );

  it('should re-encode, upright and without metadata, a photo the walker cannot parse but sharp can decode', async () => {
    // A TEM marker (FF01) between segments: libjpeg passes over it, the walker refuses it.
    const odd = afterSoi(
      await phonePhoto('jpeg', { orientation: 6, width: 80, height: 48 }),
      Buffer.from([0xff, 0x01]),
    );
    const stored = await storablePhoto(odd, limits);
    expect(stored).toMatchObject({
      format: 'jpeg',
      extension: 'jpg',
      contentType: 'image/jpeg',
      method: 're-encoded',
    });
    const meta = await sharp(stored.bytes).metadata();
    expect(meta).toMatchObject({ format: 'jpeg', width: 48, height: 80 });
    expect(meta.orientation).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(await exifr.gps(stored.bytes).catch(() => undefined)).toBeUndefined();
    const text = stored.bytes.toString('latin1');
    expect(privateStrings.filter((value) => text.includes(value))).toEqual([]);
  });

  it.each(['jpeg', 'png', 'webp'] as const)(
    'should refuse a truncated %s with FILE_UNREADABLE and a sentence to act on',
    async (format) => {
      const photo = await phonePhoto(format, { width: 200, height: 150 });
      const error = await rejection(
        storablePhoto(photo.subarray(0, Math.floor(photo.length * 0.6)), limits),
      );
      expect(error).toBeInstanceOf(PhotoFileError);
      expect(error).toMatchObject({
        code: 'FILE_UNREADABLE',
        message: expect.stringMatching(/Send it again|Send the photo/),
      });
    },
  );

  it('should keep the upload checks: size, type and unreadable bytes', async () => {
    const photo = await phonePhoto('jpeg');
    expect(await rejection(storablePhoto(photo, { ...limits, maxBytes: 1000 }))).toMatchObject({
      code: 'FILE_TOO_LARGE',
    });
    const gif = await sharp(Buffer.alloc(8 * 8 * 3, 50), {
      raw: { width: 8, height: 8, channels: 3 },
    })
      .gif()
      .toBuffer();
    expect(await rejection(storablePhoto(gif, limits))).toMatchObject({ code: 'FILE_UNSUPPORTED' });
    expect(await rejection(storablePhoto(Buffer.from('not a photo at all'), limits))).toMatchObject(
      { code: 'FILE_UNREADABLE' },
    );
  });
});
