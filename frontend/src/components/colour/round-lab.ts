import type { Lab } from '@mixmark/common';

/** One decimal, as the L*, a*, b* fields take a measured reading. */
export const roundLab = ({ L, a, b }: Lab): Lab => ({
  L: +L.toFixed(1),
  a: +a.toFixed(1),
  b: +b.toFixed(1),
});
