import { crc32 } from 'node:zlib';

/**
 * Removes metadata from a JPEG, PNG or WebP file without touching the compressed picture: the
 * container is walked segment by segment (chunk by chunk), the segments that only describe the
 * photo (EXIF with its GPS IFD, XMP, IPTC, comments, text, time stamps, thumbnails of other
 * programs) are left out, and every byte of the image data is copied as it was, so the decoded
 * pixels are identical. Kept are only the parts that change how the pixels are decoded or shown:
 *
 * - JPEG (ITU-T T.81 Annex B; JFIF 1.02 / ITU-T T.871; Exif 2.3, CIPA DC-008 §4.5.4; ICC.1
 *   Annex B.4 for ICC_PROFILE in APP2; Adobe Technical Note 5116 for APP14): every table, frame
 *   and scan segment and the entropy-coded data; of the application segments only APP0 `JFIF`,
 *   APP2 `ICC_PROFILE` and APP14 `Adobe` (its transform flag decides YCC or RGB). APP1 (Exif,
 *   XMP), APP13 (Photoshop / IPTC), COM, every other APPn and anything after EOI (MPF images,
 *   appended videos) are dropped.
 * - PNG (W3C PNG Specification, Third Edition, §5.3 chunk layout and §11 chunk list): the
 *   critical chunks and the ancillary chunks that affect decoding or display (tRNS, cHRM, gAMA,
 *   iCCP, sBIT, sRGB, cICP, mDCV, cLLI, bKGD, hIST, pHYs, sPLT, and APNG's acTL, fcTL, fdAT).
 *   eXIf, tEXt, zTXt, iTXt, tIME and any other ancillary chunk are dropped (an allow-list, so a
 *   private chunk cannot carry a location through); CRCs of kept chunks are checked.
 * - WebP (Google's "WebP Container Specification", RIFF): VP8X, ICCP, ANIM, ANMF, ALPH, VP8 and
 *   VP8L are kept; EXIF, XMP and unknown chunks are dropped, VP8X's EXIF and XMP flags cleared
 *   and the RIFF size rewritten.
 *
 * The EXIF orientation is the one piece of EXIF that changes the picture (measurement and
 * browsers turn the photo upright by it; Exif 2.3 §4.6.4 A, tag 0x0112), so when it is not 1 a
 * minimal EXIF block holding only that tag is written back: an APP1 after SOI (and JFIF), an
 * eXIf chunk before the first IDAT, or an EXIF chunk at the end of a WebP (with its VP8X flag).
 *
 * Anything the walker does not understand throws a MalformedImageError; it never returns bytes
 * it could not parse from one end to the other.
 */
export type StrippableFormat = 'jpeg' | 'png' | 'webp';

/** The file's structure is not what its format's specification allows (or not what we accept). */
export class MalformedImageError extends Error {
  constructor(format: StrippableFormat, problem: string) {
    super(`${format}: ${problem}`);
    this.name = 'MalformedImageError';
  }
}

/**
 * @param bytes - a whole JPEG, PNG or WebP file
 * @param format - its format (from its first bytes)
 * @param options.orientation - the photo's EXIF orientation (1 to 8; 1 or absent writes none)
 * @returns the same picture without metadata
 * @throws MalformedImageError when the file cannot be walked from start to end
 * @example
 * const clean = stripMetadata(bytes, 'jpeg', { orientation: 6 });
 */
export function stripMetadata(
  bytes: Buffer,
  format: StrippableFormat,
  options: { orientation?: number } = {},
): Buffer {
  const orientation = options.orientation ?? 1;
  if (!Number.isInteger(orientation) || orientation < 1 || orientation > 8) {
    throw new MalformedImageError(format, `orientation ${orientation} is not one of 1 to 8`);
  }
  if (format === 'jpeg') return stripJpeg(bytes, orientation);
  if (format === 'png') return stripPng(bytes, orientation);
  return stripWebp(bytes, orientation);
}

/**
 * A TIFF structure (Exif 2.3 §4.6.2, IFD structure) with one IFD holding one entry:
 * Orientation (0x0112), type SHORT, count 1, the value left-justified in the 4-byte field; no
 * next IFD.
 */
function orientationTiff(orientation: number): Buffer {
  const tiff = Buffer.alloc(26);
  tiff.write('MM\0*', 0, 'latin1'); // big-endian byte order, 42
  tiff.writeUInt32BE(8, 4); // IFD0 right after the header
  tiff.writeUInt16BE(1, 8); // one entry
  tiff.writeUInt16BE(0x0112, 10);
  tiff.writeUInt16BE(3, 12);
  tiff.writeUInt32BE(1, 14);
  tiff.writeUInt16BE(orientation, 18);
  return tiff; // bytes 22-25 (offset of the next IFD) stay 0
}

// ---------------------------------------------------------------------------------------------
// JPEG

const jpegKeptApp: ReadonlyArray<[marker: number, identifier: string]> = [
  [0xe0, 'JFIF\0'],
  [0xe2, 'ICC_PROFILE\0'],
  [0xee, 'Adobe'],
];

