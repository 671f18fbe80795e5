import type { Raster8 } from '@mixmark/common';
import sharp from 'sharp';
import { chromaLatticeOf, type ChromaLattice } from './jpeg-lattice';
import { PhotoFileError } from './measurement-issue';

/** Input limits that stop decompression bombs and oversized uploads before decoding. */
export type PhotoLimits = {
  /** Largest file accepted, in bytes (default 40 MB). */
  maxBytes: number;
  /** Largest image accepted, in pixels (default 100 MP: a 48 MP phone photo fits twice over). */
  maxPixels: number;
};

/** Default limits (common practice for phone uploads; no standard sets them). */
export const defaultPhotoLimits: PhotoLimits = {
  maxBytes: 40 * 1024 * 1024,
  maxPixels: 100_000_000,
};

/** A decoded photo: upright, sRGB, 8-bit RGB, reduced to a working size. */
export type DecodedPhoto = {
  raster: Raster8 & { channels: 3 };
  /** Working pixels per original pixel (e.g. 0.5). */
  scale: number;
  /** Size of the upright original. */
  width: number;
  height: number;
  format: 'jpeg' | 'png' | 'webp';
  /** For a JPEG whose decoded YCbCr reaches the raster untouched: its chroma DC lattice
   * (flat areas are snapped to it, `jpeg-lattice.ts`); otherwise why not. */
  chroma: { lattice: ChromaLattice } | { skipped: string };
};

type Sniffed = 'jpeg' | 'png' | 'webp' | 'heic' | 'avif' | 'gif' | 'tiff' | 'bmp' | undefined;

/** File type from the first bytes (the name and the declared type are not trusted). */
export function sniffImageType(bytes: Buffer): Sniffed {
  if (bytes.length >= 3 && bytes[0] === 0xff && bytes[1] === 0xd8 && bytes[2] === 0xff)
    return 'jpeg';
  if (
    bytes.length >= 8 &&
    bytes.readUInt32BE(0) === 0x89504e47 &&
    bytes.readUInt32BE(4) === 0x0d0a1a0a
  )
    return 'png';
  if (
    bytes.length >= 12 &&
    bytes.toString('latin1', 0, 4) === 'RIFF' &&
    bytes.toString('latin1', 8, 12) === 'WEBP'
  )
    return 'webp';
  if (bytes.length >= 12 && bytes.toString('latin1', 4, 8) === 'ftyp') {
    const brand = bytes.toString('latin1', 8, 12);
    return brand.startsWith('avi') ? 'avif' : 'heic';
  }
  if (bytes.length >= 4 && bytes.toString('latin1', 0, 4) === 'GIF8') return 'gif';
  if (bytes.length >= 4 && ['II*\0', 'MM\0*'].includes(bytes.toString('latin1', 0, 4)))
    return 'tiff';
  if (bytes.length >= 2 && bytes.toString('latin1', 0, 2) === 'BM') return 'bmp';
  return undefined;
}

const sendJpeg =
  'Send the photo as a JPEG instead: on an iPhone choose Settings › Camera › Formats › Most Compatible, or share or export the photo as JPEG.';

/** Checks bytes, type and size; throws a PhotoFileError with a sentence to act on. */
export async function checkPhoto(bytes: Buffer, limits: PhotoLimits = defaultPhotoLimits) {
  if (bytes.length > limits.maxBytes) {
    throw new PhotoFileError(
      'FILE_TOO_LARGE',
      `This file is ${(bytes.length / 1048576).toFixed(0)} MB; the limit is ${(limits.maxBytes / 1048576).toFixed(0)} MB. Send the photo as a JPEG from the phone's camera.`,
    );
  }
  const type = sniffImageType(bytes);
  if (type === undefined) {
    throw new PhotoFileError(
      'FILE_UNREADABLE',
      `This file is not a photo we can read. ${sendJpeg}`,
    );
  }
  if (type !== 'jpeg' && type !== 'png' && type !== 'webp') {
    throw new PhotoFileError(
      'FILE_UNSUPPORTED',
      `${type.toUpperCase()} photos are not supported (JPEG, PNG and WebP are). ${sendJpeg}`,
    );
  }
  let meta: sharp.Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: false }).metadata();
  } catch {
    throw new PhotoFileError(
      'FILE_UNREADABLE',
      `This photo file is damaged and cannot be opened. ${sendJpeg}`,
    );
  }
  const pixels = (meta.width ?? 0) * (meta.height ?? 0);
  if (!pixels)
    throw new PhotoFileError(
      'FILE_UNREADABLE',
      `This photo file has no picture in it. ${sendJpeg}`,
    );
  if (pixels > limits.maxPixels) {
    throw new PhotoFileError(
      'FILE_TOO_LARGE',
      `This image is ${(pixels / 1e6).toFixed(0)} megapixels; the limit is ${(limits.maxPixels / 1e6).toFixed(0)}. Send the photo straight from the phone's camera.`,
    );
  }
  // EXIF orientations 5 to 8 turn the picture a quarter turn (CIPA DC-008, Exif 2.32 §4.6.4).
  const turned = (meta.orientation ?? 1) >= 5;
  return {
    type,
    hasProfile: Boolean(meta.hasProfile),
    width: turned ? meta.height! : meta.width!,
    height: turned ? meta.width! : meta.height!,
  };
}

