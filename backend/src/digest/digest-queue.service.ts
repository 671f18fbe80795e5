import { Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type PgBoss from 'pg-boss';
import type { AllConfigType } from '../config/config.type';
import { QueueService } from '../queue/queue.service';
import { isoWeekOf, parseIsoWeek, previousIsoWeek } from './iso-week';
import { WeeklyDigestService } from './weekly-digest.service';

/** One job per week: finds who gets a digest and queues one job per person. */
export const WEEKLY_DIGEST = 'weekly-digest';
/** One job per person and week: composes and sends that person's digest. */
export const WEEKLY_DIGEST_PERSON = 'weekly-digest-person';

/**
 * Schedules and works the weekly digest through pg-boss, the queue the grading already uses.
 *
 * Why pg-boss's `schedule()` rather than an @nestjs/schedule cron: a cron in each process fires in
 * every server and worker at once; pg-boss keeps the schedule in PostgreSQL and its clock creates
 * one job per tick for the whole cluster, and a job whose worker dies is retried with back-off.
 * The week job fans out one job per person (singleton key `userId:week` on a `short` queue, so a
 * person is never queued twice at once), and the person job claims a `weekly_digests` row in the
 * transaction that sends the mail (`WeeklyDigestService.sendTo`): however often the week runs,
 * retries included, each person gets that week's mail once.
 *
 * Only processes that work queues (`GRADING_IN_SERVER`, the worker) register the schedule and
 * work these jobs; the schedule is `mail.digestCron` (DIGEST_CRON, Monday 07:00 UTC by default),
 * and `off` removes it.
 */
@Injectable()
export class DigestQueue implements OnModuleInit {
  private readonly logger = new Logger(DigestQueue.name);
  private boss: PgBoss | undefined;

  constructor(
    private readonly configService: ConfigService<AllConfigType>,
    private readonly queueService: QueueService,
    private readonly digestService: WeeklyDigestService,
  ) {}

  async onModuleInit(): Promise<void> {
    const boss = await this.queueService.ready();
    await boss.createQueue(WEEKLY_DIGEST, { name: WEEKLY_DIGEST, policy: 'short', retryLimit: 5, retryDelay: 60, retryBackoff: true, expireInSeconds: 900 });
    await boss.createQueue(WEEKLY_DIGEST_PERSON, {
      name: WEEKLY_DIGEST_PERSON,
      policy: 'short',
      retryLimit: 6,
      retryDelay: 30,
      retryBackoff: true,
      expireInSeconds: 300,
    });
    this.boss = boss;
    if (!this.configService.getOrThrow('storage.gradingInServer', { infer: true })) return;
    const cron = this.configService.getOrThrow('mail.digestCron', { infer: true });
    if (cron) await boss.schedule(WEEKLY_DIGEST, cron, {}, { tz: 'UTC' });
    else await boss.unschedule(WEEKLY_DIGEST);
    await boss.work<{ week?: string }>(WEEKLY_DIGEST, { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: 2 }, async ([job]) => {
      // A scheduled job carries no week: it sums up the week before the one it was made in.
      await this.fanOut(job.data.week ?? previousIsoWeek(job.createdOn).key);
    });
    await boss.work<{ userId: string; week: string }>(WEEKLY_DIGEST_PERSON, { batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
      await this.digestService.sendTo(job.data.userId, parseIsoWeek(job.data.week));
    });
  }

  /** Queues the digest of one week now (default: last week), as the schedule would. */
  async enqueueWeek(week = previousIsoWeek(new Date()).key): Promise<string | null> {
    return this.requireBoss().send(WEEKLY_DIGEST, { week: parseIsoWeek(week).key }, { singletonKey: week });
  }

  private async fanOut(weekKey: string): Promise<void> {
    const week = parseIsoWeek(weekKey);
    if (week.start.getTime() > isoWeekOf(new Date()).start.getTime()) throw new Error(`the week ${weekKey} has not started`);
    const boss = this.requireBoss();
    const people = await this.digestService.recipients(week);
    for (const userId of people) {
      await boss.send(WEEKLY_DIGEST_PERSON, { userId, week: week.key }, { singletonKey: `${userId}:${week.key}` });
    }
    this.logger.log(`weekly digest ${week.key}: queued for ${people.length} people`);
  }

  private requireBoss(): PgBoss {
    if (!this.boss) throw new Error('the digest queue has not started');
    return this.boss;
  }
}
