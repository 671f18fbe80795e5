import { boolean, number, object, string, type InferType } from 'yup';

/** The form fields that come with an uploaded photo (multipart). */
export const createAttemptSchema = object({
  /** For practice: the drill. For an assignment, the assignment decides the drill. */
  drillId: string().uuid().optional(),
  assignmentId: string().uuid().optional(),
}).test('drill-or-assignment', 'say which drill or assignment the photo is for', (v) => Boolean(v.drillId || v.assignmentId));
export type CreateAttemptInput = InferType<typeof createAttemptSchema>;

/** A teacher's mark over the machine's: score and pass/fail, with a comment for the student. */
export const overrideMarkSchema = object({
  score: number().integer().min(0).max(100).required(),
  pass: boolean().required(),
  comment: string().trim().max(2000).default(''),
});
export type OverrideMarkInput = InferType<typeof overrideMarkSchema>;
