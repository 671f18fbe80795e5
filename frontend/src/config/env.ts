/**
 * The app's build-time settings (`VITE_APP_*`), checked once at start with a readable list of
 * problems. There is one setting, so it is checked here by hand: a yup schema for it would put
 * yup (~12 KB gzip) in the first download of every page, the public ones included, which
 * otherwise validate nothing until a form is used (see `lib/lazy-resolver.ts`).
 */
export type AppEnv = {
  /** Where the API lives; the app and the API share an origin by default. */
  VITE_APP_API_URL: string;
};

export function readEnv(source: Record<string, unknown>): AppEnv {
  const problems: string[] = [];
  const apiUrl = source.VITE_APP_API_URL ?? '/api';
  if (typeof apiUrl !== 'string' || !/^(\/|https?:\/\/)/.test(apiUrl)) {
    problems.push('VITE_APP_API_URL must be a path (/api) or an http(s) address');
  }
  if (problems.length > 0) {
    throw new Error(`Invalid app settings:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
  }
  return { VITE_APP_API_URL: apiUrl as string };
}

export const env = readEnv(import.meta.env);
