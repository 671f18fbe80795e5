import { describe, expect, it } from '@jest/globals';
import { deltaE2000, gradeMatch, type Lab } from '@mixmark/common';
import { summariseProgress, weekStart, type ProgressAttempt } from './summarise-progress';

const target: Lab = { L: 60, a: 20, b: 30 };
const graded = (when: string, reading: Lab): ProgressAttempt => {
  const mark = gradeMatch({ targets: [{ lab: target }], readings: [{ lab: reading }] });
  return { createdAt: new Date(when), state: 'graded', pass: mark.pass, mark };
};

describe('summariseProgress', () => {
  it('should put attempts in ISO weeks starting on Monday (ISO 8601)', () => {
    expect(weekStart(new Date('2026-12-06T23:00:00Z'))).toBe('2026-11-30'); // a Sunday
    expect(weekStart(new Date('2026-11-30T00:00:00Z'))).toBe('2026-11-30'); // the Monday
  });

  it('should average the value, chroma and overall errors of the graded attempts of each week', () => {
    const lighter = { L: 66, a: 20, b: 30 };
    const summary = summariseProgress([graded('2026-11-24T10:00:00Z', lighter), graded('2026-12-01T10:00:00Z', target)], new Date('2026-12-01T12:00:00Z'));
    expect(summary.weeks.map((w) => w.week)).toEqual(['2026-11-23', '2026-11-30']);
    const [first, second] = summary.weeks;
    expect(first.meanValueError).toBeCloseTo(6, 2);
    expect(first.meanDeltaE).toBeCloseTo(deltaE2000(target, lighter), 2);
    expect(first.meanChromaError).toBeCloseTo(0, 2);
    expect(second).toMatchObject({ meanDeltaE: 0, meanValueError: 0, passRate: 1 });
  });

  it('should leave a week of ungraded attempts without averages', () => {
    const summary = summariseProgress([{ createdAt: new Date('2026-12-01T09:00:00Z'), state: 'needs-retake', pass: null, mark: null }]);
    expect(summary.weeks[0]).toMatchObject({ attempts: 1, graded: 0, passRate: null, meanDeltaE: null });
  });

  it('should count the practice streak back from today, or from yesterday before today\'s practice', () => {
    const days = ['2026-11-28', '2026-11-29', '2026-11-30'].map((d) => graded(`${d}T18:00:00Z`, target));
    expect(summariseProgress(days, new Date('2026-11-30T20:00:00Z')).streakDays).toBe(3);
    expect(summariseProgress(days, new Date('2026-12-01T08:00:00Z')).streakDays).toBe(3);
    expect(summariseProgress(days, new Date('2026-12-02T08:00:00Z')).streakDays).toBe(0);
  });
});
