import { existsSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { Module, type MiddlewareConsumer, type NestModule } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_FILTER } from '@nestjs/core';
import { ServeStaticModule, type ServeStaticModuleOptions } from '@nestjs/serve-static';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ApiExceptionFilter } from './common/filters/api-exception.filter';
import { RequestLoggerMiddleware } from './common/middleware/request-logger.middleware';
import { AssignmentsModule } from './assignments/assignments.module';
import { AttemptsModule } from './attempts/attempts.module';
import { AuthModule } from './auth/auth.module';
import { CardsModule } from './cards/cards.module';
import { ClassesModule } from './classes/classes.module';
import appConfig from './config/app.config';
import authConfig from './config/auth.config';
import databaseConfig from './config/database.config';
import mailConfig from './config/mail.config';
import storageConfig from './config/storage.config';
import type { AllConfigType } from './config/config.type';
import { dataSourceOptions } from './database/data-source';
import { DigestModule } from './digest/digest.module';
import { DrillsModule } from './drills/drills.module';
import { HealthModule } from './health/health.module';
import { MailModule } from './mail/mail.module';
import { OutboxModule } from './outbox/outbox.module';
import { PalettesModule } from './palettes/palettes.module';
import { ProgressModule } from './progress/progress.module';
import { QueueModule } from './queue/queue.module';
import { StorageModule } from './storage/storage.module';

/**
 * Cache-Control for the built web app. Vite names every file under /assets/ by a hash of its
 * content, so a browser may keep them for a year without asking again (`immutable`); anything
 * else, index.html and the SPA fallback above all, is revalidated on every load (`no-cache`), so a
 * new release is picked up at once. Also called by the fallback for index.html.
 */
export function staticCacheHeaders(rootPath: string) {
  return (res: { setHeader(name: string, value: string): unknown }, filePath: string): void => {
    const hashed = relative(rootPath, filePath).startsWith(`assets${sep}`);
    res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
  };
}

/** ServeStaticModule's options for the built web app in `rootPath` (none when it is not built). */
export function webAppServeOptions(rootPath: string): ServeStaticModuleOptions[] {
  if (!existsSync(join(rootPath, 'index.html'))) return [];
  return [{ rootPath, exclude: ['/api/{*path}'], serveStaticOptions: { index: 'index.html', setHeaders: staticCacheHeaders(rootPath) } }];
}

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, load: [appConfig, databaseConfig, authConfig, mailConfig, storageConfig], ignoreEnvFile: true }),
    TypeOrmModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AllConfigType>) => ({
        ...dataSourceOptions(config.getOrThrow('database', { infer: true })),
        retryAttempts: 3,
        retryDelay: 1000,
      }),
    }),
    // The built web app, served beside the API; every non-API path falls back to index.html
    // so that the app's own router handles it (its 404 page included).
    ServeStaticModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<AllConfigType>) => webAppServeOptions(config.getOrThrow('app.frontendDist', { infer: true })),
    }),
    HealthModule,
    MailModule,
    StorageModule,
    QueueModule,
    OutboxModule.register(process.env.NODE_ENV),
    AuthModule,
    ClassesModule,
    DrillsModule,
    AssignmentsModule,
    AttemptsModule,
    ProgressModule,
    CardsModule,
    PalettesModule,
    DigestModule,
  ],
  providers: [{ provide: APP_FILTER, useClass: ApiExceptionFilter }],
})
export class AppModule implements NestModule {
  configure(consumer: MiddlewareConsumer): void {
    consumer.apply(RequestLoggerMiddleware).forRoutes('{*path}');
  }
}
