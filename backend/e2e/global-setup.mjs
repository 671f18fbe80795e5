// Jest global set-up for the e2e project: a database with every migration applied.
// Under `npm test` the runner hands us a throwaway cluster (MIXMARK_TEST_PG_URL); run alone
// (`npm run test:e2e -w backend`) we start one of our own and remove it afterwards.
import { join } from 'node:path';
import { buildIfStale } from '../../scripts/lib/builds.mjs';
import { run } from '../../scripts/lib/proc.mjs';
import { rootDir } from '../../scripts/lib/project.mjs';
import { startFakeSmtp } from '../../scripts/lib/fake-smtp.mjs';
import { recreateDatabase, startTestCluster } from '../../scripts/lib/test-cluster.mjs';

export default async function globalSetup() {
  let baseUrl = process.env.MIXMARK_TEST_PG_URL;
  if (!baseUrl) {
    const testCluster = await startTestCluster();
    globalThis.__mixmarkTestCluster = testCluster;
    baseUrl = testCluster.cluster.url('postgres');
    process.env.MIXMARK_TEST_PG_URL = baseUrl;
  }
  if (!process.env.SMTP_URL) {
    const dir = join(rootDir, 'test-output', 'outbox-backend');
    const smtp = await startFakeSmtp({ port: 0, dir });
    globalThis.__mixmarkTestSmtp = smtp;
    process.env.SMTP_URL = `smtp://127.0.0.1:${smtp.port}`;
    process.env.OUTBOX_DIR = dir;
  }
  const databaseUrl = await recreateDatabase(baseUrl, 'mixmark_backend_e2e');
  await buildIfStale(rootDir, ['common', 'backend'], { log: () => {} });
  await run(process.execPath, [join(rootDir, 'backend/dist/cli.js'), 'migrate'], {
    capture: true,
    env: { ...process.env, DATABASE_URL: databaseUrl },
    label: 'the e2e migrations',
  });
  process.env.DATABASE_URL = databaseUrl;
  process.env.NODE_ENV = 'test';
  process.env.LOG_LEVEL = 'warn';
  process.env.BCRYPT_ROUNDS ??= '4';
  // No scheduled weekly digest while tests run (it would mail every test account on a Monday
  // morning); the digest tests run their weeks by hand.
  process.env.DIGEST_CRON ??= 'off';
  // Photos of the tests go to the test output, never into the start command's store.
  process.env.STORAGE_DIR ??= join(rootDir, 'test-output', 'photos-backend');
}

