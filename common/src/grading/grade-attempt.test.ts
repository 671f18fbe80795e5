import { describe, expect, it } from 'vitest';
import { drillKinds } from '../types/drill.js';
import { gradeAttempt, gradeInputProblems, gradersByKind } from './grade-attempt.js';
import { gradeMatch } from './grade-match.js';

const lab = { L: 50, a: 0, b: 0 };

describe('gradeAttempt', () => {
  it('should have a grade function for every drill kind', () => {
    for (const kind of drillKinds) expect(typeof gradersByKind[kind]).toBe('function');
  });

  it('should dispatch to the kind’s grade function', () => {
    const input = { targets: [{ lab }], readings: [{ lab: { L: 55, a: 0, b: 0 } }] };
    expect(gradeAttempt('match', input)).toEqual(gradeMatch(input));
  });

  it.each([
    [
      'temperature-pair',
      { targets: [{ lab }], readings: [{ lab }] },
      'readings: expected 2 but received 1',
    ],
    [
      'value-ladder',
      { targets: [{ lab }, { lab }], readings: [{ lab }, { lab }] },
      'targets: expected at least 3 but received 2',
    ],
    ['match', { targets: [{ lab }], readings: [] }, 'readings: expected 1 but received 0'],
    [
      'graded-wash',
      { targets: [{ lab }, { lab }], readings: [{ lab }] },
      'readings[0].profile: a graded wash needs at least 3 profile slices',
    ],
    [
      'match',
      { targets: [{ lab: { L: Number.NaN, a: 0, b: 0 } }], readings: [{ lab }] },
      'targets[0].lab: not a finite Lab',
    ],
    [
      'match',
      { targets: [{ lab }], readings: [{ lab }], tolerance: { deltaE: 0 } },
      'tolerance.deltaE: expected a positive number but received 0',
    ],
  ] as const)('should reject a bad %s input: %s', (kind, input, problem) => {
    expect(gradeInputProblems(kind, input as never)).toContain(problem);
    expect(() => gradeAttempt(kind, input as never)).toThrow(RangeError);
  });

  it('should find no problems in a well-formed input of each kind', () => {
    const profile = [80, 70, 60, 50];
    const inputs = {
      match: { targets: [{ lab }], readings: [{ lab }] },
      'value-ladder': {
        targets: [{ lab }, { lab }, { lab }],
        readings: [{ lab }, { lab }, { lab }],
      },
      'temperature-pair': { targets: [{ lab }], readings: [{ lab }, { lab }] },
      neutral: { targets: [{ lab }], readings: [{ lab }] },
      'graded-wash': { targets: [{ lab }, { lab }], readings: [{ lab, profile }] },
      'flat-wash': { targets: [{ lab }], readings: [{ lab }] },
    };
    for (const kind of drillKinds) expect(gradeInputProblems(kind, inputs[kind])).toEqual([]);
  });
});
