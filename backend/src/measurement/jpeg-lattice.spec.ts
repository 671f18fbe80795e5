import { describe, expect, it } from '@jest/globals';
import sharp from 'sharp';
import { decodePhoto } from './decode-photo';
import {
  cbOf,
  chromaLatticeOf,
  crOf,
  decoderChromaTerms,
  latticePointFor,
  latticeShift,
  readJpegHeader,
  shiftedTable,
  type ChromaLattice,
  type JpegHeader,
} from './jpeg-lattice';

// ITU-T T.81 Annex K, Tables K.1 and K.2 (natural order), the tables IJG's jcparam.c
// (std_luminance_quant_tbl, std_chrominance_quant_tbl) starts from, which sharp (libvips,
// quant_table 0) uses.
const annexK1 = [
  16, 11, 10, 16, 24, 40, 51, 61, 12, 12, 14, 19, 26, 58, 60, 55, 14, 13, 16, 24, 40, 57, 69, 56,
  14, 17, 22, 29, 51, 87, 80, 62, 18, 22, 37, 56, 68, 109, 103, 77, 24, 35, 55, 64, 81, 104, 113,
  92, 49, 64, 78, 87, 103, 121, 120, 101, 72, 92, 95, 98, 112, 100, 103, 99,
];
const annexK2 = [
  17,
  18,
  24,
  47,
  99,
  99,
  99,
  99,
  18,
  21,
  26,
  66,
  99,
  99,
  99,
  99,
  24,
  26,
  56,
  99,
  99,
  99,
  99,
  99,
  47,
  66,
  99,
  99,
  99,
  99,
  99,
  99,
  ...Array<number>(32).fill(99),
];

/** IJG jcparam.c: jpeg_quality_scaling, then jpeg_add_quant_table with force_baseline. */
const ijgTable = (base: number[], quality: number): number[] => {
  const scale = quality < 50 ? Math.floor(5000 / quality) : 200 - 2 * quality;
  return base.map((v) => Math.min(255, Math.max(1, Math.floor((v * scale + 50) / 100))));
};

