import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { readDatabaseConfig } from './config/database.config';
import { dataSourceOptions } from './database/data-source';
import { seedDemo } from './database/seeds/seed-demo';
import { seedTeaching } from './database/seeds/seed-teaching';
import { readStorageConfig } from './config/storage.config';
import { LocalPhotoStorage } from './storage/local-photo-storage';

/**
 * Operator commands that need the database but not the web server:
 *   node dist/cli.js migrate        apply pending migrations
 *   node dist/cli.js migrate:revert undo the last migration
 *   node dist/cli.js seed           load the demo scenario (idempotent)
 * Prints one line per step; on failure one line on stderr and exit code 1.
 */
async function main(command: string | undefined): Promise<void> {
  const commands = ['migrate', 'migrate:revert', 'seed'];
  if (!command || !commands.includes(command)) {
    throw new Error(`Expected one of ${commands.join(', ')} but received ${command ?? 'nothing'}`);
  }
  const dataSource = new DataSource(dataSourceOptions(readDatabaseConfig()));
  await dataSource.initialize();
  try {
    if (command === 'migrate') {
      const applied = await dataSource.runMigrations({ transaction: 'each' });
      console.log(
        applied.length === 0
          ? 'migrations: up to date'
          : `migrations: applied ${applied.map((m) => m.name).join(', ')}`,
      );
    } else if (command === 'migrate:revert') {
      await dataSource.undoLastMigration({ transaction: 'each' });
      console.log('migrations: reverted the last one');
    } else {
      const summary = await seedDemo(dataSource);
      console.log(`demo data: ${summary.usersCreated} accounts added, ${summary.usersKept} already there`);
      const started = Date.now();
      const teaching = await seedTeaching(dataSource, new LocalPhotoStorage(readStorageConfig().dir));
      console.log(
        teaching.skipped
          ? 'demo data: classes, drills and attempts already there'
          : `demo data: ${teaching.classes} classes, ${teaching.drills} drills, ${teaching.assignments} assignments, ` +
              `${teaching.attempts} attempts photographed and graded in ${((Date.now() - started) / 1000).toFixed(1)} s`,
      );
    }
  } finally {
    await dataSource.destroy();
  }
}

main(process.argv[2]).catch((error: unknown) => {
  console.error(`mixmark cli: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
