/** A point in the plane. */
export type Point = { x: number; y: number };

/** A plane homography as a row-major 3 × 3 matrix with h[8] = 1. */
export type Homography = Float64Array;

/**
 * Maps a point through a homography.
 *
 * @param h - the homography
 * @param x - source x
 * @param y - source y
 * @returns the image point
 * @example
 * applyHomography(Float64Array.of(1, 0, 5, 0, 1, 0, 0, 0, 1), 1, 1); // { x: 6, y: 1 }
 */
export function applyHomography(h: Homography, x: number, y: number): Point {
  const w = h[6] * x + h[7] * y + h[8];
  return { x: (h[0] * x + h[1] * y + h[2]) / w, y: (h[3] * x + h[4] * y + h[5]) / w };
}

/** The similarity that moves points' centroid to the origin and their mean distance to √2
 * (Hartley & Zisserman, Multiple View Geometry, 2nd ed., §4.4.4). */
function normaliser(points: Point[]): Float64Array {
  let cx = 0;
  let cy = 0;
  for (const p of points) {
    cx += p.x;
    cy += p.y;
  }
  cx /= points.length;
  cy /= points.length;
  let d = 0;
  for (const p of points) d += Math.hypot(p.x - cx, p.y - cy);
  const s = Math.SQRT2 / Math.max(d / points.length, 1e-12);
  return Float64Array.of(s, 0, -s * cx, 0, s, -s * cy, 0, 0, 1);
}

function multiply(a: Float64Array, b: Float64Array): Float64Array {
  const out = new Float64Array(9);
  for (let r = 0; r < 3; r++) {
    for (let c = 0; c < 3; c++) {
      out[r * 3 + c] = a[r * 3] * b[c] + a[r * 3 + 1] * b[3 + c] + a[r * 3 + 2] * b[6 + c];
    }
  }
  return out;
}

function invertSimilarity(t: Float64Array): Float64Array {
  const s = t[0];
  return Float64Array.of(1 / s, 0, -t[2] / s, 0, 1 / s, -t[5] / s, 0, 0, 1);
}

/** Solves the symmetric system M x = v in place by Gaussian elimination with partial pivoting. */
export function solveLinear(m: Float64Array, v: Float64Array, n: number): Float64Array | undefined {
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++)
      if (Math.abs(m[r * n + col]) > Math.abs(m[pivot * n + col])) pivot = r;
    if (Math.abs(m[pivot * n + col]) < 1e-14) return undefined;
    if (pivot !== col) {
      for (let c = 0; c < n; c++)
        [m[col * n + c], m[pivot * n + c]] = [m[pivot * n + c], m[col * n + c]];
      [v[col], v[pivot]] = [v[pivot], v[col]];
    }
    for (let r = col + 1; r < n; r++) {
      const f = m[r * n + col] / m[col * n + col];
      if (f === 0) continue;
      for (let c = col; c < n; c++) m[r * n + c] -= f * m[col * n + c];
      v[r] -= f * v[col];
    }
  }
  const x = new Float64Array(n);
  for (let r = n - 1; r >= 0; r--) {
    let s = v[r];
    for (let c = r + 1; c < n; c++) s -= m[r * n + c] * x[c];
    x[r] = s / m[r * n + r];
  }
  return x;
}

/** Adds one weighted equation (row · h = rhs) to the normal equations AᵀA h = Aᵀb. A
 * module-level function, not a closure made per fit: V8 keeps a long-lived function's optimised
 * code across full collections, while a per-call closure's is dropped and compiled again. */
function addNormalRow(
  ata: Float64Array,
  atb: Float64Array,
  row: Float64Array,
  rhs: number,
  w: number,
): void {
  for (let i = 0; i < 8; i++) {
    atb[i] += w * row[i] * rhs;
    for (let j = 0; j < 8; j++) ata[i * 8 + j] += w * row[i] * row[j];
  }
}

/**
 * Least-squares homography from point pairs (at least 4): the normalised direct linear
 * transform (Hartley & Zisserman §4.1 and §4.4, Algorithm 4.2), with h33 fixed at 1 in the
 * normalised frame (safe there: the origin is the points' centroid, never sent to infinity).
 *
 * @param source - points in the source plane (card millimetres)
 * @param target - matching points in the image
 * @param weights - optional per-pair weights
 * @returns the homography, or undefined when the points are degenerate
 * @example
 * fitHomography(cardPoints, photoPoints);
 */
