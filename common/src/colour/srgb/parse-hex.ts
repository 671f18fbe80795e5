import type { RGB8 } from '../../types/colour.js';

const hexPattern = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i;

/**
 * Parses a CSS-style hex colour (`#rgb` or `#rrggbb`, `#` optional, any case).
 *
 * @param hex - the text to parse
 * @returns the 8-bit channels, or `undefined` when the text is not a hex colour
 * @example
 * parseHex('#C96'); // { r: 204, g: 153, b: 102 }
 * parseHex('teal'); // undefined
 */
export function parseHex(hex: string): RGB8 | undefined {
  const match = hexPattern.exec(hex.trim());
  if (!match) return undefined;
  let digits = match[1];
  if (digits.length === 3) digits = digits.replace(/./g, (d) => d + d);
  const n = Number.parseInt(digits, 16);
  return { r: (n >> 16) & 255, g: (n >> 8) & 255, b: n & 255 };
}

/**
 * Formats 8-bit RGB as a lower-case `#rrggbb` string. Channels are clipped to 0..255
 * and rounded.
 *
 * @param rgb8 - channels 0..255
 * @returns the hex string
 * @example
 * formatHex({ r: 204, g: 153, b: 102 }); // '#cc9966'
 */
export function formatHex({ r, g, b }: RGB8): string {
  const h = (v: number): string =>
    Math.round(Math.min(255, Math.max(0, v)))
      .toString(16)
      .padStart(2, '0');
  return `#${h(r)}${h(g)}${h(b)}`;
}
