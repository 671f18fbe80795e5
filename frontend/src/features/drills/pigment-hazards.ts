/**
 * Pigments whose handling calls for the usual studio cautions. Common practice, not advice
 * for any one paint: the label on the tube and local rules decide. Colour Index codes; the
 * lookup ignores a trailing ":1"-style variant.
 */
export const pigmentHazards: Record<string, string> = {
  PR108: 'cadmium',
  PY35: 'cadmium',
  PO20: 'cadmium',
  PB28: 'cobalt',
  PB36: 'cobalt',
  PV14: 'cobalt',
  PY40: 'cobalt',
  PB33: 'manganese',
  PV16: 'manganese',
  PG17: 'chromium',
  PY34: 'chromium (and lead)',
  PG18: 'chromium',
  PW1: 'lead',
};

export const studioCautions = [
  'Do not point brushes with your mouth.',
  'Do not eat or drink while painting.',
  'Do not spray, airbrush or sand these paints.',
  'Wash your hands after painting.',
  'Keep paints away from children.',
];

/** The hazardous pigments in a list of Colour Index codes, with what makes them so. */
export function hazardousPigments(codes: string[]): { code: string; compound: string }[] {
  const found = new Map<string, string>();
  for (const code of codes) {
    const base = code.toUpperCase().replace(/:\d$/, '');
    const compound = pigmentHazards[base];
    if (compound) found.set(base, compound);
  }
  return [...found].map(([code, compound]) => ({ code, compound }));
}
