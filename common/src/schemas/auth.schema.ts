import { boolean, object, string, type InferType } from 'yup';

/** E-mail addresses are compared lower-cased and trimmed everywhere. */
export const emailField = () => string().trim().lowercase().email().max(254).required();

/** At least 10 characters: long enough to resist guessing, short enough to type on a phone. */
export const passwordField = () => string().min(10).max(200).required();

export const registerSchema = object({
  email: emailField(),
  password: passwordField(),
  displayName: string().trim().min(1).max(80).required(),
  /** Teachers run classes; students (and self-learners) practise. Admins are made, not registered. */
  role: string().oneOf(['teacher', 'student'] as const).required(),
});
export type RegisterInput = InferType<typeof registerSchema>;

export const signInSchema = object({
  email: emailField(),
  password: string().max(200).required(),
});
export type SignInInput = InferType<typeof signInSchema>;

export const passwordResetRequestSchema = object({ email: emailField() });
export type PasswordResetRequestInput = InferType<typeof passwordResetRequestSchema>;

export const passwordResetSchema = object({
  token: string().trim().min(20).max(200).required(),
  password: passwordField(),
});
export type PasswordResetInput = InferType<typeof passwordResetSchema>;

export const updateRoleSchema = object({
  role: string().oneOf(['admin', 'teacher', 'student'] as const).required(),
});
export type UpdateRoleInput = InferType<typeof updateRoleSchema>;

/**
 * The signed-in person's own settings (`PATCH /api/auth/me`): the name shown to teachers and
 * classmates, and whether the weekly progress digest is e-mailed. Either field may be left out;
 * a body with neither is refused (`details: { '': 'profile-empty' }`), so that a misspelt key
 * (stripped as unknown) cannot pass for a saved change.
 */
export const profileUpdateSchema = object({
  displayName: string().trim().min(1).max(80).optional(),
  weeklyDigest: boolean().strict().optional(),
}).test(
  'profile-empty',
  'change the display name, the weekly digest, or both',
  (v) => v.displayName !== undefined || v.weeklyDigest !== undefined,
);
export type ProfileUpdate = InferType<typeof profileUpdateSchema>;
