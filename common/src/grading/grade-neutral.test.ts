import { describe, expect, it } from 'vitest';
import { gradeNeutral } from './grade-neutral.js';

const target = { L: 50, a: 0, b: 0 };
const grade = (lab: { L: number; a: number; b: number }) =>
  gradeNeutral({ targets: [{ lab: target }], readings: [{ lab }] });

describe('gradeNeutral', () => {
  it('should pass a true grey at the value with score 100', () => {
    const mark = grade(target);
    expect(mark.pass).toBe(true);
    expect(mark.score).toBe(100);
    expect(mark.feedback.map((f) => f.text)).toContain('A true grey, with no cast to see');
  });

  it('should name a warm (yellow) cast and its remedy', () => {
    const mark = grade({ L: 50, a: 1.5, b: 7 });
    expect(mark.pass).toBe(false);
    expect(mark.feedback[0].text).toBe(
      'Still has a yellow cast: neutralise it with a touch of violet or blue',
    );
    expect(mark.feedback[0].numbers).toContain('C* 7.2');
  });

  it('should name a blue cast and a green cast', () => {
    expect(grade({ L: 50, a: 0, b: -6 }).feedback[0].text).toContain(
      'blue cast: neutralise it with a touch of orange',
    );
    expect(grade({ L: 50, a: -6, b: 0 }).feedback[0].text).toContain('green cast');
  });

  it('should pass a grey within the chroma limit without naming a hue for it', () => {
    // C* 2.8 at h 45°: under the default limit of 4, where the hue angle means nothing to the eye.
    const mark = grade({ L: 50, a: 2, b: 2 });
    expect(mark.pass).toBe(true);
    const line = mark.feedback.find((f) => f.topic === 'neutrality')!;
    expect(line.text).toBe('Reads as a grey: its colour is within the limit, too slight to name a cast');
    expect(line.numbers).toContain('C* 2.8');
    for (const f of mark.feedback) expect(f.text).not.toMatch(/red|yellow|green|blue/);
  });

  it('should name no hue for near-zero chroma at any hue angle', () => {
    for (const [a, b] of [[0.6, 0.1], [-0.4, 0.5], [0.05, -0.7]]) {
      const mark = grade({ L: 50, a, b });
      expect(mark.feedback.map((f) => f.text)).toEqual(['A true grey, with no cast to see']);
    }
  });

  it('should name the cast once the chroma is over the drill’s own limit', () => {
    const wide = gradeNeutral({ targets: [{ lab: target }], readings: [{ lab: { L: 50, a: 0, b: 5 } }], tolerance: { maxChroma: 6 } });
    expect(wide.feedback.find((f) => f.topic === 'neutrality')!.text).not.toContain('yellow');
    const narrow = gradeNeutral({ targets: [{ lab: target }], readings: [{ lab: { L: 50, a: 0, b: 5 } }], tolerance: { maxChroma: 3 } });
    expect(narrow.feedback.find((f) => f.topic === 'neutrality')!.text).toBe('Still has a yellow cast: neutralise it with a touch of violet or blue');
  });

  it('should fail a grey of the wrong value', () => {
    const mark = grade({ L: 58, a: 0, b: 0 });
    expect(mark.checks.find((c) => c.name === 'value')!.pass).toBe(false);
    expect(mark.feedback[0].text).toMatch(/^Too light/);
  });
});