/** Table, frame, scan and restart-interval segments (T.81 Table B.1), all kept as they are. */
function isJpegCodingSegment(marker: number): boolean {
  if (marker >= 0xc0 && marker <= 0xcf) return marker !== 0xc8; // SOFn, DHT (C4), DAC (CC); C8 is reserved (JPG)
  return marker >= 0xda && marker <= 0xdf; // SOS, DQT, DNL, DRI, DHP, EXP
}

function isJpegFrame(marker: number): boolean {
  return marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc;
}

function stripJpeg(bytes: Buffer, orientation: number): Buffer {
  const fail = (problem: string): never => {
    throw new MalformedImageError('jpeg', problem);
  };
  if (bytes.length < 4 || bytes[0] !== 0xff || bytes[1] !== 0xd8) fail('no SOI marker');
  const parts: Buffer[] = [bytes.subarray(0, 2)];
  let exifPending = orientation !== 1;
  let frames = 0;
  let scans = 0;
  let i = 2;
  for (;;) {
    if (i >= bytes.length) fail('the file ends before the EOI marker (truncated)');
    if (bytes[i] !== 0xff) fail(`no marker at byte ${i}`);
    while (i < bytes.length && bytes[i] === 0xff) i += 1; // fill bytes (T.81 B.1.1.2)
    if (i >= bytes.length) fail('the file ends inside a marker (truncated)');
    const marker = bytes[i];
    const markerAt = i - 1;
    i += 1;
    if (marker === 0xd9) {
      if (scans === 0) fail('EOI before any scan');
      parts.push(bytes.subarray(markerAt, i)); // bytes after EOI are dropped
      break;
    }
    const isApp = marker >= 0xe0 && marker <= 0xef;
    if (!isApp && marker !== 0xfe && !isJpegCodingSegment(marker)) {
      fail(`unexpected marker FF${marker.toString(16).toUpperCase()} at byte ${markerAt}`);
    }
    if (i + 2 > bytes.length) fail('the file ends inside a segment length (truncated)');
    const length = bytes.readUInt16BE(i);
    const end = i + length;
    if (length < 2 || end > bytes.length)
      fail(`segment FF${marker.toString(16).toUpperCase()} runs past the end`);
    const keep =
      !isApp && marker !== 0xfe
        ? true
        : jpegKeptApp.some(
            ([app, id]) =>
              app === marker &&
              length - 2 >= id.length &&
              bytes.toString('latin1', i + 2, i + 2 + id.length) === id,
          );
    // The orientation goes right after SOI, or after a JFIF APP0 that comes first (JFIF 1.02
    // wants APP0 right after SOI; readers take APP1 anywhere before the frame).
    if (exifPending && !(marker === 0xe0 && keep)) {
      parts.push(jpegOrientationSegment(orientation));
      exifPending = false;
    }
    if (keep) parts.push(bytes.subarray(markerAt, end));
    i = end;
    if (isJpegFrame(marker)) frames += 1;
    if (marker === 0xda) {
      if (frames === 0) fail('a scan before any frame header');
      scans += 1;
      // Entropy-coded data runs to the next marker; FF 00 is a stuffed byte and FF D0-D7 a
      // restart marker, both part of the data (T.81 B.1.1.5, F.1.2.3).
      let j = i;
      for (;;) {
        j = bytes.indexOf(0xff, j);
        if (j < 0 || j + 1 >= bytes.length) fail('the file ends inside a scan (truncated)');
        const next = bytes[j + 1];
        if (next === 0x00 || (next >= 0xd0 && next <= 0xd7)) j += 2;
        else break;
      }
      parts.push(bytes.subarray(i, j));
      i = j;
    }
  }
  return Buffer.concat(parts);
}

/** APP1 holding `Exif\0\0` and the orientation-only TIFF (Exif 2.3 §4.5.4). */
function jpegOrientationSegment(orientation: number): Buffer {
  const tiff = orientationTiff(orientation);
  const segment = Buffer.alloc(4 + 6 + tiff.length);
  segment.writeUInt16BE(0xffe1, 0);
  segment.writeUInt16BE(2 + 6 + tiff.length, 2);
  segment.write('Exif\0\0', 4, 'latin1');
  tiff.copy(segment, 10);
  return segment;
}

// ---------------------------------------------------------------------------------------------
// PNG

const pngSignature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const pngKept = new Set([
  'IHDR',
  'PLTE',
  'IDAT',
  'IEND',
  'tRNS',
  'cHRM',
  'gAMA',
  'iCCP',
  'sBIT',
  'sRGB',
  'cICP',
  'mDCV',
  'cLLI',
  'bKGD',
  'hIST',
  'pHYs',
  'sPLT',
  'acTL',
  'fcTL',
  'fdAT',
]);

