import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Mark } from '@mixmark/common';
import { DataSource } from 'typeorm';
import { statusFromSummary, type AttemptSummary } from '../assignments/assignment-status';
import { IsoDate } from '../assignments/iso-date';
import { preparedQuery } from '../assignments/prepared-query';
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

const notFound = () =>
  new NotFoundException({
    code: 'not_found',
    message: 'There is no student with this id in your classes.',
  });

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
  async forStudent(
    caller: AuthUser,
    studentId: string,
    { now }: { now?: Date } = {},
  ): Promise<ProgressSummary & { student: { id: string; displayName: string } }> {
    if (caller.id !== studentId && caller.role !== 'admin') {
      const [teaches] = await this.dataSource.query(
        `SELECT 1 FROM class_members m JOIN classes c ON c.id = m.class_id WHERE m.student_id = $1 AND c.teacher_id = $2 LIMIT 1`,
        [studentId, caller.id],
      );
      if (!teaches) throw notFound();
    }
    const [student] = await this.dataSource.query<{ id: string; display_name: string }[]>(
      `SELECT id, display_name FROM users WHERE id = $1`,
      [studentId],
    );
    if (!student) throw notFound();
    const attempts = await this.attempts('a.student_id = $1', [studentId]);
    return {
      ...summariseProgress(attempts.map(this.toProgressAttempt), now),
      student: { id: student.id, displayName: student.display_name },
    };
  }

  /** The class's progress over its assignments. */
  async forClass(teacher: AuthUser, classId: string): Promise<ProgressSummary> {
    await this.classesService.findOwned(teacher, classId);
    const attempts = await this.attempts('s.class_id = $1', [classId]);
    return summariseProgress(attempts.map(this.toProgressAttempt));
  }

  /**
   * Students × assignments: latest and best (effective) scores and each student's status, from
   * the assignment cells PostgreSQL keeps from the attempts (one row per student and assignment;
   * see the AddAssignmentCells migration) and the roster, in one query. PostgreSQL hands the lists
   * over as JSON text (one parse, no per-field row decoding); the status rule is applied here,
   * with the clock, because lateness is not stored.
   */
  async gradebook(teacher: AuthUser, classId: string): Promise<Gradebook> {
    const [book] = await preparedQuery<{
      name: string;
      assignments: string;
      students: string;
      cells: string;
    }>(
      this.dataSource,
      'gradebook',
      `SELECT c.name,
              (SELECT COALESCE(json_agg(json_build_array(a.id, d.title, d.kind, floor(extract(epoch FROM a.due_at) * 1000), to_char(a.due_at AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')) ORDER BY a.due_at, a.created_at), '[]')
                 FROM assignments a JOIN drills d ON d.id = a.drill_id WHERE a.class_id = c.id)::text AS assignments,
              (SELECT COALESCE(json_agg(json_build_array(u.id, u.display_name, u.email) ORDER BY u.display_name), '[]')
                 FROM class_members m JOIN users u ON u.id = m.student_id WHERE m.class_id = c.id)::text AS students,
              -- Cells of students who have left the class come too; only the roster's are shown.
              -- The JSON is written by hand: every value is a uuid, boolean, integer or state
              -- label (nothing to escape), and this is about twice as fast as json_build_array.
              '[' || COALESCE((SELECT string_agg(
                        '["' || x.student_id || '","' || x.assignment_id || '",' || x.passed || ','
                          || COALESCE('"' || x.latest_state || '"', 'null') || ',' || x.attempts || ','
                          || COALESCE(x.latest_score::text, 'null') || ',' || COALESCE(x.best_score::text, 'null') || ','
                          || COALESCE('"' || x.latest_attempt_id || '"', 'null') || ']', ',')
                 FROM assignment_cells x
                WHERE x.assignment_id IN (SELECT a.id FROM assignments a WHERE a.class_id = c.id)), '') || ']' AS cells
         FROM classes c
        WHERE c.id = $1 AND (c.teacher_id = $2 OR $3)`,
      [classId, teacher.id, teacher.role === 'admin'],
    );
    if (!book)
      throw new NotFoundException({
        code: 'not_found',
        message: 'There is no class with this id.',
      });
    const assignments = (
      JSON.parse(book.assignments) as [string, string, string, number, string][]
    ).map(([id, drillTitle, kind, dueMs, dueIso]) => ({
      id,
      drillTitle,
      kind,
      dueAt: new IsoDate(dueMs, dueIso),
    }));
    const cellsOf = new Map<string, Map<string, GradebookCell>>();
    const dueOf = new Map(assignments.map((a) => [a.id, a.dueAt]));
    type CellRow = [
      string,
      string,
      boolean,
      AttemptSummary['latestState'],
      number,
      number | null,
      number | null,
      string | null,
    ];
    for (const [
      studentId,
      assignmentId,
      passed,
      latestState,
      attempts,
      latestScore,
      bestScore,
      latestAttemptId,
    ] of JSON.parse(book.cells) as CellRow[]) {
      let mine = cellsOf.get(studentId);
      if (!mine) cellsOf.set(studentId, (mine = new Map()));
      mine.set(assignmentId, {
        status: statusFromSummary({ passed, latestState }, dueOf.get(assignmentId)!),
        attempts,
        latestScore,
        bestScore,
        latestAttemptId,
      });
    }
    // A student with no attempts for an assignment: the status rule with no summary, one cell per assignment.
    const empty = new Map(
      assignments.map((a) => [
        a.id,
        {
          status: statusFromSummary(undefined, a.dueAt),
          attempts: 0,
          latestScore: null,
          bestScore: null,
          latestAttemptId: null,
        } satisfies GradebookCell,
      ]),
    );
    return {
      classId,
      className: book.name,
      assignments,
      students: (JSON.parse(book.students) as [string, string, string][]).map(
        ([id, displayName, email]) => {
          const mine = cellsOf.get(id);
          const cells: Record<string, GradebookCell> = {};
          for (const a of assignments) cells[a.id] = mine?.get(a.id) ?? { ...empty.get(a.id)! };
          return { id, displayName, email, cells };
        },
      ),
    };
  }

  /** Attempts with the effective (override-first) score and pass, newest first. */
  private attempts(where: string, params: unknown[]): Promise<AttemptRow[]> {
    return this.dataSource.query<AttemptRow[]>(
      `SELECT a.id, a.student_id, a.assignment_id, a.state, a.mark, a.created_at,
              COALESCE(a.override_pass, a.pass) AS pass, COALESCE(a.override_score, a.score) AS score
         FROM attempts a LEFT JOIN assignments s ON s.id = a.assignment_id
        WHERE ${where} ORDER BY a.created_at DESC`,
      params,
    );
  }

  private toProgressAttempt = (row: AttemptRow) => ({
    createdAt: row.created_at,
    state: row.state,
    pass: row.pass,
    mark: row.mark,
  });
}
