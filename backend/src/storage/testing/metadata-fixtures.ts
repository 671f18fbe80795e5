import { crc32 } from 'node:zlib';
import sharp from 'sharp';

/** Where the test photos were "taken": Trafalgar Square (51.5034 N, 0.1275 W). */
export const gpsExif = {
  IFD0: { Make: 'PhoneCo', Model: 'Test Phone 1', Copyright: 'Alice Example' },
  IFD2: { DateTimeOriginal: '2026:03:14 15:09:26', BodySerialNumber: 'SN-0042' },
  IFD3: {
    GPSLatitudeRef: 'N',
    GPSLatitude: '51/1 30/1 1234/100',
    GPSLongitudeRef: 'W',
    GPSLongitude: '0/1 7/1 3900/100',
  },
};

export const xmpPacket =
  '<x:xmpmeta xmlns:x="adobe:ns:meta/"><rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#">' +
  '<rdf:Description xmlns:dc="http://purl.org/dc/elements/1.1/" dc:creator="Alice Example"/></rdf:RDF></x:xmpmeta>';

/** Strings of the metadata above that must not be found anywhere in a stripped file. */
export const privateStrings = [
  'PhoneCo',
  'Test Phone 1',
  'Alice Example',
  'SN-0042',
  '2026:03:14',
  'adobe:ns:meta',
];

/** A noisy, colourful picture (deterministic), so that the codecs have real work to do. */
export function noisyRaw(width: number, height: number): Buffer {
  const raw = Buffer.alloc(width * height * 3);
  let seed = 7;
  for (let y = 0; y < height; y += 1) {
    for (let x = 0; x < width; x += 1) {
      for (let c = 0; c < 3; c += 1) {
        seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
        raw[(y * width + x) * 3 + c] = (c * 70 + x * (c + 1) + y * 2 + ((seed >>> 24) % 40)) & 255;
      }
    }
  }
  return raw;
}

/**
 * A photo as a phone would send it: a Display P3 profile, EXIF with GPS, camera and date, XMP,
 * and the given EXIF orientation.
 */
export async function phonePhoto(
  format: 'jpeg' | 'png' | 'webp',
  options: { width?: number; height?: number; orientation?: number } = {},
): Promise<Buffer> {
  const width = options.width ?? 96;
  const height = options.height ?? 64;
  let image = sharp(noisyRaw(width, height), {
    raw: { width, height, channels: 3 },
  }).withIccProfile('p3');
  if (options.orientation) image = image.withMetadata({ orientation: options.orientation });
  image = image.withExif(gpsExif).withXmp(xmpPacket);
  if (format === 'jpeg') return image.jpeg({ quality: 90 }).toBuffer();
  if (format === 'png') return image.png().toBuffer();
  return image.webp({ quality: 80 }).toBuffer();
}

/** A JPEG segment (marker + length + payload), T.81 B.1.1.4. */
export function jpegSegment(marker: number, payload: Buffer | string): Buffer {
  const body = typeof payload === 'string' ? Buffer.from(payload, 'latin1') : payload;
  const segment = Buffer.alloc(4 + body.length);
  segment.writeUInt16BE(0xff00 | marker, 0);
  segment.writeUInt16BE(2 + body.length, 2);
  body.copy(segment, 4);
  return segment;
}

/** Inserts bytes right after a JPEG's SOI marker. */
export function afterSoi(jpeg: Buffer, ...inserted: Buffer[]): Buffer {
  return Buffer.concat([jpeg.subarray(0, 2), ...inserted, jpeg.subarray(2)]);
}

/** A PNG chunk with its CRC (PNG §5.3). */
export function pngChunk(type: string, data: Buffer | string): Buffer {
  const body = typeof data === 'string' ? Buffer.from(data, 'latin1') : data;
  const chunk = Buffer.alloc(12 + body.length);
  chunk.writeUInt32BE(body.length, 0);
  chunk.write(type, 4, 'latin1');
  body.copy(chunk, 8);
  chunk.writeUInt32BE(crc32(chunk.subarray(4, 8 + body.length)), 8 + body.length);
  return chunk;
}

/** Inserts chunks right after a PNG's IHDR (signature 8 bytes + IHDR 25 bytes). */
export function afterIhdr(png: Buffer, ...chunks: Buffer[]): Buffer {
  return Buffer.concat([png.subarray(0, 33), ...chunks, png.subarray(33)]);
}

/** The four-character codes of a WebP's top-level chunks, read straight from the RIFF bytes. */
export function webpChunkTypes(webp: Buffer): string[] {
  const types: string[] = [];
  for (let i = 12; i + 8 <= webp.length;) {
    const size = webp.readUInt32LE(i + 4);
    types.push(webp.toString('latin1', i, i + 4));
    i += 8 + size + (size & 1);
  }
  return types;
}
