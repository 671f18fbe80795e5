/**
 * "Decoding closer to the file": a JPEG stores a flat area's chroma as one quantised DC value
 * per block, and the decoder rounds it to a whole code and then rounds again when it converts
 * YCbCr to RGB. For an area whose decoded chroma is one value throughout, the value the file
 * holds can be recovered from the decoded codes and the file's own quantisation table, which
 * takes both of the decoder's roundings out of the reading (docs/measurement.md).
 *
 * Sources: ITU-T T.81 (JPEG) §B.2.2 (SOF), §B.2.3 (SOS), §B.2.4.1 (DQT), Figure A.6 (zig-zag
 * order), §A.3.1 (level shift); JFIF 1.02 §7 (full-range BT.601 YCbCr); the IJG / libjpeg-turbo
 * decoder that sharp (libvips) uses: jidctint.c (a DC-only block decodes to
 * 128 + DESCALE(DC·q, 3), rounding halves up) and jdcolor.c (build_ycc_rgb_table, the
 * fixed-point YCbCr → RGB tables reproduced in `decoderChromaTerms`).
 */

/** One component of a JPEG frame (T.81 §B.2.2). */
export type JpegComponent = {
  id: number;
  /** Horizontal and vertical sampling factors. */
  h: number;
  v: number;
  /** Quantisation table selector. */
  table: number;
};

/** What the measurement needs from a JPEG's headers. */
export type JpegHeader = {
  /** SOF marker: 0xc0 baseline, 0xc1 extended sequential, 0xc2 progressive (others read too). */
  frame: number;
  precision: number;
  width: number;
  height: number;
  components: JpegComponent[];
  /** Quantisation tables by selector, 64 entries each in natural (row-major) order. */
  tables: (Uint16Array | undefined)[];
  /** Component ids of the first scan. */
  firstScan: number[];
  /** Adobe APP14 colour transform flag (0 none/RGB, 1 YCbCr, 2 YCCK), when present. */
  adobeTransform?: number;
  jfif: boolean;
};

/** Zig-zag index → natural (row-major) index (T.81 Figure A.6). */
const zigzagToNatural = [
  0, 1, 8, 16, 9, 2, 3, 10, 17, 24, 32, 25, 18, 11, 4, 5, 12, 19, 26, 33, 40, 48, 41, 34, 27, 20,
  13, 6, 7, 14, 21, 28, 35, 42, 49, 56, 57, 50, 43, 36, 29, 22, 15, 23, 30, 37, 44, 51, 58, 59, 52,
  45, 38, 31, 39, 46, 53, 60, 61, 54, 47, 55, 62, 63,
];

/**
 * Reads the markers of a JPEG up to its first scan: quantisation tables (8- or 16-bit
 * entries), the frame (size, components, sampling, table selectors), the first scan's
 * components, JFIF and Adobe markers. Nothing is decoded.
 *
 * @param bytes - the file
 * @returns the header, or a sentence saying why it cannot be read
 */
