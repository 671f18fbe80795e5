import { describe, expect, it } from 'vitest';
import { gradeGradedWash } from './grade-graded-wash.js';

const targets = [{ lab: { L: 85, a: 0, b: -10 } }, { lab: { L: 35, a: 5, b: -40 } }];
const smooth = Array.from({ length: 20 }, (_, k) => 85 - (50 * k) / 19);
const grade = (profile: number[]) =>
  gradeGradedWash({ targets, readings: [{ lab: { L: 60, a: 3, b: -25 }, profile }] });

describe('gradeGradedWash', () => {
  it('should pass a smooth monotone wash between the target ends with score 100', () => {
    const mark = grade(smooth);
    expect(mark.pass).toBe(true);
    expect(mark.score).toBe(100);
  });

  it('should accept a smooth curved (not straight) gradient', () => {
    const curved = Array.from({ length: 20 }, (_, k) => 35 + 50 * (1 - k / 19) ** 1.6);
    expect(grade(curved).pass).toBe(true);
  });

  it('should find a dark band and say where it is', () => {
    const banded = smooth.map((L, k) => (k === 8 ? L - 6 : L));
    const mark = grade(banded);
    expect(mark.pass).toBe(false);
    const line = mark.feedback.find((f) => f.topic === 'smoothness')!;
    expect(line.text).toMatch(/^A dark band about 4\d % of the way along/);
  });

  it('should flag a wash that turns back', () => {
    const back = smooth.map((L, k) => (k >= 10 && k <= 12 ? smooth[9] + 2 * (k - 9) : L));
    const mark = grade(back);
    expect(mark.checks.find((c) => c.name === 'order')!.pass).toBe(false);
    expect(mark.feedback.some((f) => f.text.includes('turns back'))).toBe(true);
  });

  it('should tell a wash that starts too dark to begin paler', () => {
    const dark = smooth.map((L) => L - 8 * (1 - (85 - L) / 50));
    const mark = grade(dark);
    expect(mark.checks.find((c) => c.name === 'start')!.pass).toBe(false);
    expect(mark.feedback.some((f) => f.text.startsWith('The start of the wash is too dark'))).toBe(
      true,
    );
  });
});
