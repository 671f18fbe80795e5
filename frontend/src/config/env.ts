import { object, string, ValidationError } from 'yup';

const schema = object({
  /** Where the API lives; the app and the API share an origin by default. */
  VITE_APP_API_URL: string().default('/api'),
});

function readEnv() {
  try {
    return schema.validateSync(import.meta.env, { abortEarly: false, stripUnknown: true });
  } catch (error) {
    if (error instanceof ValidationError) {
      throw new Error(`Invalid app settings:\n${error.errors.map((e) => `  - ${e}`).join('\n')}`);
    }
    throw error;
  }
}

export const env = readEnv();
