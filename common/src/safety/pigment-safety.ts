/**
 * Safety notes for artists' pigments that contain hazardous elements, keyed by Colour Index
 * generic name. Which element each pigment carries is common practice in the trade (its
 * chemical make-up as the Colour Index describes it), transcribed here from memory and marked
 * so: it is a prompt to read the paint's own label and safety data sheet, never a substitute.
 */
export type HazardElement = 'cadmium' | 'cobalt' | 'manganese' | 'chromium' | 'lead' | 'mercury' | 'arsenic' | 'barium' | 'nickel';

export interface PigmentSafetyNote {
  /** Colour Index generic name, e.g. PR108. */
  code: string;
  /** What the pigment is, in a few words. */
  pigment: string;
  elements: HazardElement[];
  /** Where the entry comes from. */
  source: 'common practice (from memory; check the label)';
}

const entry = (code: string, pigment: string, ...elements: HazardElement[]): PigmentSafetyNote => ({
  code,
  pigment,
  elements,
  source: 'common practice (from memory; check the label)',
});

export const pigmentSafetyNotes: readonly PigmentSafetyNote[] = [
  entry('PR108', 'cadmium selenide sulfide (cadmium red)', 'cadmium'),
  entry('PR113', 'cadmium mercury sulfide', 'cadmium', 'mercury'),
  entry('PO20', 'cadmium sulfoselenide (cadmium orange)', 'cadmium'),
  entry('PY35', 'cadmium zinc sulfide (cadmium yellow)', 'cadmium'),
  entry('PY37', 'cadmium sulfide (cadmium yellow)', 'cadmium'),
  entry('PB28', 'cobalt aluminate (cobalt blue)', 'cobalt'),
  entry('PB36', 'cobalt chromite (cerulean / turquoise)', 'cobalt', 'chromium'),
  entry('PB35', 'cobalt tin oxide (cerulean blue)', 'cobalt'),
  entry('PV14', 'cobalt phosphate (cobalt violet)', 'cobalt'),
  entry('PY40', 'potassium cobaltinitrite (aureolin)', 'cobalt'),
  entry('PG19', 'cobalt zinc oxide (cobalt green)', 'cobalt'),
  entry('PG26', 'cobalt chromite green', 'cobalt', 'chromium'),
  entry('PG50', 'cobalt titanate green', 'cobalt', 'nickel'),
  entry('PB33', 'barium manganate (manganese blue)', 'manganese', 'barium'),
  entry('PV16', 'manganese ammonium pyrophosphate (manganese violet)', 'manganese'),
  entry('PBR8', 'manganese oxide (manganese brown)', 'manganese'),
  entry('PG17', 'chromium oxide green', 'chromium'),
  entry('PG18', 'hydrated chromium oxide (viridian)', 'chromium'),
  entry('PY34', 'lead chromate (chrome yellow)', 'lead', 'chromium'),
  entry('PR104', 'lead chromate molybdate', 'lead', 'chromium'),
  entry('PW1', 'basic lead carbonate (lead white, flake white)', 'lead'),
  entry('PR105', 'lead tetroxide (red lead)', 'lead'),
  entry('PY41', 'lead antimonate (Naples yellow, genuine)', 'lead'),
  entry('PR106', 'mercuric sulfide (vermilion)', 'mercury'),
  entry('PG21', 'copper acetoarsenite (emerald green, historical)', 'arsenic'),
  entry('PY31', 'barium chromate', 'barium', 'chromium'),
  entry('PY53', 'nickel antimony titanate', 'nickel'),
];

/** The usual cautions for painting with such pigments (common practice). */
export const pigmentCautions: readonly string[] = [
  'Do not point brushes with your lips or mouth.',
  'Do not eat, drink or smoke while painting.',
  'Do not spray these paints or sand dried paint; avoid making dust.',
  'Wash your hands when you finish, and clean up spills while wet.',
  'Keep paints and rinse water away from children and pets.',
  'Follow the label on the paint and your local rules for disposing of rinse water.',
];

const byCode = new Map(pigmentSafetyNotes.map((note) => [note.code, note]));

/** Canonical form of a Colour Index code: upper case, no spaces (`pb 15:3` → `PB15:3`). */
export function normalisePigmentCode(code: string): string {
  return code.replace(/\s+/g, '').toUpperCase();
}

/**
 * The safety notes for the pigments a paint or palette names, once each.
 *
 * @param codes - Colour Index codes, e.g. `['PB29', 'PR108']`
 * @returns the notes of the hazardous ones, in the order given
 * @example pigmentSafety(['PB29', 'PR108']) // [{ code: 'PR108', elements: ['cadmium'], … }]
 */
export function pigmentSafety(codes: readonly string[]): PigmentSafetyNote[] {
  const seen = new Set<string>();
  const notes: PigmentSafetyNote[] = [];
  for (const code of codes.map(normalisePigmentCode)) {
    const note = byCode.get(code);
    if (note && !seen.has(code)) {
      seen.add(code);
      notes.push(note);
    }
  }
  return notes;
}
