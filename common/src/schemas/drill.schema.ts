import { array, mixed, number, object, string, type InferType } from 'yup';
import { drillKinds, type DrillKind } from '../types/drill.js';

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
    }),
  tolerance: toleranceSchema,
  palette: array(allowedPaintSchema.required()).max(12).default([]),
  visibility: string().oneOf(drillVisibilities).default('private'),
});
export type CreateDrillInput = InferType<typeof createDrillSchema>;

/** Editing replaces the whole drill description (the same rules as creating it). */
export const updateDrillSchema = createDrillSchema;
export type UpdateDrillInput = CreateDrillInput;
