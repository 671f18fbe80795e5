import { hexToLab, lchToLab, type Target, type TargetInput } from '@mixmark/common';

/**
 * A target as entered (hex, Lab or LCh) as the CIELAB (D65) the drill keeps. The schema has
 * already checked that exactly one form was given and that it parses.
 */
export function normaliseTarget(input: TargetInput): Target {
  const label = input.label || undefined;
  if (input.hex !== undefined) {
    const hex = input.hex.startsWith('#') ? input.hex : `#${input.hex}`;
    return { lab: hexToLab(hex)!, label, enteredAs: 'hex' };
  }
  if (input.lch !== undefined) return { lab: roundLab(lchToLab(input.lch)), label, enteredAs: 'lch' };
  return { lab: input.lab!, label, enteredAs: 'lab' };
}

/** Four decimals: well below any visible difference, and stable through JSON. */
function roundLab({ L, a, b }: { L: number; a: number; b: number }) {
  const r = (x: number) => Math.round(x * 1e4) / 1e4;
  return { L: r(L), a: r(a), b: r(b) };
}