export function readJpegHeader(bytes: Uint8Array): JpegHeader | { unreadable: string } {
  const fail = (why: string) => ({ unreadable: why });
  if (bytes.length < 4 || bytes[0] !== 0xff || bytes[1] !== 0xd8) return fail('not a JPEG');
  const tables: (Uint16Array | undefined)[] = [];
  let frame: Omit<JpegHeader, 'tables' | 'firstScan' | 'adobeTransform' | 'jfif'> | undefined;
  let adobeTransform: number | undefined;
  let jfif = false;
  let p = 2;
  while (p + 4 <= bytes.length) {
    if (bytes[p] !== 0xff) return fail(`no marker at byte ${p}`);
    const marker = bytes[p + 1];
    if (marker === 0xff) {
      p++; // fill byte (T.81 §B.1.1.2)
      continue;
    }
    if (marker === 0xd9) break;
    if (marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7)) {
      p += 2;
      continue;
    }
    const length = (bytes[p + 2] << 8) | bytes[p + 3];
    const start = p + 4;
    const end = p + 2 + length;
    if (length < 2 || end > bytes.length)
      return fail(`marker 0x${marker.toString(16)} runs past the end`);
    if (marker === 0xdb) {
      // DQT: Pq (0: 8-bit, 1: 16-bit entries) and Tq in one byte, then 64 entries in zig-zag order.
      let q = start;
      while (q < end) {
        const precision = bytes[q] >> 4;
        const id = bytes[q] & 15;
        const size = precision ? 128 : 64;
        if (precision > 1 || id > 3 || q + 1 + size > end) return fail('malformed DQT');
        const table = new Uint16Array(64);
        for (let i = 0; i < 64; i++) {
          table[zigzagToNatural[i]] = precision
            ? (bytes[q + 1 + 2 * i] << 8) | bytes[q + 2 + 2 * i]
            : bytes[q + 1 + i];
        }
        tables[id] = table;
        q += 1 + size;
      }
    } else if (
      marker >= 0xc0 &&
      marker <= 0xcf &&
      marker !== 0xc4 &&
      marker !== 0xc8 &&
      marker !== 0xcc
    ) {
      const count = bytes[start + 5];
      if (length < 8 + 3 * count) return fail('malformed SOF');
      const components: JpegComponent[] = [];
      for (let i = 0; i < count; i++) {
        const o = start + 6 + 3 * i;
        components.push({
          id: bytes[o],
          h: bytes[o + 1] >> 4,
          v: bytes[o + 1] & 15,
          table: bytes[o + 2],
        });
      }
      frame = {
        frame: marker,
        precision: bytes[start],
        height: (bytes[start + 1] << 8) | bytes[start + 2],
        width: (bytes[start + 3] << 8) | bytes[start + 4],
        components,
      };
    } else if (marker === 0xe0 && length >= 7) {
      jfif ||= String.fromCharCode(...bytes.subarray(start, start + 5)) === 'JFIF\0';
    } else if (marker === 0xee && length >= 14) {
      if (String.fromCharCode(...bytes.subarray(start, start + 5)) === 'Adobe')
        adobeTransform = bytes[start + 11];
    } else if (marker === 0xda) {
      if (!frame) return fail('scan before the frame header');
      const count = bytes[start];
      const firstScan = Array.from({ length: count }, (_, i) => bytes[start + 1 + 2 * i]);
      return { ...frame, tables, firstScan, adobeTransform, jfif };
    }
    p = end;
  }
  return fail('no scan');
}

/** The chroma DC lattice of a JPEG: decoded Cb (Cr) of a flat block = 128 + round(k·step). */
export type ChromaLattice = {
  /** Code values per quantisation step of the Cb and Cr block DC (q_dc / 8). */
  cbStep: number;
  crStep: number;
  /** The DC quantiser entries themselves. */
  cbQ: number;
  crQ: number;
  /** Chroma sampling, from the frame's factors. */
  subsampling: string;
};

/**
 * The chroma lattice of a JPEG whose decoded pixels sharp hands over unchanged, or why it
 * does not apply: only 8-bit, three-component YCbCr frames whose first scan carries all three
 * components (the tables read are then the ones the decoder uses, T.81 §B.2.4.1), and only
 * when the decoded pixels are not converted further (no embedded ICC profile: sharp would
 * convert them to sRGB).
 *
 * @param bytes - the file
 * @param hasProfile - whether the file embeds an ICC profile
 */
export function chromaLatticeOf(
  bytes: Uint8Array,
  hasProfile: boolean,
): { lattice: ChromaLattice } | { skipped: string } {
  if (hasProfile) return { skipped: 'embedded ICC profile: decoded pixels are converted' };
  const header = readJpegHeader(bytes);
  if ('unreadable' in header) return { skipped: `header: ${header.unreadable}` };
  const { components: c, precision, firstScan, tables, adobeTransform, frame } = header;
  if (![0xc0, 0xc1, 0xc2].includes(frame)) return { skipped: `frame type 0x${frame.toString(16)}` };
  if (precision !== 8) return { skipped: `${precision}-bit samples` };
  if (c.length !== 3) return { skipped: `${c.length} components` };
  // libjpeg's rule for a three-component file without JFIF: Adobe transform 0 or component
  // ids 'R', 'G', 'B' mean RGB (jdapimin.c default_decompress_parms).
  const rgbIds = c[0].id === 0x52 && c[1].id === 0x47 && c[2].id === 0x42;
  if (!header.jfif && (adobeTransform === 0 || (adobeTransform === undefined && rgbIds)))
    return { skipped: 'RGB, not YCbCr' };
  if (!c.every((k) => firstScan.includes(k.id))) return { skipped: 'components in separate scans' };
  const cbQ = tables[c[1].table]?.[0];
  const crQ = tables[c[2].table]?.[0];
  if (!cbQ || !crQ) return { skipped: 'a chroma quantisation table is missing' };
  const subsampling =
    c[1].h === c[2].h && c[1].v === c[2].v
      ? c[0].h === c[1].h && c[0].v === c[1].v
        ? '4:4:4'
        : c[0].h === 2 * c[1].h && c[0].v === 2 * c[1].v
          ? '4:2:0'
          : c[0].h === 2 * c[1].h && c[0].v === c[1].v
            ? '4:2:2'
            : `${c[0].h}x${c[0].v}/${c[1].h}x${c[1].v}`
      : 'mixed';
  return { lattice: { cbStep: cbQ / 8, crStep: crQ / 8, cbQ, crQ, subsampling } };
}

