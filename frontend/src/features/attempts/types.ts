import type { AttemptState, AttemptView, QualityReport } from '@mixmark/common';

export type { AttemptState, QualityReport };

/** The API's attempt (one definition, in common) as it arrives over JSON: dates as strings. */
export type Attempt = Omit<AttemptView, 'createdAt' | 'gradedAt' | 'override'> & {
  createdAt: string;
  gradedAt: string | null;
  override: (Omit<NonNullable<AttemptView['override']>, 'at'> & { at: string }) | null;
};

/** Still with the server: keep asking. */
export const isPending = (state: AttemptState) => state === 'queued' || state === 'measuring';
