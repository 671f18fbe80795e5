import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { buildIfStale } from '../../scripts/lib/builds.mjs';
import { waitForOk } from '../../scripts/lib/http.mjs';
import { freePort } from '../../scripts/lib/ports.mjs';
import { run } from '../../scripts/lib/proc.mjs';
import { rootDir } from '../../scripts/lib/project.mjs';
import { startFakeSmtp } from '../../scripts/lib/fake-smtp.mjs';
import { recreateDatabase, startTestCluster } from '../../scripts/lib/test-cluster.mjs';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    outputDir: string;
  }
}

/**
 * Starts the real server (built backend serving the built frontend) on a fresh database with the
 * migrations and the demo seed applied. Under `npm test` the cluster comes from the runner.
 */
export default async function setup(project: TestProject) {
  let ownCluster: Awaited<ReturnType<typeof startTestCluster>> | undefined;
  let baseUrl = process.env.MIXMARK_TEST_PG_URL;
  if (!baseUrl) {
    ownCluster = await startTestCluster();
    baseUrl = ownCluster.cluster.url('postgres');
  }
  await buildIfStale(rootDir, ['common', 'backend', 'frontend'], { log: () => {} });
  const database = 'mixmark_browser_e2e';

  const backend = join(rootDir, 'backend');
  const databaseUrl = await recreateDatabase(baseUrl, database);

  let ownSmtp: Awaited<ReturnType<typeof startFakeSmtp>> | undefined;
  if (!process.env.SMTP_URL) {
    ownSmtp = await startFakeSmtp({ port: 0, dir: join(rootDir, 'test-output', 'outbox-browser') });
  }
  const smtpUrl = process.env.SMTP_URL ?? `smtp://127.0.0.1:${ownSmtp!.port}`;
  const outboxDir = process.env.OUTBOX_DIR ?? join(rootDir, 'test-output', 'outbox-browser');
  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: 'test',
    LOG_LEVEL: 'warn',
    DATABASE_URL: databaseUrl,
    HOST: '127.0.0.1',
    PORT: String(port),
    FRONTEND_DIST: join(rootDir, 'frontend', 'dist'),
    SMTP_URL: smtpUrl,
    OUTBOX_DIR: outboxDir,
    PUBLIC_URL: `http://127.0.0.1:${port}`,
  };
  for (const command of ['migrate', 'seed']) {
    await run(process.execPath, [join(backend, 'dist', 'cli.js'), command], { env, capture: true, label: `backend ${command}` });
  }
  const server: ChildProcess = spawn(process.execPath, [join(backend, 'dist', 'main.js')], { env, stdio: ['ignore', 'inherit', 'inherit'] });
  const url = `http://127.0.0.1:${port}`;
  if (!(await waitForOk(`${url}/api/health`, { child: server, timeoutMs: 60_000 }))) {
    server.kill('SIGKILL');
    throw new Error('the server for the browser tests did not become healthy');
  }
  project.provide('baseUrl', url);
  project.provide('outputDir', join(process.env.MIXMARK_TEST_OUTPUT ?? join(rootDir, 'test-output'), 'screenshots'));

  return async () => {
    await new Promise<void>((resolve) => {
      if (server.exitCode !== null) return resolve();
      server.once('exit', () => resolve());
      server.kill('SIGTERM');
    });
    await ownSmtp?.close();
    await ownCluster?.remove();
  };
}

