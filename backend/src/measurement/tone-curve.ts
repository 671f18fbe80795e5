/** A monotone map from a channel's observed linear value to the reflectance it stands for. */
export type ToneCurve = (observed: number) => number;

/**
 * Fits a per-channel tone curve through the neutral ramp: a monotone cubic Hermite spline
 * (Fritsch & Carlson, SIAM J. Numer. Anal. 17 (1980) 238–246) through the points in log–log
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
