import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { registerAccount, withEnv, type TestAccount } from './helpers';

const dayMs = 86_400_000;

interface Listed {
  id: string;
  className: string;
  drill: { title: string };
  note: string;
  dueAt: string;
  status?: string;
  counts?: Record<string, number>;
}

/**
 * A server keeps teachers' and students' assignment lists and serves them again while the class
 * counters (the AddClassListStamps migration's triggers) are unchanged. Two servers run here on
 * one database, as two processes would: `kept` keeps lists, `plain` (LIST_CACHE_MB=0) reads
 * every list from PostgreSQL, and every write goes through `plain` or straight to PostgreSQL (as
 * the grading worker on another machine writes). After each kind of write the list `kept` sends
 * must show it and equal the list `plain` reads.
 */
describe('assignment lists kept between requests (e2e, two servers on one PostgreSQL)', () => {
  let kept: INestApplication;
  let plain: INestApplication;
  let db: DataSource;
  let teacher: TestAccount;
  let student: TestAccount;
  let classmate: TestAccount;
  let classId: string;
  let drillId: string;

  const list = async (app: INestApplication, account: TestAccount, query = ''): Promise<Listed[]> =>
    (
      await request(app.getHttpServer())
        .get(`/api/assignments${query}`)
        .set(account.auth)
        .expect(200)
    ).body as Listed[];

  /** What `kept` sends to the account, after checking that it is what `plain` reads now. */
  const keptList = async (account: TestAccount, query = ''): Promise<Listed[]> => {
    const fromKept = await list(kept, account, query);
    expect(fromKept).toEqual(await list(plain, account, query));
    return fromKept;
  };

  const byId = (lists: Listed[], id: string) => lists.find((entry) => entry.id === id);
  const write = () => plain.getHttpServer();

  beforeAll(async () => {
    kept = await createTestApp();
    plain = await withEnv({ LIST_CACHE_MB: '0' }, createTestApp);
    db = kept.get(DataSource);
    teacher = await registerAccount(kept, 'teacher');
    student = await registerAccount(kept, 'student');
    classmate = await registerAccount(kept, 'student');
    const klass = await request(write())
      .post('/api/classes')
      .set(teacher.auth)
      .send({ name: 'Kept lists class' })
      .expect(201);
    classId = klass.body.id;
    await request(write())
      .post('/api/classes/join')
      .set(student.auth)
      .send({ code: klass.body.code })
      .expect(200);
    const drill = await request(write())
      .post('/api/drills')
      .set(teacher.auth)
      .send({ title: 'Neutral grey', kind: 'neutral', targets: [{ lab: { L: 50, a: 0, b: 0 } }] })
      .expect(201);
    drillId = drill.body.id;
  });
  afterAll(async () => {
    await kept.close();
    await plain.close();
  });

  const assign = async (dueInMs: number, note = '') =>
    (
      await request(write())
        .post('/api/assignments')
        .set(teacher.auth)
        .send({ classId, drillId, dueAt: new Date(Date.now() + dueInMs).toISOString(), note })
        .expect(201)
    ).body.id as string;

  it('should show assignments made, changed and deleted, for the teacher and the student', async () => {
    expect(await keptList(teacher)).toEqual([]);
    expect(await keptList(student)).toEqual([]);
    const id = await assign(5 * dayMs, 'First wash');
    expect(byId(await keptList(teacher), id)).toMatchObject({
      note: 'First wash',
      counts: { 'not-started': 1 },
    });
    expect(byId(await keptList(student), id)).toMatchObject({
      note: 'First wash',
      status: 'not-started',
    });

    await request(write())
      .patch(`/api/assignments/${id}`)
      .set(teacher.auth)
      .send({ note: 'Second wash' })
      .expect(200);
    expect(byId(await keptList(teacher), id)?.note).toBe('Second wash');
    expect(byId(await keptList(student), id)?.note).toBe('Second wash');
    // The filtered list is kept under its own key and follows the same counters.
    expect(byId(await keptList(teacher, `?classId=${classId}`), id)?.note).toBe('Second wash');

    await request(write()).delete(`/api/assignments/${id}`).set(teacher.auth).expect(204);
    expect(await keptList(teacher)).toEqual([]);
    expect(await keptList(student)).toEqual([]);
    expect(await keptList(teacher, `?classId=${classId}`)).toEqual([]);
  });

  it('should show a class renamed and a drill edited', async () => {
    const id = await assign(6 * dayMs);
    await keptList(teacher);
    await keptList(student);
    await request(write())
      .patch(`/api/classes/${classId}`)
      .set(teacher.auth)
      .send({ name: 'Kept lists, renamed' })
      .expect(200);
    expect(byId(await keptList(teacher), id)?.className).toBe('Kept lists, renamed');
    expect(byId(await keptList(student), id)?.className).toBe('Kept lists, renamed');

    await request(write())
      .put(`/api/drills/${drillId}`)
      .set(teacher.auth)
      .send({ title: 'Light grey', kind: 'neutral', targets: [{ lab: { L: 70, a: 0, b: 0 } }] })
      .expect(200);
    expect(byId(await keptList(teacher), id)?.drill.title).toBe('Light grey');
    expect(byId(await keptList(student), id)?.drill.title).toBe('Light grey');
  });

  it('should show an attempt the worker writes straight to PostgreSQL, and a teacher override', async () => {
    const id = await assign(7 * dayMs);
    expect(byId(await keptList(student), id)?.status).toBe('not-started');
    await keptList(teacher);
    // The grading worker (any process, any machine) writes attempts; nothing tells this server.
    const [attempt] = await db.query<{ id: string }[]>(
      `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes)
       VALUES ($1, $2, $3, 'queued', 'attempts/none/photo.jpg', 1) RETURNING id`,
      [student.id, drillId, id],
    );
    expect(byId(await keptList(student), id)?.status).toBe('submitted');
    expect(byId(await keptList(teacher), id)?.counts).toMatchObject({
      submitted: 1,
      'not-started': 0,
    });
    await db.query(
      `UPDATE attempts SET state = 'graded', score = 40, pass = false, graded_at = now() WHERE id = $1`,
      [attempt.id],
    );
    expect(byId(await keptList(student), id)?.status).toBe('failed');
    expect(byId(await keptList(teacher), id)?.counts).toMatchObject({ failed: 1, submitted: 0 });
    await request(write())
      .patch(`/api/attempts/${attempt.id}/override`)
      .set(teacher.auth)
      .send({ score: 80, pass: true, comment: 'The value is right.' })
      .expect(200);
    expect(byId(await keptList(student), id)?.status).toBe('passed');
    expect(byId(await keptList(teacher), id)?.counts).toMatchObject({ passed: 1, failed: 0 });
  });

  it('should follow students joining and leaving, and a class given to another teacher', async () => {
    const before = await keptList(classmate);
    expect(before).toEqual([]);
    const { code } = (
      await request(write()).get(`/api/classes/${classId}`).set(teacher.auth).expect(200)
    ).body;
    await request(write()).post('/api/classes/join').set(classmate.auth).send({ code }).expect(200);
    const joined = await keptList(classmate);
    expect(joined.length).toBeGreaterThan(0);
    const teacherList = await keptList(teacher);
    expect(
      teacherList.every((entry) => Object.values(entry.counts!).reduce((a, b) => a + b, 0) === 2),
    ).toBe(true);

    await request(write())
      .delete(`/api/classes/${classId}/students/${classmate.id}`)
      .set(teacher.auth)
      .expect(204);
    expect(await keptList(classmate)).toEqual([]);
    expect(
      (await keptList(teacher)).every(
        (entry) => Object.values(entry.counts!).reduce((a, b) => a + b, 0) === 1,
      ),
    ).toBe(true);

    // Not a route the app has: an administrator moving a class in the database.
    const other = await registerAccount(kept, 'teacher');
    await keptList(other);
    await db.query(`UPDATE classes SET teacher_id = $1 WHERE id = $2`, [other.id, classId]);
    expect(await keptList(teacher)).toEqual([]);
    expect((await keptList(other)).length).toBe(joined.length);
    await db.query(`UPDATE classes SET teacher_id = $1 WHERE id = $2`, [teacher.id, classId]);
    expect((await keptList(teacher)).length).toBe(joined.length);
  });

  it('should turn an assignment late when its due date passes, with nothing written', async () => {
    const id = await assign(1500);
    expect(byId(await keptList(student), id)?.status).toBe('not-started');
    expect(byId(await keptList(teacher), id)?.counts).toMatchObject({ 'not-started': 1, late: 0 });
    await new Promise((resolve) => setTimeout(resolve, 1700));
    expect(byId(await keptList(student), id)?.status).toBe('late');
    expect(byId(await keptList(teacher), id)?.counts).toMatchObject({ 'not-started': 0, late: 1 });
  });

  it('should drop the lists of a deleted class', async () => {
    const klass = await request(write())
      .post('/api/classes')
      .set(teacher.auth)
      .send({ name: 'Short-lived class' })
      .expect(201);
    await request(write())
      .post('/api/classes/join')
      .set(classmate.auth)
      .send({ code: klass.body.code })
      .expect(200);
    await request(write())
      .post('/api/assignments')
      .set(teacher.auth)
      .send({ classId: klass.body.id, drillId, dueAt: new Date(Date.now() + dayMs).toISOString() })
      .expect(201);
    expect((await keptList(classmate)).map((entry) => entry.className)).toEqual([
      'Short-lived class',
    ]);
    // No delete route: classes are archived. Deleting in the database cascades to assignments
    // and roster while the class is already gone; the triggers must not fail on it.
    await db.query(`DELETE FROM classes WHERE id = $1`, [klass.body.id]);
    expect(await keptList(classmate)).toEqual([]);
    const [{ left }] = await db.query<{ left: number }[]>(
      `SELECT count(*)::int AS left FROM class_list_stamps WHERE class_id = $1`,
      [klass.body.id],
    );
    expect(left).toBe(0);
  });
});
