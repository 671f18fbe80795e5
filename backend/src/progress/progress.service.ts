import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Mark } from '@mixmark/common';
import { DataSource } from 'typeorm';
import { assignmentStatus } from '../assignments/assignment-status';
import { ClassesService } from '../classes/classes.service';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import type { Gradebook, GradebookCell } from './gradebook';
import { summariseProgress, type ProgressSummary } from './summarise-progress';

interface AttemptRow {
  id: string;
  student_id: string;
  assignment_id: string | null;
  state: string;
  pass: boolean | null;
  score: number | null;
  mark: Mark | null;
  created_at: Date;
}

const notFound = () => new NotFoundException({ code: 'not_found', message: 'There is no student with this id in your classes.' });

@Injectable()
export class ProgressService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly classesService: ClassesService,
  ) {}

  /**
   * A student's progress: their own, or a student of one of the caller's classes.
   * @param now - the day the streak runs up to (today unless a summary of the past asks otherwise)
   */
  async forStudent(caller: AuthUser, studentId: string, { now }: { now?: Date } = {}): Promise<ProgressSummary & { student: { id: string; displayName: string } }> {
    if (caller.id !== studentId && caller.role !== 'admin') {
      const [teaches] = await this.dataSource.query(
        `SELECT 1 FROM class_members m JOIN classes c ON c.id = m.class_id WHERE m.student_id = $1 AND c.teacher_id = $2 LIMIT 1`,
        [studentId, caller.id],
      );
      if (!teaches) throw notFound();
    }
    const [student] = await this.dataSource.query<{ id: string; display_name: string }[]>(`SELECT id, display_name FROM users WHERE id = $1`, [studentId]);
    if (!student) throw notFound();
    const attempts = await this.attempts('a.student_id = $1', [studentId]);
    return { ...summariseProgress(attempts.map(this.toProgressAttempt), now), student: { id: student.id, displayName: student.display_name } };
  }

  /** The class's progress over its assignments. */
  async forClass(teacher: AuthUser, classId: string): Promise<ProgressSummary> {
    await this.classesService.findOwned(teacher, classId);
    const attempts = await this.attempts('s.class_id = $1', [classId]);
    return summariseProgress(attempts.map(this.toProgressAttempt));
  }

  /** Students × assignments: latest and best (effective) scores and each student's status. */
  async gradebook(teacher: AuthUser, classId: string): Promise<Gradebook> {
    const klass = await this.classesService.findOwned(teacher, classId);
    const assignments = await this.dataSource.query<{ id: string; drill_title: string; kind: string; due_at: Date }[]>(
      `SELECT a.id, d.title AS drill_title, d.kind, a.due_at FROM assignments a JOIN drills d ON d.id = a.drill_id WHERE a.class_id = $1 ORDER BY a.due_at, a.created_at`,
      [classId],
    );
    const students = await this.dataSource.query<{ id: string; display_name: string; email: string }[]>(
      `SELECT u.id, u.display_name, u.email FROM class_members m JOIN users u ON u.id = m.student_id WHERE m.class_id = $1 ORDER BY u.display_name`,
      [classId],
    );
    // The gradebook needs no mark (its JSON is the heavy part of a row): leave it out, and group
    // the attempts by cell in one pass instead of scanning them all for every cell.
    const attempts = await this.attempts('s.class_id = $1', [classId], { withMark: false });
    const byCell = new Map<string, AttemptRow[]>();
    for (const t of attempts) {
      const key = `${t.assignment_id}/${t.student_id}`;
      const list = byCell.get(key) ?? [];
      if (list.length === 0) byCell.set(key, list);
      list.push(t);
    }
    return {
      classId,
      className: klass.name,
      assignments: assignments.map((a) => ({ id: a.id, drillTitle: a.drill_title, kind: a.kind, dueAt: a.due_at })),
      students: students.map((s) => ({
        id: s.id,
        displayName: s.display_name,
        email: s.email,
        cells: Object.fromEntries(
          assignments.map((a) => {
            const mine = byCell.get(`${a.id}/${s.id}`) ?? []; // newest first
            const scores = mine.map((t) => t.score).filter((v): v is number => v !== null);
            const cell: GradebookCell = {
              status: assignmentStatus(mine.map((t) => ({ state: t.state as never, pass: t.pass, createdAt: t.created_at })), a.due_at),
              attempts: mine.length,
              latestScore: mine.find((t) => t.score !== null)?.score ?? null,
              bestScore: scores.length ? Math.max(...scores) : null,
              latestAttemptId: mine[0]?.id ?? null,
            };
            return [a.id, cell];
          }),
        ),
      })),
    };
  }

  /** Attempts with the effective (override-first) score and pass, newest first. */
  private attempts(where: string, params: unknown[], { withMark = true } = {}): Promise<AttemptRow[]> {
    return this.dataSource.query<AttemptRow[]>(
      `SELECT a.id, a.student_id, a.assignment_id, a.state, ${withMark ? 'a.mark' : 'NULL AS mark'}, a.created_at,
              COALESCE(a.override_pass, a.pass) AS pass, COALESCE(a.override_score, a.score) AS score
         FROM attempts a LEFT JOIN assignments s ON s.id = a.assignment_id
        WHERE ${where} ORDER BY a.created_at DESC`,
      params,
    );
  }

  private toProgressAttempt = (row: AttemptRow) => ({ createdAt: row.created_at, state: row.state, pass: row.pass, mark: row.mark });
}
