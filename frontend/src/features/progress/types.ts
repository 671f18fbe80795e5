import type { ProgressSummary } from '@mixmark/common';

export type { WeekProgress } from '@mixmark/common';

/** The progress routes' reply (one definition, in common). */
export type Progress = ProgressSummary;
