import type { DrillKind, TargetInput } from '@mixmark/common';
import { targetLab } from './target-colour';

const ladderSteps = 5;

/**
 * The targets a new drill of a kind starts from. A ladder runs evenly from light (L* 90) to
 * dark (L* 20) in near-neutral greys; a neutral is a mid grey of zero chroma; a temperature
 * pair's single target is the base both swatches vary from, a muted mid-value colour that can
 * be pushed warmer and cooler at the same value; a graded wash runs light to dark in one hue.
 */
export function defaultTargets(kind: DrillKind): TargetInput[] {
  switch (kind) {
    case 'value-ladder':
      return Array.from({ length: ladderSteps }, (_, i) => ladderStep(i, ladderSteps));
    case 'neutral':
      return [{ lab: { L: 50, a: 0, b: 0 } }];
    case 'temperature-pair':
      return [{ lch: { L: 55, C: 20, h: 70 } }];
    case 'graded-wash':
      return [{ lch: { L: 85, C: 12, h: 250 } }, { lch: { L: 35, C: 30, h: 250 } }];
    case 'flat-wash':
      return [{ hex: '#6f8fa6' }];
    case 'match':
    default:
      return [{ hex: '#8a5a3c' }];
  }
}

/** Step `index` of a ladder of `count`, evenly spaced in L* from light to dark. */
export function ladderStep(index: number, count: number): TargetInput {
  const L = 90 - (index * 70) / Math.max(count - 1, 1);
  return { lab: { L: Math.round(L * 10) / 10, a: 0, b: 0 } };
}

/** What a target stands for, without an empty label or the way it is typed mattering. */
function fingerprint(target: TargetInput | undefined): string {
  if (!target) return '';
  const lab = targetLab(target);
  const label = target.label?.trim() ?? '';
  if (!lab) return `?${label}`;
  return `${lab.L.toFixed(1)},${lab.a.toFixed(1)},${lab.b.toFixed(1)}|${label}`;
}

/** True when the targets are still the untouched defaults of `kind`. */
export function isDefaultTargets(kind: DrillKind, targets: (TargetInput | undefined)[]): boolean {
  const defaults = defaultTargets(kind);
  return defaults.length === targets.length && defaults.every((t, i) => fingerprint(t) === fingerprint(targets[i]));
}

/** Keeps what the teacher entered, cut or padded to the number of targets `kind` takes. */
export function fitTargets(kind: DrillKind, targets: TargetInput[], [min, max]: [number, number]): TargetInput[] {
  const kept = targets.slice(0, max);
  if (kept.length >= min) return kept;
  const wanted = kind === 'value-ladder' ? Math.max(min, ladderSteps) : min;
  const padding = defaultTargets(kind);
  for (let i = kept.length; i < wanted; i += 1) {
    kept.push(kind === 'value-ladder' ? ladderStep(i, wanted) : (padding[i] ?? padding[padding.length - 1]));
  }
  return kept;
}
