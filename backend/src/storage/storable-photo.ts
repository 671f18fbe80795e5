import sharp from 'sharp';
import {
  checkPhoto,
  defaultPhotoLimits,
  sanitisePhoto,
  sniffImageType,
  type PhotoLimits,
} from '../measurement/decode-photo';
import { PhotoFileError } from '../measurement/measurement-issue';
import { stripMetadata, type StrippableFormat } from './strip-metadata';

/** The copy of an upload that is kept: the original's picture, none of its metadata. */
export type StorablePhoto = {
  bytes: Buffer;
  format: StrippableFormat;
  /** File name ending for the storage key (`jpg`, `png`, `webp`). */
  extension: 'jpg' | 'png' | 'webp';
  contentType: 'image/jpeg' | 'image/png' | 'image/webp';
  /**
   * How the metadata went: `stripped` keeps the original's compressed pixels byte for byte;
   * `re-encoded` is the fallback for a file the walker could not parse (an upright sRGB JPEG).
   */
  method: 'stripped' | 're-encoded';
};

const kinds = {
  jpeg: { extension: 'jpg', contentType: 'image/jpeg' },
  png: { extension: 'png', contentType: 'image/png' },
  webp: { extension: 'webp', contentType: 'image/webp' },
} as const;

/** The content type of stored photo bytes, by their first bytes (JPEG when unknown). */
export function photoContentType(bytes: Buffer): StorablePhoto['contentType'] {
  const type = sniffImageType(bytes);
  return type === 'png' || type === 'webp' ? kinds[type].contentType : 'image/jpeg';
}

/**
 * Checks an upload (`checkPhoto`: size, type by its bytes, pixel count) and makes the copy to
 * store: the metadata is walked out of the file without decoding it (`stripMetadata`), keeping
 * the colour profile and the EXIF orientation, so the photo is stored as it was taken, in its
 * own format, in a few milliseconds. The result is read back by sharp and must show the same
 * size, orientation and colour profile and no EXIF beyond the orientation, no XMP, no IPTC.
 * Only a file the walker cannot parse, or whose copy does not read back so, is decoded and
 * re-encoded as before (`sanitisePhoto`); a file that cannot be decoded either is refused.
 *
 * @param bytes - the uploaded file
 * @param limits - the upload limits
 * @returns the bytes to store and how to name and serve them
 * @throws PhotoFileError (FILE_TOO_LARGE, FILE_UNSUPPORTED, FILE_UNREADABLE) with a sentence to act on
 * @example
 * const { bytes, extension } = await storablePhoto(file.buffer, { maxBytes, maxPixels: 100_000_000 });
 */
export async function storablePhoto(
  bytes: Buffer,
  limits: PhotoLimits = defaultPhotoLimits,
): Promise<StorablePhoto> {
  const { type } = await checkPhoto(bytes, limits);
  const stripped = await strippedCopy(bytes, type);
  if (stripped) return { bytes: stripped, format: type, ...kinds[type], method: 'stripped' };
  try {
    return {
      bytes: await sanitisePhoto(bytes, limits),
      format: 'jpeg',
      ...kinds.jpeg,
      method: 're-encoded',
    };
  } catch (error) {
    if (error instanceof PhotoFileError) throw error;
    throw new PhotoFileError(
      'FILE_UNREADABLE',
      'This photo file is damaged or incomplete (it may not have finished uploading). Send it again, as a JPEG.',
    );
  }
}

/** The stripped copy, or undefined when the file must take the re-encoding path. */
async function strippedCopy(bytes: Buffer, type: StrippableFormat): Promise<Buffer | undefined> {
  try {
    const before = await sharp(bytes, { limitInputPixels: false }).metadata();
    const orientation = before.orientation ?? 1;
    const copy = stripMetadata(bytes, type, { orientation });
    const after = await sharp(copy, { limitInputPixels: false }).metadata();
    const readsTheSame =
      after.format === before.format &&
      after.width === before.width &&
      after.height === before.height &&
      (after.orientation ?? 1) === orientation &&
      Boolean(after.icc) === Boolean(before.icc) &&
      !after.xmp &&
      !after.iptc &&
      !after.comments?.length &&
      (orientation === 1 ? !after.exif : (after.exif?.length ?? 0) <= 64);
    return readsTheSame ? copy : undefined;
  } catch {
    return undefined; // a MalformedImageError from the walker, or sharp unable to read either file
  }
}