/**
 * The one lattice point 128 + k·q/8 that the decoder rounds to the code `v` (halves up, as
 * jidctint.c's DESCALE), or undefined when none or two do (a step under one code). Exact in
 * integers: 8(v − 128) − 4 ≤ k·q < 8(v − 128) + 4.
 */
export function latticePointFor(v: number, q: number): number | undefined {
  if (v <= 0 || v >= 255) return undefined; // the decoder's range limit may have clipped it
  const lo = 8 * (v - 128) - 4;
  const first = Math.ceil(lo / q);
  const last = Math.ceil((lo + 8) / q) - 1;
  return first === last ? 128 + (first * q) / 8 : undefined;
}

const fix = (x: number): number => Math.floor(x * 65536 + 0.5);
const half = 1 << 15;
const [crR, cbG, crG, cbB] = [fix(1.402), fix(0.34414), fix(0.71414), fix(1.772)];

/**
 * What libjpeg(-turbo)'s YCbCr → RGB conversion adds to Y for integer Cb, Cr (jdcolor.c
 * build_ycc_rgb_table and ycc_rgb_convert, 16-bit fixed point, JFIF 1.02's coefficients):
 * R = Y + r, G = Y + g, B = Y + b, each then limited to 0..255.
 */
export function decoderChromaTerms(cb: number, cr: number): [number, number, number] {
  const x = cb - 128;
  const y = cr - 128;
  return [
    Math.floor((crR * y + half) / 65536),
    Math.floor((-cbG * x + half - crG * y) / 65536),
    Math.floor((cbB * x + half) / 65536),
  ];
}

/** Cb of 8-bit R, G, B (JFIF 1.02 §7, full-range BT.601). */
export const cbOf = (r: number, g: number, b: number): number =>
  128 - 0.168736 * r - 0.331264 * g + 0.5 * b;
/** Cr of 8-bit R, G, B (JFIF 1.02 §7). */
export const crOf = (r: number, g: number, b: number): number =>
  128 + 0.5 * r - 0.418688 * g - 0.081312 * b;

/**
 * Share of an area's samples that must agree, and be unclipped, for it to count as flat in
 * chroma. If a tenth of the samples sat one lattice step s from the rest, the area's true mean
 * would be at most 0.1·s ≈ 0.1–0.2 code from the majority's lattice point, below the 0.29
 * code RMS of the whole-code rounding that the snap removes; more disagreement and the mean is
 * left as it is (the chroma is then dithered, or the area is textured). (A minority on the
 * next point also says the true chroma is near the boundary between the two, up to half a
 * step from the majority's; averaging each sample's own point instead was tried and read
 * the same within chance, docs/measurement.md.)
 */
export const flatShare = 0.9;

/**
 * How far to move an area's camera codes (R, G, B) so that its chroma is the value the file
 * holds: its decoded Cb, Cr (one integer pair over the area) snapped to the file's DC lattice,
 * and the decoder's fixed-point conversion replaced by the exact JFIF one. Y is left as
 * decoded (noise dithers it). Undefined when the area is not flat in chroma (fewer than
 * `flatShare` of the samples unclipped and on one Cb, Cr pair, i.e. one R − G, B − G) or
 * its pair is not on the lattice at exactly one point.
 *
 * round(Cb(R, G, B)) gives back the decoder's integer Cb exactly: the conversion's roundings
 * move the JFIF forward Cb, Cr by at most 0.495 code over all 65,536 pairs (checked in the
 * spec), and Y cancels out of both, so one pair has one (R − G, B − G) and the reverse.
 *
 * @param codes - RGB codes, three per sample
 * @param lattice - the file's chroma lattice
 * @returns the shift per channel in code values, or undefined
 */
