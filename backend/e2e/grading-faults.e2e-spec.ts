import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { listMessages } from '../../scripts/lib/fake-smtp.mjs';
import { GradingService } from '../src/grading/grading.service';
import { renderScene } from '../src/measurement/testing/photo-scene';
import { createTestApp } from './create-test-app';
import { registerAccount, type TestAccount } from './helpers';

const grey = { L: 55, a: 0, b: 0 };

describe('grading under load and faults (e2e, real PostgreSQL and pg-boss)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;
  let student: TestAccount;
  let drillId: string;
  let photo: Buffer;

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
    const teacher = await registerAccount(app, 'teacher');
    student = await registerAccount(app, 'student');
    const drill = await request(http)
      .post('/api/drills')
      .set(teacher.auth)
      .send({ title: 'Load grey', kind: 'neutral', visibility: 'public', targets: [{ lab: grey }] })
      .expect(201);
    drillId = drill.body.id;
    ({ jpeg: photo } = await renderScene({
      kind: 'neutral', swatches: [{ L: 57, a: 1, b: 2 }], width: 1200, height: 900, cardFraction: 0.55, rotation: -6, tiltX: 4, tiltY: 3,
      ev: 0, cast: 'fluorescent', crossTalk: 0.01, flare: 0.01, vignetting: 0.1, noise: 1.5, jpegQuality: 88, seed: 11,
    }));
  }, 180_000);
  afterAll(async () => {
    await app.close();
  });

  const states = async (ids: string[]) =>
    app.get(DataSource).query<{ id: string; state: string; tries: number }[]>(`SELECT id, state, tries FROM attempts WHERE id = ANY($1)`, [ids]);

  it('should take 50 concurrent uploads and grade every one exactly once', async () => {
    const uploads = await Promise.all(
      Array.from({ length: 50 }, () =>
        request(http).post('/api/attempts').set(student.auth).field('drillId', drillId).attach('photo', photo, 'grey.jpg'),
      ),
    );
    expect(uploads.map((r) => r.status)).toEqual(Array(50).fill(202));
    const ids = uploads.map((r) => r.body.id as string);
    const deadline = Date.now() + 240_000;
    let rows = await states(ids);
    while (rows.some((r) => r.state === 'queued' || r.state === 'measuring') && Date.now() < deadline) {
      await new Promise((resolve) => setTimeout(resolve, 500));
      rows = await states(ids);
    }
    expect(rows.map((r) => r.state)).toEqual(Array(50).fill('graded'));
    expect(rows.every((r) => r.tries === 1)).toBe(true);
  }, 300_000);

  it('should grade an attempt once when three workers take the same job at the same moment', async () => {
    const upload = await request(http).post('/api/attempts').set(student.auth).field('drillId', drillId).attach('photo', photo, 'grey.jpg').expect(202);
    const id = upload.body.id as string;
    const dataSource = app.get(DataSource);
    // Wait for the queue's own grading, then put the attempt back as if its job were delivered again.
    for (let i = 0; i < 240 && (await states([id]))[0].state !== 'graded'; i += 1) await new Promise((r) => setTimeout(r, 250));
    // The marked mail goes out after the mark is written: wait for it before counting.
    const mailsFor = async () => (await listMessages(process.env.OUTBOX_DIR!)).filter((m) => m.text.includes(id)).length;
    for (let i = 0; i < 100 && (await mailsFor()) < 1; i += 1) await new Promise((r) => setTimeout(r, 100));
    expect(await mailsFor()).toBe(1);
    await dataSource.query(`UPDATE attempts SET state = 'queued', mark = NULL, score = NULL, pass = NULL WHERE id = $1`, [id]);

    const grading = app.get(GradingService);
    await Promise.all([grading.grade(id), grading.grade(id), grading.grade(id)]);
    const [row] = await dataSource.query(`SELECT state, score, tries FROM attempts WHERE id = $1`, [id]);
    expect(row.state).toBe('graded');
    expect(row.score).toEqual(expect.any(Number));
    // Each claim bumps `tries`; only the last claim may write, so exactly one more mail goes out.
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailsFor()).toBe(2);
  }, 120_000);

  it('should finish an attempt whose worker died mid-job when the job comes round again', async () => {
    const upload = await request(http).post('/api/attempts').set(student.auth).field('drillId', drillId).attach('photo', photo, 'grey.jpg').expect(202);
    const id = upload.body.id as string;
    for (let i = 0; i < 240 && (await states([id]))[0].state !== 'graded'; i += 1) await new Promise((r) => setTimeout(r, 250));
    // A worker that claimed the job and then died leaves it 'measuring' with its claim counted.
    await app.get(DataSource).query(`UPDATE attempts SET state = 'measuring', mark = NULL, score = NULL WHERE id = $1`, [id]);
    await app.get(GradingService).grade(id); // pg-boss redelivers the expired job: the same call
    const [row] = await states([id]);
    expect(row).toMatchObject({ state: 'graded', tries: 2 });
  }, 120_000);

  it('should leave nothing half-written when the database refuses the attempt', async () => {
    const dataSource = app.get(DataSource);
    const before = await dataSource.query(`SELECT count(*)::int AS n FROM attempts WHERE student_id = $1`, [student.id]);
    // Make the insert fail inside the transaction, as a database going away mid-request would.
    await dataSource.query(`ALTER TABLE attempts ADD CONSTRAINT fail_next CHECK (photo_bytes < 0) NOT VALID`);
    try {
      const response = await request(http).post('/api/attempts').set(student.auth).field('drillId', drillId).attach('photo', photo, 'grey.jpg');
      expect(response.status).toBe(503);
      expect(response.body).toMatchObject({ code: 'service_unavailable', message: expect.stringMatching(/send it again/) });
    } finally {
      await dataSource.query(`ALTER TABLE attempts DROP CONSTRAINT fail_next`);
    }
    const after = await dataSource.query(`SELECT count(*)::int AS n FROM attempts WHERE student_id = $1`, [student.id]);
    expect(after[0].n).toBe(before[0].n);
    const orphanJobs = await dataSource.query(
      `SELECT count(*)::int AS n FROM pgboss.job j WHERE j.name = 'grade-attempt' AND NOT EXISTS (SELECT 1 FROM attempts a WHERE a.id::text = j.data->>'attemptId')`,
    );
    expect(orphanJobs[0].n).toBe(0);
  }, 120_000);
});
