import { describe, expect, it } from '@jest/globals';
import { VerifiedTokens } from './verified-tokens';

/** A compact JWS with this payload (the signature is not checked here: the guard has done it). */
const token = (claims: object, signature = 'c2lnbmF0dXJl') =>
  `${Buffer.from('{"alg":"HS256","typ":"JWT"}').toString('base64url')}.${Buffer.from(JSON.stringify(claims)).toString('base64url')}.${signature}`;

const teacher = { id: '0b6c2f0e-3d1a-4c55-9a34-5d2f4b7e8a10', role: 'teacher' as const };

describe('VerifiedTokens', () => {
  it('should find a remembered token until the second its exp names (RFC 7519 §4.1.4)', () => {
    let now = 1_000;
    const tokens = new VerifiedTokens(10, () => now);
    const t = token({ sub: teacher.id, role: 'teacher', exp: 1_900 });
    tokens.remember(t, teacher);
    expect(tokens.find(t)).toEqual(teacher);
    now = 1_899;
    expect(tokens.find(t)).toEqual(teacher);
    now = 1_900;
    expect(tokens.find(t)).toBeUndefined();
    expect(tokens.size).toBe(0);
  });

  it('should not find a token that differs in any part, signature included', () => {
    const tokens = new VerifiedTokens(10, () => 0);
    const t = token({ sub: teacher.id, exp: 60 });
    tokens.remember(t, teacher);
    expect(tokens.find(token({ sub: teacher.id, exp: 60 }, 'b3RoZXI'))).toBeUndefined();
    expect(tokens.find(token({ sub: teacher.id, exp: 61 }))).toBeUndefined();
    expect(tokens.find(`${t}x`)).toBeUndefined();
  });

  it('should keep only tokens with a numeric exp and no nbf, and nothing unreadable', () => {
    const tokens = new VerifiedTokens(10, () => 0);
    tokens.remember(token({ sub: teacher.id }), teacher);
    tokens.remember(token({ sub: teacher.id, exp: '60' }), teacher);
    tokens.remember(token({ sub: teacher.id, exp: 60, nbf: 10 }), teacher);
    tokens.remember('not.a-token', teacher);
    tokens.remember('only-one-part', teacher);
    expect(tokens.size).toBe(0);
  });

  it('should drop the oldest token when full', () => {
    const tokens = new VerifiedTokens(2, () => 0);
    const [a, b, c] = [1, 2, 3].map((i) => token({ sub: `user-${i}`, exp: 60 }));
    tokens.remember(a, teacher);
    tokens.remember(b, teacher);
    tokens.remember(c, teacher);
    expect(tokens.size).toBe(2);
    expect(tokens.find(a)).toBeUndefined();
    expect(tokens.find(b)).toEqual(teacher);
    expect(tokens.find(c)).toEqual(teacher);
  });

  it('should hand out a copy of the caller, so a request cannot change what the next one gets', () => {
    const tokens = new VerifiedTokens(10, () => 0);
    const t = token({ sub: teacher.id, exp: 60 });
    const caller = { ...teacher };
    tokens.remember(t, caller);
    caller.role = 'admin' as never;
    expect(tokens.find(t)).toEqual(teacher);
  });
});
