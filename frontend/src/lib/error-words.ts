import type { ApiError } from '@mixmark/common';
import { toApiError } from './api-client';

/**
 * Words for the API's error codes where the server's own sentence is not the best thing to show
 * a painter (the rest already come as sentences a person can act on).
 */
const codeWords: Record<string, string> = {
  network_error: 'Mixmark cannot reach its server. Check your connection and try again.',
  too_many_requests: 'Too many tries in a short time. Wait a minute, then try again.',
  forbidden: 'Your account cannot do this.',
  payload_too_large:
    'This file is too large to send. Take the photo at a lower resolution, or choose a smaller file.',
  internal_error: 'Something went wrong on the server. Please try again in a moment.',
  unexpected_reply: 'The server gave an answer Mixmark did not expect. Please try again.',
};

/** The sentence to show for a failed request. */
export function errorMessage(error: unknown): string {
  const apiError: ApiError = toApiError(error);
  return codeWords[apiError.code] ?? apiError.message;
}

/** Words for validation codes, field by field first, then for any field. */
const fieldWords: Record<string, Record<string, string>> = {
  email: {
    required: 'Enter an e-mail address.',
    email: 'This does not look like an e-mail address (name@example.org).',
    taken: 'An account already uses this address. Sign in, or reset the password.',
  },
  password: { required: 'Enter a password.', min: 'Use at least 10 characters.' },
  displayName: {
    required: 'Enter the name others will see.',
    min: 'Enter the name others will see.',
    max: 'Use at most 80 characters.',
  },
  role: { required: 'Choose teacher or student.' },
  code: {
    required: 'Enter the class code.',
    code: 'A class code is 6 letters and digits, such as K7M2QX.',
    unknown: 'No open class has this code. Check it with your teacher.',
  },
  name: { required: 'Give the class a name.', min: 'Use at least 2 characters.' },
  title: { required: 'Give the drill a title.', min: 'Use at least 2 characters.' },
  hex: { hex: 'A hex colour is # and 6 digits 0–9, a–f, such as #8a5a3c.' },
  pigment: { pigment: 'A Colour Index code, such as PB29 or PR209.' },
  photo: {
    required: 'Choose a photo of your swatch with the card.',
  },
};

const anyFieldWords: Record<string, string> = {
  required: 'This is needed.',
  min: 'This is too short.',
  max: 'This is too long.',
  email: 'This does not look like an e-mail address.',
  typeError: 'Enter a number.',
  oneOf: 'Choose one of the options.',
  count: 'This drill kind takes a different number of targets.',
};

/**
 * The words for one field's validation code, from the form's own checks or from a 400 reply's
 * `details`. The last part of a dotted path names the field (`targets.0.hex` → `hex`).
 */
export function fieldMessage(path: string, code: string | undefined, fallback?: string): string {
  const field = path.split('.').pop() ?? path;
  const key = code === 'optionality' ? 'required' : (code ?? 'invalid');
  return fieldWords[field]?.[key] ?? anyFieldWords[key] ?? fallback ?? 'Check this value.';
}

/** A schema's own message ("a value-ladder drill takes 3 to 9 targets") as a sentence. */
export function schemaSentence(message: string | undefined): string | undefined {
  const text = message?.trim();
  if (!text) return undefined;
  const capital = text.charAt(0).toUpperCase() + text.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}
