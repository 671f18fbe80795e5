import type { Raster8 } from '@mixmark/common';

/** A QR finder pattern seen in the raster: its centre and module size, in raster pixels. */
export type FinderPattern = { x: number; y: number; module: number; hits: number };

/** A group of finder patterns that look like one QR symbol, and the box to decode in. */
export type QrCandidate = {
  /** The finders, in the pixels of the image they were found in (raster px / scale). */
  finders: FinderPattern[];
  /** Raster pixels per finder-image pixel. */
  scale: number;
  module: number;
  x0: number;
  y0: number;
  x1: number;
  y1: number;
};

/** A grey copy for the finder scan with its local threshold: a pixel is dark when it is
 * under `limit` of its 8 × 8 block. */
export type FinderImage = {
  data: Uint8Array;
  width: number;
  height: number;
  /** Blocks across. */
  bw: number;
  /** Per 8 × 8 block: 90 % of the mean of the 5 × 5 blocks around it. */
  limit: Float64Array;
};

/**
 * The green channel of an RGB raster, reduced by an integer factor (box average), with the
 * dark/light threshold of every 8 × 8 block of it, in one pass over the raster. Green alone
 * carries most of the luminance and the black-on-white print has the same contrast in every
 * channel under any cast; reading one byte of three makes this copy about twice as fast as a
 * weighted grey. The threshold is 90 % of the mean of the 5 × 5 blocks around a pixel's own
 * (40 px, wider than a finder pattern at the module sizes scanned): local, so uneven light and
 * vignetting do not break it.
 */
export function greyReduced(raster: Raster8, factor: number): FinderImage {
  const width = Math.floor(raster.width / factor);
  const height = Math.floor(raster.height / factor);
  const out = new Uint8Array(width * height);
  const { data, channels: c } = raster;
  const stride = raster.width * c;
  const B = 8;
  const bw = Math.ceil(width / B);
  const bh = Math.ceil(height / B);
  const sums = new Float64Array(bw * bh);
  const div = factor * factor;
  for (let y = 0; y < height; y++) {
    const row = (y >> 3) * bw;
    let k = y * width;
    let i = y * factor * stride + 1;
    for (let bx = 0; bx < bw; bx++) {
      const end = Math.min(width, (bx + 1) * B);
      let s = 0;
      if (factor === 1) {
        for (let x = bx * B; x < end; x++, i += c) {
          const v = data[i];
          out[k++] = v;
          s += v;
        }
      } else if (factor === 2) {
        for (let x = bx * B; x < end; x++, i += 2 * c) {
          const j = i + stride;
          const v = (data[i] + data[i + c] + data[j] + data[j + c]) >> 2;
          out[k++] = v;
          s += v;
        }
      } else {
        for (let x = bx * B; x < end; x++, i += factor * c) {
          let sum = 0;
          for (let dy = 0; dy < factor; dy++)
            for (let dx = 0, o = i + dy * stride; dx < factor; dx++, o += c) sum += data[o];
          const v = (sum / div) | 0;
          out[k++] = v;
          s += v;
        }
      }
      sums[row + bx] += s;
    }
  }
  const side = (i: number, size: number): number => Math.min(size, (i + 1) * B) - i * B;
  const limit = new Float64Array(bw * bh);
  for (let by = 0; by < bh; by++) {
    for (let bx = 0; bx < bw; bx++) {
      let s = 0;
      let n = 0;
      for (let j = Math.max(0, by - 2); j <= Math.min(bh - 1, by + 2); j++) {
        const rows = side(j, height);
        for (let i = Math.max(0, bx - 2); i <= Math.min(bw - 1, bx + 2); i++) {
          s += sums[j * bw + i];
          n += rows * side(i, width);
        }
      }
      limit[by * bw + bx] = (0.9 * s) / n;
    }
  }
  return { data: out, width, height, bw, limit };
}

