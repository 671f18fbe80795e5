// `npm run bench:api -w backend`: requests/s and latency of the API on 127.0.0.1 with autocannon,
// the authenticated assignments list and a 30-student gradebook beside the floor (a bare route
// with one indexed SELECT), all in the same run against the real server and PostgreSQL.
import { spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildIfStale } from './lib/builds.mjs';
import { runMain } from './lib/errors.mjs';
import { waitForOk } from './lib/http.mjs';
import { serviceNodeFlags } from './lib/node-flags.mjs';
import { freePort } from './lib/ports.mjs';
import { run } from './lib/proc.mjs';
import { rootDir } from './lib/project.mjs';
import { startTestCluster } from './lib/test-cluster.mjs';

const DURATION = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = 32;
// Extra node flags for the server, e.g. BENCH_SERVER_FLAGS="--cpu-prof --cpu-prof-dir=/tmp/prof"
// to profile it; BENCH_ROUTES="list" runs only the routes whose name contains one of the words;
// BENCH_ROUNDS (default 2) how often each route is run, between floor runs.
const serverFlags = (process.env.BENCH_SERVER_FLAGS ?? '').split(' ').filter(Boolean);
const routeFilter = (process.env.BENCH_ROUTES ?? '').split(',').filter(Boolean);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 2);

/**
 * A process's parent pid, the CPU time (ms) it has used so far, and that of its children that
 * have ended and been waited for, from /proc (Linux), or null.
 */
function procStat(pid) {
  try {
    // Fields after the command name: state, ppid, …, utime 14th, stime 15th, cutime 16th,
    // cstime 17th (proc(5)); 10 ms ticks.
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').replace(/^.*\) /, '').split(' ');
    return {
      ppid: Number(fields[1]),
      cpuMs: (Number(fields[11]) + Number(fields[12])) * 10,
      endedChildrenCpuMs: (Number(fields[13]) + Number(fields[14])) * 10,
    };
  } catch {
    return null; // gone, or not Linux
  }
}

const cpuMs = (pid) => procStat(pid)?.cpuMs ?? null;

/**
 * CPU time (ms) of a PostgreSQL server and all its backends: the running ones (processes whose
 * parent it is) and the ones that have ended (a pool closing idle connections), which the
 * postmaster has waited for and the kernel counts in its children's time.
 */
function clusterCpuMs(postmasterPid) {
  const postmaster = procStat(postmasterPid);
  let total = postmaster ? postmaster.cpuMs + postmaster.endedChildrenCpuMs : 0;
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    const stat = procStat(entry);
    if (stat?.ppid === postmasterPid) total += stat.cpuMs;
  }
  return total;
}

