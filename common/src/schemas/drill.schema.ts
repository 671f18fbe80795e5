import { array, mixed, number, object, string, type InferType } from 'yup';
import { hexToLab } from '../colour/srgb/hex-lab.js';
import { labToLch, lchToLab } from '../colour/lab/lab-lch.js';
import { fixed1 } from '../grading/format-numbers.js';
import { resolveTolerance } from '../grading/tolerance-bands.js';
import type { Lab } from '../types/colour.js';
import { drillKinds, type DrillKind, type Tolerance } from '../types/drill.js';

/** How many targets each kind takes (one per card window; a graded wash has a start and an end). */
export const targetCountByKind: Record<DrillKind, [min: number, max: number]> = {
  match: [1, 1],
  'value-ladder': [3, 9],
  'temperature-pair': [1, 1],
  neutral: [1, 1],
  'graded-wash': [2, 2],
  'flat-wash': [1, 1],
};

const labSchema = object({
  L: number().min(0).max(100).required(),
  a: number().min(-128).max(128).required(),
  b: number().min(-128).max(128).required(),
});

const lchSchema = object({
  L: number().min(0).max(100).required(),
  C: number().min(0).max(180).required(),
  h: number().min(0).max(360).required(),
});

/**
 * A target as a teacher enters it: exactly one of hex, Lab or LCh. The server stores CIELAB
 * (D65) and keeps how it was entered.
 */
