import { object, string } from 'yup';
import { describe, expect, it } from 'vitest';
import { lazyYupResolver } from './lazy-resolver';

type Values = { email: string };
const options = { fields: {}, shouldUseNativeValidation: false } as const;

describe('lazyYupResolver', () => {
  it('should check with the schema once it has loaded, loading it only once', async () => {
    let loads = 0;
    const resolver = lazyYupResolver<Values>(async () => {
      loads += 1;
      return object({ email: string().email().required() });
    });
    const bad = await resolver({ email: 'not-an-address' }, undefined, options);
    expect(bad.errors).toMatchObject({ email: { type: 'email' } });
    const good = await resolver({ email: 'pip@example.test' }, undefined, options);
    expect(good).toEqual({ values: { email: 'pip@example.test' }, errors: {} });
    expect(loads).toBe(1);
  });

  it('should give the form a root error in words when the checks cannot load, and try again next time', async () => {
    let loads = 0;
    const resolver = lazyYupResolver<Values>(async () => {
      loads += 1;
      if (loads === 1) throw new TypeError('Failed to fetch dynamically imported module');
      return object({ email: string().required() });
    });
    const first = await resolver({ email: '' }, undefined, options);
    expect(first.errors).toMatchObject({
      root: { type: 'network_error', message: expect.stringMatching(/cannot reach its server/) },
    });
    const second = await resolver({ email: '' }, undefined, options);
    expect(second.errors).toMatchObject({ email: { type: 'required' } });
  });
});
