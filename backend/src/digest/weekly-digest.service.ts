import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { AssignmentStatus } from '../assignments/assignment-status';
import { AssignmentsService } from '../assignments/assignments.service';
import { ClassesService } from '../classes/classes.service';
import type { AllConfigType } from '../config/config.type';
import { MailService } from '../mail/mail.service';
import {
  teacherDigestMail,
  weeklyDigestMail,
  type DigestSkill,
  type MailContent,
  type TeacherDigestClass,
} from '../mail/templates';
import { ProgressService } from '../progress/progress.service';
import { User } from '../users/entities/user.entity';
import type { IsoWeek } from './iso-week';
import { rowsOf } from '../common/database/rows-of';

/** What became of one person's digest for one week. */
export type DigestOutcome = 'sent' | 'already-sent' | 'nothing-to-say' | 'opted-out' | 'failed';

const dayMs = 86_400_000;
/** Statuses that mean "still to do" for the student. */
const open: AssignmentStatus[] = ['not-started', 'needs-retake', 'late', 'failed'];
const standing: Record<AssignmentStatus, string> = {
  'not-started': 'not started',
  submitted: 'handed in, being marked',
  'needs-retake': 'needs a retake',
  passed: 'passed',
  failed: 'not passed yet',
  late: 'late',
};

/**
 * The weekly progress digest: what one person's mail for one ISO week says, and sending it at most
 * once. The figures come from `ProgressService` and `AssignmentsService` (the same numbers as the
 * progress pages and the gradebook; no second copy of the maths).
 *
 * Once per person per week: `weekly_digests` has one row per (user, week), claimed in the same
 * transaction that sends the mail. A second run, a retried job or a second worker at the same
 * moment finds the row (or waits on the first claim's lock, then finds it) and sends nothing. When
 * the SMTP server refuses, the transaction rolls back and a retry may send. The one gap left is a
 * crash between the SMTP server accepting the mail and the commit (milliseconds): that person may
 * get the week twice, never zero times once the run completes.
 */
@Injectable()
export class WeeklyDigestService {
  private readonly logger = new Logger(WeeklyDigestService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly progressService: ProgressService,
    private readonly assignmentsService: AssignmentsService,
    private readonly classesService: ClassesService,
    private readonly mailService: MailService,
    private readonly configService: ConfigService<AllConfigType>,
  ) {}

  /** Everyone who may get the digest of `week`: students and teachers who want it and have not had it. */
  async recipients(week: IsoWeek): Promise<string[]> {
    const rows = await this.dataSource.query<{ id: string }[]>(
      `SELECT u.id FROM users u
        WHERE u.weekly_digest AND u.role IN ('student', 'teacher')
          AND NOT EXISTS (SELECT 1 FROM weekly_digests d WHERE d.user_id = u.id AND d.iso_week = $1)
        ORDER BY u.id`,
      [week.key],
    );
    return rows.map((row) => row.id);
  }

  /**
   * Sends one person the digest of one week, unless they turned it off, had it already, or there
   * is nothing to tell them.
   * @throws ServiceUnavailableException (`mail_unavailable`) when the SMTP server refuses; nothing
   *   is recorded then, so a retry sends it
   */
  async sendTo(userId: string, week: IsoWeek): Promise<DigestOutcome> {
    const user = await this.dataSource.getRepository(User).findOneBy({ id: userId });
    if (!user || !user.weeklyDigest || user.role === 'admin') return 'opted-out';
    if (await this.alreadySent(userId, week)) return 'already-sent';
    const content = user.role === 'teacher' ? await this.teacherContent(user, week) : await this.studentContent(user, week);
    // People with no activity that week and nothing due get no mail: an empty summary every
    // Monday teaches people to ignore the real ones.
    if (!content) return 'nothing-to-say';
    return this.dataSource.transaction(async (manager) => {
      const claimed = rowsOf(
        await manager.query(
          `INSERT INTO weekly_digests (user_id, iso_week) VALUES ($1, $2) ON CONFLICT DO NOTHING RETURNING user_id`,
          [userId, week.key],
        ),
      );
      if (claimed.length === 0) return 'already-sent';
      await this.mailService.send({ to: user.email, ...content });
      return 'sent';
    });
  }

  /**
   * Sends the week's digest to everyone due one, one after another in this process (the CLI's
   * `digest` command; the schedule fans out through the queue instead). Safe to run again.
   */
  async runWeek(week: IsoWeek): Promise<Record<DigestOutcome, number>> {
    const counts: Record<DigestOutcome, number> = { sent: 0, 'already-sent': 0, 'nothing-to-say': 0, 'opted-out': 0, failed: 0 };
    for (const userId of await this.recipients(week)) {
      try {
        counts[await this.sendTo(userId, week)] += 1;
      } catch (error) {
        counts.failed += 1;
        this.logger.error(`weekly digest ${week.key} for ${userId}: ${(error as Error).message}`);
      }
    }
    return counts;
  }

