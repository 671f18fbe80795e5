import { Injectable, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type PgBoss from 'pg-boss';
import type { AllConfigType } from '../config/config.type';
import { QueueService } from '../queue/queue.service';
import { GradingService } from './grading.service';

export const GRADE_ATTEMPT = 'grade-attempt';

/** Something that runs SQL inside the caller's transaction (pg-boss's `db` option). */
export interface SqlExecutor {
  executeSql(text: string, values: unknown[]): Promise<{ rows: unknown[] }>;
}

/**
 * The grading queue, kept in PostgreSQL by pg-boss. Web servers only add jobs; any process that
 * works the queue (the server itself by default, or `npm run worker -w backend` elsewhere)
 * grades them. Jobs are retried with back-off when a worker crashes or a step throws.
 */
@Injectable()
export class GradingQueue implements OnModuleInit {
  private boss: PgBoss | undefined;
  private expireInSeconds = 300;

  constructor(
    private readonly configService: ConfigService<AllConfigType>,
    private readonly queueService: QueueService,
    private readonly gradingService: GradingService,
  ) {}

  async onModuleInit(): Promise<void> {
    const boss = await this.queueService.ready();
    const storage = this.configService.getOrThrow('storage', { infer: true });
    this.expireInSeconds = storage.gradingExpireSeconds;
    await boss.createQueue(GRADE_ATTEMPT, {
      name: GRADE_ATTEMPT,
      retryLimit: 4,
      retryDelay: 2,
      retryBackoff: true,
      expireInSeconds: this.expireInSeconds,
    });
    this.boss = boss;
    if (storage.gradingInServer) await this.work(storage.gradingConcurrency);
  }

  /** Works the queue in this process with `concurrency` jobs at once. */
  async work(concurrency: number): Promise<void> {
    const boss = this.requireBoss();
    for (let i = 0; i < concurrency; i += 1) {
      let workerId: string | undefined;
      workerId = await boss.work<{ attemptId: string }>(GRADE_ATTEMPT, { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: 0.5 }, async ([job]) => {
        await this.gradingService.grade(job.data.attemptId, { finalTry: job.retryCount >= job.retryLimit });
        // pg-boss waits out the polling interval after every fetch, jobs found or not, which
        // capped each worker at two photos a second (a 12 MP photo takes ~0.2 s). After a job
        // done, fetch the next at once; an empty queue still waits the interval.
        if (workerId) boss.notifyWorker(workerId);
      });
    }
  }

  /**
   * Queues the grading of an attempt. Pass `db` to add the job in the caller's transaction, so
   * that an attempt row never exists without its job. The attempt id is the job's singleton key:
   * an attempt is never queued twice.
   */
  async enqueue(attemptId: string, db?: SqlExecutor): Promise<void> {
    // The expiry is given per job as well: a queue made earlier keeps the options it was made with.
    // A job whose worker died is retried once it has been active longer than this.
    await this.requireBoss().send(GRADE_ATTEMPT, { attemptId }, { singletonKey: attemptId, expireInSeconds: this.expireInSeconds, db: db as never });
  }

  private requireBoss(): PgBoss {
    if (!this.boss) throw new Error('the grading queue has not started');
    return this.boss;
  }
}
