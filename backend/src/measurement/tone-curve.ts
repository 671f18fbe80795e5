import { solveLinear } from './homography';

/** A monotone map from a channel's observed linear value to the reflectance it stands for. */
export type ToneCurve = (observed: number) => number;

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
function fitPSpline(xs: number[], ys: number[], ws: number[]): (x: number) => number {
  // Eight segments and λ = 0.03 (per unit weight) read best on the accuracy suite among
  // 5–12 segments and λ 0.01–10 (p95 1.99; interpolating the same points: 2.29).
  const segments = 8;
  const lambda = 0.03;
  const kappa = 1e6;
  const lo = xs[0];
  const hi = xs[xs.length - 1];
  const step = (hi - lo) / segments;
  const nb = segments + 3;
  const locate = (x: number): [number, number] => {
    const f = Math.min(segments - 1e-9, Math.max(0, (x - lo) / step));
    const j = Math.floor(f);
    return [j, f - j];
  };
  const btwb = new Float64Array(nb * nb);
  const btwy = new Float64Array(nb);
  xs.forEach((x, i) => {
    const [j, t] = locate(x);
    const b = cubicBasis(t);
    for (let r = 0; r < 4; r++) {
      btwy[j + r] += ws[i] * b[r] * ys[i];
      for (let c = 0; c < 4; c++) btwb[(j + r) * nb + j + c] += ws[i] * b[r] * b[c];
    }
  });
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
    const next = Uint8Array.from({ length: nb - 1 }, (_, k) =>
      alpha[k + 1] < alpha[k] ? 1 : down[k],
    );
    if (next.every((v, k) => v === down[k])) break;
    down = next;
  }
  const value = (x: number): number => {
    const [j, t] = locate(x);
    const b = cubicBasis(t);
    return b[0] * alpha[j] + b[1] * alpha[j + 1] + b[2] * alpha[j + 2] + b[3] * alpha[j + 3];
  };
  // End slopes of the spline (derivative of the uniform cubic B-spline at the end knots).
  const slopeLo = (alpha[2] - alpha[0]) / (2 * step);
  const slopeHi = (alpha[nb - 1] - alpha[nb - 3]) / (2 * step);
  const yLo = value(lo);
  const yHi = value(hi);
  return (x: number): number =>
    x <= lo
      ? yLo + Math.max(0, slopeLo) * (x - lo)
      : x >= hi
        ? yHi + Math.max(0, slopeHi) * (x - hi)
        : value(x);
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
 * fitToneCurve([0.02, 0.2, 0.8], [0.03, 0.18, 1])(0.2); // 0.18
 */
export function fitToneCurve(observed: number[], truth: number[]): ToneCurve {
  if (observed.length >= smoothingFrom) {
    // Every point counts for the smoother, in order of what was observed.
    const order = observed.map((_, i) => i).sort((a, b) => observed[a] - observed[b]);
    const xs = order.map((i) => Math.log(Math.max(observed[i], 1e-5)));
    const ys = order.map((i) => Math.log(Math.max(truth[i], 1e-6)));
    // Each point's weight: one over the variance of log(observed) from a code value of
    // JPEG rounding, as d ln(linear)/d code ≈ 2.4 / (code + 14) for the sRGB decode.
    const ws = order.map((i) => {
      const lin = observed[i];
      const code = 255 * (lin <= 0.0031308 ? 12.92 * lin : 1.055 * lin ** (1 / 2.4) - 0.055);
      return ((code + 14) / 128) ** 2;
    });
    const f = fitPSpline(xs, ys, ws);
    return (o: number): number => Math.exp(f(Math.log(Math.max(o, 1e-6))));
  }
  const order = truth.map((_, i) => i).sort((a, b) => truth[a] - truth[b]);
  const xs: number[] = [];
  const ys: number[] = [];
  for (const i of order) {
    const x = Math.log(Math.max(observed[i], 1e-5));
    if (xs.length && x <= xs[xs.length - 1] + 1e-4) continue;
    xs.push(x);
    ys.push(Math.log(Math.max(truth[i], 1e-6)));
  }
  const n = xs.length;
  if (n === 1) return (o) => Math.exp(ys[0]) * (o / Math.exp(xs[0]));
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
  return (o: number): number => {
    const x = Math.log(Math.max(o, 1e-6));
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
  };
}
