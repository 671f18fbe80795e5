import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { freePort } from './ports.mjs';
import { ensurePostgresBinaries, PostgresCluster } from './postgres.mjs';

/**
 * A throwaway PostgreSQL cluster for tests: its own folder under the system temp dir (never the
 * start command's cluster), a free port, durability off for speed. `remove()` deletes it all.
 */
export async function startTestCluster({ log = () => {} } = {}) {
  const binDir = await ensurePostgresBinaries({ log });
  const root = mkdtempSync(join(tmpdir(), 'mixmark-test-pg-'));
  const port = await freePort();
  const cluster = new PostgresCluster({ binDir, root, port, throwaway: true });
  await cluster.init();
  await cluster.start({ fast: true });
  return {
    cluster,
    async remove() {
      await cluster.stop().catch(() => {});
      cluster.remove();
    },
  };
}

/**
 * Drops (closing its connections) and creates a database on the server at `serverUrl`, so a
 * suite starts from nothing. `pg` is installed by then (the bootstrap ran first).
 */
export async function recreateDatabase(serverUrl, name) {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`database name "${name}" must be lower-case letters, digits and _`);
  const { default: pg } = await import('pg');
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  try {
    await client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    await client.query(`CREATE DATABASE "${name}"`);
  } finally {
    await client.end();
  }
  return serverUrl.replace(/\/[^/]*$/, `/${name}`);
}
