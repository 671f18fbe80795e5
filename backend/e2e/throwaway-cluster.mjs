// A PostgreSQL cluster of a test's own, for tests that stop and start the server or need a queue
// no other test file works: restarting the shared e2e cluster would break the files running
// beside it. Migrated databases on it, and stop/start for the faults.
import { join } from 'node:path';
import { run } from '../../scripts/lib/proc.mjs';
import { rootDir } from '../../scripts/lib/project.mjs';
import { recreateDatabase, startTestCluster } from '../../scripts/lib/test-cluster.mjs';

async function migrate(url, name) {
  await run(process.execPath, [join(rootDir, 'backend/dist/cli.js'), 'migrate'], {
    capture: true,
    env: { ...process.env, DATABASE_URL: url },
    label: `the migrations of ${name}`,
  });
  return url;
}

/**
 * A database of a test's own on the shared e2e server (MIXMARK_TEST_PG_URL), migrated: for a
 * test whose queue no other file's server may work (their grading would not find its photos).
 */
export async function migratedTestDatabase(name) {
  const base = process.env.MIXMARK_TEST_PG_URL;
  if (!base) throw new Error('MIXMARK_TEST_PG_URL is not set: the e2e set-up provides it');
  return migrate(await recreateDatabase(base, name), name);
}

export async function startThrowawayCluster() {
  const testCluster = await startTestCluster();
  const { cluster } = testCluster;
  return {
    /** A new database with every migration applied; resolves to its URL. */
    async migratedDatabase(name) {
      return migrate(await recreateDatabase(cluster.url('postgres'), name), name);
    },
    stop: () => cluster.stop(),
    start: () => cluster.start({ fast: true }),
    remove: () => testCluster.remove(),
  };
}
