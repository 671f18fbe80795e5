import { describe, expect, it } from 'vitest';
import { ValidationError } from 'yup';
import { hexToLab } from '../colour/srgb/hex-lab.js';
import { labToLch } from '../colour/lab/lab-lch.js';
import { defaultTolerances } from '../grading/tolerance-bands.js';
import { createDrillSchema, ladderMinStepL } from './drill.schema.js';
import { validationDetails } from './validation-details.js';

async function refusal(value: unknown): Promise<{ details: Record<string, string>; errors: string[] }> {
  try {
    await createDrillSchema.validate(value, { abortEarly: false, stripUnknown: true });
  } catch (error) {
    if (error instanceof ValidationError) return { details: validationDetails(error), errors: error.errors };
    throw error;
  }
  throw new Error('expected the drill to be refused');
}

const greys = (Ls: number[]) => Ls.map((L) => ({ lab: { L, a: 0, b: 0 } }));

describe('createDrillSchema: value-ladder targets', () => {
  it('should accept steps from light to dark, however the colour was entered', async () => {
    // PRODUCT.md: "N steps light to dark, evenly spaced in lightness".
    await expect(createDrillSchema.validate({ title: 'Ladder', kind: 'value-ladder', targets: greys([90, 72.5, 55, 37.5, 20]) })).resolves.toBeDefined();
    // Nine steps 90 → 20 (the app's default ladder) are 8.75 L* apart.
    const nine = Array.from({ length: 9 }, (_, i) => 90 - (i * 70) / 8);
    await expect(createDrillSchema.validate({ title: 'Ladder', kind: 'value-ladder', targets: greys(nine) })).resolves.toBeDefined();
    // #ffffff is L* 100, #808080 L* 53.59, #000000 L* 0 (sRGB → CIELAB D65).
    const mixed = [{ hex: 'ffffff' }, { lch: { L: 70, C: 20, h: 270 } }, { hex: '#808080' }, { lab: { L: 30, a: 5, b: -20 } }, { hex: '#000' }];
    await expect(createDrillSchema.validate({ title: 'Ladder', kind: 'value-ladder', targets: mixed })).resolves.toBeDefined();
  });

  it('should refuse a step darker than the one after it, naming both steps', async () => {
    const { details, errors } = await refusal({ title: 'Ladder', kind: 'value-ladder', targets: greys([80, 60, 70, 40]) });
    expect(details).toEqual({ 'targets[2]': 'ladder-step' });
    expect(errors).toEqual(['step 3 (L* 70.0) is lighter than step 2 (L* 60.0): a value ladder runs from light to dark, each step at least 5 L* darker than the one before']);
  });

  it('should refuse a ladder entered dark to light at its first step', async () => {
    const { details, errors } = await refusal({ title: 'Ladder', kind: 'value-ladder', targets: greys([20, 50, 80]) });
    expect(details).toEqual({ 'targets[1]': 'ladder-step' });
    expect(errors[0]).toMatch(/^step 2 \(L\* 50\.0\) is lighter than step 1 \(L\* 20\.0\)/);
  });

  it(`should refuse neighbouring steps closer than ${ladderMinStepL} L* (Mixmark's choice) or equal`, async () => {
    expect(ladderMinStepL).toBe(5);
    const close = await refusal({ title: 'Ladder', kind: 'value-ladder', targets: greys([80, 60, 57, 30]) });
    expect(close.details).toEqual({ 'targets[2]': 'ladder-step' });
    expect(close.errors[0]).toMatch(/^step 3 \(L\* 57\.0\) is only 3\.0 L\* darker than step 2 \(L\* 60\.0\)/);
    const same = await refusal({ title: 'Ladder', kind: 'value-ladder', targets: greys([80, 50, 50]) });
    expect(same.errors[0]).toMatch(/^step 3 \(L\* 50\.0\) is as light as step 2/);
    // Exactly the minimum passes.
    await expect(createDrillSchema.validate({ title: 'Ladder', kind: 'value-ladder', targets: greys([80, 75, 70]) })).resolves.toBeDefined();
  });

  it('should leave a target that is not one valid colour to its own check', async () => {
    const { details } = await refusal({ title: 'Ladder', kind: 'value-ladder', targets: [{ lab: { L: 80, a: 0, b: 0 } }, { hex: 'nope' }, { lab: { L: 40, a: 0, b: 0 } }] });
    expect(details).toEqual({ 'targets[1].hex': 'hex' });
  });
});

describe('createDrillSchema: neutral targets', () => {
  const limit = defaultTolerances.neutral.maxChroma!;

  it('should accept a grey entered as Lab, as hex and as a faint LCh lean', async () => {
    await expect(createDrillSchema.validate({ title: 'Grey', kind: 'neutral', targets: [{ lab: { L: 50, a: 0, b: 0 } }] })).resolves.toBeDefined();
    await expect(createDrillSchema.validate({ title: 'Grey', kind: 'neutral', targets: [{ hex: '#777777' }] })).resolves.toBeDefined();
    await expect(createDrillSchema.validate({ title: 'Warm grey', kind: 'neutral', targets: [{ lch: { L: 55, C: limit, h: 70 } }] })).resolves.toBeDefined();
  });

  it('should refuse a strong orange, with its chroma and the grading limit in words', async () => {
    const orange = '#e07020';
    const C = labToLch(hexToLab(orange)!).C;
    expect(C).toBeGreaterThan(50);
    const { details, errors } = await refusal({ title: 'Grey', kind: 'neutral', targets: [{ hex: orange }] });
    expect(details).toEqual({ 'targets[0]': 'not-neutral' });
    expect(errors).toEqual([
      `the target has a chroma (C*) of ${C.toFixed(1)}, too colourful for a grey: a neutral drill's target needs C* of at most ${limit.toFixed(1)}, the limit its students are graded by`,
    ]);
  });

  it("should use the drill's own neutrality limit when the teacher set one", async () => {
    const faint = { lch: { L: 55, C: 6, h: 70 } };
    expect((await refusal({ title: 'Grey', kind: 'neutral', targets: [faint] })).details).toEqual({ 'targets[0]': 'not-neutral' });
    await expect(createDrillSchema.validate({ title: 'Grey', kind: 'neutral', tolerance: { maxChroma: 8 }, targets: [faint] })).resolves.toBeDefined();
    const strict = await refusal({ title: 'Grey', kind: 'neutral', tolerance: { maxChroma: 2 }, targets: [{ lch: { L: 55, C: 3, h: 250 } }] });
    expect(strict.errors[0]).toMatch(/\(C\*\) of 3\.0, .*at most 2\.0,/);
  });

  it('should not apply the neutral or ladder rules to other kinds', async () => {
    await expect(createDrillSchema.validate({ title: 'Orange', kind: 'match', targets: [{ hex: '#e07020' }] })).resolves.toBeDefined();
    await expect(createDrillSchema.validate({ title: 'Wash', kind: 'graded-wash', targets: greys([30, 90]) })).resolves.toBeDefined();
  });
});
