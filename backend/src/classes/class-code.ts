import { randomInt } from 'node:crypto';
import { classCodeAlphabet } from '@mixmark/common';

/** A new random class code: 6 characters without look-alikes, ~887 million possibilities. */
export function newClassCode(): string {
  let code = '';
  for (let i = 0; i < 6; i += 1) code += classCodeAlphabet[randomInt(classCodeAlphabet.length)];
  return code;
}
