import { describe, expect, it } from '@jest/globals';
import { BadRequestException } from '@nestjs/common';
import { number, object, string } from 'yup';
import { SchemaValidationPipe } from './schema-validation.pipe';

describe('SchemaValidationPipe', () => {
  const pipe = new SchemaValidationPipe(
    object({ name: string().trim().min(2).required(), steps: number().integer().min(2).max(9).default(5) }),
  );

  it('should return the cast value with defaults and without unknown keys', async () => {
    await expect(pipe.transform({ name: '  Value ladder ', isAdmin: true })).resolves.toEqual({ name: 'Value ladder', steps: 5 });
  });

  it('should reject with a 400 that names every bad field', async () => {
    const error = await pipe.transform({ name: 'x', steps: 12 }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(BadRequestException);
    expect((error as BadRequestException).getResponse()).toMatchObject({
      code: 'validation_failed',
      details: { name: 'min', steps: 'max' },
    });
  });

  it('should store SQL-looking text as plain text', async () => {
    await expect(pipe.transform({ name: "Robert'); DROP TABLE drills;--" })).resolves.toMatchObject({
      name: "Robert'); DROP TABLE drills;--",
    });
  });
});
