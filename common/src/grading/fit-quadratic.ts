/**
 * Least-squares fit of y = c0 + c1·x + c2·x² (normal equations solved by Cramer's rule;
 * x is scaled to 0..1 so they stay well conditioned). Returns the fitted values.
 *
 * @param ys - samples at evenly spaced positions
 * @returns the fitted curve at the same positions
 * @example
 * fitQuadratic([1, 4, 9, 16]); // ≈ [1, 4, 9, 16]
 */
export function fitQuadratic(ys: number[]): number[] {
  const n = ys.length;
  if (n < 3) return ys.slice();
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  let s4 = 0;
  let t0 = 0;
  let t1 = 0;
  let t2 = 0;
  ys.forEach((y, k) => {
    const x = k / (n - 1);
    const x2 = x * x;
    s0 += 1;
    s1 += x;
    s2 += x2;
    s3 += x2 * x;
    s4 += x2 * x2;
    t0 += y;
    t1 += x * y;
    t2 += x2 * y;
  });
  const det3 = (m: number[][]): number =>
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
  const A = [
    [s0, s1, s2],
    [s1, s2, s3],
    [s2, s3, s4],
  ];
  const t = [t0, t1, t2];
  const d = det3(A);
  const c = [0, 1, 2].map(
    (j) => det3(A.map((row, i) => row.map((v, k) => (k === j ? t[i] : v)))) / d,
  );
  return ys.map((_, k) => {
    const x = k / (n - 1);
    return c[0] + c[1] * x + c[2] * x * x;
  });
}