runMain(async () => {
  const { default: autocannon } = await import('autocannon');
  const { default: pg } = await import('pg');
  await buildIfStale(rootDir, ['common', 'backend'], { log: (line) => console.error(line) });
  const testCluster = await startTestCluster();
  const storage = mkdtempSync(join(tmpdir(), 'mixmark-bench-'));
  const servers = [];
  let server;
  let base;
  try {
    await testCluster.cluster.ensureDatabase('bench');
    const port = await freePort();
    const env = {
      ...process.env, NODE_ENV: 'production', LOG_LEVEL: 'warn', DATABASE_URL: testCluster.cluster.url('bench'), PORT: String(port),
      JWT_SECRET: 'bench-secret-bench-secret-bench-secret-0001', STORAGE_DIR: storage, SMTP_URL: 'smtp://127.0.0.1:9', GRADING_IN_SERVER: 'false',
      DATABASE_POOL_SIZE: process.env.BENCH_POOL_SIZE ?? '16', SIGN_IN_LIMIT_PER_MINUTE: '100000', SIGN_IN_IP_LIMIT_PER_MINUTE: '100000',
    };
    await run(process.execPath, [join(rootDir, 'backend/dist/cli.js'), 'migrate'], { env, capture: true });
    const startServer = async (extraEnv) => {
      const serverPort = extraEnv.PORT ?? String(await freePort());
      const child = spawn(process.execPath, [...serviceNodeFlags, ...serverFlags, join(rootDir, 'backend/dist/main.js')], {
        env: { ...env, ...extraEnv, PORT: serverPort }, stdio: ['ignore', 'ignore', 'inherit'],
      });
      servers.push(child);
      const url = `http://127.0.0.1:${serverPort}`;
      if (!(await waitForOk(`${url}/api/health`, { child }))) throw new Error('the server did not start');
      return { child, url };
    };
    // The server as deployed, and beside it (idle unless measured) one that keeps no assignment
    // lists, so that every list request reads the list from PostgreSQL: the cost after a write.
    const deployed = await startServer({ PORT: String(port) });
    ({ child: server, url: base } = deployed);
    const uncached = await startServer({ LIST_CACHE_MB: '0' });

    // A teacher with a class of 30 students, 12 assignments and 4 graded attempts each.
    const post = async (path, body, token) => {
      const response = await fetch(`${base}${path}`, { method: 'POST', headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) }, body: JSON.stringify(body) });
      if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`);
      return response.json();
    };
    const teacher = await post('/api/auth/register', { email: 'bench-teacher@bench.test', password: 'bench password 1', displayName: 'Bench Teacher', role: 'teacher' });
    const klass = await post('/api/classes', { name: 'Bench class' }, teacher.accessToken);
    const drill = await post('/api/drills', { title: 'Bench grey', kind: 'neutral', targets: [{ lab: { L: 50, a: 0, b: 0 } }] }, teacher.accessToken);
    const db = new pg.Client({ connectionString: env.DATABASE_URL });
    // A failure below stops the cluster while this client is open: report that failure, not
    // the client's lost connection.
    db.on('error', () => {});
    await db.connect();
    // One of the 30 signs in (for the student's own list); the other 29 are written directly.
    const student = await post('/api/auth/register', { email: 'student30@bench.test', password: 'bench password 1', displayName: 'Student 30', role: 'student' });
    await post('/api/classes/join', { code: klass.code }, student.accessToken);
    await db.query(`INSERT INTO users (email, display_name, role, password_hash) SELECT 'student' || i || '@bench.test', 'Student ' || i, 'student', 'x' FROM generate_series(1, 29) i`);
    await db.query(`INSERT INTO class_members (class_id, student_id) SELECT $1, id FROM users WHERE email LIKE 'student%@bench.test' ON CONFLICT DO NOTHING`, [klass.id]);
    // Six past and six due: a new assignment may not be due in the past, so all are made due
    // ahead and then moved, as a teacher moving due dates would.
    for (let i = 0; i < 12; i += 1) await post('/api/assignments', { classId: klass.id, drillId: drill.id, dueAt: new Date(Date.now() + (i + 1) * 86400000).toISOString() }, teacher.accessToken);
    await db.query(`UPDATE assignments SET due_at = due_at - interval '7 days' WHERE class_id = $1`, [klass.id]);
    await db.query(
      `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes, score, pass, graded_at, created_at)
       SELECT m.student_id, a.drill_id, a.id, 'graded', 'bench', 1, (random() * 100)::int, random() > 0.4, now(), now() - (k || ' days')::interval
         FROM class_members m JOIN assignments a ON a.class_id = m.class_id CROSS JOIN generate_series(1, 4) k WHERE m.class_id = $1`,
      [klass.id],
    );
    await db.end();

    const auth = { authorization: `Bearer ${teacher.accessToken}` };
    const floorCase = { name: 'floor: one indexed SELECT (GET /api/health/db)', path: '/api/health/db', headers: {} };
    const studentAuth = { authorization: `Bearer ${student.accessToken}` };
    const routes = [
      { name: 'assignments list, signed in (GET /api/assignments)', path: '/api/assignments', headers: auth },
      { name: 'gradebook, 30 students x 12 (GET /api/classes/:id/gradebook)', path: `/api/classes/${klass.id}/gradebook`, headers: auth },
      { name: "a student's own list (GET /api/assignments)", path: '/api/assignments', headers: studentAuth },
      { name: 'assignments list, every request read (no kept lists)', path: '/api/assignments', headers: auth, server: uncached },
      { name: "a student's own list, every request read", path: '/api/assignments', headers: studentAuth, server: uncached },
    ].filter((c) => routeFilter.length === 0 || routeFilter.some((word) => c.name.includes(word)));
    const show = (load) => load.map((v) => v.toFixed(2)).join(', ');
    const loadBefore = show(loadavg());
    const postmasterPid = Number(readFileSync(join(testCluster.cluster.dataDir, 'postmaster.pid'), 'utf8').split('\n')[0]);
    const measure = async (c) => {
      const target = c.server ?? deployed;
      const url = `${target.url}${c.path}`;
      await autocannon({ url, headers: c.headers, connections: 4, duration: target.warm ? 1 : 3 }); // first run: code not compiled yet
      target.warm = true;
      const serverPid = target.child.pid;
      const before = { server: cpuMs(serverPid), db: clusterCpuMs(postmasterPid), bench: process.cpuUsage() };
      const r = await autocannon({ url, headers: c.headers, connections: CONNECTIONS, duration: DURATION });
      if (r.non2xx > 0) throw new Error(`${c.path} answered ${r.non2xx} non-2xx responses`);
      const perRequest = (ms) => (ms === null || !r.requests.total ? NaN : (1000 * ms) / r.requests.total);
      const benchCpu = process.cpuUsage(before.bench);
      return {
        rps: r.requests.average, p50: r.latency.p50, p99: r.latency.p99,
        serverUs: perRequest(before.server === null ? null : cpuMs(serverPid) - before.server),
        dbUs: perRequest(clusterCpuMs(postmasterPid) - before.db),
        benchUs: perRequest((benchCpu.user + benchCpu.system) / 1000),
      };
    };
    // The machine is shared and its speed drifts over seconds: the floor is run before each
    // round and once more at the end, and each route is set against the mean of the two floor
    // runs around it, in every round.
    const floors = [await measure(floorCase)];
    const byRoute = routes.map(() => []);
    for (let round = 0; round < ROUNDS; round++) {
      const runs = [];
      for (const c of routes) runs.push(await measure(c));
      floors.push(await measure(floorCase));
      const around = (floors.at(-2).rps + floors.at(-1).rps) / 2;
      runs.forEach((run, i) => byRoute[i].push({ ...run, share: run.rps / around }));
    }
    const mean = (values) => values.reduce((sum, v) => sum + v, 0) / values.length;
    const us = (v) => (Number.isFinite(v) ? v.toFixed(0) : '–');
    const pct = (v) => `${(100 * v).toFixed(0)} %`;
    const line = (name, runs, share) =>
      name.padEnd(62) + mean(runs.map((r) => r.rps)).toFixed(0).padStart(7) + share.padStart(19) +
      String(Math.max(...runs.map((r) => r.p50))).padStart(8) + String(Math.max(...runs.map((r) => r.p99))).padStart(8) +
      us(mean(runs.map((r) => r.serverUs))).padStart(9) + us(mean(runs.map((r) => r.dbUs))).padStart(8) + us(mean(runs.map((r) => r.benchUs))).padStart(8);
    console.log(`\nAPI on 127.0.0.1, ${CONNECTIONS} connections, ${DURATION} s a run, ${ROUNDS} rounds (NODE_ENV=production; "every request read": a second server process with LIST_CACHE_MB=0)\n`);
    console.log(''.padEnd(62) + ''.padStart(7) + 'vs floor*'.padStart(19) + 'worst of the runs'.padStart(18) + 'CPU µs per request'.padStart(25));
    console.log('route'.padEnd(62) + 'req/s'.padStart(7) + '(each round)'.padStart(19) + 'p50 ms'.padStart(8) + 'p99 ms'.padStart(8) + 'server'.padStart(9) + 'db'.padStart(8) + 'bench'.padStart(8));
    console.log(line(`${floorCase.name}, ${floors.length} runs`, floors, floors.map((f) => f.rps.toFixed(0)).join('/')));
    routes.forEach((c, i) => console.log(line(c.name, byRoute[i], `${pct(mean(byRoute[i].map((r) => r.share)))} (${byRoute[i].map((r) => pct(r.share).replace(' ', '')).join(' ')})`)));
    console.log('\n* each round against the mean of the floor runs before and after it; the figure is the mean of the rounds.');
    console.log('db: PostgreSQL (server and backends); bench: autocannon, in this process. Both share the two cores with the server.');
    console.log('Aim: the list route at least 70 % of the floor with p99 under 50 ms.');
    console.log(`Load average (1, 5, 15 min) before ${loadBefore}, after ${show(loadavg())} (2 shared cores: compare with the floor of the same run).`);
  } finally {
    for (const child of servers) {
      if (child.exitCode !== null) continue;
      await new Promise((resolve) => {
        child.once('exit', resolve);
        child.kill('SIGTERM');
      });
    }
    await testCluster.remove();
    rmSync(storage, { recursive: true, force: true });
  }
});