/** Whether five run lengths are in the finder pattern's 1:1:3:1:1 ratio (ISO/IEC 18004
 * §6.3.3; the tolerance is the one ZXing uses: half a module on each run, 1.5 on the core). */
function finderRatio(c: number[]): number {
  const total = c[0] + c[1] + c[2] + c[3] + c[4];
  if (total < 7) return 0;
  const m = total / 7;
  const v = m / 2;
  return Math.abs(m - c[0]) < v &&
    Math.abs(m - c[1]) < v &&
    Math.abs(3 * m - c[2]) < 3 * v &&
    Math.abs(m - c[3]) < v &&
    Math.abs(m - c[4]) < v
    ? m
    : 0;
}

/** Runs along a line through (x, y) in direction (dx, dy); returns the finder centre offset
 * along the line and the module size, or undefined when the ratio fails. */
function crossCheck(
  img: FinderImage,
  x: number,
  y: number,
  dx: number,
  dy: number,
  maxRun: number,
): { offset: number; module: number } | undefined {
  const { data, width, height, bw, limit } = img;
  const at = (k: number): number => {
    const px = x + k * dx;
    const py = y + k * dy;
    if (px < 0 || py < 0 || px >= width || py >= height) return -1;
    return data[py * width + px] < limit[(py >> 3) * bw + (px >> 3)] ? 1 : 0;
  };
  if (at(0) !== 1) return undefined;
  const c = [0, 0, 0, 0, 0];
  let k = 0;
  // Back from the centre: core (dark), ring (light), outer (dark).
  while (at(k) === 1 && c[2] <= maxRun) {
    c[2]++;
    k--;
  }
  while (at(k) === 0 && c[1] <= maxRun) {
    c[1]++;
    k--;
  }
  while (at(k) === 1 && c[0] <= maxRun) {
    c[0]++;
    k--;
  }
  const start = k + 1;
  k = 1;
  while (at(k) === 1 && c[2] <= maxRun) {
    c[2]++;
    k++;
  }
  while (at(k) === 0 && c[3] <= maxRun) {
    c[3]++;
    k++;
  }
  while (at(k) === 1 && c[4] <= maxRun) {
    c[4]++;
    k++;
  }
  const m = finderRatio(c);
  if (!m) return undefined;
  // Centre of the core run, relative to (x, y).
  const coreStart = start + c[0] + c[1];
  return { offset: coreStart + c[2] / 2 - 0.5, module: m };
}

/**
 * Finds QR finder patterns (the 7 × 7-module squares at three corners of every QR symbol)
 * by their 1:1:3:1:1 dark-light run ratio along rows, confirmed across columns and both
 * diagonals (the scan of ISO/IEC 18004 Annex C's reference decoder, as ZXing does it).
 *
 * @param img - a grey image with its threshold (`greyReduced`)
 * @param step - rows scanned (1 = every row)
 * @returns centres and module sizes, in the grey image's pixels
 */
