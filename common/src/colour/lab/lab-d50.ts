import type { Lab } from '../../types/colour.js';
import { D50 } from '../constants.js';
import { xyzD50ToD65, xyzD65ToD50 } from '../xyz/bradford.js';
import { labToXyz } from './convert-lab-to-xyz.js';
import { xyzToLab } from './convert-xyz-to-lab.js';

/**
 * Mixmark's D65 CIELAB to D50 CIELAB (the ICC / print convention) through the
 * Bradford transform. Only for exchange: grading always uses D65 Lab.
 *
 * @param lab - Lab relative to D65
 * @returns Lab relative to D50
 * @example
 * labD65ToD50({ L: 42.009163, a: -0.145938, b: -32.845134 }); // ≈ { L: 41.5208, a: -4.5731, b: -33.4942 }
 */
export function labD65ToD50(lab: Lab): Lab {
  return xyzToLab(xyzD65ToD50(labToXyz(lab)), D50);
}

/**
 * D50 CIELAB to Mixmark's D65 CIELAB (Bradford).
 *
 * @param lab - Lab relative to D50
 * @returns Lab relative to D65
 * @example
 * labD50ToD65({ L: 41.520824, a: -4.57309, b: -33.494195 }); // ≈ { L: 42.0092, a: -0.1459, b: -32.8451 }
 */
export function labD50ToD65(lab: Lab): Lab {
  return xyzToLab(xyzD50ToD65(labToXyz(lab, D50)));
}
