import { describe, expect, it } from '@jest/globals';
import type { Lab } from '@mixmark/common';
import type { MeasurementResult } from '../measurement/measure-photo';
import type { WindowReading } from '../measurement/read-window';
import { gradeMeasurement, gradingRetakeMessages } from './grade-photo';

const reading = (window: number, lab: Lab, profile?: number[]): WindowReading => ({
  window,
  lab,
  spread: { L: 0.4, a: 0.3, b: 0.3, deltaE90: 0.8 },
  profile,
  pixels: 4000,
});
const measured = (kind: MeasurementResult['card'] extends infer C ? (C extends { kind: infer K } ? K : never) : never, readings: WindowReading[]): MeasurementResult => ({
  ok: true,
  errors: [],
  warnings: [],
  card: { id: 'card', kind, steps: readings.length, version: 1, markers: [0, 1, 2, 3], corners: [[0, 0], [1, 0], [1, 1], [0, 1]], fitError: 0.5, pixelsPerMm: 10 },
  readings,
});

describe('gradeMeasurement: readings that cannot be graded', () => {
  it('should ask for a retake (READING_INCOMPLETE, naming the window) when a window has no finite reading, instead of throwing', () => {
    const drill = { kind: 'match' as const, targets: [{ lab: { L: 50, a: 10, b: 10 } }, { lab: { L: 60, a: 0, b: 20 } }], tolerance: {} };
    const outcome = gradeMeasurement(drill, measured('match', [reading(1, { L: Number.NaN, a: 0, b: 0 }), reading(0, { L: 50, a: 10, b: 10 })]));
    expect(outcome).toEqual({
      kind: 'needs-retake',
      warnings: [],
      errors: [{ code: 'READING_INCOMPLETE', message: gradingRetakeMessages.READING_INCOMPLETE, window: 1 }],
    });
  });

  it('should ask for a retake when a graded wash has fewer than 3 profile slices', () => {
    const drill = { kind: 'graded-wash' as const, targets: [{ lab: { L: 85, a: 0, b: 5 } }, { lab: { L: 40, a: 0, b: 30 } }], tolerance: {} };
    const outcome = gradeMeasurement(drill, measured('graded-wash', [reading(0, { L: 60, a: 0, b: 15 }, [80, 45])]));
    expect(outcome.kind).toBe('needs-retake');
    if (outcome.kind === 'needs-retake') expect(outcome.errors.map((e) => [e.code, e.window])).toEqual([['READING_INCOMPLETE', 0]]);
  });

  it('should still grade complete readings', () => {
    const drill = { kind: 'match' as const, targets: [{ lab: { L: 50, a: 10, b: 10 } }], tolerance: {} };
    const outcome = gradeMeasurement(drill, measured('match', [reading(0, { L: 50, a: 10, b: 10 })]));
    expect(outcome.kind).toBe('graded');
    if (outcome.kind === 'graded') expect(outcome.mark.pass).toBe(true);
  });

  it("should keep throwing for a problem in the drill's own data (a real fault: retried, then failed)", () => {
    const drill = { kind: 'match' as const, targets: [{ lab: { L: Number.NaN, a: 0, b: 0 } }], tolerance: {} };
    expect(() => gradeMeasurement(drill, measured('match', [reading(0, { L: 50, a: 0, b: 0 })]))).toThrow(/targets\[0\]\.lab/);
  });
});