const flat = (width: number, height: number, rgb: number[], noise = 0, seed = 1): Buffer => {
  const data = Buffer.alloc(width * height * 3);
  let s = seed;
  const random = (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
  for (let i = 0; i < width * height; i++) {
    // Sensor-like noise, the same in all three channels' expectation (triangular-ish, ±noise).
    for (let c = 0; c < 3; c++) {
      const n = noise * (random() + random() - 1);
      data[3 * i + c] = Math.max(0, Math.min(255, Math.round(rgb[c] + n)));
    }
  }
  return data;
};

const jpegOf = (
  width: number,
  height: number,
  data: Buffer,
  options: sharp.JpegOptions,
): Promise<Buffer> =>
  sharp(data, { raw: { width, height, channels: 3 } })
    .jpeg(options)
    .toBuffer();

const header = (bytes: Buffer): JpegHeader => {
  const h = readJpegHeader(bytes);
  if ('unreadable' in h) throw new Error(h.unreadable);
  return h;
};

/** Codes of the interior of a decoded raster (a margin of two chroma blocks clear of the
 * image edge). */
const interior = (raster: { data: Uint8Array; width: number; height: number }, margin = 32) => {
  const out: number[] = [];
  for (let y = margin; y < raster.height - margin; y++)
    for (let x = margin; x < raster.width - margin; x++) {
      const o = (y * raster.width + x) * 3;
      out.push(raster.data[o], raster.data[o + 1], raster.data[o + 2]);
    }
  return Uint8Array.from(out);
};

describe('readJpegHeader', () => {
  it.each([60, 70, 75, 80, 95])(
    "reads sharp's quality-%i tables as IJG's scaled Annex K tables (4:2:0)",
    async (quality) => {
      const bytes = await jpegOf(64, 48, flat(64, 48, [120, 130, 140]), { quality });
      const h = header(bytes);
      expect(h.frame).toBe(0xc0);
      expect(h.precision).toBe(8);
      expect([h.width, h.height]).toEqual([64, 48]);
      expect(h.components).toEqual([
        { id: 1, h: 2, v: 2, table: 0 },
        { id: 2, h: 1, v: 1, table: 1 },
        { id: 3, h: 1, v: 1, table: 1 },
      ]);
      expect(Array.from(h.tables[0]!)).toEqual(ijgTable(annexK1, quality));
      expect(Array.from(h.tables[1]!)).toEqual(ijgTable(annexK2, quality));
      expect(h.firstScan).toEqual([1, 2, 3]);
    },
  );

  it('reads a progressive 4:4:4 file (SOF2) and its lattice', async () => {
    const bytes = await jpegOf(64, 48, flat(64, 48, [120, 130, 140]), {
      quality: 65,
      progressive: true,
      chromaSubsampling: '4:4:4',
    });
    const h = header(bytes);
    expect(h.frame).toBe(0xc2);
    expect(h.components.map((c) => [c.h, c.v])).toEqual([
      [1, 1],
      [1, 1],
      [1, 1],
    ]);
    const q = ijgTable(annexK2, 65)[0];
    expect(chromaLatticeOf(bytes, false)).toEqual({
      lattice: { cbQ: q, crQ: q, cbStep: q / 8, crStep: q / 8, subsampling: '4:4:4' },
    });
  });

  it('reads 16-bit table entries (Pq = 1, T.81 §B.2.4.1) in zig-zag order', () => {
    // SOI, DQT (Pq 1, Tq 0: entries 1..64 in zig-zag order, 16-bit), SOF0 (8-bit, 8 × 8,
    // one component on table 0), SOS, EOI: a header only.
    const dqt = [0xff, 0xdb, 0, 2 + 1 + 128, 0x10];
    for (let i = 0; i < 64; i++) dqt.push((256 + i) >> 8, (256 + i) & 255);
    const sof = [0xff, 0xc0, 0, 11, 8, 0, 8, 0, 8, 1, 1, 0x11, 0];
    const sos = [0xff, 0xda, 0, 8, 1, 1, 0, 0, 63, 0];
    const bytes = Uint8Array.from([0xff, 0xd8, ...dqt, ...sof, ...sos, 0xff, 0xd9]);
    const h = header(Buffer.from(bytes));
    const t = h.tables[0]!;
    // Zig-zag position 0 is DC (natural 0); position 2 is natural (1, 0) = 8; 5 is (0, 2) = 2.
    expect([t[0], t[8], t[2], t[63]]).toEqual([256, 258, 261, 256 + 63]);
    expect(chromaLatticeOf(bytes, false)).toEqual({ skipped: '1 components' });
  });

  it('says why a damaged or foreign file cannot be read, and never throws', () => {
    expect(readJpegHeader(Buffer.from('not a jpeg'))).toEqual({ unreadable: 'not a JPEG' });
    expect(readJpegHeader(Uint8Array.from([0xff, 0xd8, 0xff, 0xdb, 0x01, 0x00]))).toEqual({
      unreadable: 'marker 0xdb runs past the end',
    });
    expect(readJpegHeader(Uint8Array.from([0xff, 0xd8, 0x12, 0x34, 0, 0]))).toEqual({
      unreadable: 'no marker at byte 2',
    });
  });

  it('skips files whose decoded pixels sharp converts (embedded ICC profile)', async () => {
    const bytes = await sharp(flat(32, 32, [100, 120, 140]), {
      raw: { width: 32, height: 32, channels: 3 },
    })
      .withIccProfile('p3')
      .jpeg({ quality: 70 })
      .toBuffer();
    const photo = await decodePhoto(bytes);
    expect(photo.chroma).toEqual({
      skipped: 'embedded ICC profile: decoded pixels are converted',
    });
  });
});

describe('the decoder model', () => {
  it("recovers every integer (Cb, Cr) pair from libjpeg's fixed-point RGB (jdcolor.c)", () => {
    // Y cancels out of the JFIF forward Cb and Cr (their RGB weights sum to 0), so the RGB
    // terms alone are enough; every one of the 65,536 pairs is checked.
    let worst = 0;
    for (let cb = 0; cb < 256; cb++)
      for (let cr = 0; cr < 256; cr++) {
        const [r, g, b] = decoderChromaTerms(cb, cr);
        worst = Math.max(worst, Math.abs(cbOf(r, g, b) - cb), Math.abs(crOf(r, g, b) - cr));
      }
    expect(worst).toBeLessThan(0.5);
  });

  it('finds the one lattice point the decoder rounds to a code (halves up, jidctint.c)', () => {
    // q 12 (step 1.5): 129.5 decodes to 130, 131 to 131, and no point decodes to 129.
    expect([128, 129, 130, 131].map((v) => latticePointFor(v, 12))).toEqual([
      128,
      undefined,
      129.5,
      131,
    ]);
    // q 7 (step 0.875): 128 has one point; both 131.5 and 132.375 decode to 132.
    expect(latticePointFor(128, 7)).toBe(128);
    expect(latticePointFor(132, 7)).toBeUndefined();
    expect(latticePointFor(255, 12)).toBeUndefined();
  });

  it('reads a table at a fraction of a code', () => {
    const identity = Float64Array.from({ length: 256 }, (_, c) => c);
    const t = shiftedTable(identity, 0.25);
    expect([t[0], t[100], t[255]]).toEqual([0.25, 100.25, 255]);
    expect(shiftedTable(identity, -0.5)[0]).toBe(0);
  });
});

describe('latticeShift on files sharp writes', () => {
  // Flat colours, one JPEG each, compared with what the file holds, from the IJG encoder's
  // own arithmetic: jccolor.c rounds Cb, Cr per pixel to whole codes, and jcdctmgr.c
  // quantises the block DC = 8·(Cb − 128) to k = round(DC / q) (T.81 §A.3.4); no ties occur
  // for these q. Without noise every block is the same, so the decoded area is flat.
  const colours = [
    [180, 140, 100],
    [90, 160, 200],
    [200, 60, 90],
    [120, 130, 60],
    [150, 150, 150],
    [230, 210, 170],
    [60, 70, 40],
  ];
  it.each([60, 66, 72, 78])(
    'quality %i: snaps each flat area to its DC lattice point',
    async (quality) => {
      const q = ijgTable(annexK2, quality)[0];
      let snapped = 0;
      for (const rgb of colours) {
        const bytes = await jpegOf(128, 96, flat(128, 96, rgb), { quality });
        const photo = await decodePhoto(bytes);
        expect('lattice' in photo.chroma).toBe(true);
        const lattice = (photo.chroma as { lattice: ChromaLattice }).lattice;
        expect([lattice.cbQ, lattice.crQ, lattice.subsampling]).toEqual([q, q, '4:2:0']);
        const codes = interior(photo.raster);
        // Every sample decodes to Y + the decoder's terms of one (Cb, Cr) pair.
        const cb = Math.round(cbOf(codes[0], codes[1], codes[2]));
        const cr = Math.round(crOf(codes[0], codes[1], codes[2]));
        const [tr, tg, tb] = decoderChromaTerms(cb, cr);
        let off = 0;
        for (let k = 0; k < codes.length; k += 3) {
          const g = codes[k + 1];
          if (codes[k] - g !== tr - tg || codes[k + 2] - g !== tb - tg) off++;
        }
        expect(off).toBe(0);
        const file = (v: number): number =>
          128 + (Math.round((8 * (Math.round(v) - 128)) / q) * q) / 8;
        const fileCb = file(cbOf(rgb[0], rgb[1], rgb[2]));
        const fileCr = file(crOf(rgb[0], rgb[1], rgb[2]));
        // The decoder rounds the file's value to the code read.
        expect([Math.floor(fileCb + 0.5), Math.floor(fileCr + 0.5)]).toEqual([cb, cr]);
        const shift = latticeShift(codes, lattice);
        if (latticePointFor(cb, q) === undefined || latticePointFor(cr, q) === undefined) {
          expect(shift).toBeUndefined();
          continue;
        }
        snapped++;
        const [r, g, b] = [0, 1, 2].map((c) => codes[c] + shift![c]);
        expect(cbOf(r, g, b)).toBeCloseTo(fileCb, 9);
        expect(crOf(r, g, b)).toBeCloseTo(fileCr, 9);
        // Y is the decoder's own (its conversion's rounding taken out, under half a code).
        const luma = (x: number, y: number, z: number): number => 0.299 * x + 0.587 * y + 0.114 * z;
        expect(Math.abs(luma(r, g, b) - luma(codes[0], codes[1], codes[2]))).toBeLessThan(0.5);
      }
      // Steps over one code (q ≥ 9) always have one point per code; 7/8 has most.
      expect(snapped).toBeGreaterThanOrEqual(q >= 9 ? colours.length : 3);
    },
  );

  it('snaps through the shrink on load (odd size, halved) as on a full-size decode', async () => {
    const rgb = [170, 120, 90];
    const bytes = await jpegOf(1025, 769, flat(1025, 769, rgb, 1.5, 7), { quality: 64 });
    const full = await decodePhoto(bytes);
    const half = await decodePhoto(bytes, { maxSide: 600 });
    expect(half.raster.width).toBe(513);
    const lattice = (full.chroma as { lattice: ChromaLattice }).lattice;
    const a = latticeShift(interior(full.raster), lattice);
    const b = latticeShift(interior(half.raster), lattice);
    expect(a).toBeDefined();
    expect(b).toEqual(a);
  });

  it('leaves areas that are not flat in chroma, and clipped ones, as they are', async () => {
    // A hue ramp across the image: many chroma values.
    const width = 128;
    const height = 96;
    const data = Buffer.alloc(width * height * 3);
    for (let y = 0; y < height; y++)
      for (let x = 0; x < width; x++) data.set([100 + x, 140, 200 - x], (y * width + x) * 3);
    const ramp = await decodePhoto(await jpegOf(width, height, data, { quality: 65 }));
    const lattice = (ramp.chroma as { lattice: ChromaLattice }).lattice;
    expect(latticeShift(interior(ramp.raster), lattice)).toBeUndefined();
    // A colour clipped at 255 in red.
    const clipped = await decodePhoto(
      await jpegOf(width, height, flat(width, height, [255, 120, 80]), { quality: 65 }),
    );
    expect(latticeShift(interior(clipped.raster), lattice)).toBeUndefined();
    expect(latticeShift(new Uint8Array(0), lattice)).toBeUndefined();
  });

  it('is not used for PNG', async () => {
    const png = await sharp(flat(16, 16, [1, 2, 3]), {
      raw: { width: 16, height: 16, channels: 3 },
    })
      .png()
      .toBuffer();
    expect((await decodePhoto(png)).chroma).toEqual({ skipped: 'png' });
  });
});
