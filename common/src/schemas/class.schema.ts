import { array, boolean, object, string, type InferType } from 'yup';
import { emailField } from './auth.schema.js';

/** Class codes: 6 characters from an alphabet without look-alikes (no 0/O, 1/I/L). */
export const classCodeAlphabet = '23456789ABCDEFGHJKMNPQRSTUVWXYZ';
export const classCodePattern = /^[23456789ABCDEFGHJKMNPQRSTUVWXYZ]{6}$/;

export const createClassSchema = object({
  name: string().trim().min(2).max(80).required(),
});
export type CreateClassInput = InferType<typeof createClassSchema>;

export const updateClassSchema = object({
  name: string().trim().min(2).max(80).optional(),
  archived: boolean().optional(),
});
export type UpdateClassInput = InferType<typeof updateClassSchema>;

export const joinClassSchema = object({
  code: string()
    .trim()
    .uppercase()
    .transform((value: string) => value.replace(/[\s-]/g, ''))
    .matches(classCodePattern, { name: 'code', message: 'a class code is 6 letters and digits' })
    .required(),
});
export type JoinClassInput = InferType<typeof joinClassSchema>;

export const inviteStudentsSchema = object({
  emails: array(emailField()).min(1).max(50).required(),
});
export type InviteStudentsInput = InferType<typeof inviteStudentsSchema>;
