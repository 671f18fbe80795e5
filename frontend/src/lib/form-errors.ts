import type { FieldError, FieldPath, FieldValues, UseFormSetError } from 'react-hook-form';
import { toApiError } from './api-client';
import { errorMessage, fieldMessage } from './error-words';

/**
 * Puts a 400 reply's `details` ({ field: code }) beside the form's fields. Returns the sentence
 * for the whole form when no field takes the error (or when there are no details).
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly string[],
): string | undefined {
  const apiError = toApiError(error);
  const details = apiError.details ?? {};
  let placed = 0;
  for (const [path, code] of Object.entries(details)) {
    const root = path.split('.')[0];
    if (!fields.includes(root)) continue;
    setError(path as FieldPath<T>, { type: code, message: fieldMessage(path, code) });
    placed += 1;
  }
  return placed > 0 && placed === Object.keys(details).length ? undefined : errorMessage(error);
}

/** The helper text for a field: our words for its code, else the check's own message. */
export function fieldHelp(path: string, error: FieldError | undefined): string | undefined {
  if (!error) return undefined;
  return fieldMessage(path, error.type, error.message);
}
