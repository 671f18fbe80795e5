// Tests of the start/test bootstrap itself: the messages a newcomer sees when something is off.
import assert from 'node:assert/strict';
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync, existsSync, mkdirSync } from 'node:fs';
import net from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import { dependencyStamp } from './bootstrap.mjs';
import { SetupError } from './errors.mjs';
import { assertPortFree, freePort, portFromEnv } from './ports.mjs';
import { ensurePostgresBinaries, findPostgresBinDir, PostgresCluster } from './postgres.mjs';
import { rootDir } from './project.mjs';
import { countReport } from './reports.mjs';

function listen(port) {
  return new Promise((resolve) => {
    const server = net.createServer().listen(port, '127.0.0.1', () => resolve(server));
  });
}

function runStart(env) {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [join(rootDir, 'scripts', 'start.mjs')], {
      env: { ...process.env, ...env },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (chunk) => (stdout += chunk));
    child.stderr.on('data', (chunk) => (stderr += chunk));
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}

describe('ports', () => {
  it('should say in one line which port is taken and which variable moves it', async () => {
    const port = await freePort();
    const server = await listen(port);
    try {
      await assert.rejects(assertPortFree(port, { what: 'the Mixmark server', envName: 'PORT' }), (error) => {
        assert.ok(error instanceof SetupError);
        assert.match(error.message, new RegExp(`^port ${port} on 127\\.0\\.0\\.1 \\(for the Mixmark server\\) is already in use`));
        assert.match(error.message, /PORT=<port>/);
        assert.doesNotMatch(error.message, /\n/);
        return true;
      });
    } finally {
      server.close();
    }
  });

  it('should accept a free port', async () => {
    await assertPortFree(await freePort(), { what: 'x', envName: 'X' });
  });

  it('should reject a port variable that is not a port', () => {
    assert.throws(() => portFromEnv('PORT', 1, { PORT: 'eighty' }), /PORT must be a port number between 1 and 65535 but is "eighty"/);
    assert.equal(portFromEnv('PORT', 4310, {}), 4310);
  });

  it('should stop `npm start` with one line and exit 1 when its port is taken', async () => {
    const port = await freePort();
    const server = await listen(port);
    try {
      const { code, stdout, stderr } = await runStart({ PORT: String(port) });
      assert.equal(code, 1);
      assert.equal(stderr.trim().split('\n').length, 1, `expected one line, got: ${stderr}`);
      assert.match(stderr, new RegExp(`^mixmark: port ${port} on 127\\.0\\.0\\.1 \\(for the Mixmark server\\) is already in use`));
      assert.doesNotMatch(stdout + stderr, /at .*\.mjs:\d+/, 'no stack trace');
    } finally {
      server.close();
    }
  });
});

