import { hexToLab, labToHex, labToLch, lchToLab, type Lab, type TargetInput } from '@mixmark/common';

export type EntryMode = 'hex' | 'lab' | 'lch';

const round = (n: number, digits = 1) => Math.round(n * 10 ** digits) / 10 ** digits;

/** Which way a target is entered: the one of hex, Lab and LCh that is given. */
export function entryMode(target: TargetInput): EntryMode {
  if (target.lab) return 'lab';
  if (target.lch) return 'lch';
  return 'hex';
}

/** The CIELAB a target stands for, or undefined while what is typed cannot be read. */
export function targetLab(target: TargetInput): Lab | undefined {
  const ok = (...ns: (number | undefined)[]) => ns.every((n) => typeof n === 'number' && Number.isFinite(n));
  if (target.lab) return ok(target.lab.L, target.lab.a, target.lab.b) ? target.lab : undefined;
  if (target.lch) return ok(target.lch.L, target.lch.C, target.lch.h) ? lchToLab(target.lch) : undefined;
  return target.hex ? hexToLab(target.hex) : undefined;
}

/** The same colour entered another way (rounded as a person would type it). */
export function convertTarget(target: TargetInput, mode: EntryMode): TargetInput {
  const lab = targetLab(target) ?? { L: 50, a: 0, b: 0 };
  const base = target.label ? { label: target.label } : {};
  if (mode === 'hex') return { ...base, hex: labToHex(lab) };
  if (mode === 'lab') return { ...base, lab: { L: round(lab.L), a: round(lab.a), b: round(lab.b) } };
  const lch = labToLch(lab);
  return { ...base, lch: { L: round(lch.L), C: round(lch.C), h: round(lch.h) % 360 } };
}
