import type { Lab, LabSpread } from './colour.js';

/**
 * The measured colour of one swatch window after colour correction: what the photo
 * pipeline hands to grading. Readings come in the order of the card's windows.
 */
export type Reading = {
  /** CIELAB (D65) of the window's linear-light (trimmed) mean. */
  lab: Lab;
  /** Per-pixel standard deviations of L*, a*, b* inside the window. */
  spread?: LabSpread;
  /** L* along the window's long axis, from its start (left or top) to its end. */
  profile?: number[];
  /** Pixels measured. */
  pixels?: number;
};
