import type { DrillKind, Target, Tolerance } from '@mixmark/common';

export type AllowedPaint = { name: string; pigments: string[] };

export type Drill = {
  id: string;
  ownerId: string;
  title: string;
  kind: DrillKind;
  instructions: string;
  targets: Target[];
  tolerance: Partial<Tolerance>;
  palette: AllowedPaint[];
  visibility: 'private' | 'public';
  createdAt: string;
  updatedAt: string;
};

export type DrillScope = 'mine' | 'library' | 'all';

export const kindWords: Record<DrillKind, { name: string; what: string }> = {
  match: { name: 'Match', what: 'Mix one colour to match the target.' },
  'value-ladder': { name: 'Value ladder', what: 'Paint steps from light to dark, evenly spaced in value.' },
  'temperature-pair': { name: 'Temperature pair', what: 'A warmer and a cooler version of one colour at the same value.' },
  neutral: { name: 'Neutral grey', what: 'Mix a grey of low chroma, often from complements, at a given value.' },
  'graded-wash': { name: 'Graded wash', what: 'A smooth gradient from one colour to another along the swatch.' },
  'flat-wash': { name: 'Flat wash', what: 'One even colour across the whole swatch; evenness counts.' },
};
