import { array, boolean, number, object, string, type InferType } from 'yup';

export const paintOpacityValues = ['transparent', 'semi-transparent', 'semi-opaque', 'opaque'] as const;
export const paintStainingValues = ['non-staining', 'low', 'medium', 'high'] as const;

/** A paint in a user's palette: their own name for it and its Colour Index pigment codes. */
export const paintSchema = object({
  name: string().trim().min(1).max(80).required(),
  pigments: array(
    string()
      .trim()
      .uppercase()
      .transform((v: string) => v.replace(/\s+/g, ''))
      .matches(/^P(BK|BR|B|G|O|R|V|W|Y)\d{1,3}(:\d)?$/, { name: 'pigment', message: 'a Colour Index code such as PB29 or PR209' })
      .required(),
  )
    .max(6)
    .default([]),
  opacity: string().oneOf(paintOpacityValues).nullable().default(null),
  staining: string().oneOf(paintStainingValues).nullable().default(null),
  granulating: boolean().default(false),
  swatchLab: object({ L: number().min(0).max(100).required(), a: number().min(-128).max(128).required(), b: number().min(-128).max(128).required() })
    .nullable()
    .default(null),
});
export type PaintInput = InferType<typeof paintSchema>;
