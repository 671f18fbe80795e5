import { ValidationError } from 'yup';

/**
 * Flattens a yup ValidationError into `{ field: code }`, the `details` of the API's 400 reply.
 * The code is the failing test's name (`required`, `email`, `min`, ...), so that the app can map
 * it onto the form field and word it for people; the first failure of each field wins.
 *
 * @param error - the error thrown by `schema.validate(value, { abortEarly: false })`
 * @returns a map from field path (`''` for the value as a whole) to a validation code
 * @example validationDetails(err) // { email: 'email', password: 'min' }
 */
export function validationDetails(error: ValidationError): Record<string, string> {
  const details: Record<string, string> = {};
  const failures = error.inner.length > 0 ? error.inner : [error];
  for (const failure of failures) {
    const field = failure.path ?? '';
    // yup 1 names its required/defined checks "optionality"; the API says "required".
    const type = failure.type === 'optionality' ? 'required' : failure.type;
    if (!(field in details)) details[field] = type ?? 'invalid';
  }
  return details;
}
