// A PostgreSQL cluster of a test's own, for tests that stop and start the server or need a queue
// no other test file works: restarting the shared e2e cluster would break the files running
// beside it. Migrated databases on it, and stop/start for the faults.
import { join } from 'node:path';
import { run } from '../../scripts/lib/proc.mjs';
import { rootDir } from '../../scripts/lib/project.mjs';
import { recreateDatabase, startTestCluster } from '../../scripts/lib/test-cluster.mjs';

export async function startThrowawayCluster() {
  const testCluster = await startTestCluster();
  const { cluster } = testCluster;
  return {
    /** A new database with every migration applied; resolves to its URL. */
    async migratedDatabase(name) {
      const url = await recreateDatabase(cluster.url('postgres'), name);
      await run(process.execPath, [join(rootDir, 'backend/dist/cli.js'), 'migrate'], {
        capture: true,
        env: { ...process.env, DATABASE_URL: url },
        label: `the migrations of ${name}`,
      });
      return url;
    },
    stop: () => cluster.stop(),
    start: () => cluster.start({ fast: true }),
    remove: () => testCluster.remove(),
  };
}
