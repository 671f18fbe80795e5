import { labToSrgb, lchToLab, type DrillKind, type Lab } from '@mixmark/common';

/**
 * The demo studio's teaching: classes, a drill library covering every kind, assignments past
 * and due, and each student's habits (how their mixes miss, and how fast they improve), from
 * which several weeks of attempts are photographed synthetically and graded for real.
 * All targets are invented and lie inside the sRGB gamut (checked when the seed runs).
 */

/** The most chroma a hue keeps at a lightness inside sRGB (a ladder step stays printable). */
export function inGamutLch(L: number, C: number, h: number): Lab {
  for (let c = C; c >= 0; c -= 0.5) {
    const lab = lchToLab({ L, C: c, h });
    if (labToSrgb(lab).inGamut) return { L: round(lab.L), a: round(lab.a), b: round(lab.b) };
  }
  return { L, a: 0, b: 0 };
}
const round = (x: number) => Math.round(x * 100) / 100;

export interface DemoDrill {
  key: string;
  title: string;
  kind: DrillKind;
  instructions: string;
  targets: { lab: Lab; label?: string }[];
  palette: { name: string; pigments: string[] }[];
  visibility: 'private' | 'public';
}

export const demoDrills: DemoDrill[] = [
  {
    key: 'orange',
    title: 'Burnt orange from two primaries',
    kind: 'match',
    instructions: 'Mix the warm red and the warm yellow, then grey it with a touch of the cool blue until it sits beside the target.',
    targets: [{ lab: inGamutLch(52, 48, 55), label: 'burnt orange' }],
    palette: [
      { name: 'Harbour red (warm)', pigments: ['PR255'] },
      { name: 'Marigold yellow (warm)', pigments: ['PY65'] },
      { name: 'Deep sea blue (cool)', pigments: ['PB15:3'] },
    ],
    visibility: 'public',
  },
  {
    key: 'ladder',
    title: 'Five-step value ladder in blue',
    kind: 'value-ladder',
    instructions: 'From paper white to the darkest blue you can mix, in five even steps. Judge each step against the greyscale preview.',
    targets: [85, 70, 55, 40, 27].map((L, i) => ({ lab: inGamutLch(L, 10 + i * 7, 270), label: `step ${i + 1}` })),
    palette: [{ name: 'Ultramarine', pigments: ['PB29'] }],
    visibility: 'public',
  },
  {
    key: 'pair',
    title: 'Warm and cool of a sap green',
    kind: 'temperature-pair',
    instructions: 'Paint a warmer version (towards yellow) on the left and a cooler one (towards blue) on the right, both at the value of the target.',
    targets: [{ lab: inGamutLch(56, 38, 125), label: 'base green' }],
    palette: [
      { name: 'Lemon yellow (cool)', pigments: ['PY175'] },
      { name: 'Deep sea blue (cool)', pigments: ['PB15:3'] },
      { name: 'Marigold yellow (warm)', pigments: ['PY65'] },
    ],
    visibility: 'private',
  },
  {
    key: 'grey',
    title: 'A neutral grey from complements',
    kind: 'neutral',
    instructions: 'Mix the orange and the blue until neither wins: a grey with no lean, at middle value.',
    targets: [{ lab: { L: 55, a: 0, b: 0 }, label: 'middle grey' }],
    palette: [
      { name: 'Ultramarine', pigments: ['PB29'] },
      { name: 'Burnt sienna', pigments: ['PBR7'] },
    ],
    visibility: 'public',
  },
  {
    key: 'flat',
    title: 'Flat wash of raw sienna',
    kind: 'flat-wash',
    instructions: 'One even layer, no blooms or streaks: mix more than you need and keep a wet edge.',
    targets: [{ lab: inGamutLch(66, 42, 72), label: 'raw sienna' }],
    palette: [{ name: 'Raw sienna', pigments: ['PBR7'] }],
    visibility: 'private',
  },
  {
    key: 'graded',
    title: 'Graded wash, indigo to paper',
    kind: 'graded-wash',
    instructions: 'Start dark at the left and add water stroke by stroke so the wash fades evenly to paper white.',
    targets: [
      { lab: inGamutLch(32, 20, 265), label: 'start' },
      { lab: inGamutLch(90, 4, 265), label: 'end' },
    ],
    palette: [{ name: 'Indigo mix', pigments: ['PB29', 'PBK9'] }],
    visibility: 'public',
  },
];

export const demoClasses = [
  {
    name: 'Tuesday evening watercolour',
    students: ['bram', 'ines', 'kofi', 'liesl', 'ravi'],
    // [drill key, due in days from today (negative: past)]
    assignments: [['orange', -24], ['ladder', -10], ['pair', 5]] as [string, number][],
  },
  {
    name: 'Saturday gouache studio',
    students: ['sunniva', 'theo', 'yuki', 'ines'],
    assignments: [['grey', -17], ['flat', -3], ['orange', 9]] as [string, number][],
  },
];

/**
 * How each student tends to miss: a lightness bias (too much water is +), a chroma bias, a hue
 * bias (degrees), and how much of the miss is left each week (0.6: improving fast).
 */
export const studentHabits: Record<string, { dL: number; dC: number; dh: number; keep: number }> = {
  bram: { dL: 7, dC: -3, dh: 4, keep: 0.6 },
  ines: { dL: -2, dC: 6, dh: -3, keep: 0.7 },
  kofi: { dL: 4, dC: -6, dh: 8, keep: 0.8 },
  liesl: { dL: 1.5, dC: 2, dh: 2, keep: 0.9 },
  ravi: { dL: -6, dC: -2, dh: -6, keep: 0.75 },
  sunniva: { dL: 3, dC: 4, dh: 10, keep: 0.65 },
  theo: { dL: 9, dC: -8, dh: -4, keep: 0.85 },
  yuki: { dL: -3, dC: -3, dh: 3, keep: 0.7 },
  noor: { dL: 5, dC: 5, dh: -5, keep: 0.7 },
};
