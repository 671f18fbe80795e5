import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';

const password = 'correct horse battery';

function refreshCookie(response: request.Response): string {
  const cookies = ([] as string[]).concat(response.headers['set-cookie'] ?? []);
  const cookie = cookies.find((c) => c.startsWith('mixmark_refresh='));
  if (!cookie) throw new Error('no refresh cookie was set');
  return cookie.split(';')[0];
}

describe('auth (e2e, real PostgreSQL)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
  });
  afterAll(async () => {
    await app.close();
  });

  const register = (email = `t-${randomUUID()}@example.test`, role = 'teacher') =>
    request(http).post('/api/auth/register').send({ email, password, displayName: 'Wren Test', role });

  it('should register, sign in and say who is signed in', async () => {
    const email = `Mixed.Case-${randomUUID()}@Example.test`;
    const registered = await register(email).expect(201);
    expect(registered.body.user).toMatchObject({ email: email.toLowerCase(), role: 'teacher', displayName: 'Wren Test' });
    expect(registered.body.user.passwordHash).toBeUndefined();
    const cookies = ([] as string[]).concat(registered.headers['set-cookie'] ?? []);
    const refresh = cookies.find((c) => c.startsWith('mixmark_refresh='));
    expect(refresh).toMatch(/HttpOnly/);
    expect(refresh).toMatch(/SameSite=Strict/);
    expect(refresh).toMatch(/Path=\/api\/auth/);
    // The page's hint that a session may be restored: no secret in it, so the page may read it.
    const hint = cookies.find((c) => c.startsWith('mixmark_session='));
    expect(hint).toMatch(/^mixmark_session=1; Path=\/; Expires=/);
    expect(hint).toMatch(/SameSite=Strict/);
    expect(hint).not.toMatch(/HttpOnly/);

    const signedIn = await request(http).post('/api/auth/sign-in').send({ email, password }).expect(200);
    const me = await request(http).get('/api/auth/me').set('authorization', `Bearer ${signedIn.body.accessToken}`).expect(200);
    expect(me.body.email).toBe(email.toLowerCase());
  });

  it('should refuse a second account with the same e-mail (409 with details.email)', async () => {
    const email = `dup-${randomUUID()}@example.test`;
    await register(email).expect(201);
    const again = await register(email.toUpperCase()).expect(409);
    expect(again.body).toMatchObject({ statusCode: 409, code: 'email_taken', details: { email: 'taken' } });
  });

  it('should answer invalid bodies with 400 naming each field', async () => {
    const response = await request(http)
      .post('/api/auth/register')
      .send({ email: 'not-an-address', password: 'short', displayName: '', role: 'admin' })
      .expect(400);
    expect(response.body).toMatchObject({
      statusCode: 400,
      code: 'validation_failed',
      details: { email: 'email', password: 'min', displayName: 'min', role: 'oneOf' },
    });
  });

  it('should say nothing about which half of the sign-in was wrong', async () => {
    const email = `wrong-${randomUUID()}@example.test`;
    await register(email).expect(201);
    const badPassword = await request(http).post('/api/auth/sign-in').send({ email, password: 'not the password' }).expect(401);
    const noAccount = await request(http).post('/api/auth/sign-in').send({ email: `nobody-${randomUUID()}@example.test`, password }).expect(401);
    expect(badPassword.body).toEqual(noAccount.body);
    expect(badPassword.body.code).toBe('bad_credentials');
  });

  it('should rotate the refresh token and revoke the family when an old one is replayed', async () => {
    const first = refreshCookie(await register().expect(201));
    const second = await request(http).post('/api/auth/refresh').set('cookie', first).expect(200);
    expect(second.body.accessToken).toEqual(expect.any(String));
    const secondCookie = refreshCookie(second);
    expect(secondCookie).not.toBe(first);

    // Replaying the first token (already rotated) is theft: it fails and kills the newer one too.
    await request(http).post('/api/auth/refresh').set('cookie', first).expect(401);
    const afterReplay = await request(http).post('/api/auth/refresh').set('cookie', secondCookie).expect(401);
    expect(afterReplay.body.code).toBe('session_expired');
  });

  it('should end the session on sign-out', async () => {
    const cookie = refreshCookie(await register().expect(201));
    const signedOut = await request(http).post('/api/auth/sign-out').set('cookie', cookie).expect(204);
    const cleared = ([] as string[]).concat(signedOut.headers['set-cookie'] ?? []);
    expect(cleared.find((c) => c.startsWith('mixmark_refresh='))).toMatch(/Expires=Thu, 01 Jan 1970/);
    expect(cleared.find((c) => c.startsWith('mixmark_session='))).toMatch(/^mixmark_session=; Path=\/; Expires=Thu, 01 Jan 1970/);
    const refused = await request(http).post('/api/auth/refresh').set('cookie', cookie).expect(401);
    expect(([] as string[]).concat(refused.headers['set-cookie'] ?? []).some((c) => c.startsWith('mixmark_session=;'))).toBe(true);
  });

  it('should keep only a hash of each refresh token', async () => {
    const cookie = refreshCookie(await register().expect(201));
    const [id, secret] = decodeURIComponent(cookie.split('=')[1]).split('.');
    const [row] = await app.get(DataSource).query('SELECT token_hash FROM refresh_tokens WHERE id = $1', [id]);
    expect(row.token_hash).toMatch(/^[0-9a-f]{64}$/);
    expect(row.token_hash).not.toContain(secret);
  });

  it('should reject missing, tampered and expired access tokens with 401', async () => {
    const { body } = await register().expect(201);
    await request(http).get('/api/auth/me').expect(401);
    // The genuine token first, twice: the server then knows it as verified (JwtAuthGuard's
    // VerifiedTokens), and a changed copy must still go through full verification.
    for (let i = 0; i < 2; i++) await request(http).get('/api/auth/me').set('authorization', `Bearer ${body.accessToken}`).expect(200);
    const [header, payload, signature] = body.accessToken.split('.');
    const forged = Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(payload, 'base64url').toString()), role: 'admin' })).toString('base64url');
    await request(http).get('/api/auth/me').set('authorization', `Bearer ${header}.${forged}.${signature}`).expect(401);
    const otherSignature = `${signature.slice(0, -2)}${signature.endsWith('AA') ? 'BA' : 'AA'}`;
    await request(http).get('/api/auth/me').set('authorization', `Bearer ${header}.${payload}.${otherSignature}`).expect(401);
    await request(http).get('/api/admin/users').set('authorization', `Bearer ${header}.${forged}.${signature}`).expect(401);
    const expired = await app.get(JwtService).signAsync(
      { sub: body.user.id, role: 'teacher' },
      { secret: process.env.JWT_SECRET ?? 'mixmark-development-secret-not-for-production-use', expiresIn: -10 },
    );
    const response = await request(http).get('/api/auth/me').set('authorization', `Bearer ${expired}`).expect(401);
    expect(response.body).toMatchObject({ statusCode: 401, code: 'unauthorized' });
  });

  it('should refuse an access token once it expires, also after it was accepted', async () => {
    const { body } = await register().expect(201);
    const shortLived = await app.get(JwtService).signAsync(
      { sub: body.user.id, role: 'student' },
      { secret: process.env.JWT_SECRET ?? 'mixmark-development-secret-not-for-production-use', expiresIn: 1 },
    );
    await request(http).get('/api/auth/me').set('authorization', `Bearer ${shortLived}`).expect(200);
    // RFC 7519 §4.1.4: not accepted on or after `exp` (one whole second after it was issued).
    const { exp } = JSON.parse(Buffer.from(shortLived.split('.')[1], 'base64url').toString()) as { exp: number };
    await new Promise((resolve) => setTimeout(resolve, Math.max(0, exp * 1000 - Date.now()) + 50));
    const response = await request(http).get('/api/auth/me').set('authorization', `Bearer ${shortLived}`).expect(401);
    expect(response.body).toMatchObject({ statusCode: 401, code: 'unauthorized' });
  });

  it('should limit sign-in attempts per e-mail with a 429 and Retry-After', async () => {
    const email = `limited-${randomUUID()}@example.test`;
    const limit = Number(process.env.SIGN_IN_LIMIT_PER_MINUTE ?? 10);
    for (let i = 0; i < limit; i += 1) {
      await request(http).post('/api/auth/sign-in').send({ email, password: 'wrong password' }).expect(401);
    }
    const blocked = await request(http).post('/api/auth/sign-in').send({ email, password: 'wrong password' }).expect(429);
    expect(blocked.body).toMatchObject({ statusCode: 429, code: 'too_many_requests' });
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('should keep admin routes for admins', async () => {
    const { body } = await register().expect(201);
    await request(http).get('/api/admin/users').set('authorization', `Bearer ${body.accessToken}`).expect(403);
  });

  it('should show the weekly digest choice on /me (on by default) and change it and the name with PATCH', async () => {
    const { body } = await register().expect(201);
    const auth = { authorization: `Bearer ${body.accessToken}` };
    const me = await request(http).get('/api/auth/me').set(auth).expect(200);
    expect(me.body).toMatchObject({ id: body.user.id, displayName: 'Wren Test', weeklyDigest: true });

    const off = await request(http).patch('/api/auth/me').set(auth).send({ weeklyDigest: false }).expect(200);
    expect(off.body).toMatchObject({ displayName: 'Wren Test', weeklyDigest: false });
    const renamed = await request(http).patch('/api/auth/me').set(auth).send({ displayName: '  Wren Halloway ', role: 'admin' }).expect(200);
    expect(renamed.body).toMatchObject({ displayName: 'Wren Halloway', weeklyDigest: false, role: 'teacher' });
    const [row] = await app.get(DataSource).query(`SELECT display_name, weekly_digest, role FROM users WHERE id = $1`, [body.user.id]);
    expect(row).toEqual({ display_name: 'Wren Halloway', weekly_digest: false, role: 'teacher' });
  });

  it('should refuse a profile change with nothing to change or bad fields (400 naming them)', async () => {
    const { body } = await register().expect(201);
    const auth = { authorization: `Bearer ${body.accessToken}` };
    const empty = await request(http).patch('/api/auth/me').set(auth).send({ weekly_digest: false }).expect(400);
    expect(empty.body).toMatchObject({ statusCode: 400, code: 'validation_failed', details: { '': 'profile-empty' } });
    const bad = await request(http).patch('/api/auth/me').set(auth).send({ displayName: ' ', weeklyDigest: 'sometimes' }).expect(400);
    expect(bad.body).toMatchObject({ statusCode: 400, code: 'validation_failed', details: { displayName: 'min', weeklyDigest: 'typeError' } });
  });
});
