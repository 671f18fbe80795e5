import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { buildIfStale } from './builds.mjs';
import { SetupError } from './errors.mjs';
import { waitForOk } from './http.mjs';
import { assertPortFree, portFromEnv } from './ports.mjs';
import { ensurePostgresBinaries, PostgresCluster } from './postgres.mjs';
import { startFakeSmtp } from './fake-smtp.mjs';
import { run } from './proc.mjs';
import { serviceNodeFlags } from './node-flags.mjs';
import { clusterFolders, rootDir } from './project.mjs';

const DATABASE = 'mixmark';

/** Opens (creating on first use) the start command's own cluster, and starts or adopts its server. */
export async function openProjectCluster({ binDir, port, log = console.log, onOpen = () => {} }) {
  let lastProblem;
  for (const root of clusterFolders()) {
    const cluster = new PostgresCluster({ binDir, root, port });
    try {
      if (!cluster.exists()) {
        log(`Creating the PostgreSQL cluster in ${root} (one time)...`);
        await cluster.init();
      } else {
        await cluster.prepareFolder();
      }
    } catch (error) {
      if (!(error instanceof SetupError)) throw error;
      lastProblem = error.message;
      continue;
    }
    const pid = cluster.inspectPidFile();
    if (pid.state === 'running') {
      if (pid.port !== port) {
        throw new SetupError(
          `this project's PostgreSQL is already running (pid ${pid.pid}) on port ${pid.port}, not ${port}: ` +
            `stop it with "pg_ctl -D ${cluster.dataDir} stop" or start with MIXMARK_PG_PORT=${pid.port}`,
        );
      }
      log(`Reusing this project's PostgreSQL already running (pid ${pid.pid}); it stops with Mixmark.`);
      onOpen(cluster);
      return cluster;
    }
    if (pid.state === 'stale-removed') log(`Removed a stale postmaster.pid (pid ${pid.pid} is gone).`);
    await assertPortFree(port, { what: 'PostgreSQL', envName: 'MIXMARK_PG_PORT' });
    onOpen(cluster);
    await cluster.start();
    return cluster;
  }
  throw new SetupError(`no folder could hold the PostgreSQL cluster: ${lastProblem}`);
}

function backendEnv({ pgUrl, port, dev, smtpPort }) {
  return {
    ...process.env,
    NODE_ENV: dev ? 'development' : (process.env.NODE_ENV ?? 'development'),
    DATABASE_URL: pgUrl,
    HOST: process.env.HOST ?? '127.0.0.1',
    PORT: String(port),
    FRONTEND_DIST: join(rootDir, 'frontend', 'dist'),
    SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
    OUTBOX_DIR: join(rootDir, '.data', 'outbox'),
    PUBLIC_URL: process.env.PUBLIC_URL ?? `http://127.0.0.1:${dev ? process.env.MIXMARK_VITE_PORT ?? 5173 : port}`,
  };
}

/**
 * Everything the start command runs: PostgreSQL, the server (or the dev servers). Created before
 * anything starts, so that a Ctrl-C at any moment stops exactly what was started so far.
 */
export class Stack {
  constructor({ dev, log = console.log }) {
    this.dev = dev;
    this.log = log;
    this.children = [];
    this.exitHandlers = [];
    this.cluster = undefined;
  }

  onExit(handler) {
    this.exitHandlers.push(handler);
  }

