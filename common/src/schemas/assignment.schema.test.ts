import { describe, expect, it } from 'vitest';
import { ValidationError } from 'yup';
import { createAssignmentSchema, dueAtGraceMs, updateAssignmentSchema } from './assignment.schema.js';
import { validationDetails } from './validation-details.js';

const ids = { classId: '0b7f6c1e-3f7a-4c56-9a55-1d2a3b4c5d6e', drillId: '5e4d3c2b-1a0f-4e9d-8c7b-6a5f4e3d2c1b' };
const hour = 3_600_000;

async function detailsOf(value: unknown): Promise<Record<string, string>> {
  try {
    await createAssignmentSchema.validate(value, { abortEarly: false });
  } catch (error) {
    if (error instanceof ValidationError) return validationDetails(error);
    throw error;
  }
  throw new Error('expected the assignment to be refused');
}

describe('createAssignmentSchema: due date', () => {
  it('should accept a due date from now on', async () => {
    const dueAt = new Date(Date.now() + 24 * hour).toISOString();
    await expect(createAssignmentSchema.validate({ ...ids, dueAt })).resolves.toMatchObject({ dueAt: new Date(dueAt) });
  });

  it('should refuse a due date already passed, naming the field', async () => {
    expect(await detailsOf({ ...ids, dueAt: new Date(Date.now() - 24 * hour).toISOString() })).toEqual({ dueAt: 'future' });
    // Beyond the minute of grace (Mixmark's choice) for the request's way and clock differences.
    expect(dueAtGraceMs).toBe(60_000);
    expect(await detailsOf({ ...ids, dueAt: new Date(Date.now() - 2 * dueAtGraceMs).toISOString() })).toEqual({ dueAt: 'future' });
    await expect(createAssignmentSchema.validate({ ...ids, dueAt: new Date(Date.now() - 24 * hour) })).rejects.toThrow(
      'this due date has passed: choose a due date and time from now on',
    );
  });

  it('should still let an existing assignment move to any date, the past included', async () => {
    const past = new Date(Date.now() - 24 * hour);
    await expect(updateAssignmentSchema.validate({ dueAt: past.toISOString() })).resolves.toEqual({ dueAt: past });
  });
});
