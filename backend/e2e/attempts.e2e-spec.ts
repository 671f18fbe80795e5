import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { deltaE2000, type Lab } from '@mixmark/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import exifr from 'exifr';
import sharp from 'sharp';
import { renderScene } from '../src/measurement/testing/photo-scene';
import { gpsExif, privateStrings, xmpPacket } from '../src/storage/testing/metadata-fixtures';
import { createTestApp } from './create-test-app';
import { latestMailTo, registerAccount, type TestAccount } from './helpers';

// An in-gamut burnt orange, invented for the test.
const target: Lab = { L: 52, a: 28, b: 40 };

async function waitForGrading(http: ReturnType<INestApplication['getHttpServer']>, auth: { authorization: string }, id: string, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const { body } = await request(http).get(`/api/attempts/${id}`).set(auth).expect(200);
    if (!['queued', 'measuring'].includes(body.state)) return body;
    if (Date.now() > deadline) throw new Error(`attempt ${id} still ${body.state} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

describe('attempts: upload, queued grading, override (e2e, real PostgreSQL, pg-boss, SMTP)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;
  let teacher: TestAccount;
  let student: TestAccount;
  let otherStudent: TestAccount;
  let otherTeacher: TestAccount;
  let assignmentId: string;
  let classId: string;
  let photo: Buffer;

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
    [teacher, student, otherStudent, otherTeacher] = await Promise.all([
      registerAccount(app, 'teacher'),
      registerAccount(app, 'student'),
      registerAccount(app, 'student'),
      registerAccount(app, 'teacher'),
    ]);
    const klass = await request(http).post('/api/classes').set(teacher.auth).send({ name: 'Saturday mixing' }).expect(201);
    classId = klass.body.id;
    await request(http).post('/api/classes/join').set(student.auth).send({ code: klass.body.code }).expect(200);
    const drill = await request(http)
      .post('/api/drills')
      .set(teacher.auth)
      .send({ title: 'Burnt orange', kind: 'match', targets: [{ lab: target }] })
      .expect(201);
    const assignment = await request(http)
      .post('/api/assignments')
      .set(teacher.auth)
      .send({ classId: klass.body.id, drillId: drill.body.id, dueAt: new Date(Date.now() + 86_400_000).toISOString() })
      .expect(201);
    assignmentId = assignment.body.id;
    // A phone-like photo of the match card over a swatch painted exactly on target, under warm light.
    ({ jpeg: photo } = await renderScene({
      kind: 'match', swatches: [target], width: 1200, height: 900, cardFraction: 0.45, rotation: 8, tiltX: 6, tiltY: -4,
      ev: -0.3, cast: 'shade', crossTalk: 0.01, flare: 0.01, vignetting: 0.1, noise: 1.5, jpegQuality: 90, seed: 7,
    }));
  }, 180_000);
  afterAll(async () => {
    await app.close();
  });

  it('should queue the photo, grade it once through the pipeline and mail the student', async () => {
    const created = await request(http)
      .post('/api/attempts')
      .set(student.auth)
      .field('assignmentId', assignmentId)
      .attach('photo', photo, { filename: 'swatch.jpg', contentType: 'image/jpeg' })
      .expect(202);
    expect(created.body.state).toMatch(/queued|measuring|graded/);

    const graded = await waitForGrading(http, student.auth, created.body.id);
    expect(graded.state).toBe('graded');
    expect(graded.readings).toHaveLength(1);
    // The reading is within the measurement's stated accuracy of what was painted (docs/measurement.md).
    const miss = deltaE2000(target, graded.readings[0].lab);
    expect(miss).toBeLessThan(2);
    expect(graded.pass).toBe(true);
    expect(graded.machine).toEqual({ score: graded.score, pass: true });
    expect(graded.hasOverlay).toBe(true);

    const [{ tries }] = await app.get(DataSource).query('SELECT tries FROM attempts WHERE id = $1', [created.body.id]);
    expect(tries).toBe(1);
    const mail = await latestMailTo(student.email);
    expect(mail.subject).toContain('Burnt orange');

    const overlay = await request(http).get(`/api/attempts/${created.body.id}/overlay`).set(student.auth).expect(200);
    expect(overlay.headers['content-type']).toBe('image/jpeg');
    // Drawn on this first view from the stored photo, at most 1280 px long, then kept: the
    // teacher's view gets the same bytes.
    const drawn = await sharp(overlay.body).metadata();
    expect(drawn.format).toBe('jpeg');
    expect(Math.max(drawn.width!, drawn.height!)).toBeLessThanOrEqual(1280);
    const again = await request(http).get(`/api/attempts/${created.body.id}/overlay`).set(teacher.auth).expect(200);
    expect(Buffer.compare(again.body, overlay.body)).toBe(0);
    // An attempt graded when overlays were PNG keeps its `.png` key: drawn and served as PNG.
    const db = app.get(DataSource);
    await db.query(`UPDATE attempts SET overlay_key = $2 WHERE id = $1`, [created.body.id, `attempts/${created.body.id}/overlay-before.png`]);
    const older = await request(http).get(`/api/attempts/${created.body.id}/overlay`).set(student.auth).expect(200);
    expect(older.headers['content-type']).toBe('image/png');
    expect((await sharp(older.body).metadata()).format).toBe('png');
    await db.query(`UPDATE attempts SET overlay_key = $2 WHERE id = $1`, [created.body.id, `attempts/${created.body.id}/overlay.jpg`]);
    const stored = await request(http).get(`/api/attempts/${created.body.id}/photo`).set(student.auth).expect(200);
    expect(stored.headers['content-type']).toBe('image/jpeg');

    const status = await request(http).get(`/api/assignments/${assignmentId}`).set(student.auth).expect(200);
    expect(status.body.status).toBe('passed');

    // Teacher overrides: the machine mark stays beside the teacher's.
    const overridden = await request(http)
      .patch(`/api/attempts/${created.body.id}/override`)
      .set(teacher.auth)
      .send({ score: 60, pass: false, comment: 'Right colour, but the wash is streaky: lay it wetter.' })
      .expect(200);
    expect(overridden.body).toMatchObject({ score: 60, pass: false, machine: { pass: true }, override: { score: 60, pass: false } });
    await request(http).patch(`/api/attempts/${created.body.id}/override`).set(otherTeacher.auth).send({ score: 1, pass: false }).expect(404);
    await request(http).get(`/api/attempts/${created.body.id}`).set(otherStudent.auth).expect(404);
    const teacherList = await request(http).get(`/api/attempts?assignmentId=${assignmentId}`).set(teacher.auth).expect(200);
    expect(teacherList.body.map((a: { id: string }) => a.id)).toContain(created.body.id);

    // Progress and the gradebook reflect the overridden mark.
    const progress = await request(http).get('/api/progress/me').set(student.auth).expect(200);
    expect(progress.body.totals).toMatchObject({ attempts: 1, graded: 1, passed: 0 });
    expect(progress.body.weeks).toHaveLength(1);
    expect(progress.body.weeks[0].meanDeltaE).toBeCloseTo(miss, 1);
    expect(progress.body.streakDays).toBe(1);
    await request(http).get(`/api/progress/students/${student.id}`).set(teacher.auth).expect(200);
    await request(http).get(`/api/progress/students/${student.id}`).set(otherTeacher.auth).expect(404);

    const book = await request(http).get(`/api/classes/${classId}/gradebook`).set(teacher.auth).expect(200);
    expect(book.body.students[0].cells[assignmentId]).toMatchObject({ status: 'failed', attempts: 1, latestScore: 60, bestScore: 60 });
    const csv = await request(http).get(`/api/classes/${classId}/gradebook.csv`).set(teacher.auth).expect(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toBe('attachment; filename="gradebook-Saturday-mixing.csv"');
    expect(csv.text.split('\r\n')[1]).toMatch(/,60,Not passed yet$/);
    await request(http).get(`/api/classes/${classId}/gradebook`).set(otherTeacher.auth).expect(404);
  });

  it('should grade a PNG sent with GPS in it, keep it as a PNG and serve it without the location', async () => {
    // The same scene as a PNG carrying camera EXIF, GPS and XMP, as a phone might share it.
    const png = await sharp(photo).withExif(gpsExif).withXmp(xmpPacket).png().toBuffer();
    expect(await exifr.gps(png)).toMatchObject({ latitude: expect.any(Number) });
    const created = await request(http)
      .post('/api/attempts')
      .set(student.auth)
      .field('assignmentId', assignmentId)
      .attach('photo', png, { filename: 'swatch.png', contentType: 'image/png' })
      .expect(202);
    const graded = await waitForGrading(http, student.auth, created.body.id);
    expect(graded.state).toBe('graded');
    expect(deltaE2000(target, graded.readings[0].lab)).toBeLessThan(2);
    const stored = await request(http).get(`/api/attempts/${created.body.id}/photo`).set(student.auth).buffer(true).expect(200);
    expect(stored.headers['content-type']).toBe('image/png');
    const bytes = Buffer.from(stored.body);
    expect(await exifr.gps(bytes).catch(() => undefined)).toBeUndefined();
    for (const text of privateStrings) expect(bytes.includes(text)).toBe(false);
    // Lossless: the stored PNG decodes to the very pixels that were sent.
    const [sent, kept] = await Promise.all([png, bytes].map((b) => sharp(b).raw().toBuffer()));
    expect(kept.equals(sent)).toBe(true);
  }, 120_000);

  it('should ask for a retake, with the quality code, when the card is not in the photo', async () => {
    const { jpeg } = await renderScene({
      kind: 'match', swatches: [target], width: 1200, height: 900, cardFraction: 0.4, rotation: 0, tiltX: 0, tiltY: 0,
      offset: [0.75, 0], ev: 0, cast: 'neutral', crossTalk: 0, flare: 0, vignetting: 0, noise: 1, jpegQuality: 90, seed: 3,
    });
    const created = await request(http).post('/api/attempts').set(student.auth).field('assignmentId', assignmentId).attach('photo', jpeg, 'off.jpg').expect(202);
    const done = await waitForGrading(http, student.auth, created.body.id);
    expect(done.state).toBe('needs-retake');
    expect(done.quality.errors[0].code).toMatch(/CARD_NOT_FOUND|CARD_PARTLY_OUTSIDE/);
  });

  it('should refuse a text file named .jpg with 415, by its bytes', async () => {
    const response = await request(http)
      .post('/api/attempts')
      .set(student.auth)
      .field('assignmentId', assignmentId)
      .attach('photo', Buffer.from('this is not a photo at all'), { filename: 'swatch.jpg', contentType: 'image/jpeg' })
      .expect(415);
    expect(response.body).toMatchObject({ statusCode: 415, code: expect.stringMatching(/^FILE_UN(SUPPORTED|READABLE)$/) });
    expect(response.body.message).toEqual(expect.any(String));
  });

  it('should refuse an upload over 20 MB with 413 and store nothing', async () => {
    const before = await app.get(DataSource).query('SELECT count(*)::int AS n FROM attempts');
    const response = await request(http)
      .post('/api/attempts')
      .set(student.auth)
      .field('assignmentId', assignmentId)
      .attach('photo', Buffer.alloc(21 * 1024 * 1024, 0xff), 'huge.jpg');
    expect(response.status).toBe(413);
    expect(response.body.code).toBe('payload_too_large');
    const after = await app.get(DataSource).query('SELECT count(*)::int AS n FROM attempts');
    expect(after[0].n).toBe(before[0].n);
  });

  it('should say which field is missing', async () => {
    const response = await request(http).post('/api/attempts').set(student.auth).field('assignmentId', assignmentId).expect(400);
    expect(response.body).toMatchObject({ code: 'photo_missing', details: { photo: 'required' } });
    await request(http).post('/api/attempts').set(otherStudent.auth).field('assignmentId', assignmentId).attach('photo', photo, 'x.jpg').expect(404);
  });
});
