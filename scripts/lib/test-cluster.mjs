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
