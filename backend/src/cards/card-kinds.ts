import type { CardKind } from './card-layout.types';

/** One-letter codes used in the markers' payload (QR alphanumeric mode has no lower case). */
export const cardKindCodes: Record<CardKind, string> = {
  match: 'M',
  neutral: 'N',
  'flat-wash': 'F',
  'temperature-pair': 'T',
  'value-ladder': 'L',
  'graded-wash': 'G',
};

/** Every card kind, in a stable order. */
export const cardKinds = Object.keys(cardKindCodes) as CardKind[];

/** Number of windows a kind has when no step count is given. */
export const defaultSteps: Record<CardKind, number> = {
  match: 1,
  neutral: 1,
  'flat-wash': 1,
  'temperature-pair': 2,
  'value-ladder': 5,
  'graded-wash': 1,
};

/** True when `value` names a card kind. */
export const isCardKind = (value: unknown): value is CardKind =>
  typeof value === 'string' && value in cardKindCodes;

/**
 * The window count for a kind: only value ladders take a step count (2 to 9); the other
 * kinds have a fixed number of windows.
 *
 * @param kind - the drill kind
 * @param steps - requested steps (value-ladder only)
 * @returns the number of windows
 * @throws Error worded like sharp's parameter errors when `steps` does not fit the kind
 * @example
 * resolveSteps('value-ladder', 7); // 7
 */
export function resolveSteps(kind: CardKind, steps?: number): number {
  if (steps === undefined) return defaultSteps[kind];
  if (kind === 'value-ladder') {
    if (!Number.isInteger(steps) || steps < 2 || steps > 9) {
      throw new Error(`Expected integer between 2 and 9 for steps but received ${steps}`);
    }
    return steps;
  }
  if (steps !== defaultSteps[kind]) {
    throw new Error(
      `Expected ${defaultSteps[kind]} for steps of a ${kind} card but received ${steps}`,
    );
  }
  return steps;
}
