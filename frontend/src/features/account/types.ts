import type { SessionUser } from '@/lib/auth-store';

/** `GET /api/auth/me`: the signed-in person with their own settings. */
export type Profile = SessionUser & {
  /** Whether the weekly progress e-mail is sent (on by default). */
  weeklyDigest: boolean;
};
