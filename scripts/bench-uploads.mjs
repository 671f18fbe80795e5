// `npm run bench:uploads -w backend`: 4 MB phone-like photos uploaded to the real server and
// graded by real worker processes, end to end (upload → stored → queued → measured → graded),
// beside the floor measured in the same run: the same photo through the same code in this process
// (the upload checks + metadata strip, and the measurement), one photo at a time on one core, with
// the overlay drawing workers did per photo before it moved to the first view; and
// the metadata step alone, lossless strip (storablePhoto) beside the sharp re-encode it replaced.
// Prints photos/s, photos/s per core and the peak memory (VmHWM) of the server and each worker.
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildIfStale } from './lib/builds.mjs';
import { runMain } from './lib/errors.mjs';
import { startFakeSmtp } from './lib/fake-smtp.mjs';
import { waitForOk } from './lib/http.mjs';
import { serviceNodeFlags } from './lib/node-flags.mjs';
import { freePort } from './lib/ports.mjs';
import { run } from './lib/proc.mjs';
import { rootDir } from './lib/project.mjs';
import { startTestCluster } from './lib/test-cluster.mjs';

const PHOTOS = Number(process.env.BENCH_PHOTOS ?? 24);
const UPLOAD_CONCURRENCY = Number(process.env.BENCH_UPLOAD_CONCURRENCY ?? 4);
const CORES = availableParallelism();
const WORKERS = Number(process.env.BENCH_WORKERS ?? CORES);
const FLOOR_RUNS = Number(process.env.BENCH_FLOOR_RUNS ?? 6);

const ticksPerSecond = 100; // USER_HZ on Linux
/** CPU seconds a process has used so far (user + system), from /proc/<pid>/stat. */
function cpuSecondsOf(pid) {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').replace(/^.*\) /, '').split(' ');
  return (Number(fields[11]) + Number(fields[12])) / ticksPerSecond;
}

/** Peak and current resident memory of a process, MB, from /proc (Linux). */
function memoryOf(pid) {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (field) => Number(new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(status)?.[1] ?? NaN);
  return { peakMb: kb('VmHWM') / 1024, rssMb: kb('VmRSS') / 1024 };
}

function startEntry(entry, env, ready) {
  const child = spawn(process.execPath, [...serviceNodeFlags, join(rootDir, 'backend/dist', entry)], { env, stdio: ['ignore', 'pipe', 'inherit'] });
  let out = '';
  child.stdout.on('data', (chunk) => (out += chunk));
  return new Promise((resolve, reject) => {
    const timer = setInterval(() => {
      if (out.includes(ready)) {
        clearInterval(timer);
        resolve(child);
      } else if (child.exitCode !== null) {
        clearInterval(timer);
        reject(new Error(`${entry} exited before it was ready:\n${out}`));
      }
    }, 100);
  });
}

async function stop(child) {
  if (!child || child.exitCode !== null) return;
  await new Promise((resolve) => {
    child.once('exit', resolve);
    child.kill('SIGTERM');
  });
}

