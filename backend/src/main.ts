import 'reflect-metadata';
import { Logger, type LogLevel } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';
import { guardAgainstDatabaseOutages } from './common/process/database-outage-guard';
import { applyImageThreads } from './common/process/image-threads';
import type { AllConfigType } from './config/config.type';
import { configureApp } from './configure-app';

const levels: LogLevel[] = ['fatal', 'error', 'warn', 'log', 'debug', 'verbose'];

async function bootstrap(): Promise<void> {
  guardAgainstDatabaseOutages();
  const wanted = (process.env.LOG_LEVEL ?? 'log') as LogLevel;
  const logger = levels.slice(0, Math.max(2, levels.indexOf(wanted) + 1));
  const app = await NestFactory.create(AppModule, { logger, bufferLogs: true });
  configureApp(app);
  const config = app.get(ConfigService<AllConfigType>);
  applyImageThreads(config.getOrThrow('storage.imageThreads', { infer: true }));
  const host = config.getOrThrow('app.host', { infer: true });
  const port = config.getOrThrow('app.port', { infer: true });
  await app.listen(port, host);
  Logger.log(`Mixmark listening on http://${host}:${port}`, 'Main');
}

bootstrap().catch((error: unknown) => {
  const message = error instanceof Error ? error.message : String(error);
  // One clear line for the operator; the start script shows it as it is.
  console.error(`mixmark backend: could not start: ${message}`);
  process.exit(1);
});