export function fitHomography(
  source: Point[],
  target: Point[],
  weights?: number[],
): Homography | undefined {
  if (source.length < 4 || source.length !== target.length) return undefined;
  const ts = normaliser(source);
  const tt = normaliser(target);
  const ata = new Float64Array(64);
  const atb = new Float64Array(8);
  const row = new Float64Array(8);
  for (let k = 0; k < source.length; k++) {
    const w = weights ? weights[k] : 1;
    const x = ts[0] * source[k].x + ts[2];
    const y = ts[4] * source[k].y + ts[5];
    const u = tt[0] * target[k].x + tt[2];
    const v = tt[4] * target[k].y + tt[5];
    row.set([x, y, 1, 0, 0, 0, -u * x, -u * y]);
    addNormalRow(ata, atb, row, u, w);
    row.set([0, 0, 0, x, y, 1, -v * x, -v * y]);
    addNormalRow(ata, atb, row, v, w);
  }
  const h = solveLinear(ata, atb, 8);
  if (!h) return undefined;
  const hn = Float64Array.of(h[0], h[1], h[2], h[3], h[4], h[5], h[6], h[7], 1);
  const full = multiply(invertSimilarity(tt), multiply(hn, ts));
  const scale = full[8];
  return full.map((value) => value / scale);
}

/** Root-mean-square distance (image units) between targets and the mapped sources. */
export function reprojectionError(h: Homography, source: Point[], target: Point[]): number {
  let sum = 0;
  for (let k = 0; k < source.length; k++) {
    const p = applyHomography(h, source[k].x, source[k].y);
    sum += (p.x - target[k].x) ** 2 + (p.y - target[k].y) ** 2;
  }
  return Math.sqrt(sum / Math.max(1, source.length));
}

/**
 * Refines a homography by minimising the geometric (reprojection) error in the image, the
 * "gold standard" cost when only the image points are noisy (Hartley & Zisserman §4.2.4,
 * §4.5), with Gauss–Newton steps and Huber weights (k = 1.5 px) so a badly located point
 * counts less; a few iteratively reweighted linear fits started from the DLT.
 *
 * @param initial - the DLT estimate
 * @param source - points in the card plane
 * @param target - points in the image
 * @param iterations - Gauss–Newton iterations (default 6)
 * @returns the refined homography and the per-point weights it ended with
 */
export function refineHomography(
  initial: Homography,
  source: Point[],
  target: Point[],
  iterations = 6,
): { h: Homography; weights: number[] } {
  let h = Float64Array.from(initial);
  const huber = 1.5;
  let weights = source.map(() => 1);
  for (let it = 0; it < iterations; it++) {
    const jtj = new Float64Array(64);
    const jtr = new Float64Array(8);
    weights = [];
    for (let k = 0; k < source.length; k++) {
      const { x, y } = source[k];
      const w = h[6] * x + h[7] * y + 1;
      const px = (h[0] * x + h[1] * y + h[2]) / w;
      const py = (h[3] * x + h[4] * y + h[5]) / w;
      const rx = target[k].x - px;
      const ry = target[k].y - py;
      const r = Math.hypot(rx, ry);
      const weight = r <= huber ? 1 : huber / r;
      weights.push(weight);
      // d(px)/dh and d(py)/dh for h0..h7.
      const jx = [x / w, y / w, 1 / w, 0, 0, 0, (-px * x) / w, (-px * y) / w];
      const jy = [0, 0, 0, x / w, y / w, 1 / w, (-py * x) / w, (-py * y) / w];
      for (let i = 0; i < 8; i++) {
        jtr[i] += weight * (jx[i] * rx + jy[i] * ry);
        for (let j = 0; j < 8; j++) jtj[i * 8 + j] += weight * (jx[i] * jx[j] + jy[i] * jy[j]);
      }
    }
    // A touch of Levenberg–Marquardt damping keeps the step sane far from the minimum.
    for (let i = 0; i < 8; i++) jtj[i * 8 + i] *= 1 + 1e-6;
    const step = solveLinear(jtj, jtr, 8);
    if (!step) break;
    for (let i = 0; i < 8; i++) h[i] += step[i];
    h = h.slice();
  }
  return { h, weights };
}
