import type { AuthUser } from '../common/decorators/current-user.decorator';

interface Entry {
  user: AuthUser;
  /** The token's `exp` claim, seconds since the epoch. */
  exp: number;
}

/**
 * Access tokens that passport-jwt has already verified, so that the next request with the same
 * token skips the second HMAC and the JSON decoding of header and payload (with passport's own
 * per-request set-up, about a tenth of the server's time on the assignments list). The key is
 * the whole token, signature included: a token changed in any byte is not found and goes
 * through full verification. An entry holds only while the token's own `exp` has not passed
 * (the same test as jsonwebtoken's: the token is expired once the current whole second reaches
 * `exp`); nothing else is cached, and access tokens were stateless already (a token is good
 * until it expires whether it was verified now or a minute ago). Bounded: at `limit` entries the
 * oldest is dropped.
 */
export class VerifiedTokens {
  private readonly entries = new Map<string, Entry>();

  constructor(
    private readonly limit = 10_000,
    private readonly nowSeconds: () => number = () => Math.floor(Date.now() / 1000),
  ) {}

  /** The caller a verified token names, or undefined when it is unknown or has expired. */
  find(token: string): AuthUser | undefined {
    const entry = this.entries.get(token);
    if (!entry) return undefined;
    if (this.nowSeconds() >= entry.exp) {
      this.entries.delete(token);
      return undefined;
    }
    return entry.user;
  }

  /**
   * Remembers a token that has just passed verification. Only tokens with a numeric `exp` and
   * no `nbf` (not-before: Mixmark does not issue any) are kept.
   */
  remember(token: string, user: AuthUser): void {
    const claims = payloadOf(token);
    if (!claims || typeof claims.exp !== 'number' || claims.nbf !== undefined) return;
    if (this.entries.size >= this.limit) {
      const oldest = this.entries.keys().next().value;
      if (oldest !== undefined) this.entries.delete(oldest);
    }
    this.entries.set(token, { user: { id: user.id, role: user.role }, exp: claims.exp });
  }

  get size(): number {
    return this.entries.size;
  }
}

/** The payload of a compact JWS (header.payload.signature), already verified by the caller. */
function payloadOf(token: string): { exp?: unknown; nbf?: unknown } | undefined {
  const parts = token.split('.');
  if (parts.length !== 3) return undefined;
  try {
    const claims: unknown = JSON.parse(Buffer.from(parts[1], 'base64url').toString('utf8'));
    return claims !== null && typeof claims === 'object' ? claims : undefined;
  } catch {
    return undefined;
  }
}
