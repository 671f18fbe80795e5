import type { Lab } from '../../types/colour.js';

const rad = Math.PI / 180;

/**
 * The warm–cool index of Ou, Luo, Woodcock & Wright, "A study of colour emotion and colour
 * preference. Part I: Colour emotions for single colours", Color Res. Appl. 29(3):232–240
 * (2004): WC = −0.5 + 0.02·(C*)^1.07·cos(h − 50°), on CIELAB (C*ab, hab). Positive is warm,
 * negative cool; warmest along h = 50° (a red-orange), coolest at h = 230° (a cyan-blue),
 * and every neutral scores −0.5.
 *
 * @param lab - CIELAB (D65)
 * @returns the index WC (unbounded; about −2 … 2 for surface colours)
 * @example
 * warmCoolIndex({ L: 50, a: 0, b: 0 }); // -0.5
 */
export function warmCoolIndex({ a, b }: Lab): number {
  const C = Math.sqrt(a * a + b * b);
  if (C === 0) return -0.5;
  // cos(h − 50°) = (a·cos50° + b·sin50°) / C, without computing h.
  const cosine = (a * Math.cos(50 * rad) + b * Math.sin(50 * rad)) / C;
  return -0.5 + 0.02 * C ** 1.07 * cosine;
}
