import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { DataSource } from 'typeorm';
import { AppModule } from './app.module';
import { readDatabaseConfig } from './config/database.config';
import { dataSourceOptions } from './database/data-source';
import { seedDemo } from './database/seeds/seed-demo';
import { seedTeaching } from './database/seeds/seed-teaching';
import { readStorageConfig } from './config/storage.config';
import { createPhotoStorage } from './storage/create-photo-storage';
import { parseIsoWeek, previousIsoWeek } from './digest/iso-week';
import { WeeklyDigestService } from './digest/weekly-digest.service';

/**
 * Operator commands that need the database but not the web server:
 *   node dist/cli.js migrate        apply pending migrations
 *   node dist/cli.js migrate:revert undo the last migration
 *   node dist/cli.js seed           load the demo scenario (idempotent)
 *   node dist/cli.js digest [--week YYYY-Www]
 *                                   send the weekly progress digest of a week (default: last
 *                                   week) now, from this process; whoever had it already is
 *                                   skipped, so it is safe beside the schedule
 * Prints one line per step; on failure one line on stderr and exit code 1.
 */
async function main(command: string | undefined, args: string[]): Promise<void> {
  const commands = ['migrate', 'migrate:revert', 'seed', 'digest'];
  if (!command || !commands.includes(command)) {
    throw new Error(`Expected one of ${commands.join(', ')} but received ${command ?? 'nothing'}`);
  }
  if (command === 'digest') return digest(args);
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
      const teaching = await seedTeaching(dataSource, createPhotoStorage(readStorageConfig()));
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

async function digest(args: string[]): Promise<void> {
  const flag = args.indexOf('--week');
  if (flag >= 0 && !args[flag + 1]) throw new Error('Expected a week after --week, such as --week 2031-W10');
  const week = flag >= 0 ? parseIsoWeek(args[flag + 1]) : previousIsoWeek(new Date());
  // The whole app without HTTP and without working the queues (no grading here, no schedule).
  process.env.GRADING_IN_SERVER = 'false';
  const app = await NestFactory.createApplicationContext(AppModule, { logger: ['fatal', 'error', 'warn'] });
  try {
    const counts = await app.get(WeeklyDigestService).runWeek(week);
    console.log(
      `weekly digest ${week.key}: ${counts.sent} sent, ${counts['already-sent']} sent before, ` +
        `${counts['nothing-to-say']} with nothing to say, ${counts.failed} failed`,
    );
    if (counts.failed > 0) throw new Error(`${counts.failed} digests could not be sent; run the command again to retry them`);
  } finally {
    await app.close();
  }
}

main(process.argv[2], process.argv.slice(3)).catch((error: unknown) => {
  console.error(`mixmark cli: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