export function findFinderPatterns(img: FinderImage, step = 1): FinderPattern[] {
  const { data, width, height, bw, limit } = img;
  const found: FinderPattern[] = [];
  const maxRun = Math.ceil(Math.min(width, height) / 8);
  const consider = (cx: number, cy: number, mRow: number): void => {
    let x = Math.round(cx);
    const v = crossCheck(img, x, cy, 0, 1, maxRun);
    if (!v || Math.abs(v.module - mRow) > 0.5 * mRow) return;
    const y = Math.round(cy + v.offset);
    const h = crossCheck(img, x, y, 1, 0, maxRun);
    if (!h || Math.abs(h.module - v.module) > 0.5 * v.module) return;
    x = Math.round(x + h.offset);
    const d1 = crossCheck(img, x, y, 1, 1, maxRun);
    const d2 = crossCheck(img, x, y, 1, -1, maxRun);
    if (!d1 && !d2) return;
    const module = (v.module + h.module) / 2;
    for (const f of found) {
      if (Math.hypot(f.x - x, f.y - y) < 2 * Math.max(module, f.module)) {
        f.x = (f.x * f.hits + x) / (f.hits + 1);
        f.y = (f.y * f.hits + y) / (f.hits + 1);
        f.module = (f.module * f.hits + module) / (f.hits + 1);
        f.hits++;
        return;
      }
    }
    found.push({ x, y, module, hits: 1 });
  };
  const c = [0, 0, 0, 0, 0];
  for (let y = 0; y < height; y += step) {
    c.fill(0);
    let state = 0;
    const row = y * width;
    const brow = (y >> 3) * bw;
    for (let x = 0; x <= width; x++) {
      const d = x < width && data[row + x] < limit[brow + (x >> 3)] ? 1 : 0;
      if (d === 1) {
        if (state % 2 === 1) state++;
        c[state]++;
      } else if (state % 2 === 1) {
        c[state]++;
      } else if (state === 4) {
        // A dark-light-dark-light-dark sequence has just ended: test it, then slide on
        // by two runs (the last dark and light runs may start the next pattern).
        const m = finderRatio(c);
        if (m) consider(x - c[4] - c[3] - c[2] / 2, y, m);
        c[0] = c[2];
        c[1] = c[3];
        c[2] = c[4];
        c[3] = 1;
        c[4] = 0;
        state = 3;
      } else if (state > 0 || c[0] > 0) {
        state++;
        c[state]++;
      }
    }
  }
  return found;
}

/**
 * Groups finder patterns into QR symbol candidates: patterns with about the same module
 * size within 36 modules of each other (the three finder centres of a version 2 symbol are
 * 18 modules apart, 25.5 across the diagonal; 36 leaves room for perspective), each with a
 * box to decode in (the finders' extent plus the finder half-width and a 4-module margin).
 * Groups of three come first.
 *
 * @param finders - from `findFinderPatterns`
 * @param scale - raster pixels per finder-image pixel
 * @param width - raster width
 * @param height - raster height
 * @returns candidates in raster pixels
 */
export function groupQrCandidates(
  finders: FinderPattern[],
  scale: number,
  width: number,
  height: number,
): QrCandidate[] {
  const left = new Set(finders.map((_, i) => i));
  const groups: FinderPattern[][] = [];
  for (let i = 0; i < finders.length; i++) {
    if (!left.has(i)) continue;
    left.delete(i);
    const group = [finders[i]];
    for (let grew = true; grew;) {
      grew = false;
      for (const j of left) {
        const f = finders[j];
        const near = group.some(
          (g) =>
            Math.abs(g.module - f.module) < 0.4 * Math.max(g.module, f.module) &&
            Math.hypot(g.x - f.x, g.y - f.y) < 36 * Math.max(g.module, f.module),
        );
        if (near) {
          group.push(f);
          left.delete(j);
          grew = true;
        }
      }
    }
    groups.push(group);
  }
  const candidates = groups.map((group): QrCandidate => {
    const module = group.reduce((s, f) => s + f.module, 0) / group.length;
    // With fewer than three finders seen, the rest of the symbol may lie either side.
    const margin = (group.length >= 3 ? 8 : 26) * module;
    const xs = group.map((f) => f.x);
    const ys = group.map((f) => f.y);
    return {
      finders: group,
      scale,
      module: module * scale,
      x0: Math.max(0, Math.floor((Math.min(...xs) - margin) * scale)),
      y0: Math.max(0, Math.floor((Math.min(...ys) - margin) * scale)),
      x1: Math.min(width, Math.ceil((Math.max(...xs) + margin) * scale)),
      y1: Math.min(height, Math.ceil((Math.max(...ys) + margin) * scale)),
    };
  });
  const score = (c: QrCandidate): number =>
    (c.finders.length === 3 ? 1000 : c.finders.length > 3 ? 500 : 0) +
    c.finders.reduce((s, f) => s + f.hits, 0);
  return candidates.sort((a, b) => score(b) - score(a));
}
