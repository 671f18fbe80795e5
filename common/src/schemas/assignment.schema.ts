import { date, object, string, type InferType } from 'yup';

/**
 * How far in the past a new assignment's due time may lie and still count as "now" (Mixmark's
 * choice): a minute covers the request's way to the server and a small difference between the
 * teacher's clock and the server's, while a date already passed (every student late at once) is
 * refused.
 */
export const dueAtGraceMs = 60_000;

export const createAssignmentSchema = object({
  classId: string().uuid().required(),
  drillId: string().uuid().required(),
  // Only on creating: an existing assignment's due date may be moved anywhere (updateAssignmentSchema).
  dueAt: date()
    .required()
    .test('future', 'this due date has passed: choose a due date and time from now on', (value) => !value || value.getTime() >= Date.now() - dueAtGraceMs),
  note: string().trim().max(1000).default(''),
});
export type CreateAssignmentInput = InferType<typeof createAssignmentSchema>;

export const updateAssignmentSchema = object({
  dueAt: date().optional(),
  note: string().trim().max(1000).optional(),
});
export type UpdateAssignmentInput = InferType<typeof updateAssignmentSchema>;
