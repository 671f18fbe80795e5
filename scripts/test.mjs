// `npm test`: every suite on a fresh clone, against a throwaway PostgreSQL cluster of its own,
// ending with one line "N passed, N failed". Exit code 1 when anything failed.
import { mkdirSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDependencies } from './lib/bootstrap.mjs';
import { runMain } from './lib/errors.mjs';
import { rootDir } from './lib/project.mjs';
import { countReport } from './lib/reports.mjs';

const outDir = join(rootDir, 'test-output');
const only = process.argv.slice(2).filter((arg) => !arg.startsWith('-'));

/** The bootstrap's own tests (Node 20's --test takes no glob). */
function scriptTests() {
  return readdirSync(join(rootDir, 'scripts', 'lib'))
    .filter((file) => file.endsWith('.test.mjs'))
    .map((file) => join('scripts', 'lib', file));
}

/** The suites, in order; each writes a machine-readable report that we count from. */
function suites(env) {
  const node = process.execPath;
  const jest = join(rootDir, 'node_modules', 'jest', 'bin', 'jest.js');
  const vitest = join(rootDir, 'node_modules', 'vitest', 'vitest.mjs');
  return [
    {
      name: 'scripts',
      what: 'start/test bootstrap (node:test)',
      command: [node, '--test', '--test-reporter=spec', '--test-reporter-destination=stdout', '--test-reporter=tap', `--test-reporter-destination=${join(outDir, 'scripts.tap')}`, ...scriptTests()],
      cwd: rootDir,
      report: { kind: 'tap', file: join(outDir, 'scripts.tap') },
    },
    {
      name: 'common',
      what: 'colour engine, grading rules, schemas (vitest)',
      command: [node, vitest, 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${join(outDir, 'common.json')}`],
      cwd: join(rootDir, 'common'),
      report: { kind: 'json', file: join(outDir, 'common.json') },
    },
    {
      name: 'backend',
      what: 'unit and end-to-end on PostgreSQL (jest + supertest)',
      command: [node, '--experimental-vm-modules', '--no-warnings=ExperimentalWarning', jest, '-c', 'jest.config.cjs', '--json', `--outputFile=${join(outDir, 'backend.json')}`],
      cwd: join(rootDir, 'backend'),
      report: { kind: 'json', file: join(outDir, 'backend.json') },
    },
    {
      name: 'frontend',
      what: 'components (vitest + Testing Library)',
      command: [node, vitest, 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${join(outDir, 'frontend.json')}`],
      cwd: join(rootDir, 'frontend'),
      report: { kind: 'json', file: join(outDir, 'frontend.json') },
    },
    {
      name: 'browser',
      what: 'end-to-end in Chromium (playwright-core)',
      command: [node, vitest, 'run', '-c', 'vitest.e2e.config.ts', '--reporter=default', '--reporter=json', `--outputFile.json=${join(outDir, 'browser.json')}`],
      cwd: join(rootDir, 'frontend'),
      report: { kind: 'json', file: join(outDir, 'browser.json') },
    },
  ]
    .filter((suite) => only.length === 0 || only.includes(suite.name))
    .map((suite) => ({ ...suite, env }));
}

runMain(async () => {
  await ensureDependencies(rootDir);
  const { run } = await import('./lib/proc.mjs');
  const { buildIfStale } = await import('./lib/builds.mjs');
  const { startTestCluster } = await import('./lib/test-cluster.mjs');
  const { ensureChromium } = await import('./lib/chromium.mjs');

  rmSync(outDir, { recursive: true, force: true });
  mkdirSync(outDir, { recursive: true });
  const wanted = suites({});
  if (wanted.some((suite) => suite.name === 'browser')) await ensureChromium();
  // The browser tests need every build; the others only what they import.
  const builds = wanted.some((suite) => suite.name === 'browser') ? ['common', 'backend', 'frontend'] : ['common', 'backend'];
  console.log(`Building ${builds.join(', ')}...`);
  await buildIfStale(rootDir, builds);

  console.log('Starting a throwaway PostgreSQL cluster for the tests...');
  const testCluster = await startTestCluster();
  const { startFakeSmtp } = await import('./lib/fake-smtp.mjs');
  const outboxDir = join(outDir, 'outbox');
  const smtp = await startFakeSmtp({ port: 0, dir: outboxDir });
  const cleanUp = async () => {
    await smtp.close();
    await testCluster.remove();
  };
  for (const signal of ['SIGINT', 'SIGTERM']) {
    process.on(signal, () => cleanUp().finally(() => process.exit(130)));
  }

  const env = {
    ...process.env,
    NODE_ENV: 'test',
    LOG_LEVEL: 'warn',
    BCRYPT_ROUNDS: '4',
    MIXMARK_TEST_PG_URL: testCluster.cluster.url('postgres'),
    MIXMARK_TEST_OUTPUT: outDir,
    SMTP_URL: `smtp://127.0.0.1:${smtp.port}`,
    OUTBOX_DIR: outboxDir,
    STORAGE_DIR: join(outDir, 'photos'),
    FORCE_COLOR: process.env.CI ? '0' : (process.env.FORCE_COLOR ?? '1'),
  };
  const results = [];
  try {
    for (const suite of suites(env)) {
      console.log(`\n━━ ${suite.name}: ${suite.what}`);
      const started = Date.now();
      const [command, ...args] = suite.command;
      const { code } = await run(command, args, { cwd: suite.cwd, env: suite.env, allowFailure: true });
      const counts = countReport(suite.report);
      results.push({
        name: suite.name,
        seconds: (Date.now() - started) / 1000,
        code,
        counts: counts ?? { passed: 0, failed: 1, skipped: 0 },
        note: counts ? '' : ' (no report: the suite crashed before counting)',
      });
    }
  } finally {
    await cleanUp();
  }

  console.log('\n━━ summary');
  for (const r of results) {
    const exit = r.code === 0 ? '' : ` (exit ${r.code})`;
    console.log(`  ${r.name.padEnd(9)} ${String(r.counts.passed).padStart(4)} passed ${String(r.counts.failed).padStart(3)} failed ${String(r.counts.skipped).padStart(3)} skipped  ${r.seconds.toFixed(1)} s${exit}${r.note}`);
  }
  const total = (key) => results.reduce((sum, r) => sum + r.counts[key], 0);
  // A suite that exited non-zero with nothing failed in its report (e.g. a crash in teardown) counts as a failure.
  const hiddenFailures = results.filter((r) => r.code !== 0 && r.counts.failed === 0).length;
  const failed = total('failed') + hiddenFailures;
  const skipped = total('skipped');
  console.log(`${total('passed')} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
  process.exit(failed > 0 ? 1 : 0);
});
