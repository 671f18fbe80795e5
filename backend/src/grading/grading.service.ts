import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { Attempt } from '../attempts/entities/attempt.entity';
import type { AllConfigType } from '../config/config.type';
import { Drill } from '../drills/entities/drill.entity';
import { MailService } from '../mail/mail.service';
import { attemptMarkedMail } from '../mail/templates';
import { measurePhoto } from '../measurement/measure-photo';
import { overlayPlan } from '../measurement/render-overlay';
import { PhotoStorage } from '../storage/photo-storage';
import { User } from '../users/entities/user.entity';
import { gradeMeasurement } from './grade-photo';
import { rowsOf } from '../common/database/rows-of';

/**
 * Measures and grades one attempt. Safe to run twice for the same attempt, even at once: the
 * claim bumps `tries`, and only the claim that is still current may write the result, so an
 * attempt is graded exactly once.
 */
@Injectable()
export class GradingService {
  private readonly logger = new Logger(GradingService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly storage: PhotoStorage,
    private readonly mailService: MailService,
    private readonly configService: ConfigService<AllConfigType>,
  ) {}

  async grade(attemptId: string, { finalTry = false } = {}): Promise<void> {
    const claimed = rowsOf<{ tries: number }>(
      await this.dataSource.query(
        `UPDATE attempts SET state = 'measuring', tries = tries + 1 WHERE id = $1 AND state IN ('queued', 'measuring') RETURNING tries`,
        [attemptId],
      ),
    );
    if (claimed.length === 0) return; // graded already, or gone
    const claim = claimed[0].tries;
    try {
      await this.measureAndWrite(attemptId, claim);
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      this.logger.error(`attempt ${attemptId}, try ${claim}: ${reason}`);
      if (finalTry) {
        await this.dataSource.query(
          `UPDATE attempts SET state = 'failed', failure_reason = $3 WHERE id = $1 AND tries = $2 AND state = 'measuring'`,
          [attemptId, claim, 'The photo could not be graded because of a fault on our side. Please send it again.'],
        );
        return;
      }
      await this.dataSource.query(`UPDATE attempts SET state = 'queued' WHERE id = $1 AND tries = $2 AND state = 'measuring'`, [attemptId, claim]);
      throw error; // pg-boss retries with back-off
    }
  }

  private async measureAndWrite(attemptId: string, claim: number): Promise<void> {
    const attempt = await this.dataSource.getRepository(Attempt).findOneByOrFail({ id: attemptId });
    const drill = await this.dataSource.getRepository(Drill).findOneOrFail({ where: { id: attempt.drillId }, withDeleted: true });
    const photo = await this.storage.get(attempt.photoKey);
    if (!photo) throw new Error(`the stored photo ${attempt.photoKey} is missing`);
    const detail = await measurePhoto(photo);
    // The overlay is drawn when someone first opens it (AttemptsService.image); here only what
    // it shows is kept, which costs nothing next to drawing and encoding a picture per attempt.
    const overlayKey = detail.photo ? `attempts/${attempt.id}/overlay.jpg` : null;
    const plan = detail.photo ? JSON.stringify(overlayPlan(detail)) : null;
    const outcome = gradeMeasurement(drill, detail.result);
    const written = rowsOf<{ id: string }>(
      outcome.kind === 'graded'
        ? await this.dataSource.query(
            `UPDATE attempts SET state = 'graded', readings = $3, mark = $4, score = $5, pass = $6, quality = $7, overlay_key = $8, overlay_plan = $9, graded_at = now()
              WHERE id = $1 AND tries = $2 AND state = 'measuring' RETURNING id`,
            [attemptId, claim, JSON.stringify(outcome.readings), JSON.stringify(outcome.mark), outcome.mark.score, outcome.mark.pass, JSON.stringify({ errors: [], warnings: outcome.warnings }), overlayKey, plan],
          )
        : await this.dataSource.query(
            `UPDATE attempts SET state = 'needs-retake', quality = $3, overlay_key = $4, overlay_plan = $5, graded_at = now()
              WHERE id = $1 AND tries = $2 AND state = 'measuring' RETURNING id`,
            [attemptId, claim, JSON.stringify({ errors: outcome.errors, warnings: outcome.warnings }), overlayKey, plan],
          ),
    );
    if (written.length === 1 && outcome.kind === 'graded') await this.tellStudent(attempt, drill, outcome.mark);
  }

  /** The "your swatch is marked" mail; a mail failure never undoes a mark. */
  private async tellStudent(attempt: Attempt, drill: Drill, mark: { score: number; pass: boolean; feedback: { text: string }[] }): Promise<void> {
    try {
      const student = await this.dataSource.getRepository(User).findOneByOrFail({ id: attempt.studentId });
      const publicUrl = this.configService.getOrThrow('app.publicUrl', { infer: true });
      await this.mailService.send({
        to: student.email,
        ...attemptMarkedMail({
          displayName: student.displayName,
          drillTitle: drill.title,
          score: mark.score,
          pass: mark.pass,
          feedbackLines: mark.feedback.slice(0, 3).map((line) => line.text),
          attemptUrl: `${publicUrl}/attempts/${attempt.id}`,
        }),
      });
    } catch (error) {
      this.logger.warn(`could not send the marked mail for attempt ${attempt.id}: ${(error as Error).message}`);
    }
  }
}
