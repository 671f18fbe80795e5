import { describe, expect, it } from 'vitest';
import { lchToLab } from '../colour/lab/lab-lch.js';
import { gradeTemperaturePair } from './grade-temperature-pair.js';

// A mid green base; warmer = toward yellow (hue angle down toward 50°), cooler = toward blue.
const base = lchToLab({ L: 55, C: 35, h: 150 });
const grade = (
  warm: { L: number; C: number; h: number },
  cool: { L: number; C: number; h: number },
) =>
  gradeTemperaturePair({
    targets: [{ lab: base }],
    readings: [{ lab: lchToLab(warm) }, { lab: lchToLab(cool) }],
  });

describe('gradeTemperaturePair', () => {
  it('should pass a clear warm and cool pair at the base value', () => {
    const mark = grade({ L: 55, C: 35, h: 125 }, { L: 55, C: 35, h: 180 });
    expect(mark.pass).toBe(true);
    expect(mark.score).toBe(100);
    expect(mark.feedback[0].text).toBe('A clear warm and cool pair at one value');
  });

  it('should fail a swapped pair and say which swatch went the wrong way', () => {
    const mark = grade({ L: 55, C: 35, h: 180 }, { L: 55, C: 35, h: 125 });
    expect(mark.pass).toBe(false);
    const texts = mark.feedback.map((f) => f.text);
    expect(texts.some((t) => t.startsWith('The warm swatch is cooler than the base'))).toBe(true);
    expect(texts.some((t) => t.startsWith('The cool swatch is warmer than the base'))).toBe(true);
  });

  it('should fail a pair that moved off the base value', () => {
    const mark = grade({ L: 63, C: 35, h: 125 }, { L: 55, C: 35, h: 180 });
    expect(mark.checks.find((c) => c.name === 'value' && c.swatch === 0)!.pass).toBe(false);
    expect(
      mark.feedback.some((f) => f.text.startsWith('The warm swatch has moved off the base')),
    ).toBe(true);
  });

  it('should fail a pair too alike to tell apart side by side', () => {
    const mark = grade({ L: 55, C: 35, h: 147 }, { L: 55, C: 35, h: 153 });
    expect(mark.checks.find((c) => c.name === 'separation')!.pass).toBe(false);
    expect(mark.feedback.some((f) => f.topic === 'separation')).toBe(true);
  });
});
