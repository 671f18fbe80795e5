import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { createServer, type AddressInfo } from 'node:net';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { listMessages } from '../../scripts/lib/fake-smtp.mjs';
import { dataSourceOptions } from '../src/database/data-source';
import { renderScene } from '../src/measurement/testing/photo-scene';
import { createTestApp } from './create-test-app';
import { registerAccount, testPassword, withEnv, type TestAccount } from './helpers';
import { startThrowawayCluster, type ThrowawayCluster } from './throwaway-cluster.mjs';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const built = (file: string) => [resolve('dist', file), resolve('backend/dist', file)].find((p) => existsSync(p)) ?? resolve('dist', file);
const workerPath = built('worker.js');
const serverPath = built('main.js');

async function until<T>(what: string, probe: () => Promise<T | undefined | false>, timeoutMs = 60_000, everyMs = 100): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`gave up waiting for ${what} after ${timeoutMs} ms`);
    await sleep(everyMs);
  }
}

/** A built backend entry point (`node dist/….js`) as a process of its own, once it says `ready`. */
async function startProcess(entry: string, ready: string, env: Record<string, string>): Promise<{ child: ChildProcess; exited: Promise<number | null>; output: () => string }> {
  const child = spawn(process.execPath, [entry], { env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  child.stdout!.on('data', (chunk) => (output += chunk));
  child.stderr!.on('data', (chunk) => (output += chunk));
  const exited = new Promise<number | null>((r) => child.on('exit', (code) => r(code)));
  await until(`${entry} to start`, async () => output.includes(ready) || child.exitCode !== null, 60_000);
  if (child.exitCode !== null) throw new Error(`${entry} did not start:\n${output}`);
  return { child, exited, output: () => output };
}

/** A real grading worker (`node dist/worker.js`). */
const startWorker = (env: Record<string, string>) => startProcess(workerPath, 'working the queue', env);

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  const { port } = server.address() as AddressInfo;
  await new Promise((r) => server.close(r));
  return port;
}

/**
 * Faults with real processes and a real PostgreSQL server, on a cluster of this file's own
 * (stopping the shared e2e cluster would break the files running beside this one, and a queue of
 * its own means no other file's server takes these jobs).
 */
describe('grading when processes die and the database restarts (e2e, real processes)', () => {
  let cluster: ThrowawayCluster;
  let photo: Buffer;
  const storageDir = mkdtempSync(join(tmpdir(), 'mixmark-faults-photos-'));

  beforeAll(async () => {
    cluster = await startThrowawayCluster();
    ({ jpeg: photo } = await renderScene({
      kind: 'neutral', swatches: [{ L: 57, a: 1, b: 2 }], width: 1600, height: 1200, cardFraction: 0.55, rotation: -6, tiltX: 4, tiltY: 3,
      ev: 0, cast: 'fluorescent', crossTalk: 0.01, flare: 0.01, vignetting: 0.1, noise: 1.5, jpegQuality: 88, seed: 11,
    }));
  }, 180_000);
  afterAll(async () => {
    await cluster?.remove();
    rmSync(storageDir, { recursive: true, force: true });
  });

  async function setUp(app: INestApplication): Promise<{ student: TestAccount; drillId: string }> {
    const teacher = await registerAccount(app, 'teacher');
    const student = await registerAccount(app, 'student');
    const drill = await request(app.getHttpServer())
      .post('/api/drills')
      .set(teacher.auth)
      .send({ title: 'Fault grey', kind: 'neutral', visibility: 'public', targets: [{ lab: { L: 55, a: 0, b: 0 } }] })
      .expect(201);
    return { student, drillId: drill.body.id };
  }

  it('should grade an attempt exactly once when its worker is killed (SIGKILL) mid-job and another worker starts', async () => {
    const databaseUrl = await cluster.migratedDatabase('faults_worker');
    // Short expiry so the dead worker's job comes round within the test; the web server here
    // only takes uploads, the worker processes grade.
    const env = {
      DATABASE_URL: databaseUrl,
      STORAGE_DIR: join(storageDir, 'worker'),
      GRADING_EXPIRE_SECONDS: '4',
      QUEUE_MAINTENANCE_SECONDS: '1',
      DIGEST_CRON: 'off',
      NODE_ENV: 'test',
      LOG_LEVEL: 'warn',
    };
    const app = await withEnv({ ...env, GRADING_IN_SERVER: 'false' }, () => createTestApp());
    const db = app.get(DataSource);
    // PostgreSQL drops a dead client's statement within 200 ms instead of running it when it can.
    await db.query(`ALTER DATABASE faults_worker SET client_connection_check_interval = '200ms'`);
    const workers: Array<Awaited<ReturnType<typeof startWorker>>> = [];
    try {
      const { student, drillId } = await setUp(app);
      const first = await startWorker(env);
      workers.push(first);
      const upload = await request(app.getHttpServer()).post('/api/attempts').set(student.auth).field('drillId', drillId).attach('photo', photo, 'grey.jpg').expect(202);
      const id = upload.body.id as string;
      const row = async () => (await db.query(`SELECT state, tries FROM attempts WHERE id = $1`, [id]))[0] as { state: string; tries: number };
      await until('the worker to claim the attempt', async () => (await row()).state === 'measuring', 60_000, 10);

      // Hold the attempt's row: the worker measures, then waits on our lock to write the mark.
      // With it seen waiting there, the kill lands mid-job for certain.
      const holder = db.createQueryRunner();
      await holder.connect();
      await holder.startTransaction();
      const [locked] = await holder.query(`SELECT state, tries FROM attempts WHERE id = $1 FOR UPDATE`, [id]);
      expect(locked).toEqual({ state: 'measuring', tries: 1 });
      const [{ pid: holderPid }] = await holder.query(`SELECT pg_backend_pid() AS pid`);
      const blocked = async () =>
        (await db.query(`SELECT count(*)::int AS n FROM pg_stat_activity WHERE $1 = ANY(pg_blocking_pids(pid))`, [holderPid]))[0].n as number;
      await until('the worker to wait to write its mark', async () => (await blocked()) === 1, 60_000, 20);
      first.child.kill('SIGKILL');
      expect(await first.exited).toBeNull(); // killed by the signal, no exit code
      await until('PostgreSQL to drop the dead worker\'s statement', async () => (await blocked()) === 0, 30_000);
      await holder.rollbackTransaction();
      await holder.release();
      expect(await row()).toEqual({ state: 'measuring', tries: 1 });

      const mailsFor = async () => (await listMessages(process.env.OUTBOX_DIR!)).filter((m) => m.text.includes(id)).length;
      expect(await mailsFor()).toBe(0);

      workers.push(await startWorker(env));
      await until('the new worker to grade the attempt', async () => (await row()).state === 'graded', 90_000, 200);
      expect(await row()).toEqual({ state: 'graded', tries: 2 });
      // The job: retried once after it expired, and completed by the new worker.
      const job = async () => (await db.query(`SELECT state, retry_count FROM pgboss.job WHERE name = 'grade-attempt' AND data->>'attemptId' = $1`, [id]))[0];
      await until('the job to complete', async () => (await job()).state === 'completed', 30_000);
      expect(await job()).toEqual({ state: 'completed', retry_count: 1 });
      // The marked mail follows the write: wait for it, then make sure no second one comes.
      await until('the marked mail', async () => (await mailsFor()) >= 1, 10_000);
      await sleep(2000);
      expect(await mailsFor()).toBe(1);
    } finally {
      for (const worker of workers) if (worker.child.exitCode === null && worker.child.signalCode === null) worker.child.kill('SIGTERM');
      await Promise.all(workers.map((worker) => worker.exited));
      await app.close();
    }
  }, 240_000);

  it('should fail uploads cleanly while the database restarts, leave nothing half-written, and recover', async () => {
    const databaseUrl = await cluster.migratedDatabase('faults_restart');
    const photosDir = join(storageDir, 'restart');
    const port = await freePort();
    // A real server process (`node dist/main.js`) grading in itself. A job whose grading the
    // restart cut off stays active in the queue until it expires, then comes round again: a short
    // expiry keeps that within the test.
    const server = await startProcess(serverPath, 'Mixmark listening', {
      DATABASE_URL: databaseUrl,
      STORAGE_DIR: photosDir,
      PORT: String(port),
      HOST: '127.0.0.1',
      GRADING_IN_SERVER: 'true',
      GRADING_CONCURRENCY: '2',
      GRADING_EXPIRE_SECONDS: '5',
      QUEUE_MAINTENANCE_SECONDS: '1',
      DIGEST_CRON: 'off',
      NODE_ENV: 'test',
      LOG_LEVEL: 'log',
    });
    const http = `http://127.0.0.1:${port}`;
    const db = new DataSource(dataSourceOptions({ url: databaseUrl, poolSize: 2 }));
    await db.initialize();
    try {
      const register = async (role: 'teacher' | 'student') =>
        (await request(http).post('/api/auth/register').send({ email: `${role}-${randomUUID()}@studio.test`, password: testPassword, displayName: `Restart ${role}`, role }).expect(201)).body
          .accessToken as string;
      const teacherToken = await register('teacher');
      const studentToken = await register('student');
      const drill = await request(http)
        .post('/api/drills')
        .set('authorization', `Bearer ${teacherToken}`)
        .send({ title: 'Restart grey', kind: 'neutral', visibility: 'public', targets: [{ lab: { L: 55, a: 0, b: 0 } }] })
        .expect(201);
      const replies: Array<{ status: number; body: Record<string, unknown>; afterRestart: boolean }> = [];
      let restarted = false;
      let stopUploading = false;
      const uploader = async () => {
        while (!stopUploading) {
          const reply = await request(http).post('/api/attempts').set('authorization', `Bearer ${studentToken}`).field('drillId', drill.body.id).attach('photo', photo, 'grey.jpg');
          replies.push({ status: reply.status, body: reply.body, afterRestart: restarted });
          await sleep(50);
        }
      };
      const uploaders = [uploader(), uploader(), uploader()];
      await until('the first uploads', async () => replies.length >= 3, 60_000);
      await cluster.stop();
      await sleep(1500);
      await cluster.start();
      restarted = true;
      await until('the health check to pass again', async () => (await request(http).get('/api/health')).status === 200, 60_000, 250);
      await until('uploads to succeed again', async () => replies.filter((r) => r.afterRestart && r.status === 202).length >= 3, 60_000, 100);
      stopUploading = true;
      await Promise.all(uploaders);
      expect(server.child.exitCode).toBeNull(); // the server lived through it

      // Every reply is a success or one of our JSON errors (a 5xx), nothing else.
      for (const reply of replies) {
        if (reply.status === 202) continue;
        expect(reply.status).toBeGreaterThanOrEqual(500);
        expect(reply.body).toEqual({ statusCode: reply.status, code: expect.stringMatching(/^(database_unavailable|service_unavailable)$/), message: expect.any(String) });
      }
      const failed = replies.filter((r) => r.status !== 202);
      expect(failed.length).toBeGreaterThan(0); // the restart did hit uploads
      const accepted = replies.filter((r) => r.status === 202).map((r) => r.body.id as string);

      // All attempts end graded: the queue recovered too.
      await until(
        'every attempt to be graded',
        async () => (await db.query(`SELECT count(*)::int AS n FROM attempts WHERE state IN ('queued', 'measuring')`))[0].n === 0,
        120_000,
        500,
      ).catch(async (error: Error) => {
        const left = await db.query(`SELECT a.id, a.state, a.tries, j.state AS job FROM attempts a LEFT JOIN pgboss.job j ON j.data->>'attemptId' = a.id::text WHERE a.state IN ('queued', 'measuring')`);
        throw new Error(`${error.message}; still waiting: ${JSON.stringify(left)}`);
      });
      const rows: Array<{ id: string; state: string }> = await db.query(`SELECT id, state FROM attempts`);
      const rowIds = new Set(rows.map((r) => r.id));
      for (const id of accepted) expect(rowIds.has(id)).toBe(true);
      expect(rows.every((r) => r.state === 'graded')).toBe(true);
      // No row without its stored photo and its job; no stored photo (or half-written file) without its row.
      const stored = readdirSync(join(photosDir, 'attempts'));
      expect(stored.filter((id) => existsSync(join(photosDir, 'attempts', id, 'photo.jpg'))).sort()).toEqual([...rowIds].sort());
      const partials = stored.flatMap((id) => readdirSync(join(photosDir, 'attempts', id)).filter((file) => file.endsWith('.partial')));
      expect(partials).toEqual([]);
      const jobs: Array<{ attempt_id: string }> = await db.query(`SELECT DISTINCT data->>'attemptId' AS attempt_id FROM pgboss.job WHERE name = 'grade-attempt'`);
      expect(jobs.map((j) => j.attempt_id).sort()).toEqual([...rowIds].sort());
      console.log(
        `database restart: ${replies.length} uploads, ${accepted.length} accepted, ${failed.length} refused ` +
          `(${[...new Set(failed.map((r) => `${r.status} ${r.body.code}`))].join(', ')}), ${rows.length} attempts stored and graded`,
      );
    } finally {
      await db.destroy();
      server.child.kill('SIGTERM');
      await server.exited;
    }
  }, 300_000);
});