runMain(async () => {
  const { default: pg } = await import('pg');
  await buildIfStale(rootDir, ['common', 'backend'], { log: (line) => console.error(line) });
  const require = (await import('node:module')).createRequire(import.meta.url);
  const { renderScene } = require(join(rootDir, 'backend/dist/measurement/testing/photo-scene.js'));
  const { measurePhoto } = require(join(rootDir, 'backend/dist/measurement/measure-photo.js'));
  const { checkPhoto, sanitisePhoto } = require(join(rootDir, 'backend/dist/measurement/decode-photo.js'));
  const { storablePhoto } = require(join(rootDir, 'backend/dist/storage/storable-photo.js'));
  const { overlayPlan, renderOverlay, renderOverlayFromPhoto } = require(join(rootDir, 'backend/dist/measurement/render-overlay.js'));

  // The floor runs image work as the server and workers do (IMAGE_THREADS, default 1 thread per operation).
  require('sharp').concurrency(Number(process.env.IMAGE_THREADS ?? 1));
  const load = loadavg()[0];
  console.error(`Rendering a 12 MP synthetic phone photo (load average ${load.toFixed(2)} on ${CORES} cores)...`);
  const { jpeg } = await renderScene({
    kind: 'neutral', swatches: [{ L: 57, a: 1, b: 2 }], width: 4000, height: 3000, cardFraction: 0.35, rotation: -6, tiltX: 4, tiltY: 3,
    ev: 0, cast: 'fluorescent', crossTalk: 0.01, flare: 0.01, vignetting: 0.1, noise: 7, jpegQuality: 95, seed: 11,
  });

  // The floor: the same work, in this process, one photo at a time (after one warm-up).
  const limits = { maxBytes: 20 * 1024 * 1024, maxPixels: 100_000_000 };
  await measurePhoto((await storablePhoto(jpeg, limits)).bytes);
  let measureMs = 0;
  let pipelineMs = 0;
  let overlayMs = 0;
  let firstViewMs = 0;
  let cpu = { user: 0, system: 0 };
  for (let i = 0; i < FLOOR_RUNS; i += 1) {
    const cpu0 = process.cpuUsage();
    const t0 = performance.now();
    const { bytes: stored } = await storablePhoto(jpeg, limits); // checks included
    const t1 = performance.now();
    const detail = await measurePhoto(stored);
    const plan = overlayPlan(detail);
    const t2 = performance.now();
    const spent = process.cpuUsage(cpu0);
    cpu = { user: cpu.user + spent.user, system: cpu.system + spent.system };
    // What workers drew per attempt until December 2026, and what the first view draws now.
    await renderOverlay(detail);
    const t3 = performance.now();
    await renderOverlayFromPhoto(stored, plan);
    firstViewMs += performance.now() - t3;
    overlayMs += t3 - t2;
    measureMs += t2 - t1;
    pipelineMs += t2 - t0;
  }
  const floorCpuPerPhoto = (cpu.user + cpu.system) / 1e6 / FLOOR_RUNS;
  const floorMeasure = (1000 * FLOOR_RUNS) / measureMs;
  const floorPipeline = (1000 * FLOOR_RUNS) / pipelineMs;
  const floorWithOverlay = (1000 * FLOOR_RUNS) / (pipelineMs + overlayMs);
  const floorPeakMb = memoryOf(process.pid).peakMb;

  // The metadata step alone: what the server does to each upload before storing it.
  const { method } = await storablePhoto(jpeg, limits);
  const timeEach = async (work) => {
    await work();
    const t0 = performance.now();
    for (let i = 0; i < FLOOR_RUNS; i += 1) await work();
    return (performance.now() - t0) / FLOOR_RUNS;
  };
  const stripMs = await timeEach(() => storablePhoto(jpeg, limits));
  const reencodeMs = await timeEach(async () => {
    await checkPhoto(jpeg, limits);
    await sanitisePhoto(jpeg, limits);
  });

  const testCluster = await startTestCluster();
  const storage = mkdtempSync(join(tmpdir(), 'mixmark-bench-uploads-'));
  const smtp = await startFakeSmtp({ port: 0, dir: join(storage, 'outbox') });
  let server;
  const workers = [];
  try {
    await testCluster.cluster.ensureDatabase('bench_uploads');
    const port = await freePort();
    const env = {
      ...process.env, NODE_ENV: 'production', LOG_LEVEL: 'log', DATABASE_URL: testCluster.cluster.url('bench_uploads'), PORT: String(port),
      JWT_SECRET: 'bench-secret-bench-secret-bench-secret-0001', STORAGE_DIR: join(storage, 'photos'), SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
      OUTBOX_DIR: join(storage, 'outbox'), GRADING_IN_SERVER: 'false', GRADING_CONCURRENCY: '1', DIGEST_CRON: 'off', BCRYPT_ROUNDS: '4',
    };
    await run(process.execPath, [join(rootDir, 'backend/dist/cli.js'), 'migrate'], { env, capture: true });
    server = await startEntry('main.js', env, 'Mixmark listening');
    const base = `http://127.0.0.1:${port}`;
    if (!(await waitForOk(`${base}/api/health`, { child: server }))) throw new Error('the server did not start');
    for (let i = 0; i < WORKERS; i += 1) workers.push(await startEntry('worker.js', env, 'working the queue'));

    const post = async (path, body, token) => {
      const response = await fetch(`${base}${path}`, { method: 'POST', headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) }, body: JSON.stringify(body) });
      if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`);
      return response.json();
    };
    const teacher = await post('/api/auth/register', { email: 'bench-teacher@bench.test', password: 'bench password 1', displayName: 'Bench Teacher', role: 'teacher' });
    const student = await post('/api/auth/register', { email: 'bench-student@bench.test', password: 'bench password 1', displayName: 'Bench Student', role: 'student' });
    const drill = await post('/api/drills', { title: 'Bench grey', kind: 'neutral', visibility: 'public', targets: [{ lab: { L: 55, a: 0, b: 0 } }] }, teacher.accessToken);
    const upload = async () => {
      const form = new FormData();
      form.set('drillId', drill.id);
      form.set('photo', new Blob([jpeg], { type: 'image/jpeg' }), 'swatch.jpg');
      const response = await fetch(`${base}/api/attempts`, { method: 'POST', headers: { authorization: `Bearer ${student.accessToken}` }, body: form });
      if (response.status !== 202) throw new Error(`upload: ${response.status} ${await response.text()}`);
      return (await response.json()).id;
    };
    await upload(); // warm-up: first requests, first job per worker

    const db = new pg.Client({ connectionString: env.DATABASE_URL });
    await db.connect();
    const pending = async () => (await db.query(`SELECT count(*)::int AS n FROM attempts WHERE state IN ('queued', 'measuring')`)).rows[0].n;
    while ((await pending()) > 0) await new Promise((r) => setTimeout(r, 200));

    const pids = [server.pid, ...workers.map((w) => w.pid)];
    const cpuBefore = pids.map(cpuSecondsOf);
    const started = performance.now();
    let next = 0;
    const uploaded = [];
    let uploadsDoneAt = 0;
    await Promise.all(
      Array.from({ length: UPLOAD_CONCURRENCY }, async () => {
        while (next < PHOTOS) {
          next += 1;
          uploaded.push(await upload());
        }
      }),
    );
    uploadsDoneAt = performance.now();
    while ((await pending()) > 0) await new Promise((r) => setTimeout(r, 100));
    const seconds = (performance.now() - started) / 1000;
    const cpuUsed = pids.map((pid, i) => cpuSecondsOf(pid) - cpuBefore[i]);
    const cpuPerPhoto = cpuUsed.reduce((a, b) => a + b, 0) / PHOTOS;
    const states = (await db.query(`SELECT state, count(*)::int AS n FROM attempts WHERE id = ANY($1) GROUP BY state`, [uploaded])).rows;
    await db.end();
    const memory = [{ name: 'server', ...memoryOf(server.pid) }, ...workers.map((w, i) => ({ name: `worker ${i + 1}`, ...memoryOf(w.pid) }))];

    const e2e = PHOTOS / seconds;
    console.log(`\nUploads of a ${(jpeg.length / 1e6).toFixed(2)} MB, 4000 x 3000 synthetic photo, measured and graded end to end`);
    console.log(`${CORES} cores, shared with other work (load average ${load.toFixed(2)} at the start: figures are noisy)\n`);
    console.log('case'.padEnd(72) + 'photos/s'.padStart(10) + 'per core'.padStart(10));
    console.log('floor: measurement alone, in-process, one at a time (1 core)'.padEnd(72) + floorMeasure.toFixed(2).padStart(10) + floorMeasure.toFixed(2).padStart(10));
    console.log('floor: upload checks + metadata strip + measurement, in-process (1 core)'.padEnd(72) + floorPipeline.toFixed(2).padStart(10) + floorPipeline.toFixed(2).padStart(10));
    console.log('before: the same + drawing the overlay per photo, in-process (1 core)'.padEnd(72) + floorWithOverlay.toFixed(2).padStart(10) + floorWithOverlay.toFixed(2).padStart(10));
    console.log(
      `end to end: ${PHOTOS} uploads (${UPLOAD_CONCURRENCY} at once), 1 server + ${WORKERS} workers, until all graded`.padEnd(72) +
        e2e.toFixed(2).padStart(10) +
        (e2e / CORES).toFixed(2).padStart(10),
    );
    console.log(`\noverlay, ms per photo: drawn from the measured raster ${(overlayMs / FLOOR_RUNS).toFixed(1)} ms (what workers did per attempt before); drawn on first view from the stored file ${(firstViewMs / FLOOR_RUNS).toFixed(1)} ms (now, once, only if opened)`);
    console.log(`\nmetadata step alone, in-process, ms per photo: checks + lossless strip (now, ${method}) ${stripMs.toFixed(1)} ms; checks + sharp re-encode (before) ${reencodeMs.toFixed(1)} ms`);
    console.log(`\n  uploads all accepted after ${((uploadsDoneAt - started) / 1000).toFixed(1)} s, all graded after ${seconds.toFixed(1)} s; states: ${states.map((s) => `${s.state} ${s.n}`).join(', ')}`);
    console.log(
      `\nCPU time per photo (less sensitive to the other work on the machine than wall time): in-process floor ${floorCpuPerPhoto.toFixed(2)} s; ` +
        `end to end ${cpuPerPhoto.toFixed(2)} s (server ${(cpuUsed[0] / PHOTOS).toFixed(2)} s, workers ${(cpuUsed.slice(1).reduce((a, b) => a + b, 0) / PHOTOS).toFixed(2)} s), ` +
        `i.e. ${(1 / cpuPerPhoto).toFixed(2)} photos per CPU-second end to end, ${(1 / floorCpuPerPhoto).toFixed(2)} for the floor`,
    );
    console.log(`\npeak memory (VmHWM)  ${memory.map((m) => `${m.name} ${m.peakMb.toFixed(0)} MB`).join(', ')}; total ${memory.reduce((s, m) => s + m.peakMb, 0).toFixed(0)} MB`);
    console.log(`                     (this bench process, which ran the in-process floor: ${floorPeakMb.toFixed(0)} MB)`);
    console.log('\nAim (issue 5): at least 2 photos per second per core end to end.');
  } finally {
    await Promise.all([stop(server), ...workers.map(stop)]);
    await smtp.close();
    await testCluster.remove();
    rmSync(storage, { recursive: true, force: true });
  }
});
