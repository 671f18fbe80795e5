import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { CreateAssignmentInput, UpdateAssignmentInput } from '@mixmark/common';
import { DataSource, Repository } from 'typeorm';
import { ClassesService } from '../classes/classes.service';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import { DrillsService } from '../drills/drills.service';
import { statusFromSummary, type AssignmentStatus, type AttemptSummary } from './assignment-status';
import { Assignment } from './entities/assignment.entity';

export interface AssignmentView {
  id: string;
  classId: string;
  className: string;
  drill: { id: string; title: string; kind: string };
  dueAt: Date;
  note: string;
  createdAt: Date;
  /** For a student: their own status. */
  status?: AssignmentStatus;
  /** For the teacher: how many students stand where. */
  counts?: Record<AssignmentStatus, number>;
}

const notFound = () => new NotFoundException({ code: 'not_found', message: 'There is no assignment with this id.' });

interface Row {
  id: string;
  class_id: string;
  class_name: string;
  teacher_id: string;
  drill_id: string;
  drill_title: string;
  drill_kind: string;
  due_at: Date;
  note: string;
  created_at: Date;
}

@Injectable()
export class AssignmentsService {
  constructor(
    @InjectRepository(Assignment) private readonly assignmentsRepository: Repository<Assignment>,
    private readonly classesService: ClassesService,
    private readonly drillsService: DrillsService,
    private readonly dataSource: DataSource,
  ) {}

  async create(teacher: AuthUser, input: CreateAssignmentInput): Promise<AssignmentView> {
    await this.classesService.findOwned(teacher, input.classId);
    await this.drillsService.findVisible(teacher, input.drillId);
    const saved = await this.assignmentsRepository.save(
      this.assignmentsRepository.create({ classId: input.classId, drillId: input.drillId, dueAt: input.dueAt, note: input.note }),
    );
    return this.findOne(teacher, saved.id);
  }

  /** Teachers: assignments of the classes they run; students: of the classes they are on, with their status. */
  async findAll(caller: AuthUser, { classId }: { classId?: string } = {}): Promise<AssignmentView[]> {
    const params: unknown[] = caller.role === 'admin' ? [] : [caller.id];
    let where =
      caller.role === 'admin'
        ? 'TRUE'
        : caller.role === 'teacher'
          ? 'c.teacher_id = $1'
          : 'EXISTS (SELECT 1 FROM class_members m WHERE m.class_id = c.id AND m.student_id = $1)';
    if (classId) {
      params.push(classId);
      where += ` AND a.class_id = $${params.length}`;
    }
    const rows = await this.dataSource.query<Row[]>(`${this.baseQuery()} WHERE ${where} ORDER BY a.due_at ASC`, params);
    return this.withStatus(caller, rows);
  }

  async findOne(caller: AuthUser, id: string): Promise<AssignmentView> {
    const [row] = await this.dataSource.query<Row[]>(`${this.baseQuery()} WHERE a.id = $1`, [id]);
    if (!row || !(await this.canSee(caller, row))) throw notFound();
    const [view] = await this.withStatus(caller, [row]);
    return view;
  }

  async update(teacher: AuthUser, id: string, input: UpdateAssignmentInput): Promise<AssignmentView> {
    const assignment = await this.findOwned(teacher, id);
    if (input.dueAt !== undefined) assignment.dueAt = input.dueAt;
    if (input.note !== undefined) assignment.note = input.note;
    await this.assignmentsRepository.save(assignment);
    return this.findOne(teacher, id);
  }

  async remove(teacher: AuthUser, id: string): Promise<void> {
    await this.findOwned(teacher, id);
    await this.assignmentsRepository.delete({ id });
  }

  async findOwned(teacher: AuthUser, id: string): Promise<Assignment> {
    const assignment = await this.assignmentsRepository.findOneBy({ id });
    if (!assignment) throw notFound();
    await this.classesService.findOwned(teacher, assignment.classId).catch(() => {
      throw notFound();
    });
    return assignment;
  }

  /** The assignment if this student is on its class (to attach an attempt to it). */
  async findForStudent(student: AuthUser, id: string): Promise<Assignment> {
    const assignment = await this.assignmentsRepository.findOneBy({ id });
    if (!assignment || !(await this.classesService.isMember(student.id, assignment.classId))) throw notFound();
    return assignment;
  }

  private async canSee(caller: AuthUser, row: Row): Promise<boolean> {
    if (caller.role === 'admin' || row.teacher_id === caller.id) return true;
    return caller.role === 'student' && this.classesService.isMember(caller.id, row.class_id);
  }

  private baseQuery(): string {
    return `SELECT a.id, a.class_id, c.name AS class_name, c.teacher_id, a.drill_id, d.title AS drill_title,
                   d.kind AS drill_kind, a.due_at, a.note, a.created_at
              FROM assignments a
              JOIN classes c ON c.id = a.class_id
              JOIN drills d ON d.id = a.drill_id`;
  }

  /** One query for all the attempts behind the statuses shown. */
  private async withStatus(caller: AuthUser, rows: Row[]): Promise<AssignmentView[]> {
    if (rows.length === 0) return [];
    const ids = rows.map((r) => r.id);
    const forStudent = caller.role === 'student';
    // One row per student and assignment, reduced by PostgreSQL to what the status rule needs.
    const cells = await this.dataSource.query<{ assignment_id: string; student_id: string; passed: boolean; latest_state: AttemptSummary['latestState'] }[]>(
      `SELECT assignment_id, student_id,
              bool_or(state = 'graded' AND COALESCE(override_pass, pass)) IS TRUE AS passed,
              (array_agg(state ORDER BY created_at DESC))[1] AS latest_state
         FROM attempts WHERE assignment_id = ANY($1) ${forStudent ? 'AND student_id = $2' : ''}
        GROUP BY assignment_id, student_id`,
      forStudent ? [ids, caller.id] : [ids],
    );
    const rosters = forStudent
      ? new Map<string, string[]>()
      : new Map(
          (
            await this.dataSource.query<{ class_id: string; students: string[] }[]>(
              `SELECT class_id, array_agg(student_id) AS students FROM class_members WHERE class_id = ANY($1) GROUP BY class_id`,
              [[...new Set(rows.map((r) => r.class_id))]],
            )
          ).map((r) => [r.class_id, r.students]),
        );
    const byCell = new Map(cells.map((c) => [`${c.assignment_id}/${c.student_id}`, { passed: c.passed, latestState: c.latest_state }]));
    return rows.map((row) => {
      const view: AssignmentView = {
        id: row.id,
        classId: row.class_id,
        className: row.class_name,
        drill: { id: row.drill_id, title: row.drill_title, kind: row.drill_kind },
        dueAt: row.due_at,
        note: row.note,
        createdAt: row.created_at,
      };
      const of = (studentId: string) => byCell.get(`${row.id}/${studentId}`);
      if (forStudent) {
        view.status = statusFromSummary(of(caller.id), row.due_at);
      } else {
        const counts: Record<AssignmentStatus, number> = { 'not-started': 0, submitted: 0, 'needs-retake': 0, passed: 0, failed: 0, late: 0 };
        for (const studentId of rosters.get(row.class_id) ?? []) counts[statusFromSummary(of(studentId), row.due_at)] += 1;
        view.counts = counts;
      }
      return view;
    });
  }
}
