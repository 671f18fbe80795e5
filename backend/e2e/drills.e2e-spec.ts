import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createTestApp } from './create-test-app';
import { registerAccount, type TestAccount } from './helpers';

const ladder = (Ls: number[]) => Ls.map((L) => ({ lab: { L, a: 0, b: 0 } }));

describe('editing a drill that is in use (e2e, real PostgreSQL)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;
  let teacher: TestAccount;
  let student: TestAccount;

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
    teacher = await registerAccount(app, 'teacher');
    student = await registerAccount(app, 'student');
  });
  afterAll(async () => {
    await app.close();
  });

  const newLadder = async () =>
    (await request(http).post('/api/drills').set(teacher.auth).send({ title: 'Four steps', kind: 'value-ladder', targets: ladder([85, 65, 45, 25]) }).expect(201)).body;

  it('should let a drill nobody has used change kind and number of targets', async () => {
    const drill = await newLadder();
    await request(http).put(`/api/drills/${drill.id}`).set(teacher.auth).send({ title: 'Five steps', kind: 'value-ladder', targets: ladder([90, 72, 54, 36, 18]) }).expect(200);
    const changed = await request(http).put(`/api/drills/${drill.id}`).set(teacher.auth).send({ title: 'A grey', kind: 'neutral', targets: ladder([50]) }).expect(200);
    expect(changed.body).toMatchObject({ kind: 'neutral', title: 'A grey' });
    expect(changed.body.targets).toHaveLength(1);
  });

  it('should refuse a new kind or target count once the drill is assigned, pointing to a copy, and keep other edits', async () => {
    const drill = await newLadder();
    const klass = await request(http).post('/api/classes').set(teacher.auth).send({ name: 'Ladder class' }).expect(201);
    await request(http)
      .post('/api/assignments')
      .set(teacher.auth)
      .send({ classId: klass.body.id, drillId: drill.id, dueAt: new Date(Date.now() + 86_400_000).toISOString() })
      .expect(201);

    const fewer = await request(http).put(`/api/drills/${drill.id}`).set(teacher.auth).send({ title: 'Three steps', kind: 'value-ladder', targets: ladder([85, 55, 25]) }).expect(409);
    expect(fewer.body).toMatchObject({ statusCode: 409, code: 'drill_in_use', details: { targets: 'drill_in_use' } });
    expect(fewer.body.message).toMatch(/duplicate/i);
    const otherKind = await request(http).put(`/api/drills/${drill.id}`).set(teacher.auth).send({ title: 'Grey', kind: 'neutral', targets: ladder([50]) }).expect(409);
    expect(otherKind.body).toMatchObject({ code: 'drill_in_use', details: { kind: 'drill_in_use', targets: 'drill_in_use' } });
    const unchanged = await request(http).get(`/api/drills/${drill.id}`).set(teacher.auth).expect(200);
    expect(unchanged.body).toMatchObject({ kind: 'value-ladder', title: 'Four steps' });
    expect(unchanged.body.targets.map((t: { lab: { L: number } }) => t.lab.L)).toEqual([85, 65, 45, 25]);

    // Same kind and count: title, instructions, tolerance and the target colours may change.
    const edited = await request(http)
      .put(`/api/drills/${drill.id}`)
      .set(teacher.auth)
      .send({ title: 'Four even steps', kind: 'value-ladder', instructions: 'Lightest first.', tolerance: { deltaE: 4 }, targets: ladder([80, 62, 44, 26]) })
      .expect(200);
    expect(edited.body).toMatchObject({ title: 'Four even steps', instructions: 'Lightest first.', tolerance: { deltaE: 4 } });
    expect(edited.body.targets.map((t: { lab: { L: number } }) => t.lab.L)).toEqual([80, 62, 44, 26]);

    // The way out the message names: the copy is free to change.
    const copy = await request(http).post(`/api/drills/${drill.id}/duplicate`).set(teacher.auth).expect(201);
    await request(http).put(`/api/drills/${copy.body.id}`).set(teacher.auth).send({ title: 'Three steps', kind: 'value-ladder', targets: ladder([85, 55, 25]) }).expect(200);
  });

  it('should refuse a new kind once the drill has an attempt, even one made outside any assignment', async () => {
    const drill = (await request(http).post('/api/drills').set(teacher.auth).send({ title: 'Match', kind: 'match', visibility: 'public', targets: [{ hex: '#c0622f' }] }).expect(201)).body;
    // Written directly: this test is about the drill's edit rule, not about grading a photo.
    await app.get(DataSource).query(
      `INSERT INTO attempts (student_id, drill_id, state, photo_key, photo_bytes) VALUES ($1, $2, 'queued', 'attempts/none/photo.jpg', 1)`,
      [student.id, drill.id],
    );
    const response = await request(http).put(`/api/drills/${drill.id}`).set(teacher.auth).send({ title: 'Flat', kind: 'flat-wash', targets: [{ hex: '#c0622f' }] }).expect(409);
    expect(response.body).toMatchObject({ code: 'drill_in_use', details: { kind: 'drill_in_use' } });
    expect(response.body.details.targets).toBeUndefined();
    await request(http).put(`/api/drills/${drill.id}`).set(teacher.auth).send({ title: 'Match', kind: 'match', targets: [{ hex: '#b05a2a' }] }).expect(200);
  });

  it('should make a kind change wait for an attempt being recorded at the same time, then refuse it', async () => {
    const drill = (await request(http).post('/api/drills').set(teacher.auth).send({ title: 'Race', kind: 'match', visibility: 'public', targets: [{ hex: '#3f6fa0' }] }).expect(201)).body;
    const db = app.get(DataSource);
    // Stands in for AttemptsService.create: the shared lock it takes on the drill row, then its insert, not yet committed.
    const recording = db.createQueryRunner();
    await recording.connect();
    await recording.startTransaction();
    try {
      await recording.query(`SELECT 1 FROM drills WHERE id = $1 FOR KEY SHARE`, [drill.id]);
      await recording.query(`INSERT INTO attempts (student_id, drill_id, state, photo_key, photo_bytes) VALUES ($1, $2, 'queued', 'attempts/none/photo.jpg', 1)`, [student.id, drill.id]);
      const put = request(http).put(`/api/drills/${drill.id}`).set(teacher.auth).send({ title: 'Flat', kind: 'flat-wash', targets: [{ hex: '#3f6fa0' }] }).then((r) => r);
      // The update's row lock must be waiting on the open attempt before that commits (without the lock it would answer 200).
      for (let i = 0; ; i += 1) {
        const [{ waiting }] = await db.query<{ waiting: number }[]>(
          `SELECT count(*)::int AS waiting FROM pg_stat_activity WHERE wait_event_type = 'Lock' AND query LIKE '%FROM drills WHERE id = $1%FOR UPDATE%'`,
        );
        if (waiting > 0) break;
        if (i > 100) throw new Error('the drill update never waited for the attempt being recorded');
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
      await recording.commitTransaction();
      const response = await put;
      expect(response.status).toBe(409);
      expect(response.body).toMatchObject({ code: 'drill_in_use', details: { kind: 'drill_in_use' } });
    } finally {
      if (recording.isTransactionActive) await recording.rollbackTransaction();
      await recording.release();
    }
  });

  it('should refuse targets that contradict the kind with a 400 naming the target', async () => {
    const orange = await request(http).post('/api/drills').set(teacher.auth).send({ title: 'Grey', kind: 'neutral', targets: [{ hex: '#e07020' }] }).expect(400);
    expect(orange.body).toMatchObject({ statusCode: 400, code: 'validation_failed', details: { 'targets[0]': 'not-neutral' } });
    expect(orange.body.message).toMatch(/too colourful for a grey/);
    const upward = await request(http).post('/api/drills').set(teacher.auth).send({ title: 'Ladder', kind: 'value-ladder', targets: ladder([30, 50, 70]) }).expect(400);
    expect(upward.body).toMatchObject({ code: 'validation_failed', details: { 'targets[1]': 'ladder-step' } });
    expect(upward.body.message).toMatch(/^step 2 \(L\* 50\.0\) is lighter than step 1/);
  });
});
