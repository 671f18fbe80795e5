import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

/** A random secret for links and refresh tokens: 32 bytes, base64url. */
export function newSecret(): string {
  return randomBytes(32).toString('base64url');
}

/** SHA-256 of a secret: what the database keeps, so a leaked table grants nothing. */
export function hashSecret(secret: string): string {
  return createHash('sha256').update(secret).digest('hex');
}

/** Compares a presented secret with a stored hash in constant time. */
export function secretMatches(secret: string, storedHash: string): boolean {
  const presented = Buffer.from(hashSecret(secret), 'hex');
  const stored = Buffer.from(storedHash, 'hex');
  return presented.length === stored.length && timingSafeEqual(presented, stored);
}

/** Tokens travel as `<row id>.<secret>`: the id finds the row, the secret proves possession. */
export function splitToken(token: string | undefined): { id: string; secret: string } | undefined {
  if (!token) return undefined;
  const match = /^([0-9a-f-]{36})\.([A-Za-z0-9_-]{20,})$/.exec(token);
  return match ? { id: match[1], secret: match[2] } : undefined;
}
