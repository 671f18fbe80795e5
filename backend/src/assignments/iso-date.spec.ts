import { describe, expect, it } from '@jest/globals';
import { IsoDate } from './iso-date';

describe('IsoDate', () => {
  it('should be the Date of its milliseconds and serialise as the text it was given', () => {
    const when = new Date('2026-11-26T07:34:23.535Z');
    const date = new IsoDate(when.getTime(), when.toISOString());
    expect(date).toBeInstanceOf(Date);
    expect(date.getTime()).toBe(when.getTime());
    expect(JSON.stringify({ date })).toBe(JSON.stringify({ date: when }));
    expect(new Date(date).toISOString()).toBe(when.toISOString());
  });
});
