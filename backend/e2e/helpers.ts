import { randomUUID } from 'node:crypto';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { listMessages } from '../../scripts/lib/fake-smtp.mjs';

export const testPassword = 'correct horse battery';

export interface TestAccount {
  id: string;
  email: string;
  token: string;
  auth: { authorization: string };
}

/** Registers a fresh account and returns its access token. */
export async function registerAccount(app: INestApplication, role: 'teacher' | 'student', name = `${role} ${randomUUID().slice(0, 6)}`): Promise<TestAccount> {
  const email = `${role}-${randomUUID()}@studio.test`;
  const response = await request(app.getHttpServer())
    .post('/api/auth/register')
    .send({ email, password: testPassword, displayName: name, role })
    .expect(201);
  return { id: response.body.user.id, email, token: response.body.accessToken, auth: { authorization: `Bearer ${response.body.accessToken}` } };
}

/** The newest mail the fake SMTP server kept for an address (waits briefly for it). */
export async function latestMailTo(address: string, timeoutMs = 5000) {
  const dir = process.env.OUTBOX_DIR;
  if (!dir) throw new Error('OUTBOX_DIR is not set: the e2e set-up starts the fake SMTP server');
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await listMessages(dir)).find((message) => message.to.includes(address));
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no mail to ${address} arrived within ${timeoutMs} ms`);
}

/** Sets environment variables while `fn` runs (an app reads its config when it is made), then puts them back. */
export async function withEnv<T>(vars: Record<string, string>, fn: () => Promise<T>): Promise<T> {
  const saved = Object.fromEntries(Object.keys(vars).map((key) => [key, process.env[key]]));
  Object.assign(process.env, vars);
  try {
    return await fn();
  } finally {
    for (const [key, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[key];
      else process.env[key] = value;
    }
  }
}