function stripPng(bytes: Buffer, orientation: number): Buffer {
  const fail = (problem: string): never => {
    throw new MalformedImageError('png', problem);
  };
  if (bytes.length < 8 || !bytes.subarray(0, 8).equals(pngSignature)) fail('no PNG signature');
  const parts: Buffer[] = [bytes.subarray(0, 8)];
  let exifPending = orientation !== 1;
  let sawData = false;
  let i = 8;
  for (let index = 0; ; index += 1) {
    if (i + 12 > bytes.length) fail('the file ends before IEND (truncated)');
    const length = bytes.readUInt32BE(i);
    const type = bytes.toString('latin1', i + 4, i + 8);
    if (length > 0x7fffffff) fail(`chunk ${index} is longer than 2^31 - 1 bytes`);
    if (!/^[A-Za-z]{4}$/.test(type)) fail(`chunk ${index} has no valid type`);
    const end = i + 12 + length;
    if (end > bytes.length) fail(`chunk ${type} runs past the end (truncated)`);
    if (index === 0 && (type !== 'IHDR' || length !== 13)) fail('the first chunk is not IHDR');
    const critical = type.charCodeAt(0) < 0x61; // upper-case first letter (§5.4)
    if (critical && !pngKept.has(type)) fail(`unknown critical chunk ${type}`);
    if (pngKept.has(type)) {
      if (crc32(bytes.subarray(i + 4, i + 8 + length)) !== bytes.readUInt32BE(i + 8 + length)) {
        fail(`chunk ${type} has a wrong CRC`);
      }
      if (exifPending && type === 'IDAT') {
        parts.push(pngChunk('eXIf', orientationTiff(orientation)));
        exifPending = false;
      }
      if (type === 'IDAT') sawData = true;
      parts.push(bytes.subarray(i, end));
    }
    i = end;
    if (type === 'IEND') break; // bytes after IEND are dropped
  }
  if (!sawData) fail('no IDAT chunk');
  return Buffer.concat(parts);
}

function pngChunk(type: string, data: Buffer): Buffer {
  const chunk = Buffer.alloc(12 + data.length);
  chunk.writeUInt32BE(data.length, 0);
  chunk.write(type, 4, 'latin1');
  data.copy(chunk, 8);
  chunk.writeUInt32BE(crc32(chunk.subarray(4, 8 + data.length)), 8 + data.length);
  return chunk;
}

// ---------------------------------------------------------------------------------------------
// WebP

const webpKept = new Set(['VP8X', 'ICCP', 'ANIM', 'ANMF', 'ALPH', 'VP8 ', 'VP8L']);
const webpImage = new Set(['ANMF', 'VP8 ', 'VP8L']);
const vp8xExif = 0x08;
const vp8xXmp = 0x04;

function stripWebp(bytes: Buffer, orientation: number): Buffer {
  const fail = (problem: string): never => {
    throw new MalformedImageError('webp', problem);
  };
  if (
    bytes.length < 20 ||
    bytes.toString('latin1', 0, 4) !== 'RIFF' ||
    bytes.toString('latin1', 8, 12) !== 'WEBP'
  ) {
    fail('no RIFF WEBP header');
  }
  const riffEnd = 8 + bytes.readUInt32LE(4);
  if (riffEnd > bytes.length) fail('the RIFF size is larger than the file (truncated)');
  const parts: Buffer[] = [];
  let extended = false;
  let sawImage = false;
  let i = 12;
  for (let index = 0; i < riffEnd; index += 1) {
    if (i + 8 > riffEnd) fail('a chunk header runs past the RIFF size');
    const type = bytes.toString('latin1', i, i + 4);
    const size = bytes.readUInt32LE(i + 4);
    const end = i + 8 + size + (size & 1); // odd payloads are padded to an even size
    if (end > riffEnd) fail(`chunk ${JSON.stringify(type)} runs past the RIFF size`);
    if (index === 0) {
      if (type === 'VP8X') {
        if (size < 10) fail('VP8X is shorter than 10 bytes');
        extended = true;
      } else if (type !== 'VP8 ' && type !== 'VP8L') {
        fail(`the first chunk is ${JSON.stringify(type)}, not VP8X, VP8 or VP8L`);
      }
    } else if (type === 'VP8X') fail('a second VP8X chunk');
    if (webpKept.has(type)) {
      if (webpImage.has(type)) sawImage = true;
      parts.push(bytes.subarray(i, end));
    }
    i = end;
  }
  if (!sawImage) fail('no image data');
  if (orientation !== 1) {
    if (!extended) fail('an orientation without a VP8X chunk');
    parts.push(webpChunk('EXIF', orientationTiff(orientation)));
  }
  if (extended) {
    const vp8x = Buffer.from(parts[0]); // a copy: the input is not changed
    vp8x[8] = (vp8x[8] & ~(vp8xExif | vp8xXmp)) | (orientation !== 1 ? vp8xExif : 0);
    parts[0] = vp8x;
  }
  const header = Buffer.alloc(12);
  header.write('RIFF', 0, 'latin1');
  header.writeUInt32LE(
    parts.reduce((sum, part) => sum + part.length, 4),
    4,
  );
  header.write('WEBP', 8, 'latin1');
  return Buffer.concat([header, ...parts]);
}

function webpChunk(type: string, data: Buffer): Buffer {
  const chunk = Buffer.alloc(8 + data.length + (data.length & 1));
  chunk.write(type, 0, 'latin1');
  chunk.writeUInt32LE(data.length, 4);
  data.copy(chunk, 8);
  return chunk;
}
