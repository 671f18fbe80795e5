import { hexToLab } from '@mixmark/common';
import { describe, expect, it } from 'vitest';
import { convertTarget, entryMode, targetLab } from './target-colour';

describe('target colour entry', () => {
  it('should convert a hex target to Lab and LCh and back to the same hex', () => {
    const lab = convertTarget({ hex: '#8a5a3c' }, 'lab');
    expect(entryMode(lab)).toBe('lab');
    const reference = hexToLab('#8a5a3c')!;
    expect(lab.lab!.L).toBeCloseTo(reference.L, 1);
    const lch = convertTarget(lab, 'lch');
    expect(lch.lch!.C).toBeGreaterThan(20);
    expect(convertTarget(lch, 'hex').hex).toBe('#8a5a3c');
  });

  it('should keep the label when the entry changes', () => {
    expect(convertTarget({ hex: '#777777', label: 'mid grey' }, 'lab')).toEqual({
      label: 'mid grey',
      lab: { L: 50, a: 0, b: 0 },
    });
  });

  it('should read nothing while a number is still being typed', () => {
    expect(targetLab({ lab: { L: Number.NaN, a: 0, b: 0 } })).toBeUndefined();
    expect(targetLab({ hex: '#12' })).toBeUndefined();
  });
});
