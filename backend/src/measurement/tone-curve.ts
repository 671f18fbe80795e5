import { solveLinear } from './homography';

/** A monotone map from a channel's observed linear value to the reflectance it stands for.
 * The curves are objects with a method rather than closures made per fit: V8 keeps a
 * long-lived method's optimised code across full collections (a worker runs about one per
 * photo), while a per-fit closure's is dropped and compiled again for every photo. */
export interface ToneCurve {
  at(observed: number): number;
}

/** From this many ramp points on (layout v2 has 21 neutrals), the curve is a smoothing fit;
 * below it (v1's nine steps) it interpolates, as a smoother has too little to average. */
export const smoothingFrom = 12;

/** Uniform cubic B-spline basis values at t ∈ [0, 1) within a segment (de Boor's
 * recurrence in closed form for equal knots). */
function cubicBasis(t: number): [number, number, number, number] {
  const u = 1 - t;
  return [
    (u * u * u) / 6,
    (3 * t * t * t - 6 * t * t + 4) / 6,
    (-3 * t * t * t + 3 * t * t + 3 * t + 1) / 6,
    (t * t * t) / 6,
  ];
}

/**
 * Fits a smoothing monotone curve through many points in log–log: a P-spline (cubic
 * B-splines on equally spaced knots with a second-order difference penalty on their
 * coefficients; Eilers & Marx, Statist. Sci. 11 (1996) 89–121), made monotone by an
 * asymmetric penalty on any decreasing coefficient pair, iterated until the set settles
 * (Bollaerts, Eilers & van Mechelen, Statist. Model. 6 (2006) 189–207). The penalty pulls
 * towards a straight line in log–log (a power law), which a camera's curve is close to; beyond
 * the end knots the curve continues straight with the end slope.
 */
function fitPSpline(xs: number[], ys: number[], ws: number[]): SmoothCurve {
  // Eight segments and λ = 0.03 (per unit weight) read best on the accuracy suite among
  // 5–12 segments and λ 0.01–10 (p95 1.99; interpolating the same points: 2.29).
  const segments = 8;
  const lambda = 0.03;
  const kappa = 1e6;
  const lo = xs[0];
  const hi = xs[xs.length - 1];
  const step = (hi - lo) / segments;
  const nb = segments + 3;
  const btwb = new Float64Array(nb * nb);
  const btwy = new Float64Array(nb);
  for (let i = 0; i < xs.length; i++) {
    const f = segmentOf(xs[i], lo, step, segments);
    const j = Math.floor(f);
    const b = cubicBasis(f - j);
    for (let r = 0; r < 4; r++) {
      btwy[j + r] += ws[i] * b[r] * ys[i];
      for (let c = 0; c < 4; c++) btwb[(j + r) * nb + j + c] += ws[i] * b[r] * b[c];
    }
  }
  const wsum = ws.reduce((a, b) => a + b, 0);
  // λ relative to the data's total weight, so the smoothing does not depend on their count.
  const scaledLambda = (lambda * wsum) / xs.length;
  let alpha: Float64Array = new Float64Array(nb);
  let down = new Uint8Array(nb - 1);
  for (let iteration = 0; iteration < 20; iteration++) {
    const m = Float64Array.from(btwb);
    for (let k = 0; k + 2 < nb; k++) {
      const d = [1, -2, 1];
      for (let r = 0; r < 3; r++)
        for (let c = 0; c < 3; c++) m[(k + r) * nb + k + c] += scaledLambda * d[r] * d[c];
    }
    for (let k = 0; k + 1 < nb; k++) {
      if (!down[k]) continue;
      m[k * nb + k] += kappa;
      m[(k + 1) * nb + k + 1] += kappa;
      m[k * nb + k + 1] -= kappa;
      m[(k + 1) * nb + k] -= kappa;
    }
    const solved = solveLinear(m, Float64Array.from(btwy), nb);
    if (!solved) break;
    alpha = solved;
    const next = new Uint8Array(nb - 1);
    let same = true;
    for (let k = 0; k + 1 < nb; k++) {
      next[k] = alpha[k + 1] < alpha[k] ? 1 : down[k];
      same &&= next[k] === down[k];
    }
    if (same) break;
    down = next;
  }
  return new SmoothCurve(lo, hi, step, segments, alpha);
}

/** Position of x in segments of the uniform knots (clamped to the fitted range). */
function segmentOf(x: number, lo: number, step: number, segments: number): number {
  return Math.min(segments - 1e-9, Math.max(0, (x - lo) / step));
}

/** The P-spline in log–log, continued straight with the end slopes beyond the end knots. */
class SmoothCurve implements ToneCurve {
  private readonly slopeLo: number;
  private readonly slopeHi: number;
  private readonly yLo: number;
  private readonly yHi: number;

  constructor(
    private readonly lo: number,
    private readonly hi: number,
    private readonly step: number,
    private readonly segments: number,
    private readonly alpha: Float64Array,
  ) {
    const nb = alpha.length;
    // End slopes of the spline (derivative of the uniform cubic B-spline at the end knots).
    this.slopeLo = Math.max(0, (alpha[2] - alpha[0]) / (2 * step));
    this.slopeHi = Math.max(0, (alpha[nb - 1] - alpha[nb - 3]) / (2 * step));
    this.yLo = this.inside(lo);
    this.yHi = this.inside(hi);
  }

  /** The spline's value at log x within the knots. */
  private inside(x: number): number {
    const f = segmentOf(x, this.lo, this.step, this.segments);
    const j = Math.floor(f);
    const b = cubicBasis(f - j);
    const a = this.alpha;
    return b[0] * a[j] + b[1] * a[j + 1] + b[2] * a[j + 2] + b[3] * a[j + 3];
  }