export function latticeShift(
  codes: Uint8Array,
  lattice: ChromaLattice,
): [number, number, number] | undefined {
  const n = Math.floor(codes.length / 3);
  if (n === 0) return undefined;
  // In one decoded flat area (R − G, B − G) are the same integers in every pixel, and they
  // fix Cb and Cr (below): a majority vote over them (Boyer and Moore's; any value held by
  // over half the samples wins) and a count of the winner tell flatness in two integer passes.
  let candidate = -1;
  let votes = 0;
  for (let k = 0; k < 3 * n; k += 3) {
    const r = codes[k];
    const g = codes[k + 1];
    const b = codes[k + 2];
    if (r === 0 || g === 0 || b === 0 || r === 255 || g === 255 || b === 255) continue;
    const key = (r - g + 256) * 512 + (b - g + 256);
    if (votes === 0) {
      candidate = key;
      votes = 1;
    } else votes += key === candidate ? 1 : -1;
  }
  let agree = 0;
  for (let k = 0; k < 3 * n; k += 3) {
    const r = codes[k];
    const g = codes[k + 1];
    const b = codes[k + 2];
    if (r === 0 || g === 0 || b === 0 || r === 255 || g === 255 || b === 255) continue;
    if ((r - g + 256) * 512 + (b - g + 256) === candidate) agree++;
  }
  if (agree < flatShare * n) return undefined;
  const rg = Math.floor(candidate / 512) - 256;
  const bg = (candidate % 512) - 256;
  // cbOf and crOf of any R, G, B with these differences (their weights sum to 0).
  const cb = Math.round(cbOf(rg, 0, bg));
  const cr = Math.round(crOf(rg, 0, bg));
  const cbFile = latticePointFor(cb, lattice.cbQ);
  const crFile = latticePointFor(cr, lattice.crQ);
  if (cbFile === undefined || crFile === undefined) return undefined;
  const [dr, dg, db] = decoderChromaTerms(cb, cr);
  const x = cbFile - 128;
  const y = crFile - 128;
  return [
    fromCb[0] * x + fromCr[0] * y - dr,
    fromCb[1] * x + fromCr[1] * y - dg,
    fromCb[2] * x + fromCr[2] * y - db,
  ];
}

/** RGB per unit of Cb − 128 and of Cr − 128: the Cb and Cr columns of the exact inverse of
 * `cbOf` / `crOf` with Y = 0.299 R + 0.587 G + 0.114 B (≈ 1.402, 0.344136, 0.714136, 1.772,
 * the rounded values JFIF 1.02 prints), so that the snapped codes give back the lattice
 * point exactly. */
const [fromCb, fromCr] = (() => {
  const m = [
    [0.299, 0.587, 0.114],
    [-0.168736, -0.331264, 0.5],
    [0.5, -0.418688, -0.081312],
  ];
  const det =
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
  // Columns 2 and 3 of the inverse (adjugate / determinant).
  const cof = (r: number, c: number): number => {
    const rows = [0, 1, 2].filter((i) => i !== r);
    const cols = [0, 1, 2].filter((j) => j !== c);
    const minor =
      m[rows[0]][cols[0]] * m[rows[1]][cols[1]] - m[rows[0]][cols[1]] * m[rows[1]][cols[0]];
    return ((r + c) % 2 ? -minor : minor) / det;
  };
  // inverse[i][j] = cofactor(j, i) / det
  return [1, 2].map((j) => [0, 1, 2].map((i) => cof(j, i)));
})();

/**
 * A code → value table read at code + shift (linear interpolation between neighbouring
 * entries, held at the ends), for samples whose codes are to be moved by a fraction of a code.
 *
 * @param table - 256 entries, code → value
 * @param shift - code values to add
 * @param out - where to write (256 entries)
 */
export function shiftedTable(
  table: ArrayLike<number>,
  shift: number,
  out: Float64Array = new Float64Array(256),
): Float64Array {
  for (let c = 0; c < 256; c++) {
    const at = Math.min(255, Math.max(0, c + shift));
    const i = Math.min(254, Math.floor(at));
    const f = at - i;
    out[c] = table[i] + f * (table[i + 1] - table[i]);
  }
  return out;
}
