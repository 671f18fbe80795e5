import { Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import PgBoss from 'pg-boss';
import type { AllConfigType } from '../config/config.type';

/**
 * The one pg-boss instance of this process, shared by every queue (grading, weekly digest), so
 * that a process holds one small pool for all of them. Started on first use; whoever needs the
 * queue awaits `ready()`, which makes the start order of the modules irrelevant.
 */
@Injectable()
export class QueueService implements OnApplicationShutdown {
  private readonly logger = new Logger(QueueService.name);
  private starting: Promise<PgBoss> | undefined;

  constructor(private readonly configService: ConfigService<AllConfigType>) {}

  ready(): Promise<PgBoss> {
    this.starting ??= this.start();
    return this.starting;
  }

  private async start(): Promise<PgBoss> {
    const boss = new PgBoss({
      connectionString: this.configService.getOrThrow('database.url', { infer: true }),
      schema: 'pgboss',
      max: 3,
      // Expiry, retries of expired jobs and archiving run in whichever process gets to them first
      // (pg-boss takes turns through its version table), so a dead worker's job comes round again.
      supervise: true,
      maintenanceIntervalSeconds: this.configService.getOrThrow('storage.queueMaintenanceSeconds', { infer: true }),
      migrate: true,
    });
    boss.on('error', (error) => this.logger.error(`queue: ${error.message}`));
    await boss.start();
    return boss;
  }

  async onApplicationShutdown(): Promise<void> {
    if (!this.starting) return;
    const boss = await this.starting.catch(() => undefined);
    await boss?.stop({ graceful: true, wait: true, timeout: 20_000 });
  }
}
