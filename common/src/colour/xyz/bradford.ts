import type { WhitePoint, XYZ } from '../../types/colour.js';
import { bradfordMatrix, D50, D65 } from '../constants.js';

type Matrix3 = readonly (readonly [number, number, number])[];

const multiply = (m: Matrix3, n: Matrix3): [number, number, number][] =>
  m.map((row) => [0, 1, 2].map((j) => row[0] * n[0][j] + row[1] * n[1][j] + row[2] * n[2][j])) as [
    number,
    number,
    number,
  ][];

const apply = (m: Matrix3, { X, Y, Z }: XYZ): XYZ => ({
  X: m[0][0] * X + m[0][1] * Y + m[0][2] * Z,
  Y: m[1][0] * X + m[1][1] * Y + m[1][2] * Z,
  Z: m[2][0] * X + m[2][1] * Y + m[2][2] * Z,
});

/** Inverse of a 3×3 matrix by the adjugate (the matrices here are well conditioned). */
const invert = (m: Matrix3): [number, number, number][] => {
  const [[a, b, c], [d, e, f], [g, h, i]] = m;
  const A = e * i - f * h;
  const B = f * g - d * i;
  const C = d * h - e * g;
  const det = a * A + b * B + c * C;
  return [
    [A / det, (c * h - b * i) / det, (b * f - c * e) / det],
    [B / det, (a * i - c * g) / det, (c * d - a * f) / det],
    [C / det, (b * g - a * h) / det, (a * e - b * d) / det],
  ];
};

const bradfordInverse = invert(bradfordMatrix);

/**
 * The linearised Bradford chromatic-adaptation matrix from one white to another:
 * M⁻¹ · diag(M·W_dst / M·W_src) · M, a von Kries scaling in Bradford cone space
 * (Lam 1985; ICC.1 Annex E; Fairchild, Color Appearance Models §9).
 *
 * @param source - white of the input XYZ
 * @param destination - white the output XYZ should be relative to
 * @returns a row-major 3×3 matrix
 * @example
 * bradfordAdaptationMatrix(D65, D50)[0][0]; // 1.0479297…
 */
export function bradfordAdaptationMatrix(
  source: WhitePoint,
  destination: WhitePoint,
): [number, number, number][] {
  const s = apply(bradfordMatrix, source);
  const d = apply(bradfordMatrix, destination);
  const scale: Matrix3 = [
    [d.X / s.X, 0, 0],
    [0, d.Y / s.Y, 0],
    [0, 0, d.Z / s.Z],
  ];
  return multiply(bradfordInverse, multiply(scale, bradfordMatrix));
}

/**
 * Adapts XYZ from one white to another with the linearised Bradford transform.
 *
 * @param xyz - colour relative to `source`
 * @param source - its white
 * @param destination - the white to adapt to
 * @returns the corresponding colour relative to `destination`
 * @example
 * adaptXyz(D65, D65, D50); // ≈ D50
 */
export function adaptXyz(xyz: XYZ, source: WhitePoint, destination: WhitePoint): XYZ {
  return apply(bradfordAdaptationMatrix(source, destination), xyz);
}

const d65ToD50 = bradfordAdaptationMatrix(D65, D50);
const d50ToD65 = bradfordAdaptationMatrix(D50, D65);

/**
 * XYZ relative to D65 to XYZ relative to D50 (Bradford), e.g. for ICC / print Lab.
 *
 * @param xyz - colour relative to D65
 * @returns the colour relative to D50
 * @example
 * xyzD65ToD50(D65); // ≈ D50
 */
export function xyzD65ToD50(xyz: XYZ): XYZ {
  return apply(d65ToD50, xyz);
}

/**
 * XYZ relative to D50 to XYZ relative to D65 (Bradford).
 *
 * @param xyz - colour relative to D50
 * @returns the colour relative to D65
 * @example
 * xyzD50ToD65(D50); // ≈ D65
 */
export function xyzD50ToD65(xyz: XYZ): XYZ {
  return apply(d50ToD65, xyz);
}
