import { date, object, string, type InferType } from 'yup';

export const createAssignmentSchema = object({
  classId: string().uuid().required(),
  drillId: string().uuid().required(),
  dueAt: date().required(),
  note: string().trim().max(1000).default(''),
});
export type CreateAssignmentInput = InferType<typeof createAssignmentSchema>;

export const updateAssignmentSchema = object({
  dueAt: date().optional(),
  note: string().trim().max(1000).optional(),
});
export type UpdateAssignmentInput = InferType<typeof updateAssignmentSchema>;
