import { describe, expect, it } from 'vitest';
import { lchToLab } from '../colour/lab/lab-lch.js';
import { seededRandom } from '../colour/fixtures/seeded-random.js';
import type { Lab } from '../types/colour.js';
import { gradeMatch } from './grade-match.js';

const target: Lab = lchToLab({ L: 60, C: 45, h: 60 }); // an orange
const grade = (reading: Lab, deltaE?: number) =>
  gradeMatch({ targets: [{ lab: target }], readings: [{ lab: reading }], tolerance: { deltaE } });
const texts = (m: ReturnType<typeof grade>) => m.feedback.map((f) => f.text).join(' | ');

describe('gradeMatch', () => {
  it('should pass a reading equal to the target with score 100 and praise only', () => {
    const mark = grade(target);
    expect(mark.pass).toBe(true);
    expect(mark.score).toBe(100);
    expect(mark.targets[0].deltaE).toBe(0);
    expect(mark.feedback.every((f) => f.severity === 'praise')).toBe(true);
    expect(texts(mark)).toContain('threshold of notice');
  });

  it('should tell a lighter reading it is too light, with the numbers', () => {
    const mark = grade({ ...target, L: 68 });
    expect(mark.pass).toBe(false);
    const line = mark.feedback.find((f) => f.topic === 'lightness')!;
    expect(line.text).toMatch(/^Too light: use less water or more pigment/);
    expect(line.severity).toBe('fix');
    expect(line.numbers).toContain('L* 68.0 vs 60.0');
    expect(line.numbers).toContain('ΔL′ +8.0');
  });

  it('should tell a darker reading it is too dark', () => {
    expect(texts(grade({ ...target, L: 52 }))).toMatch(/Too dark: thin it with more water/);
  });

  it('should tell a more chromatic reading it is too intense and a greyed one too dull', () => {
    expect(texts(grade(lchToLab({ L: 60, C: 60, h: 60 })))).toContain(
      'Too intense: grey it with a touch of its complement',
    );
    expect(texts(grade(lchToLab({ L: 60, C: 30, h: 60 })))).toContain('Too dull');
  });

  it('should say a yellower orange is too cool, turned toward yellow, warm it with a red-leaning paint', () => {
    const mark = grade(lchToLab({ L: 60, C: 45, h: 72 }));
    const hue = mark.feedback.find((f) => f.topic === 'hue')!;
    expect(hue.text).toBe(
      'Too cool: the hue has turned toward yellow; warm it with a touch of a paint that leans red',
    );
    expect(hue.numbers).toMatch(/Δh′ \+12\.0°/);
  });

  it('should order the feedback by the largest ΔE00 term first', () => {
    // Much too light, a little too dull.
    const mark = grade(lchToLab({ L: 70, C: 41, h: 60 }));
    const topics = mark.feedback.filter((f) => f.topic !== 'overall').map((f) => f.topic);
    expect(topics[0]).toBe('lightness');
  });

  it('should pass exactly while ΔE00 ≤ tolerance (sweep of lightness)', () => {
    const outcomes = new Set<boolean>();
    for (let L = 60; L <= 66; L += 0.05) {
      const mark = grade({ ...target, L });
      expect(mark.pass).toBe(mark.targets[0].deltaE <= 3);
      // The score is rounded, so 70 also covers ΔE00 a hair above the limit (≤ 3.04).
      if (mark.pass) expect(mark.score).toBeGreaterThanOrEqual(70);
      if (mark.score >= 70) expect(mark.targets[0].deltaE).toBeLessThan(3.04);
      outcomes.add(mark.pass);
    }
    expect([...outcomes].sort()).toEqual([false, true]);
  });

  it('should grade each target of a multi-swatch match and name the swatch', () => {
    const other = lchToLab({ L: 40, C: 30, h: 250 });
    const mark = gradeMatch({
      targets: [{ lab: target }, { lab: other }],
      readings: [{ lab: target }, { lab: { ...other, L: 46 } }],
    });
    expect(mark.targets.map((t) => t.pass)).toEqual([true, false]);
    expect(mark.pass).toBe(false);
    expect(mark.score).toBe(Math.round((mark.checks[0].score + mark.checks[1].score) / 2));
    expect(texts(mark)).toContain('Swatch 2: too light');
  });

  it('should never score higher for a reading further from the target (seeded property)', () => {
    const random = seededRandom(99);
    for (let n = 0; n < 500; n++) {
      const dir = { L: random() - 0.5, a: random() - 0.5, b: random() - 0.5 };
      const at = (k: number) => ({
        L: target.L + k * dir.L,
        a: target.a + k * dir.a,
        b: target.b + k * dir.b,
      });
      const near = grade(at(2));
      const far = grade(at(8));
      expect(far.targets[0].deltaE).toBeGreaterThan(near.targets[0].deltaE);
      expect(far.score).toBeLessThanOrEqual(near.score);
    }
  });
});