  async start() {
    const { dev, log } = this;
    const appPort = portFromEnv('PORT', 4310);
    const pgPort = portFromEnv('MIXMARK_PG_PORT', 54310);
    const vitePort = portFromEnv('MIXMARK_VITE_PORT', 5173);
    const smtpPort = portFromEnv('MIXMARK_SMTP_PORT', 54325);
    this.ports = { appPort, pgPort, vitePort, smtpPort };
    await assertPortFree(appPort, { what: 'the Mixmark server', envName: 'PORT' });
    if (dev) await assertPortFree(vitePort, { what: 'the Vite dev server', envName: 'MIXMARK_VITE_PORT' });

    await assertPortFree(smtpPort, { what: 'the local mail catcher', envName: 'MIXMARK_SMTP_PORT' });
    // Every e-mail the app sends lands here (and on the outbox page), never on the internet.
    this.smtp = await startFakeSmtp({ port: smtpPort, dir: join(rootDir, '.data', 'outbox') });

    const binDir = await ensurePostgresBinaries({ log });
    await openProjectCluster({ binDir, port: pgPort, log, onOpen: (cluster) => (this.cluster = cluster) });
    await this.cluster.ensureDatabase(DATABASE);
    const pgUrl = this.cluster.url(DATABASE);
    await buildIfStale(rootDir, dev ? ['common', 'backend'] : ['common', 'backend', 'frontend'], { log });
    const env = backendEnv({ pgUrl, port: appPort, dev, smtpPort });
    const cli = join(rootDir, 'backend', 'dist', 'cli.js');
    for (const command of ['migrate', 'seed']) {
      const { stdout } = await run(process.execPath, [cli, command], { env, capture: true, label: `backend ${command}` });
      log(stdout.trim());
    }

    let server;
    if (dev) {
      server = this.launch('API (watch mode)', [join(rootDir, 'scripts', 'backend-watch.mjs')], { env, cwd: join(rootDir, 'backend') });
      this.launch('Vite dev server', [join(rootDir, 'node_modules', 'vite', 'bin', 'vite.js'), '--port', String(vitePort), '--strictPort'], {
        cwd: join(rootDir, 'frontend'),
        env: { ...process.env, MIXMARK_API_URL: `http://127.0.0.1:${appPort}` },
      });
    } else {
      server = this.launch('server', [...serviceNodeFlags, join(rootDir, 'backend', 'dist', 'main.js')], { env, cwd: rootDir });
    }
    const healthy = await waitForOk(`http://127.0.0.1:${appPort}/api/health`, { child: server, timeoutMs: 90000 });
    if (!healthy) throw new SetupError('the server did not answer /api/health in time; its log is above');
  }

  /** Starts a Node.js child process that shares our terminal. */
  launch(name, args, options) {
    const child = spawn(process.execPath, args, { stdio: 'inherit', ...options });
    child.on('exit', (code) => this.exitHandlers.forEach((handler) => handler(name, code)));
    this.children.push(child);
    return child;
  }

  /** Stops the children (newest first), then PostgreSQL. Safe to call at any point, and twice. */
  stop() {
    this.stopping ??= this.stopAll();
    return this.stopping;
  }

  async stopAll() {
    const children = this.children.splice(0).reverse();
    for (const child of children) await stopChild(child);
    const cluster = this.cluster;
    this.cluster = undefined;
    if (cluster) await cluster.stop();
    const smtp = this.smtp;
    this.smtp = undefined;
    if (smtp) await smtp.close();
  }

  banner(seconds) {
    return bannerText({ ...this.ports, dev: this.dev, dataDir: this.cluster?.dataDir, seconds });
  }
}

function stopChild(child) {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve();
    const timer = setTimeout(() => child.kill('SIGKILL'), 10000);
    child.once('exit', () => (clearTimeout(timer), resolve()));
    child.kill('SIGTERM');
  });
}

function bannerText({ appPort, vitePort, smtpPort, dev, pgPort, dataDir, seconds }) {
  const url = dev ? `http://127.0.0.1:${vitePort}` : `http://127.0.0.1:${appPort}`;
  return [
    '',
    `Mixmark is running at ${url}   (ready in ${seconds} s)`,
    dev ? `  API with watch mode at http://127.0.0.1:${appPort}/api` : `  API at ${url}/api   health: ${url}/api/health`,
    `  PostgreSQL on 127.0.0.1:${pgPort}, data in ${dataDir}`,
    `  E-mail is caught on 127.0.0.1:${smtpPort} and kept in .data/outbox (API: ${url}/api/dev/outbox)`,
    '',
    'Demo sign-ins (password for all: mixmark-demo):',
    '  teacher       tamsin@saltmarsh-lane.test',
    '  student       bram@saltmarsh-lane.test',
    '  self-learner  noor@selftaught.test',
    '  admin         admin@mixmark.test',
    '',
    'Press Ctrl-C to stop everything (PostgreSQL included).',
  ].join('\n');
}
