import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { SetupError } from './errors.mjs';
import { isRoot, run } from './proc.mjs';

const REQUIRED = ['initdb', 'pg_ctl', 'postgres', 'psql'];
const WANTED_MAJOR = 15;

/** Folders that may hold the PostgreSQL server binaries, best first. */
export function candidateBinDirs(env = process.env) {
  const dirs = [];
  if (env.MIXMARK_PG_BIN) dirs.push(env.MIXMARK_PG_BIN);
  dirs.push(`/usr/lib/postgresql/${WANTED_MAJOR}/bin`);
  if (existsSync('/usr/lib/postgresql')) {
    const majors = readdirSync('/usr/lib/postgresql')
      .map(Number)
      .filter((major) => major > WANTED_MAJOR)
      .sort((x, y) => x - y);
    for (const major of majors) dirs.push(`/usr/lib/postgresql/${major}/bin`);
  }
  return dirs;
}

/** The first folder holding every server binary we need, or undefined. */
export function findPostgresBinDir(dirs = candidateBinDirs()) {
  return dirs.find((dir) => REQUIRED.every((name) => existsSync(join(dir, name))));
}

/** What to tell someone who has no server binaries and is not root. */
export function missingBinariesMessage(dirs) {
  return (
    `PostgreSQL ${WANTED_MAJOR} server binaries (initdb, pg_ctl, postgres) were not found in ` +
    `${dirs.join(', ')}. Install them with "sudo apt-get install postgresql-${WANTED_MAJOR}", ` +
    `or set MIXMARK_PG_BIN to the folder that holds initdb and pg_ctl`
  );
}

/**
 * Makes sure the server binaries exist: finds them, or installs Debian's package when running as
 * root (without letting apt create its default cluster on port 5432), or explains what to install.
 */
export async function ensurePostgresBinaries({ dirs = candidateBinDirs(), root = isRoot(), log = console.log } = {}) {
  const found = findPostgresBinDir(dirs);
  if (found) return found;
  if (!root) throw new SetupError(missingBinariesMessage(dirs));
  log(`PostgreSQL ${WANTED_MAJOR} is missing: installing Debian's postgresql-${WANTED_MAJOR} (one time)...`);
  mkdirSync('/etc/postgresql-common/createcluster.d', { recursive: true });
  writeFileSync('/etc/postgresql-common/createcluster.d/mixmark.conf', 'create_main_cluster = false\n');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  await run('apt-get', ['update', '-qq'], { env, capture: true, label: 'apt-get update' });
  await run('apt-get', ['install', '-y', '-qq', `postgresql-${WANTED_MAJOR}`], {
    env,
    capture: true,
    label: `apt-get install postgresql-${WANTED_MAJOR}`,
  });
  const installed = findPostgresBinDir(candidateBinDirs());
  if (!installed) throw new SetupError(missingBinariesMessage(dirs));
  return installed;
}

/**
 * A PostgreSQL cluster in a folder of its own: `<root>/data` (the cluster) and
 * `<root>/server.log`. As root, the server runs as the unprivileged `postgres` user, since
 * initdb and postgres refuse to run as root.
 */
export class PostgresCluster {
  constructor({ binDir, root, port, host = '127.0.0.1', throwaway = false }) {
    this.binDir = binDir;
    this.root = root;
    this.dataDir = join(root, 'data');
    this.logFile = join(root, 'server.log');
    this.port = port;
    this.host = host;
    this.throwaway = throwaway;
    this.asUser = isRoot() ? 'postgres' : undefined;
  }

  url(database) {
    return `postgres://postgres@${this.host}:${this.port}/${database}`;
  }

  bin(name) {
    return join(this.binDir, name);
  }

  /** Runs a server binary, as the `postgres` user when we are root. */
  exec(name, args, options = {}) {
    if (this.asUser) return run('runuser', ['-u', this.asUser, '--', this.bin(name), ...args], { capture: true, label: name, ...options });
    return run(this.bin(name), args, { capture: true, label: name, ...options });
  }

  exists() {
    return existsSync(join(this.dataDir, 'PG_VERSION'));
  }

