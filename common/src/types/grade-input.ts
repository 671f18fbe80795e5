import type { Target, Tolerance } from './drill.js';
import type { Reading } from './reading.js';

/** What every grade function takes: the drill's targets and tolerance, the attempt's readings. */
export type GradeInput = {
  targets: Target[];
  /** Readings in window order (see docs/grading.md for each kind's layout). */
  readings: Reading[];
  /** The drill's limits; unset ones take the kind's defaults (`defaultTolerances`). */
  tolerance?: Partial<Tolerance>;
};
