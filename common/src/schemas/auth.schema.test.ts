import { describe, expect, it } from 'vitest';
import { ValidationError } from 'yup';
import { profileUpdateSchema } from './auth.schema.js';
import { validationDetails } from './validation-details.js';

async function detailsOf(value: unknown): Promise<Record<string, string>> {
  try {
    await profileUpdateSchema.validate(value, { abortEarly: false, stripUnknown: true });
  } catch (error) {
    if (error instanceof ValidationError) return validationDetails(error);
    throw error;
  }
  throw new Error('expected the value to be refused');
}

describe('profileUpdateSchema', () => {
  it('should accept either field alone and trim the display name', async () => {
    await expect(profileUpdateSchema.validate({ weeklyDigest: false })).resolves.toEqual({ weeklyDigest: false });
    await expect(profileUpdateSchema.validate({ displayName: '  Ines Varga ' })).resolves.toEqual({ displayName: 'Ines Varga' });
  });

  it('should refuse an empty body, also one whose only key is unknown', async () => {
    expect(await detailsOf({})).toEqual({ '': 'profile-empty' });
    expect(await detailsOf({ weekly_digest: false })).toEqual({ '': 'profile-empty' });
  });

  it('should refuse a blank name and a weekly digest that is not a boolean', async () => {
    expect(await detailsOf({ displayName: '   ', weeklyDigest: 'no' })).toEqual({ displayName: 'min', weeklyDigest: 'typeError' });
    expect(await detailsOf({ displayName: 'x'.repeat(81) })).toEqual({ displayName: 'max' });
  });
});