  private async alreadySent(userId: string, week: IsoWeek): Promise<boolean> {
    const rows = await this.dataSource.query(`SELECT 1 FROM weekly_digests WHERE user_id = $1 AND iso_week = $2`, [userId, week.key]);
    return rows.length > 0;
  }

  private urls() {
    const appUrl = this.configService.getOrThrow('app.publicUrl', { infer: true }).replace(/\/$/, '');
    return { appUrl, accountUrl: `${appUrl}/account` };
  }

  /** Assignments due last week or in the coming one: the ones worth a word on Monday. */
  private inPlay(dueAt: Date, week: IsoWeek): boolean {
    const t = new Date(dueAt).getTime();
    return t >= week.start.getTime() && t < week.end.getTime() + 7 * dayMs;
  }

  private async studentContent(user: User, week: IsoWeek): Promise<MailContent | undefined> {
    const caller = { id: user.id, role: user.role };
    // The streak as it stood at the end of the week summed up (or now, for the current week).
    const now = new Date(Math.min(Date.now(), week.end.getTime() - 1));
    const progress = await this.progressService.forStudent(caller, user.id, { now });
    const figures = progress.weeks.find((w) => w.week === week.start.toISOString().slice(0, 10));
    const due = (await this.assignmentsService.findAll(caller))
      .filter((a) => this.inPlay(a.dueAt, week) && a.status !== undefined && open.includes(a.status))
      .map((a) => ({ title: a.drill.title, className: a.className, dueAt: new Date(a.dueAt), standing: standing[a.status!] }));
    if (!figures && due.length === 0) return undefined;
    // Value, hue (temperature) and chroma errors as the CIEDE2000 parts |ΔL′|, |ΔH′|, |ΔC′|,
    // which share one scale, decide the strongest and weakest skill.
    const parts: Array<[DigestSkill, number | null]> = figures
      ? [['value', figures.meanValueError], ['temperature', figures.meanHueError], ['chroma', figures.meanChromaError]]
      : [];
    const known = parts.filter((p): p is [DigestSkill, number] => p[1] !== null).sort((x, y) => x[1] - y[1]);
    const { appUrl, accountUrl } = this.urls();
    return weeklyDigestMail({
      displayName: user.displayName,
      weekOf: week.start,
      attempts: figures?.attempts ?? 0,
      passRate: figures?.passRate ?? null,
      meanDeltaE: figures?.meanDeltaE ?? null,
      errors: figures
        ? { value: figures.meanValueError, temperature: figures.meanTemperatureError, chroma: figures.meanChromaError }
        : undefined,
      bestSkill: known.length >= 2 ? known[0][0] : null,
      weakestSkill: known.length >= 2 ? known[known.length - 1][0] : null,
      streakDays: progress.streakDays,
      due,
      progressUrl: `${appUrl}/student/progress`,
      accountUrl,
    });
  }

  private async teacherContent(user: User, week: IsoWeek): Promise<MailContent | undefined> {
    const teacher = { id: user.id, role: user.role };
    const { appUrl, accountUrl } = this.urls();
    const weekKey = week.start.toISOString().slice(0, 10);
    const classes: TeacherDigestClass[] = [];
    for (const klass of await this.classesService.findAll(teacher)) {
      const [book, progress, [review]] = await Promise.all([
        this.progressService.gradebook(teacher, klass.id),
        this.progressService.forClass(teacher, klass.id),
        this.dataSource.query<{ n: number }[]>(
          `SELECT count(*)::int AS n FROM attempts a JOIN assignments s ON s.id = a.assignment_id
            WHERE s.class_id = $1 AND a.state = 'graded' AND a.pass = false AND a.override_pass IS NULL
              AND a.created_at >= $2 AND a.created_at < $3`,
          [klass.id, week.start, week.end],
        ),
      ]);
      const assignments = book.assignments
        .filter((a) => this.inPlay(a.dueAt, week))
        .map((a) => ({
          title: a.drillTitle,
          dueAt: new Date(a.dueAt),
          handedIn: book.students.filter((s) => s.cells[a.id].attempts > 0).map((s) => s.displayName),
          behind: book.students
            .filter((s) => open.includes(s.cells[a.id].status))
            .map((s) => ({ name: s.displayName, standing: standing[s.cells[a.id].status] })),
        }));
      const attempts = progress.weeks.find((w) => w.week === weekKey)?.attempts ?? 0;
      if (attempts === 0 && review.n === 0 && assignments.length === 0) continue; // a quiet class
      classes.push({
        name: klass.name,
        attempts,
        assignments,
        waitingForReview: review.n,
        gradebookUrl: `${appUrl}/teacher/classes/${klass.id}/gradebook`,
      });
    }
    if (classes.length === 0) return undefined;
    return teacherDigestMail({ displayName: user.displayName, weekOf: week.start, classes, dashboardUrl: `${appUrl}/teacher`, accountUrl });
  }
}
