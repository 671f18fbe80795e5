/**
 * The public account forms' schemas, loaded when a form is first used (see
 * `lib/lazy-resolver.ts`): importing this module is what brings yup in.
 */
export {
  passwordResetRequestSchema,
  passwordResetSchema,
  registerSchema,
  signInSchema,
} from '@mixmark/common';
