/**
 * The one JSON error shape every API error has, on both sides of the wire.
 * `code` is stable and machine-readable; `message` is a sentence a person can act on;
 * `details` maps a field (dot path) to a validation code, for forms to show beside the field.
 */
export interface ApiError {
  statusCode: number;
  code: string;
  message: string;
  details?: Record<string, string>;
}

/** Error codes shared by the API and the app (quality gates of the photo pipeline add their own). */
export const apiErrorCodes = [
  'validation_failed',
  'unauthorized',
  'forbidden',
  'not_found',
  'conflict',
  'payload_too_large',
  'unsupported_media_type',
  'too_many_requests',
  'service_unavailable',
  'internal_error',
] as const;

export type ApiErrorCode = (typeof apiErrorCodes)[number];

/** True when a value has the shape of an {@link ApiError}. */
export function isApiError(value: unknown): value is ApiError {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  return (
    typeof v.statusCode === 'number' && typeof v.code === 'string' && typeof v.message === 'string'
  );
}
