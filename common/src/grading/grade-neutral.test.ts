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

  it('should pass a faint cast within the chroma limit but mention it', () => {
    const mark = grade({ L: 50, a: 2, b: 2 });
    expect(mark.pass).toBe(true);
    expect(mark.feedback.some((f) => f.severity === 'tip' && f.text.includes('faint'))).toBe(true);
  });

  it('should fail a grey of the wrong value', () => {
    const mark = grade({ L: 58, a: 0, b: 0 });
    expect(mark.checks.find((c) => c.name === 'value')!.pass).toBe(false);
    expect(mark.feedback[0].text).toMatch(/^Too light/);
  });
});
