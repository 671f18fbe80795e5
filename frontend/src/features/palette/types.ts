import type { Lab, PaintInput, PigmentSafetyNote } from '@mixmark/common';

export type Paint = {
  id: string;
  name: string;
  pigments: string[];
  opacity: PaintInput['opacity'];
  staining: PaintInput['staining'];
  granulating: boolean;
  swatchLab: Lab | null;
  /** The hazardous pigments among this paint's, from common's safety notes. */
  safety: PigmentSafetyNote[];
};

/** The signed-in user's paints; `cautions` is empty unless some paint names a hazardous pigment. */
export type Palette = { paints: Paint[]; cautions: string[] };

export const opacityWords: Record<NonNullable<PaintInput['opacity']>, string> = {
  transparent: 'Transparent',
  'semi-transparent': 'Semi-transparent',
  'semi-opaque': 'Semi-opaque',
  opaque: 'Opaque',
};

export const stainingWords: Record<NonNullable<PaintInput['staining']>, string> = {
  'non-staining': 'Non-staining',
  low: 'Low staining',
  medium: 'Medium staining',
  high: 'High staining',
};
