const alphabet = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ';

/**
 * An 8-character card id (0-9 A-Z) derived from a seed, so the same drill always prints the
 * same card. FNV-1a (32-bit) over the seed, run twice with different offsets for 8 digits of
 * base 36; an id, not a secret.
 *
 * @param seed - e.g. a drill or assignment id, or `value-ladder/5` for a generic card
 * @returns the id
 * @example
 * cardIdFor('match/1'); // always the same 8 characters
 */
export function cardIdFor(seed: string): string {
  let id = '';
  for (const offset of [0x811c9dc5, 0x01000193]) {
    let hash = offset >>> 0;
    for (let i = 0; i < seed.length; i++) {
      hash ^= seed.charCodeAt(i);
      hash = Math.imul(hash, 0x01000193) >>> 0;
    }
    for (let k = 0; k < 4; k++) {
      id += alphabet[hash % 36];
      hash = Math.floor(hash / 36);
    }
  }
  return id;
}

/** True for a well-formed card id. */
export const isCardId = (value: string): boolean => /^[0-9A-Z]{8}$/.test(value);