export const targetInputSchema = object({
  label: string().trim().max(60).optional(),
  hex: string()
    .trim()
    .matches(/^#?([0-9a-fA-F]{3}|[0-9a-fA-F]{6})$/, { name: 'hex', message: 'a hex colour is #rrggbb' })
    .optional(),
  lab: labSchema.default(undefined).optional(),
  lch: lchSchema.default(undefined).optional(),
}).test('one-colour', 'give the colour once: as hex, as Lab or as LCh', (target) => {
  const given = [target.hex, target.lab, target.lch].filter((v) => v !== undefined).length;
  return given === 1;
});
export type TargetInput = InferType<typeof targetInputSchema>;

/**
 * The CIELAB (D65) of a target as entered, or `undefined` while it is not one valid colour
 * (the target's own checks say why). The server's stored form is the same conversion.
 */
export function targetInputLab(target: Partial<TargetInput> | undefined): Lab | undefined {
  if (!target) return undefined;
  const given = [target.hex, target.lab, target.lch].filter((v) => v !== undefined);
  if (given.length !== 1) return undefined;
  const finite = (...xs: unknown[]) => xs.every((x) => typeof x === 'number' && Number.isFinite(x));
  if (target.hex !== undefined) {
    const hex = target.hex.trim();
    return hexToLab(hex.startsWith('#') ? hex : `#${hex}`);
  }
  if (target.lch !== undefined) {
    const { L, C, h } = target.lch;
    return finite(L, C, h) ? lchToLab({ L, C, h }) : undefined;
  }
  const { L, a, b } = target.lab!;
  return finite(L, a, b) ? { L, a, b } : undefined;
}

/**
 * The least L* between neighbouring steps of a value ladder (Mixmark's choice). 5 L* is about
 * half a Munsell value step (the ASTM D1535 value function gives close to 10 L* per value step
 * in the middle of the range), the finest spacing painters' value scales use; a photo through
 * the card reads each swatch to about ±1–2 ΔE00 (docs/grading.md), so the difference of two
 * readings is uncertain by up to about 3 L*, and a closer pair of targets could not be told
 * apart from a flat step. It still leaves room for the longest ladder: 9 steps from paper
 * (L* ≈ 90) to the darkest mixes (L* ≈ 20) are 8.75 L* apart.
 */
export const ladderMinStepL = 5;

/**
 * Targets that contradict their drill's kind: a ladder not running light to dark with at least
 * {@link ladderMinStepL} between steps, or a neutral target with more chroma than the drill's
 * own neutrality limit (`tolerance.maxChroma`, else the grading default of
 * `defaultTolerances.neutral`), which a perfect match of it would fail. Returns the first
 * problem as the index of the target and a sentence for the teacher, or `undefined`.
 */
export function targetsKindProblem(
  kind: DrillKind,
  targets: (Partial<TargetInput> | undefined)[],
  tolerance: Partial<Tolerance> = {},
): { index: number; type: 'ladder-step' | 'not-neutral'; message: string } | undefined {
  const labs = targets.map(targetInputLab);
  if (kind === 'value-ladder') {
    for (let i = 1; i < labs.length; i += 1) {
      const before = labs[i - 1];
      const here = labs[i];
      if (!before || !here) continue;
      const step = before.L - here.L;
      if (step >= ladderMinStepL) continue;
      const relation =
        step > 0
          ? `is only ${fixed1(step)} L* darker than`
          : step === 0
            ? 'is as light as'
            : `is lighter than`;
      return {
        index: i,
        type: 'ladder-step',
        message:
          `step ${i + 1} (L* ${fixed1(here.L)}) ${relation} step ${i} (L* ${fixed1(before.L)}): ` +
          `a value ladder runs from light to dark, each step at least ${ladderMinStepL} L* darker than the one before`,
      };
    }
  }
  if (kind === 'neutral') {
    const maxChroma = resolveTolerance('neutral', tolerance).maxChroma!;
    for (let i = 0; i < labs.length; i += 1) {
      const lab = labs[i];
      if (!lab) continue;
      const { C } = labToLch(lab);
      if (C <= maxChroma) continue;
      const which = labs.length > 1 ? `target ${i + 1}` : 'the target';
      return {
        index: i,
        type: 'not-neutral',
        message:
          `${which} has a chroma (C*) of ${fixed1(C)}, too colourful for a grey: ` +
          `a neutral drill's target needs C* of at most ${fixed1(maxChroma)}, the limit its students are graded by`,
      };
    }
  }
  return undefined;
}

const toleranceSchema = object({
  deltaE: number().positive().max(50).optional(),
  maxChroma: number().positive().max(50).optional(),
  evenness: number().positive().max(50).optional(),
  minSeparation: number().positive().max(50).optional(),
}).default({});

/** A paint the drill allows: a name and its Colour Index pigment codes (PB29, PR209 …). */
export const allowedPaintSchema = object({
  name: string().trim().min(1).max(80).required(),
  pigments: array(
    string()
      .trim()
      .uppercase()
      .matches(/^P(BK|BR|B|G|O|R|V|W|Y)\d{1,3}(:\d)?$/, { name: 'pigment', message: 'a Colour Index code such as PB29 or PR209' })
      .required(),
  )
    .max(6)
    .default([]),
});

export const drillVisibilities = ['private', 'public'] as const;

export const createDrillSchema = object({
  title: string().trim().min(2).max(120).required(),
  kind: mixed<DrillKind>().oneOf([...drillKinds]).required(),
  instructions: string().trim().max(4000).default(''),
  targets: array(targetInputSchema.required())
    .required()
    .test('count-for-kind', function (targets) {
      const kind = this.parent.kind as DrillKind | undefined;
      if (!kind || !targets || !(kind in targetCountByKind)) return true;
      const [min, max] = targetCountByKind[kind];
      if (targets.length >= min && targets.length <= max) return true;
      const wanted = min === max ? `${min}` : `${min} to ${max}`;
      return this.createError({ message: `a ${kind} drill takes ${wanted} targets`, type: 'count' });
    })
    .test('fit-kind', function (targets) {
      const kind = this.parent.kind as DrillKind | undefined;
      if (!kind || !targets || !(kind in targetCountByKind)) return true;
      const tolerance = (this.parent.tolerance ?? {}) as Partial<Tolerance>;
      const problem = targetsKindProblem(kind, targets, typeof tolerance === 'object' ? tolerance : {});
      if (!problem) return true;
      return this.createError({ path: `${this.path}[${problem.index}]`, message: problem.message, type: problem.type });
    }),
  tolerance: toleranceSchema,
  palette: array(allowedPaintSchema.required()).max(12).default([]),
  visibility: string().oneOf(drillVisibilities).default('private'),
});
export type CreateDrillInput = InferType<typeof createDrillSchema>;

/** Editing replaces the whole drill description (the same rules as creating it). */
export const updateDrillSchema = createDrillSchema;
export type UpdateDrillInput = CreateDrillInput;
