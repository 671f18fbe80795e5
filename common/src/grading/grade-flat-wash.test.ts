import { describe, expect, it } from 'vitest';
import { gradeFlatWash } from './grade-flat-wash.js';

const lab = { L: 62, a: 12, b: 30 };
const grade = (reading: Parameters<typeof gradeFlatWash>[0]['readings'][0]) =>
  gradeFlatWash({ targets: [{ lab }], readings: [reading] });

describe('gradeFlatWash', () => {
  it('should pass an even wash of the target colour with score 100', () => {
    const mark = grade({ lab, spread: { L: 0, a: 0, b: 0 }, profile: [62, 62, 62, 62] });
    expect(mark.pass).toBe(true);
    expect(mark.score).toBe(100);
  });

  it('should fail a patchy wash even when the mean colour is right', () => {
    const mark = grade({ lab, spread: { L: 4, a: 1, b: 1.5 } });
    expect(mark.checks.find((c) => c.name === 'colour')!.pass).toBe(true);
    expect(mark.pass).toBe(false);
    expect(mark.feedback[0].text).toMatch(/^Patchy in value/);
  });

  it('should notice a wash that gets darker toward the end', () => {
    const mark = grade({ lab, profile: [64, 63, 62, 60, 58] });
    expect(mark.checks.find((c) => c.name === 'drift')!.pass).toBe(false);
    expect(
      mark.feedback.some((f) => f.text.startsWith('The wash gets darker toward the end')),
    ).toBe(true);
  });

  it('should grade the colour as a match would', () => {
    const mark = grade({ lab: { ...lab, L: 70 } });
    expect(mark.pass).toBe(false);
    expect(mark.feedback.some((f) => f.text.startsWith('Too light'))).toBe(true);
  });
});
