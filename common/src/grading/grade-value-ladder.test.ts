import { describe, expect, it } from 'vitest';
import type { Target } from '../types/drill.js';
import { gradeValueLadder } from './grade-value-ladder.js';

const grey = (L: number) => ({ L, a: 0, b: 0 });
const ladder: Target[] = [90, 75, 60, 45, 30].map((L) => ({ lab: grey(L) }));
const grade = (painted: number[]) =>
  gradeValueLadder({ targets: ladder, readings: painted.map((L) => ({ lab: grey(L) })) });

describe('gradeValueLadder', () => {
  it('should pass a ladder painted exactly with score 100', () => {
    const mark = grade([90, 75, 60, 45, 30]);
    expect(mark.pass).toBe(true);
    expect(mark.score).toBe(100);
    expect(mark.feedback[0].severity).toBe('praise');
  });

  it('should tell an uneven ladder which step and which swatch', () => {
    // Swatch 4 painted too light: the 3→4 step bunches up, the 4→5 step jumps.
    const mark = grade([90, 75, 60, 53, 30]);
    expect(mark.pass).toBe(false);
    const steps = mark.checks.find((c) => c.name === 'steps')!;
    expect(steps.pass).toBe(false);
    const line = mark.feedback.find((f) => f.topic === 'steps')!;
    expect(line.text).toMatch(
      /step from swatch (3 to swatch 4|4 to swatch 5) is too (small|big): swatch 4 is too light/,
    );
    expect(line.swatch).toBe(3);
    expect(mark.feedback.some((f) => f.text.startsWith('Swatch 4 is too light'))).toBe(true);
  });

  it('should flag two swatches of the same value and a reversed pair', () => {
    const same = grade([90, 75, 60, 60, 30]);
    expect(same.checks.find((c) => c.name === 'order')!.pass).toBe(false);
    expect(same.feedback.map((f) => f.text)).toContain(
      'Swatch 3 and swatch 4 are the same value: swatch 4 should be clearly darker',
    );
    const reversed = grade([90, 75, 45, 60, 30]);
    expect(reversed.feedback.some((f) => f.text.includes('are the wrong way round'))).toBe(true);
  });

  it('should accept small, even errors within the limits', () => {
    const mark = grade([91, 76, 61, 46, 31]); // all 1 L* light: steps perfect, values within 3
    expect(mark.pass).toBe(true);
    expect(mark.checks.find((c) => c.name === 'steps')!.value).toBeCloseTo(0, 9);
  });

  it('should judge value only: hue and chroma changes along the ladder do not count', () => {
    const readings = [90, 75, 60, 45, 30].map((L, i) => ({ lab: { L, a: 5 * i, b: 20 - 3 * i } }));
    expect(gradeValueLadder({ targets: ladder, readings }).score).toBe(100);
  });

  it('should work for a dark-to-light ladder too', () => {
    const up = [30, 45, 60, 75, 90].map((L) => ({ lab: grey(L) }));
    const mark = gradeValueLadder({
      targets: up,
      readings: [30, 45, 60, 75, 90].map((L) => ({ lab: grey(L) })),
    });
    expect(mark.pass).toBe(true);
  });
});