  /** Creates the folder, owned by the server's user, and checks that user can reach it. */
  async prepareFolder() {
    mkdirSync(this.root, { recursive: true });
    if (this.asUser) {
      await run('chown', ['-R', `${this.asUser}:${this.asUser}`, this.root], { capture: true });
      const probe = await run('runuser', ['-u', this.asUser, '--', 'test', '-w', this.root], {
        capture: true,
        allowFailure: true,
      });
      if (probe.code !== 0) {
        throw new SetupError(
          `the "${this.asUser}" user cannot reach ${this.root} (a parent folder is closed to other users)`,
        );
      }
    }
  }

  async init() {
    await this.prepareFolder();
    await this.exec('initdb', [
      '-D', this.dataDir, '-U', 'postgres', '--auth=trust', '--encoding=UTF8', '--locale=C.UTF-8',
    ]);
  }

  /**
   * Looks at `postmaster.pid`: a live postgres of this cluster is reported (to adopt it); a file
   * left by a server that is gone is removed, so the start does not fail on it.
   */
  inspectPidFile() {
    const pidFile = join(this.dataDir, 'postmaster.pid');
    if (!existsSync(pidFile)) return { state: 'none' };
    const lines = readFileSync(pidFile, 'utf8').split('\n');
    const pid = Number(lines[0]);
    const port = Number(lines[3]);
    if (Number.isInteger(pid) && pid > 0 && isPostgresProcess(pid)) return { state: 'running', pid, port };
    rmSync(pidFile, { force: true });
    return { state: 'stale-removed', pid };
  }

  /** Starts the server, detached from our terminal so Ctrl-C reaches us first and we stop it in order. */
  async start({ fast = false } = {}) {
    const options = [
      `-c listen_addresses=${this.host}`,
      `-p ${this.port}`,
      "-c unix_socket_directories=''",
    ];
    if (fast) options.push('-c fsync=off', '-c full_page_writes=off', '-c synchronous_commit=off');
    const result = await this.exec('pg_ctl', ['-D', this.dataDir, '-l', this.logFile, '-w', '-t', '60', '-o', options.join(' '), 'start'], {
      allowFailure: true,
      detached: true,
    });
    if (result.code !== 0) throw new SetupError(`PostgreSQL did not start: ${this.lastLogProblem()}`);
  }

  /** Stops the server if it runs; a server that is already gone is fine. */
  async stop() {
    if (!this.exists() || this.inspectPidFile().state !== 'running') return;
    const result = await this.exec('pg_ctl', ['-D', this.dataDir, '-m', 'fast', '-w', '-t', '60', 'stop'], {
      allowFailure: true,
    });
    if (result.code !== 0) {
      throw new SetupError(`PostgreSQL did not stop (exit ${result.code ?? result.signal}): ${(result.stderr + result.stdout).trim() || this.lastLogProblem()}`);
    }
  }

  /** The last FATAL/ERROR line of the server's log, for a one-line message. */
  lastLogProblem() {
    if (!existsSync(this.logFile)) return 'no server log was written';
    const lines = readFileSync(this.logFile, 'utf8').trim().split('\n');
    const problem = [...lines].reverse().find((line) => /FATAL|ERROR|PANIC/.test(line));
    return (problem ?? lines.at(-1) ?? 'see ' + this.logFile).replace(/^.*?(FATAL|ERROR|PANIC):\s*/, '');
  }

  async psql(database, sql) {
    const { stdout } = await this.exec('psql', ['-h', this.host, '-p', String(this.port), '-U', 'postgres', '-d', database, '-tAX', '-v', 'ON_ERROR_STOP=1', '-c', sql]);
    return stdout.trim();
  }

  async ensureDatabase(name) {
    if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new SetupError(`database name "${name}" must be lower-case letters, digits and _`);
    const exists = await this.psql('postgres', `SELECT 1 FROM pg_database WHERE datname = '${name}'`);
    if (exists !== '1') await this.psql('postgres', `CREATE DATABASE "${name}"`);
  }

  /** Removes the whole folder (throwaway clusters only). */
  remove() {
    if (!this.throwaway) throw new Error('refusing to remove a cluster that is not throwaway');
    rmSync(this.root, { recursive: true, force: true });
  }
}

/** True when `pid` is alive and is a PostgreSQL server process (not a recycled pid). */
export function isPostgresProcess(pid) {
  try {
    process.kill(pid, 0);
  } catch (error) {
    if (error.code !== 'EPERM') return false;
  }
  try {
    const cmdline = readFileSync(`/proc/${pid}/cmdline`, 'utf8');
    return /postgres|postmaster/.test(cmdline);
  } catch {
    return false;
  }
}
