import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';
import { guardAgainstDatabaseOutages } from './common/process/database-outage-guard';
import { applyImageThreads } from './common/process/image-threads';
import type { AllConfigType } from './config/config.type';

/**
 * A grading worker: the same application without the HTTP listener, working the PostgreSQL
 * queue. Run as many as you like, on any machine that reaches the database and the photo store
 * (`npm run worker -w backend`; GRADING_CONCURRENCY jobs at once each).
 */
async function main(): Promise<void> {
  guardAgainstDatabaseOutages();
  process.env.GRADING_IN_SERVER = 'true';
  const app = await NestFactory.createApplicationContext(AppModule, { logger: ['fatal', 'error', 'warn', 'log'] });
  app.enableShutdownHooks();
  applyImageThreads(app.get(ConfigService<AllConfigType>).getOrThrow('storage.imageThreads', { infer: true }));
  Logger.log('Mixmark grading worker is working the queue', 'Worker');
}

main().catch((error: unknown) => {
  console.error(`mixmark worker: could not start: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
