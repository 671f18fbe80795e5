import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { listMessages } from '../../scripts/lib/fake-smtp.mjs';
import { createTestApp } from './create-test-app';
import { registerAccount, type TestAccount } from './helpers';

const linkPattern = /\/invitations\/([0-9a-f-]{36}\.[A-Za-z0-9_-]+)/;

/** Every invitation link mailed to an address so far, newest first (waits until there are `count`). */
async function linksMailedTo(address: string, count: number, timeoutMs = 5000): Promise<string[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const links = (await listMessages(process.env.OUTBOX_DIR!))
      .filter((message) => message.to.includes(address))
      .map((message) => linkPattern.exec(message.text)?.[1])
      .filter((link): link is string => Boolean(link));
    if (links.length >= count || Date.now() > deadline) return links;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

describe('class invitations: pending list, resend and revoke (e2e, real PostgreSQL and SMTP)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;
  let teacher: TestAccount;
  let otherTeacher: TestAccount;
  let classId: string;
  const invite = async (email: string): Promise<{ id: string; email: string; createdAt: string; expiresAt: string }> => {
    const response = await request(http).post(`/api/classes/${classId}/invitations`).set(teacher.auth).send({ emails: [email] }).expect(201);
    return response.body[0];
  };
  const address = () => `invitee-${randomUUID()}@studio.test`;

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
    teacher = await registerAccount(app, 'teacher', 'Ines Marrow');
    otherTeacher = await registerAccount(app, 'teacher');
    const created = await request(http).post('/api/classes').set(teacher.auth).send({ name: 'Glazing evenings' }).expect(201);
    classId = created.body.id;
  });
  afterAll(async () => {
    await app.close();
  });

  it('should list only pending invitations, newest first, as { id, email, createdAt, expiresAt }', async () => {
    const older = await invite(address());
    const accepted = await invite(address());
    const expired = await invite(address());
    const revoked = await invite(address());
    const newest = await invite(address());
    const db = app.get(DataSource);
    await db.query(`UPDATE invitations SET created_at = now() - interval '1 minute' WHERE id = $1`, [older.id]);
    await db.query(`UPDATE invitations SET accepted_at = now() WHERE id = $1`, [accepted.id]);
    await db.query(`UPDATE invitations SET expires_at = now() - interval '1 second' WHERE id = $1`, [expired.id]);
    await request(http).delete(`/api/classes/${classId}/invitations/${revoked.id}`).set(teacher.auth).expect(204);

    const list = await request(http).get(`/api/classes/${classId}/invitations`).set(teacher.auth).expect(200);
    expect(list.body.map((row: { id: string }) => row.id)).toEqual([newest.id, older.id]);
    for (const row of list.body) {
      expect(Object.keys(row).sort()).toEqual(['createdAt', 'email', 'expiresAt', 'id']);
    }
    expect(list.body[0]).toEqual({ id: newest.id, email: newest.email, createdAt: newest.createdAt, expiresAt: newest.expiresAt });
  });

  it('should resend with a new link and a fresh expiry on the same row: the old link is refused, the new one works', async () => {
    const email = address();
    const sent = await invite(email);
    const [oldLink] = await linksMailedTo(email, 1);
    expect(oldLink.startsWith(sent.id)).toBe(true);
    await app.get(DataSource).query(`UPDATE invitations SET expires_at = now() + interval '1 hour' WHERE id = $1`, [sent.id]);

    const resent = await request(http).post(`/api/classes/${classId}/invitations/${sent.id}/resend`).set(teacher.auth).expect(200);
    expect(Object.keys(resent.body).sort()).toEqual(['createdAt', 'email', 'expiresAt', 'id']);
    expect(resent.body).toMatchObject({ id: sent.id, email, createdAt: sent.createdAt });
    // A fresh expiry: the configured days from now again, not the hour left on the old one.
    expect(new Date(resent.body.expiresAt).getTime()).toBeGreaterThan(Date.now() + 86_400_000);

    const links = await linksMailedTo(email, 2);
    expect(links).toHaveLength(2);
    const newLink = links.find((link) => link !== oldLink);
    expect(newLink).toBeDefined();
    expect(newLink!.startsWith(sent.id)).toBe(true);
    const refused = await request(http).get(`/api/invitations/${oldLink}`).expect(404);
    expect(refused.body).toMatchObject({ statusCode: 404, code: 'invitation_unknown' });
    const preview = await request(http).get(`/api/invitations/${newLink}`).expect(200);
    expect(preview.body).toMatchObject({ className: 'Glazing evenings', teacherName: 'Ines Marrow', email });

    const student = await registerAccount(app, 'student');
    await request(http).post(`/api/invitations/${oldLink}/accept`).set(student.auth).expect(404);
    const joined = await request(http).post(`/api/invitations/${newLink}/accept`).set(student.auth).expect(200);
    expect(joined.body.id).toBe(classId);
    // Accepted: no longer pending, so it can be neither sent again nor revoked.
    const gone = await request(http).post(`/api/classes/${classId}/invitations/${sent.id}/resend`).set(teacher.auth).expect(404);
    expect(gone.body).toMatchObject({ statusCode: 404, code: 'invitation_not_found', message: expect.any(String) });
    await request(http).delete(`/api/classes/${classId}/invitations/${sent.id}`).set(teacher.auth).expect(404);
  });

  it('should refuse a revoked link with invitation_unknown, and not resend it', async () => {
    const email = address();
    const sent = await invite(email);
    const [link] = await linksMailedTo(email, 1);
    await request(http).get(`/api/invitations/${link}`).expect(200);
    await request(http).delete(`/api/classes/${classId}/invitations/${sent.id}`).set(teacher.auth).expect(204);
    const refused = await request(http).get(`/api/invitations/${link}`).expect(404);
    expect(refused.body).toMatchObject({ statusCode: 404, code: 'invitation_unknown' });
    const student = await registerAccount(app, 'student');
    await request(http).post(`/api/invitations/${link}/accept`).set(student.auth).expect(404);
    await request(http).post(`/api/classes/${classId}/invitations/${sent.id}/resend`).set(teacher.auth).expect(404);
    await request(http).delete(`/api/classes/${classId}/invitations/${sent.id}`).set(teacher.auth).expect(404);
  });

  it("should answer 404 for another teacher's class or invitation, and for unknown ids", async () => {
    const sent = await invite(address());
    await request(http).post(`/api/classes/${classId}/invitations/${sent.id}/resend`).set(otherTeacher.auth).expect(404);
    await request(http).delete(`/api/classes/${classId}/invitations/${sent.id}`).set(otherTeacher.auth).expect(404);
    // The other teacher's own class does not reach this invitation either.
    const theirs = await request(http).post('/api/classes').set(otherTeacher.auth).send({ name: 'Other class' }).expect(201);
    await request(http).post(`/api/classes/${theirs.body.id}/invitations/${sent.id}/resend`).set(otherTeacher.auth).expect(404);
    await request(http).delete(`/api/classes/${theirs.body.id}/invitations/${sent.id}`).set(otherTeacher.auth).expect(404);
    await request(http).delete(`/api/classes/${classId}/invitations/${randomUUID()}`).set(teacher.auth).expect(404);
    await request(http).delete(`/api/classes/${classId}/invitations/not-a-uuid`).set(teacher.auth).expect(404);
    // Still pending for its own teacher.
    const list = await request(http).get(`/api/classes/${classId}/invitations`).set(teacher.auth).expect(200);
    expect(list.body.map((row: { id: string }) => row.id)).toContain(sent.id);
  });
});