/**
 * Decodes a photo once, upright (EXIF orientation honoured), converted to sRGB (sharp's
 * default, which applies an embedded ICC profile such as Display P3), alpha dropped, shrunk
 * on load by a power of two so that its long side is at most `maxSide` (the card's patches
 * and windows still get thousands of pixels each). Metadata is never carried over: raw
 * pixels have none.
 *
 * @param bytes - the file
 * @param options - limits and working size (default long side ≤ 2048 px)
 * @returns the working raster and how it relates to the original
 * @throws PhotoFileError for a file that cannot be used
 * @example
 * const { raster, scale } = await decodePhoto(await readFile('photo.jpg'));
 */
export async function decodePhoto(
  bytes: Buffer,
  options: { limits?: PhotoLimits; maxSide?: number } = {},
): Promise<DecodedPhoto> {
  const limits = options.limits ?? defaultPhotoLimits;
  const { type, width, height, hasProfile } = await checkPhoto(bytes, limits);
  const maxSide = options.maxSide ?? 2048;
  let factor = 1;
  while (Math.max(width, height) / factor > maxSide) factor *= 2;
  const w = Math.max(1, Math.round(width / factor));
  const h = Math.max(1, Math.round(height / factor));
  try {
    const { data, info } = await sharp(bytes, {
      limitInputPixels: limits.maxPixels,
      failOn: 'truncated',
    })
      .rotate()
      .resize(w, h, { fit: 'fill', kernel: 'linear' })
      .removeAlpha()
      .toColourspace('srgb')
      .raw()
      .toBuffer({ resolveWithObject: true });
    return {
      // A plain Uint8Array view of sharp's Buffer: V8 reads it faster in the pixel loops.
      raster: {
        data: new Uint8Array(data.buffer, data.byteOffset, data.length),
        width: info.width,
        height: info.height,
        channels: 3,
      },
      scale: info.width / width,
      width,
      height,
      format: type,
      // The decode keeps a flat area's chroma as the file's (EXIF rotation moves pixels, the
      // shrink on load decodes whole blocks at a smaller IDCT size, which keeps a DC-only
      // block one value, and the linear resize after it averages values that are equal);
      // an embedded profile's conversion to sRGB would not, so the lattice is then not used.
      chroma: type === 'jpeg' ? chromaLatticeOf(bytes, hasProfile) : { skipped: type },
    };
  } catch (error) {
    const text = error instanceof Error ? error.message : String(error);
    if (/pixel limit/i.test(text)) {
      throw new PhotoFileError(
        'FILE_TOO_LARGE',
        `This image has too many pixels. Send the photo straight from the phone's camera.`,
      );
    }
    throw new PhotoFileError(
      'FILE_UNREADABLE',
      `This photo file is damaged or incomplete (it may not have finished uploading). Send it again, as a JPEG.`,
    );
  }
}

/**
 * The copy of a photo that is stored: upright, as JPEG, with every piece of metadata (EXIF,
 * GPS location, XMP, IPTC) dropped; only the colour is kept, converted to sRGB.
 *
 * @param bytes - the uploaded file (already accepted by `checkPhoto`)
 * @returns JPEG bytes without metadata
 */
export async function sanitisePhoto(
  bytes: Buffer,
  limits: PhotoLimits = defaultPhotoLimits,
): Promise<Buffer> {
  await checkPhoto(bytes, limits);
  return sharp(bytes, { limitInputPixels: limits.maxPixels })
    .rotate()
    .toColourspace('srgb')
    .jpeg({ quality: 92, mozjpeg: false })
    .toBuffer();
}
