import { describe, expect, it } from 'vitest';
import { formatHex, parseHex } from './parse-hex.js';

describe('parseHex', () => {
  it.each([
    ['#cc9966', { r: 204, g: 153, b: 102 }],
    ['CC9966', { r: 204, g: 153, b: 102 }],
    ['#C96', { r: 204, g: 153, b: 102 }],
    [' #000000 ', { r: 0, g: 0, b: 0 }],
    ['#FFFFFF', { r: 255, g: 255, b: 255 }],
  ])('should read %s', (text, rgb8) => {
    expect(parseHex(text)).toEqual(rgb8);
  });

  it.each(['', '#', '#12', '#1234', '#12345g', 'teal', '#cc99661', 'rgb(1,2,3)'])(
    'should return undefined for %j',
    (text) => {
      expect(parseHex(text)).toBeUndefined();
    },
  );
});

describe('formatHex', () => {
  it('should write lower-case #rrggbb, clipping and rounding', () => {
    expect(formatHex({ r: 204, g: 153, b: 102 })).toBe('#cc9966');
    expect(formatHex({ r: -3, g: 300, b: 15.4 })).toBe('#00ff0f');
  });
});
