import type { HueNeighbour } from '../colour/attributes/compare-colours.js';

/**
 * Mixmark's own wording for the fixes a painter makes. Watercolour first (water makes a
 * mix lighter), with the gouache / acrylic way in brackets (white makes it lighter).
 */
export const words = {
  tooLight: 'too light: use less water or more pigment (in gouache or acrylic, less white)',
  tooDark: 'too dark: thin it with more water (in gouache or acrylic, a little white)',
  tooIntense: 'too intense: grey it with a touch of its complement',
  tooDull: 'too dull: mix it from fewer paints, with less of the complement',
} as const;

/** The opponent of each CIELAB half-axis: what neutralises a cast of that hue. */
export const castRemedy: Record<HueNeighbour, string> = {
  yellow: 'a touch of violet or blue',
  red: 'a touch of green',
  green: 'a touch of red',
  blue: 'a touch of orange',
};

/** The neighbour on the other side of a hue: where to turn a hue that went astray. */
export const oppositeNeighbour = (lean: HueNeighbour, targetHue: number): HueNeighbour => {
  const order: HueNeighbour[] = ['red', 'yellow', 'green', 'blue'];
  const below = order[Math.floor(targetHue / 90) % 4];
  const above = order[(Math.floor(targetHue / 90) + 1) % 4];
  if (lean === above) return below;
  if (lean === below) return above;
  // The hue went past a neighbour: turn it back toward the target's other side.
  return order[(order.indexOf(lean) + 2) % 4];
};