describe('PostgreSQL binaries', () => {
  it('should explain what to install when the binaries are missing and we are not root', async () => {
    await assert.rejects(ensurePostgresBinaries({ dirs: ['/nonexistent/pg/bin'], root: false }), (error) => {
      assert.ok(error instanceof SetupError);
      assert.match(error.message, /PostgreSQL 15 server binaries \(initdb, pg_ctl, postgres\) were not found in \/nonexistent\/pg\/bin/);
      assert.match(error.message, /sudo apt-get install postgresql-15/);
      assert.match(error.message, /MIXMARK_PG_BIN/);
      assert.doesNotMatch(error.message, /\n/);
      return true;
    });
  });

  it('should find a folder only when it holds every server binary', () => {
    const dir = mkdtempSync(join(tmpdir(), 'mixmark-fake-bin-'));
    try {
      writeFileSync(join(dir, 'initdb'), '');
      writeFileSync(join(dir, 'pg_ctl'), '');
      assert.equal(findPostgresBinDir([dir]), undefined);
      writeFileSync(join(dir, 'postgres'), '');
      writeFileSync(join(dir, 'psql'), '');
      assert.equal(findPostgresBinDir([dir]), dir);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('a real cluster with a stale postmaster.pid', () => {
  let cluster;
  before(async () => {
    const binDir = findPostgresBinDir();
    assert.ok(binDir, 'PostgreSQL binaries are needed for this test');
    cluster = new PostgresCluster({ binDir, root: mkdtempSync(join(tmpdir(), 'mixmark-stale-')), port: await freePort(), throwaway: true });
    await cluster.init();
  });
  after(async () => {
    await cluster.stop().catch(() => {});
    cluster.remove();
  });

  it('should remove a pid file whose process is gone, then start and stop cleanly', async () => {
    // A pid that surely is not running: a child that already exited.
    const gone = await new Promise((resolve) => {
      const child = spawn(process.execPath, ['-e', '0']);
      child.on('exit', () => resolve(child.pid));
    });
    writeFileSync(join(cluster.dataDir, 'postmaster.pid'), `${gone}\n${cluster.dataDir}\n1700000000\n${cluster.port}\n\n127.0.0.1\n`);
    assert.deepEqual(cluster.inspectPidFile(), { state: 'stale-removed', pid: gone });
    assert.equal(existsSync(join(cluster.dataDir, 'postmaster.pid')), false);
    await cluster.start({ fast: true });
    const running = cluster.inspectPidFile();
    assert.equal(running.state, 'running');
    assert.equal(running.port, cluster.port);
    assert.equal(await cluster.psql('postgres', 'SELECT 40 + 2'), '42');
    await cluster.stop();
    assert.equal(cluster.inspectPidFile().state, 'none');
  });

  it('should treat a pid file naming a live process that is not PostgreSQL as stale', () => {
    writeFileSync(join(cluster.dataDir, 'postmaster.pid'), `${process.pid}\n${cluster.dataDir}\n`);
    assert.equal(cluster.inspectPidFile().state, 'stale-removed');
  });

  it('should give a one-line reason when the server cannot start', async () => {
    const blocker = await listen(cluster.port);
    try {
      await assert.rejects(cluster.start({ fast: true }), (error) => {
        assert.ok(error instanceof SetupError);
        assert.match(error.message, /^PostgreSQL did not start: /);
        assert.doesNotMatch(error.message, /\n/);
        return true;
      });
    } finally {
      blocker.close();
    }
  });
});

describe('dependency stamp', () => {
  it('should change when a dependency changes, not when a script does', () => {
    const dir = mkdtempSync(join(tmpdir(), 'mixmark-stamp-'));
    try {
      mkdirSync(join(dir, 'common'));
      writeFileSync(join(dir, 'package.json'), '{"name":"a"}');
      const first = dependencyStamp(dir);
      assert.equal(dependencyStamp(dir), first);
      writeFileSync(join(dir, 'package.json'), '{"name":"a","scripts":{"x":"y"}}');
      assert.equal(dependencyStamp(dir), first, 'a script change needs no reinstall');
      writeFileSync(join(dir, 'common', 'package.json'), '{"name":"b","dependencies":{"yup":"1.7.1"}}');
      assert.notEqual(dependencyStamp(dir), first);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('test reports', () => {
  it('should count a node:test TAP report and a jest/vitest JSON report', () => {
    const dir = mkdtempSync(join(tmpdir(), 'mixmark-report-'));
    try {
      writeFileSync(join(dir, 'a.tap'), 'TAP version 13\n# tests 5\n# pass 4\n# fail 1\n# cancelled 0\n# skipped 0\n# todo 0\n');
      assert.deepEqual(countReport({ kind: 'tap', file: join(dir, 'a.tap') }), { passed: 4, failed: 1, skipped: 0 });
      writeFileSync(join(dir, 'b.json'), JSON.stringify({ numPassedTests: 7, numFailedTests: 2, numPendingTests: 1, numTodoTests: 0, numRuntimeErrorTestSuites: 1 }));
      assert.deepEqual(countReport({ kind: 'json', file: join(dir, 'b.json') }), { passed: 7, failed: 3, skipped: 1 });
      assert.equal(countReport({ kind: 'json', file: join(dir, 'missing.json') }), undefined);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
