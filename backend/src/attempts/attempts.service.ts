import { randomUUID } from 'node:crypto';
import {
  BadRequestException,
  Injectable,
  Logger,
  NotFoundException,
  PayloadTooLargeException,
  ServiceUnavailableException,
  UnsupportedMediaTypeException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import type { CreateAttemptInput, OverrideMarkInput } from '@mixmark/common';
import { DataSource, Repository } from 'typeorm';
import { AssignmentsService } from '../assignments/assignments.service';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import type { AllConfigType } from '../config/config.type';
import { DrillsService } from '../drills/drills.service';
import { Drill } from '../drills/entities/drill.entity';
import { GradingQueue } from '../grading/grading-queue.service';
import { MailService } from '../mail/mail.service';
import { attemptMarkedMail } from '../mail/templates';
import { sniffImageType } from '../measurement/decode-photo';
import { PhotoFileError } from '../measurement/measurement-issue';
import { renderOverlayFromPhoto } from '../measurement/render-overlay';
import { PhotoStorage } from '../storage/photo-storage';
import { storablePhoto, type StorablePhoto } from '../storage/storable-photo';
import { User } from '../users/entities/user.entity';
import { toAttemptView, type AttemptView } from './attempt-view';
import { Attempt } from './entities/attempt.entity';

const notFound = () => new NotFoundException({ code: 'not_found', message: 'There is no attempt with this id.' });

export interface AttemptFilter {
  assignmentId?: string;
  drillId?: string;
  studentId?: string;
}

@Injectable()
export class AttemptsService {
  private readonly logger = new Logger(AttemptsService.name);

  constructor(
    @InjectRepository(Attempt) private readonly attemptsRepository: Repository<Attempt>,
    private readonly assignmentsService: AssignmentsService,
    private readonly drillsService: DrillsService,
    private readonly gradingQueue: GradingQueue,
    private readonly storage: PhotoStorage,
    private readonly mailService: MailService,
    private readonly configService: ConfigService<AllConfigType>,
    private readonly dataSource: DataSource,
  ) {}

  /**
   * Takes a photo for a drill or an assignment: checks it by its bytes, stores the original with
   * its metadata stripped (in its own format, pixels untouched: `storablePhoto`), and records the
   * attempt and its grading job in one transaction (nothing is left half-written when the
   * database fails midway; the stored copy is then removed).
   */
  async create(student: AuthUser, input: CreateAttemptInput, file: Express.Multer.File | undefined): Promise<AttemptView> {
    if (!file || file.size === 0) {
      throw new BadRequestException({ code: 'photo_missing', message: 'Add a photo of your swatch with the card.', details: { photo: 'required' } });
    }
    let assignmentId: string | null = null;
    let drillId = input.drillId;
    if (input.assignmentId) {
      const assignment = await this.assignmentsService.findForStudent(student, input.assignmentId);
      assignmentId = assignment.id;
      drillId = assignment.drillId;
    }
    const drill = await this.drillsService.findVisible(student, drillId!);
    const maxBytes = this.configService.getOrThrow('storage.uploadMaxBytes', { infer: true });
    let stored: StorablePhoto;
    try {
      stored = await storablePhoto(file.buffer, { maxBytes, maxPixels: 100_000_000 });
    } catch (error) {
      if (error instanceof PhotoFileError) throw this.fileError(error, file.buffer);
      throw error;
    }

    const id = randomUUID();
    const photoKey = `attempts/${id}/photo.${stored.extension}`;
    await this.storage.put(photoKey, stored.bytes);
    try {
      await this.dataSource.transaction(async (manager) => {
        // A shared lock on the drill row until this commits: a drill update that would change
        // the kind or the number of targets (DrillsService.update, FOR UPDATE) waits for it and
        // then sees this attempt, or this waits for the update. (The foreign key check takes the
        // same lock; it is taken here on purpose, not by accident of the schema.)
        await manager.query(`SELECT 1 FROM drills WHERE id = $1 FOR KEY SHARE`, [drill.id]);
        await manager.insert(Attempt, { id, studentId: student.id, drillId: drill.id, assignmentId, photoKey, photoBytes: stored.bytes.length, state: 'queued' });
        await this.gradingQueue.enqueue(id, {
          executeSql: async (text, values) => ({ rows: await manager.query(text, values) }),
        });
      });
    } catch (error) {
      await this.storage.remove(photoKey).catch(() => undefined);
      this.logger.error(`could not record attempt ${id}: ${(error as Error).message}`);
      throw new ServiceUnavailableException({ code: 'service_unavailable', message: 'Your photo could not be saved just now. Please send it again in a moment.' });
    }
    return this.findOne(student, id);
  }

  async findAll(caller: AuthUser, filter: AttemptFilter = {}): Promise<AttemptView[]> {
    const query = this.attemptsRepository.createQueryBuilder('a').orderBy('a.created_at', 'DESC').limit(500);
    if (caller.role === 'student') query.where('a.student_id = :caller', { caller: caller.id });
    else if (caller.role === 'teacher') query.where(this.teacherSees(), { caller: caller.id });
    if (filter.assignmentId) query.andWhere('a.assignment_id = :assignmentId', filter);
    if (filter.drillId) query.andWhere('a.drill_id = :drillId', filter);
    if (filter.studentId) query.andWhere('a.student_id = :studentId', filter);
    return this.toViews(await query.getMany());
  }

  async findOne(caller: AuthUser, id: string): Promise<AttemptView> {
    const [view] = await this.toViews([await this.findVisible(caller, id)]);
    return view;
  }

  /** The stored photo or overlay (never the uploaded original with its metadata). */
  async image(caller: AuthUser, id: string, which: 'photo' | 'overlay'): Promise<Buffer> {
    const attempt = await this.findVisible(caller, id);
    const key = which === 'photo' ? attempt.photoKey : attempt.overlayKey;
    const bytes = key ? ((await this.storage.get(key)) ?? (which === 'overlay' ? await this.drawOverlay(attempt) : undefined)) : undefined;
    if (!bytes) throw new NotFoundException({ code: 'not_found', message: which === 'overlay' ? 'This attempt has no overlay yet.' : 'The photo of this attempt is missing.' });
    return bytes;
  }

  /**
   * Draws an attempt's overlay the first time it is opened, from the stored photo and the plan
   * grading kept, and stores it under the attempt's overlay key. Two first views at once draw
   * the same bytes, so either write is right.
   */
  private async drawOverlay(attempt: Attempt): Promise<Buffer | undefined> {
    const row = await this.attemptsRepository.findOne({ where: { id: attempt.id }, select: { id: true, overlayPlan: true } });
    const photo = row?.overlayPlan ? await this.storage.get(attempt.photoKey) : undefined;
    if (!row?.overlayPlan || !photo || !attempt.overlayKey) return undefined;
    // Attempts graded before overlays were JPEG keep their `.png` key and get a PNG.
    const bytes = await renderOverlayFromPhoto(photo, row.overlayPlan, attempt.overlayKey.endsWith('.png') ? 'png' : 'jpeg');
    await this.storage.put(attempt.overlayKey, bytes);
    return bytes;
  }

  /** A teacher's score and pass over the machine's, with a comment; the machine mark is kept. */
  async override(teacher: AuthUser, id: string, input: OverrideMarkInput): Promise<AttemptView> {
    const attempt = await this.findVisible(teacher, id);
    if (teacher.role === 'student') throw notFound();
    if (attempt.state !== 'graded' && attempt.state !== 'needs-retake') {
      throw new BadRequestException({ code: 'not_graded_yet', message: 'This attempt is still being measured; mark it once it is graded.' });
    }
    Object.assign(attempt, {
      overrideScore: input.score,
      overridePass: input.pass,
      overrideComment: input.comment || null,
      overriddenById: teacher.id,
      overriddenAt: new Date(),
    });
    await this.attemptsRepository.save(attempt);
    const view = await this.findOne(teacher, id);
    await this.tellStudent(attempt, view, teacher, input.comment).catch((error: Error) => this.logger.warn(`override mail: ${error.message}`));
    return view;
  }

  private async tellStudent(attempt: Attempt, view: AttemptView, teacher: AuthUser, comment: string): Promise<void> {
    const users = this.dataSource.getRepository(User);
    const [student, marker] = await Promise.all([users.findOneByOrFail({ id: attempt.studentId }), users.findOneByOrFail({ id: teacher.id })]);
    const publicUrl = this.configService.getOrThrow('app.publicUrl', { infer: true });
    await this.mailService.send({
      to: student.email,
      ...attemptMarkedMail({
        displayName: student.displayName,
        drillTitle: view.drill.title,
        score: view.score!,
        pass: view.pass!,
        feedbackLines: (view.mark?.feedback ?? []).slice(0, 3).map((line) => line.text),
        attemptUrl: `${publicUrl}/attempts/${attempt.id}`,
        commentBy: marker.displayName,
        comment: comment || undefined,
      }),
    });
  }

  private async findVisible(caller: AuthUser, id: string): Promise<Attempt> {
    const query = this.attemptsRepository.createQueryBuilder('a').where('a.id = :id', { id });
    if (caller.role === 'student') query.andWhere('a.student_id = :caller', { caller: caller.id });
    else if (caller.role === 'teacher') query.andWhere(this.teacherSees(), { caller: caller.id });
    const attempt = await query.getOne();
    if (!attempt) throw notFound();
    return attempt;
  }

  /** A teacher sees attempts for their classes' assignments, and the practice of their students. */
  private teacherSees(): string {
    return `(EXISTS (SELECT 1 FROM assignments s JOIN classes c ON c.id = s.class_id WHERE s.id = a.assignment_id AND c.teacher_id = :caller)
             OR (a.assignment_id IS NULL AND EXISTS (SELECT 1 FROM class_members m JOIN classes c ON c.id = m.class_id
                                                     WHERE m.student_id = a.student_id AND c.teacher_id = :caller)))`;
  }

  private async toViews(attempts: Attempt[]): Promise<AttemptView[]> {
    if (attempts.length === 0) return [];
    const drills = await this.dataSource.getRepository(Drill).find({ where: attempts.map((a) => ({ id: a.drillId })), withDeleted: true });
    const students = await this.dataSource.getRepository(User).find({ where: attempts.map((a) => ({ id: a.studentId })) });
    const drillOf = new Map(drills.map((d) => [d.id, { id: d.id, title: d.title, kind: d.kind }]));
    const studentOf = new Map(students.map((u) => [u.id, { id: u.id, displayName: u.displayName }]));
    return attempts.map((a) => toAttemptView(a, drillOf.get(a.drillId)!, studentOf.get(a.studentId)!));
  }

  /** 413 too large; 415 when the bytes are not a JPEG, PNG or WebP at all; 400 when one is broken. */
  private fileError(error: PhotoFileError, bytes: Buffer) {
    const body = { code: error.code, message: error.message, details: { photo: error.code } };
    if (error.code === 'FILE_TOO_LARGE') return new PayloadTooLargeException(body);
    const type = sniffImageType(bytes);
    if (error.code === 'FILE_UNSUPPORTED' || !type || !['jpeg', 'png', 'webp'].includes(type)) {
      return new UnsupportedMediaTypeException(body);
    }
    return new BadRequestException(body);
  }
}
