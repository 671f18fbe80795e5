import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { listMessages } from '../../scripts/lib/fake-smtp.mjs';
import { DigestQueue } from '../src/digest/digest-queue.service';
import { parseIsoWeek } from '../src/digest/iso-week';
import { WeeklyDigestService } from '../src/digest/weekly-digest.service';
import { renderScene } from '../src/measurement/testing/photo-scene';
import { createTestApp } from './create-test-app';
import { registerAccount, type TestAccount } from './helpers';

const target = { L: 55, a: 24, b: 40 };
// The built CLI, from the backend folder (where jest runs) or the repository root.
const cliPath = [resolve('dist/cli.js'), resolve('backend/dist/cli.js')].find((path) => existsSync(path)) ?? resolve('dist/cli.js');
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * The weekly digest against the real database, queue and fake SMTP server. The weeks summed up
 * lie in 2024, with this file's attempts and due dates moved there, so that the accounts of the
 * other e2e files (all of them made "now") have nothing to say in those weeks and get no mail.
 */
describe('weekly progress digest (e2e, real PostgreSQL, pg-boss and fake SMTP)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;
  let db: DataSource;
  let teacher: TestAccount;
  let keen: TestAccount; // two attempts in the week
  let quiet: TestAccount; // on the class, sent nothing: the assignment is late
  let optedOut: TestAccount; // sent an attempt but turned the digest off
  let idle: TestAccount; // a self-learner with nothing that week
  let classId: string;
  const outbox = () => listMessages(process.env.OUTBOX_DIR!);
  const mailsTo = async (account: TestAccount, subject?: string) =>
    (await outbox()).filter((m) => m.to.includes(account.email) && (!subject || m.subject.includes(subject)));

  async function upload(who: TestAccount, assignmentId: string, photo: Buffer): Promise<string> {
    const created = await request(http).post('/api/attempts').set(who.auth).field('assignmentId', assignmentId).attach('photo', photo, 'swatch.jpg').expect(202);
    return created.body.id as string;
  }

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
    db = app.get(DataSource);
    teacher = await registerAccount(app, 'teacher', 'Odile Brenn');
    keen = await registerAccount(app, 'student', 'Arlo Keen');
    quiet = await registerAccount(app, 'student', 'Bea Quiet');
    optedOut = await registerAccount(app, 'student', 'Cato Off');
    idle = await registerAccount(app, 'student', 'Dara Idle');
    const klass = await request(http).post('/api/classes').set(teacher.auth).send({ name: 'Thursday earth tones' }).expect(201);
    classId = klass.body.id;
    for (const s of [keen, quiet, optedOut]) {
      await request(http).post('/api/classes/join').set(s.auth).send({ code: klass.body.code }).expect(200);
    }
    const drill = await request(http).post('/api/drills').set(teacher.auth).send({ title: 'Burnt sienna match', kind: 'match', targets: [{ lab: target }] }).expect(201);
    const assignment = await request(http)
      .post('/api/assignments')
      .set(teacher.auth)
      .send({ classId, drillId: drill.body.id, dueAt: new Date(Date.now() + 86_400_000).toISOString() })
      .expect(201);
    const scene = { kind: 'match' as const, width: 1200, height: 900, cardFraction: 0.45, rotation: 4, tiltX: 3, tiltY: -2, ev: 0, cast: 'shade' as const, crossTalk: 0.01, flare: 0.01, vignetting: 0.1, noise: 1.5, jpegQuality: 90 };
    const { jpeg: onTarget } = await renderScene({ ...scene, swatches: [target], seed: 3 });
    const { jpeg: tooPale } = await renderScene({ ...scene, swatches: [{ L: 68, a: 12, b: 22 }], seed: 4 });
    const ids = [await upload(keen, assignment.body.id, onTarget), await upload(keen, assignment.body.id, tooPale), await upload(optedOut, assignment.body.id, onTarget)];
    for (let i = 0; i < 240; i += 1) {
      const rows = await db.query(`SELECT state FROM attempts WHERE id = ANY($1)`, [ids]);
      if (rows.every((r: { state: string }) => r.state === 'graded')) break;
      await sleep(250);
    }
    // Into ISO week 2024-W10 (Monday 4 March): Saturday and Sunday, so the streak is two days;
    // the assignment was due on the Friday.
    await db.query(`UPDATE attempts SET created_at = '2024-03-09T10:00:00Z' WHERE id = $1`, [ids[0]]);
    await db.query(`UPDATE attempts SET created_at = '2024-03-10T15:00:00Z' WHERE id = ANY($1)`, [[ids[1], ids[2]]]);
    await db.query(`UPDATE assignments SET due_at = '2024-03-08T17:00:00Z', created_at = '2024-03-01T09:00:00Z' WHERE id = $1`, [assignment.body.id]);
    await request(http).patch('/api/auth/me').set(optedOut.auth).send({ weeklyDigest: false }).expect(200);
  }, 180_000);
  afterAll(async () => {
    await app.close();
  });

  it("should send a student the week's figures from their progress, the streak, what is due and the way to turn it off", async () => {
    const counts = await app.get(WeeklyDigestService).runWeek(parseIsoWeek('2024-W10'));
    expect(counts.failed).toBe(0);
    expect(counts.sent).toBeGreaterThanOrEqual(3);

    const progress = await request(http).get('/api/progress/me').set(keen.auth).expect(200);
    const week = progress.body.weeks.find((w: { week: string }) => w.week === '2024-03-04');
    expect(week).toMatchObject({ attempts: 2, graded: 2 });
    const [mail, ...more] = await mailsTo(keen, 'the week of 4 March 2024');
    expect(more).toHaveLength(0);
    expect(mail.subject).toBe('Your week at Mixmark: the week of 4 March 2024');
    expect(mail.text).toContain('Hello Arlo Keen,');
    expect(mail.text).toContain(`Attempts: 2\nPassed: ${Math.round(week.passRate * 100)} %\nMean ΔE00 from target: ${week.meanDeltaE.toFixed(1)}`);
    expect(mail.text).toContain(`Value error (|ΔL*|): ${week.meanValueError.toFixed(1)}`);
    expect(mail.text).toContain(`Temperature error (warm–cool index): ${week.meanTemperatureError.toFixed(2)}`);
    expect(mail.text).toContain(`Chroma error (|ΔC′|): ${week.meanChromaError.toFixed(1)}`);
    expect(mail.text).toContain('Practice streak: 2 days');
    const publicUrl = `http://${process.env.HOST ?? '127.0.0.1'}:${process.env.PORT ?? 4310}`;
    expect(mail.text).toContain(`turn them off on your account page:\n${publicUrl}/account`);
    expect(mail.html).toContain(`href="${publicUrl}/account"`);
    expect(mail.text).toContain(`${publicUrl}/student/progress`);

    // On the class but sent nothing: no figures, and the late assignment named.
    const [quietMail] = await mailsTo(quiet, 'the week of 4 March 2024');
    expect(quietMail.text).toContain('You did not send any attempts in the week of 4 March 2024.');
    expect(quietMail.text).toContain('Still to do:\n- Burnt sienna match (Thursday earth tones): due 8 March 2024, late');
  }, 120_000);

  it('should tell the teacher, per class, who handed in, who is behind and what waits for review', async () => {
    const [{ n: failedUnreviewed }] = await db.query(
      `SELECT count(*)::int AS n FROM attempts a JOIN assignments s ON s.id = a.assignment_id WHERE s.class_id = $1 AND a.state = 'graded' AND a.pass = false AND a.override_pass IS NULL`,
      [classId],
    );
    const [mail, ...more] = await mailsTo(teacher, 'the week of 4 March 2024');
    expect(more).toHaveLength(0);
    expect(mail.subject).toBe('Your classes at Mixmark: the week of 4 March 2024');
    expect(mail.text).toContain('Thursday earth tones\n- 3 attempts sent that week;');
    expect(mail.text).toContain(`${failedUnreviewed} ${failedUnreviewed === 1 ? 'attempt' : 'attempts'} marked below the pass line and waiting for your review.`);
    expect(mail.text).toContain('- Burnt sienna match, due 8 March 2024: handed in by Arlo Keen, Cato Off; behind: Bea Quiet (late).');
    expect(mail.text).toContain(`/teacher/classes/${classId}/gradebook`);
    expect(mail.text).toMatch(/\/account\n/);
  });

  it('should send nothing to someone who turned the digest off, or who has nothing that week', async () => {
    expect(await mailsTo(optedOut, 'the week of')).toHaveLength(0);
    expect(await mailsTo(idle, 'the week of')).toHaveLength(0);
    const rows = await db.query(`SELECT user_id FROM weekly_digests WHERE user_id = ANY($1)`, [[optedOut.id, idle.id]]);
    expect(rows).toHaveLength(0);
  });

  it('should send the week once when it runs again, twice at the same time, and through the queue', async () => {
    const service = app.get(WeeklyDigestService);
    const week = parseIsoWeek('2024-W10');
    const again = await Promise.all([service.runWeek(week), service.runWeek(week)]);
    expect(again.map((c) => c.sent)).toEqual([0, 0]);
    await app.get(DigestQueue).enqueueWeek('2024-W10');
    // The same week again, from scratch, through the queue: make a fresh week for one student.
    await db.query(
      `UPDATE attempts SET created_at = '2024-03-13T09:00:00Z' WHERE id = (SELECT id FROM attempts WHERE student_id = $1 ORDER BY created_at LIMIT 1)`,
      [keen.id],
    );
    // Through the queue alone (as the schedule does), the week job sent twice.
    const queue = app.get(DigestQueue);
    await Promise.all([queue.enqueueWeek('2024-W11'), queue.enqueueWeek('2024-W11')]);
    // Wait until every digest job of that week has finished. Under a full CI run on 2 cores the
    // queue's polling can take well over 30 s to work them all (a run once gave up at 30 s with
    // a person's job still waiting, and the direct run below then sent it), so allow 90 s.
    for (let i = 0; i < 360; i += 1) {
      const [{ n }] = await db.query(
        `SELECT count(*)::int AS n FROM pgboss.job WHERE name IN ('weekly-digest', 'weekly-digest-person') AND state < 'completed'`,
      );
      if (n === 0 && (await mailsTo(keen, 'the week of 11 March 2024')).length > 0) break;
      await sleep(250);
    }
    expect(await mailsTo(keen, 'the week of 11 March 2024')).toHaveLength(1);
    await queue.enqueueWeek('2024-W11');
    expect((await service.runWeek(parseIsoWeek('2024-W11'))).sent).toBe(0);
    await sleep(3000); // room for the last week job to fan out, if it wrongly did
    for (const account of [keen, quiet, teacher]) expect(await mailsTo(account, 'the week of 4 March 2024')).toHaveLength(1);
    expect(await mailsTo(keen, 'the week of 11 March 2024')).toHaveLength(1);
  }, 180_000);

  it('should send a week from the command line, once', async () => {
    await db.query(
      `UPDATE attempts SET created_at = '2024-03-20T09:00:00Z' WHERE id = (SELECT id FROM attempts WHERE student_id = $1 ORDER BY created_at DESC LIMIT 1)`,
      [keen.id],
    );
    const cli = (week: string) =>
      new Promise<{ code: number | null; out: string }>((resolve) => {
        const child = spawn(process.execPath, [cliPath, 'digest', '--week', week], { env: process.env });
        let out = '';
        child.stdout.on('data', (chunk) => (out += chunk));
        child.stderr.on('data', (chunk) => (out += chunk));
        child.on('exit', (code) => resolve({ code, out }));
      });
    const first = await cli('2024-W12');
    expect(first).toMatchObject({ code: 0, out: expect.stringMatching(/^weekly digest 2024-W12: [1-9]\d* sent, 0 sent before, \d+ with nothing to say, 0 failed\n$/) });
    const second = await cli('2024-W12');
    expect(second).toMatchObject({ code: 0, out: expect.stringMatching(/^weekly digest 2024-W12: 0 sent, /) });
    expect(await mailsTo(keen, 'the week of 18 March 2024')).toHaveLength(1);
    const bad = await cli('2024-12');
    expect(bad).toMatchObject({ code: 1, out: 'mixmark cli: Expected an ISO week such as 2031-W10 (year, "W", week 01–53) but received "2024-12"\n' });
  }, 120_000);
});
