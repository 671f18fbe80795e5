import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { registerAccount, testPassword, type TestAccount } from './helpers';

type Who = 'anonymous' | 'student' | 'otherStudent' | 'teacher' | 'otherTeacher' | 'admin';
const everyone: Who[] = ['anonymous', 'student', 'otherStudent', 'teacher', 'otherTeacher', 'admin'];

/**
 * Every guarded route × every kind of caller. Across accounts a resource is a 404 (nobody learns
 * it exists); a route for another role is a 403; no session is a 401.
 */
describe('authorisation matrix (e2e, real PostgreSQL)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;
  const accounts = {} as Record<Exclude<Who, 'anonymous'>, TestAccount>;
  const ids = {} as { classId: string; drillId: string; assignmentId: string; attemptId: string; paintId: string; invitationId: string };

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
    accounts.student = await registerAccount(app, 'student');
    accounts.otherStudent = await registerAccount(app, 'student');
    accounts.teacher = await registerAccount(app, 'teacher');
    accounts.otherTeacher = await registerAccount(app, 'teacher');
    const admin = await registerAccount(app, 'teacher');
    await app.get(DataSource).query(`UPDATE users SET role = 'admin' WHERE id = $1`, [admin.id]);
    const signedIn = await request(http).post('/api/auth/sign-in').send({ email: admin.email, password: testPassword }).expect(200);
    accounts.admin = { ...admin, token: signedIn.body.accessToken, auth: { authorization: `Bearer ${signedIn.body.accessToken}` } };

    const t = accounts.teacher.auth;
    const klass = await request(http).post('/api/classes').set(t).send({ name: 'Matrix class' }).expect(201);
    ids.classId = klass.body.id;
    const invited = await request(http).post(`/api/classes/${ids.classId}/invitations`).set(t).send({ emails: ['matrix-pending@studio.test'] }).expect(201);
    ids.invitationId = invited.body[0].id;
    await request(http).post('/api/classes/join').set(accounts.student.auth).send({ code: klass.body.code }).expect(200);
    const drill = await request(http).post('/api/drills').set(t).send({ title: 'Matrix drill', kind: 'neutral', targets: [{ lab: { L: 50, a: 0, b: 0 } }] }).expect(201);
    ids.drillId = drill.body.id;
    const assignment = await request(http)
      .post('/api/assignments')
      .set(t)
      .send({ classId: ids.classId, drillId: ids.drillId, dueAt: new Date(Date.now() + 86_400_000).toISOString() })
      .expect(201);
    ids.assignmentId = assignment.body.id;
    // A graded attempt written directly: this matrix is about who may see it, not about grading.
    const [row] = await app.get(DataSource).query(
      `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes, score, pass, graded_at)
       VALUES ($1, $2, $3, 'graded', 'attempts/none/photo.jpg', 1, 80, true, now()) RETURNING id`,
      [accounts.student.id, ids.drillId, ids.assignmentId],
    );
    ids.attemptId = row.id;
    const paint = await request(http).post('/api/palette/paints').set(accounts.student.auth).send({ name: 'Matrix blue', pigments: ['PB29'] }).expect(201);
    ids.paintId = paint.body.id;
  });
  afterAll(async () => {
    await app.close();
  });

  type Row = { method: 'get' | 'post' | 'patch' | 'put' | 'delete'; path: () => string; body?: () => object; expect: Record<Who, number> };
  const statuses = (...codes: number[]) => Object.fromEntries(everyone.map((who, i) => [who, codes[i]])) as Record<Who, number>;
  //                                                                                  anon stu  oStu tea  oTea admin
  const rows: Row[] = [
    { method: 'get', path: () => '/api/auth/me', expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'patch', path: () => '/api/auth/me', body: () => ({ weeklyDigest: true }), expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'get', path: () => '/api/classes', expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'post', path: () => '/api/classes', body: () => ({ name: 'New class' }), expect: statuses(401, 403, 403, 201, 201, 201) },
    { method: 'get', path: () => `/api/classes/${ids.classId}`, expect: statuses(401, 200, 404, 200, 404, 200) },
    { method: 'patch', path: () => `/api/classes/${ids.classId}`, body: () => ({ name: 'Matrix class' }), expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => `/api/classes/${ids.classId}/students`, expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => `/api/classes/${ids.classId}/invitations`, expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'post', path: () => `/api/classes/${ids.classId}/invitations`, body: () => ({ emails: ['matrix@studio.test'] }), expect: statuses(401, 403, 403, 201, 404, 201) },
    { method: 'post', path: () => `/api/classes/${ids.classId}/invitations/${ids.invitationId}/resend`, expect: statuses(401, 403, 403, 200, 404, 200) },
    // Revoking works once: after the teacher's 204 the invitation is no longer pending, so the admin's call is a 404.
    { method: 'delete', path: () => `/api/classes/${ids.classId}/invitations/${ids.invitationId}`, expect: statuses(401, 403, 403, 204, 404, 404) },
    { method: 'get', path: () => `/api/classes/${ids.classId}/gradebook`, expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => `/api/classes/${ids.classId}/gradebook.csv`, expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => '/api/drills', expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'post', path: () => '/api/drills', body: () => ({ title: 'Grey', kind: 'neutral', targets: [{ hex: '#777777' }] }), expect: statuses(401, 403, 403, 201, 201, 201) },
    { method: 'get', path: () => `/api/drills/${ids.drillId}`, expect: statuses(401, 200, 404, 200, 404, 200) },
    {
      method: 'put',
      path: () => `/api/drills/${ids.drillId}`,
      body: () => ({ title: 'Matrix drill', kind: 'neutral', targets: [{ lab: { L: 50, a: 0, b: 0 } }] }),
      expect: statuses(401, 403, 403, 200, 404, 200),
    },
    { method: 'post', path: () => `/api/drills/${ids.drillId}/duplicate`, expect: statuses(401, 403, 403, 201, 404, 201) },
    { method: 'get', path: () => '/api/assignments', expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'get', path: () => `/api/assignments/${ids.assignmentId}`, expect: statuses(401, 200, 404, 200, 404, 200) },
    { method: 'patch', path: () => `/api/assignments/${ids.assignmentId}`, body: () => ({ note: 'Bring the warm red.' }), expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => '/api/attempts', expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'get', path: () => `/api/attempts/${ids.attemptId}`, expect: statuses(401, 200, 404, 200, 404, 200) },
    { method: 'patch', path: () => `/api/attempts/${ids.attemptId}/override`, body: () => ({ score: 70, pass: true }), expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => '/api/progress/me', expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'get', path: () => `/api/progress/students/${accounts.student.id}`, expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => `/api/progress/classes/${ids.classId}`, expect: statuses(401, 403, 403, 200, 404, 200) },
    { method: 'get', path: () => `/api/drills/${ids.drillId}/card.pdf`, expect: statuses(401, 200, 404, 200, 404, 200) },
    { method: 'get', path: () => `/api/drills/${ids.drillId}/card.png`, expect: statuses(401, 200, 404, 200, 404, 200) },
    // Without a photo: the role check comes first (403), then the missing file (400).
    { method: 'post', path: () => '/api/drills/targets/measure', expect: statuses(401, 403, 403, 400, 400, 400) },
    { method: 'post', path: () => '/api/attempts', expect: statuses(401, 400, 400, 403, 403, 400) },
    { method: 'get', path: () => '/api/palette', expect: statuses(401, 200, 200, 200, 200, 200) },
    { method: 'post', path: () => '/api/palette/swatch/measure', expect: statuses(401, 400, 400, 400, 400, 400) },
    // A paint is its owner's alone: everyone else gets a 404, admins included.
    { method: 'put', path: () => `/api/palette/paints/${ids.paintId}`, body: () => ({ name: 'Matrix blue', pigments: ['PB29'] }), expect: statuses(401, 200, 404, 404, 404, 404) },
    { method: 'get', path: () => '/api/admin/users', expect: statuses(401, 403, 403, 403, 403, 200) },
    { method: 'patch', path: () => `/api/admin/users/${accounts.otherStudent.id}/role`, body: () => ({ role: 'student' }), expect: statuses(401, 403, 403, 403, 403, 200) },
  ];

  for (const row of rows) {
    it(`${row.method.toUpperCase()} ${row.path.toString().match(/'(.*)'|`(.*)`/)?.slice(1).find(Boolean) ?? ''}`, async () => {
      const got: Record<string, number> = {};
      for (const who of everyone) {
        let call = request(http)[row.method](row.path());
        if (who !== 'anonymous') call = call.set(accounts[who].auth);
        const response = await (row.body ? call.send(row.body()) : call);
        got[who] = response.status;
        if (response.status >= 400) expect(response.body).toMatchObject({ statusCode: response.status, code: expect.any(String), message: expect.any(String) });
      }
      expect(got).toEqual(row.expect);
    });
  }
});
