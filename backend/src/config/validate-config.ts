import { ValidationError, type AnyObject, type ObjectSchema } from 'yup';

/**
 * Validates a slice of `process.env` against a yup schema at start-up and fails fast with the
 * whole list of what is wrong, one line per variable, so a misconfigured server never half-starts.
 */
export function validateConfig<T extends AnyObject>(
  schema: ObjectSchema<T>,
  env: Record<string, string | undefined>,
): T {
  try {
    return schema.validateSync(env, { abortEarly: false, stripUnknown: true }) as T;
  } catch (error) {
    if (error instanceof ValidationError) {
      const lines = error.errors.map((line) => `  - ${line}`).join('\n');
      throw new Error(`Invalid configuration:\n${lines}`);
    }
    throw error;
  }
}
