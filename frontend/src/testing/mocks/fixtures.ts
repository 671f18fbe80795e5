import type { Mark } from '@mixmark/common';

/** A graded attempt as `GET /api/attempts/:id` answers it (invented data). */
export const gradedMark: Mark = {
  kind: 'match',
  score: 92,
  pass: true,
  targets: [
    {
      index: 0,
      target: { L: 52, a: 28, b: 40 },
      reading: { L: 54.1, a: 27.2, b: 37.5 },
      deltaE: 2.3,
      parts: {
        deltaE: 2.3,
        deltaLPrime: 2.1,
        deltaCPrime: -2.5,
        deltaHPrime: 0.4,
        deltahPrime: 0.5,
        lightnessTerm: 1.9,
        chromaTerm: -1.0,
        hueTerm: 0.3,
        rotationTerm: 0,
      } as never,
      judgement: {
        lightness: 'lighter',
        temperature: 'same',
        intensity: 'less-intense',
        hueLean: undefined,
        numbers: { deltaE: 2.3, deltaL: 2.1, deltaC: -2.5, deltaHue: 0.5, deltaWarmCool: -0.02, lightnessTerm: 1.9, chromaTerm: -1, hueTerm: 0.3 },
      },
      score: 92,
      pass: true,
    },
  ],
  checks: [{ name: 'colour', value: 2.3, limit: 5, unit: 'ΔE00', score: 92, pass: true }],
  feedback: [
    { topic: 'lightness', severity: 'tip', text: 'A touch light: a little less water.', numbers: 'L* 54.1 vs 52.0 target (ΔL′ +2.1)' },
    { topic: 'overall', severity: 'praise', text: 'A close match.', numbers: 'ΔE00 2.3 (pass ≤ 5)' },
  ],
};

export function attemptReply(overrides: Record<string, unknown> = {}) {
  return {
    id: '11111111-1111-4111-8111-111111111111',
    drill: { id: '22222222-2222-4222-8222-222222222222', title: 'Burnt sienna match', kind: 'match' },
    assignmentId: null,
    student: { id: '33333333-3333-4333-8333-333333333333', displayName: 'Pip Lindqvist' },
    state: 'graded',
    quality: { errors: [], warnings: [] },
    failureReason: null,
    readings: [{ lab: { L: 54.1, a: 27.2, b: 37.5 } }],
    mark: gradedMark,
    score: 92,
    pass: true,
    machine: { score: 92, pass: true },
    override: null,
    photoBytes: 123456,
    hasOverlay: false,
    createdAt: '2025-03-10T10:00:00.000Z',
    gradedAt: '2025-03-10T10:00:05.000Z',
    ...overrides,
  };
}
