import { describe, expect, it } from 'vitest';
import { object, string } from 'yup';
import { validationDetails } from './validation-details.js';

describe('validationDetails', () => {
  const schema = object({
    email: string().email().required(),
    name: string().min(2).required(),
  });

  it('should map every failing field to the name of the failed test', async () => {
    const error = await schema
      .validate({ email: 'not-an-address', name: 'x' }, { abortEarly: false })
      .catch((e: unknown) => e);
    expect(validationDetails(error as never)).toEqual({ email: 'email', name: 'min' });
  });

  it('should report a missing field as required', async () => {
    const error = await schema
      .validate({ name: 'Ada' }, { abortEarly: false })
      .catch((e: unknown) => e);
    expect(validationDetails(error as never)).toEqual({ email: 'required' });
  });
});