  at(observed: number): number {
    const x = Math.log(Math.max(observed, 1e-6));
    const y =
      x <= this.lo
        ? this.yLo + this.slopeLo * (x - this.lo)
        : x >= this.hi
          ? this.yHi + this.slopeHi * (x - this.hi)
          : this.inside(x);
    return Math.exp(y);
  }
}

/** Monotone cubic Hermite interpolation in log–log, continued as the end segments' power laws. */
class HermiteCurve implements ToneCurve {
  constructor(
    private readonly xs: number[],
    private readonly ys: number[],
    /** Secant slopes of the segments. */
    private readonly d: number[],
    /** Tangents at the points (Fritsch–Carlson limited). */
    private readonly m: number[],
  ) {}

  at(observed: number): number {
    const { xs, ys, d, m } = this;
    const n = xs.length;
    const x = Math.log(Math.max(observed, 1e-6));
    if (n === 1) return Math.exp(ys[0]) * (observed / Math.exp(xs[0]));
    if (x <= xs[0]) return Math.exp(ys[0] + d[0] * (x - xs[0]));
    if (x >= xs[n - 1]) return Math.exp(ys[n - 1] + d[n - 2] * (x - xs[n - 1]));
    let i = 0;
    while (x > xs[i + 1]) i++;
    const hgt = xs[i + 1] - xs[i];
    const t = (x - xs[i]) / hgt;
    const t2 = t * t;
    const t3 = t2 * t;
    const y =
      (2 * t3 - 3 * t2 + 1) * ys[i] +
      (t3 - 2 * t2 + t) * hgt * m[i] +
      (-2 * t3 + 3 * t2) * ys[i + 1] +
      (t3 - t2) * hgt * m[i + 1];
    return Math.exp(y);
  }
}

/** Indices of `values` in ascending order of value, ties in index order (insertion sort: the
 * ramp has a few dozen points; no comparator closure per call, see `ToneCurve`). */
function ascendingOrder(values: number[]): number[] {
  const order: number[] = [];
  for (let i = 0; i < values.length; i++) {
    let k = order.length;
    while (k > 0 && values[order[k - 1]] > values[i]) k--;
    order.splice(k, 0, i);
  }
  return order;
}

/**
 * Fits a per-channel tone curve through the neutral ramp. From `smoothingFrom` points on
 * (layout v2) it is the smoothing monotone P-spline above, through every point weighted by
 * how much one code value of JPEG rounding moves its log. Below that (v1), a monotone
 * cubic Hermite spline (Fritsch & Carlson, SIAM J. Numer. Anal. 17 (1980) 238–246) through the points in log–log
 * space, where a camera's curve with its flare and shoulder is close to straight; beyond the
 * end points it continues as the power law of the end segment. Points that break the order
 * (noise on the darkest step, or a clipped white) are dropped.
 *
 * @param observed - observed linear values of the ramp patches (after the sRGB decode)
 * @param truth - the reflectances they should read as (patch Y times the light there)
 * @returns the curve
 * @example
 * fitToneCurve([0.02, 0.2, 0.8], [0.03, 0.18, 1]).at(0.2); // 0.18
 */
export function fitToneCurve(observed: number[], truth: number[]): ToneCurve {
  if (observed.length >= smoothingFrom) {
    // Every point counts for the smoother, in order of what was observed.
    const order = ascendingOrder(observed);
    const xs = order.map((i) => Math.log(Math.max(observed[i], 1e-5)));
    const ys = order.map((i) => Math.log(Math.max(truth[i], 1e-6)));
    // Each point's weight: one over the variance of log(observed) from a code value of
    // JPEG rounding, as d ln(linear)/d code ≈ 2.4 / (code + 14) for the sRGB decode.
    const ws = order.map((i) => {
      const lin = observed[i];
      const code = 255 * (lin <= 0.0031308 ? 12.92 * lin : 1.055 * lin ** (1 / 2.4) - 0.055);
      return ((code + 14) / 128) ** 2;
    });
    return fitPSpline(xs, ys, ws);
  }
  const order = ascendingOrder(truth);
  const xs: number[] = [];
  const ys: number[] = [];
  for (const i of order) {
    const x = Math.log(Math.max(observed[i], 1e-5));
    if (xs.length && x <= xs[xs.length - 1] + 1e-4) continue;
    xs.push(x);
    ys.push(Math.log(Math.max(truth[i], 1e-6)));
  }
  const n = xs.length;
  if (n === 1) return new HermiteCurve(xs, ys, [], []);
  const d: number[] = [];
  for (let i = 0; i < n - 1; i++) d.push((ys[i + 1] - ys[i]) / (xs[i + 1] - xs[i]));
  const m: number[] = [d[0]];
  for (let i = 1; i < n - 1; i++) m.push(d[i - 1] * d[i] <= 0 ? 0 : (d[i - 1] + d[i]) / 2);
  m.push(d[n - 2]);
  for (let i = 0; i < n - 1; i++) {
    if (d[i] === 0) {
      m[i] = 0;
      m[i + 1] = 0;
      continue;
    }
    const a = m[i] / d[i];
    const b = m[i + 1] / d[i];
    const s = a * a + b * b;
    if (s > 9) {
      const t = 3 / Math.sqrt(s);
      m[i] = t * a * d[i];
      m[i + 1] = t * b * d[i];
    }
  }
  return new HermiteCurve(xs, ys, d, m);
}
