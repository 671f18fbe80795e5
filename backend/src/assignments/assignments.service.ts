import { Injectable, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import type { CreateAssignmentInput, UpdateAssignmentInput } from '@mixmark/common';
import { LRUCache } from 'lru-cache';
import { DataSource, Repository } from 'typeorm';
import { ClassesService } from '../classes/classes.service';
import type { AuthUser } from '../common/decorators/current-user.decorator';
import type { AllConfigType } from '../config/config.type';
import { DrillsService } from '../drills/drills.service';
import { statusFromSummary, type AssignmentStatus, type AttemptSummary } from './assignment-status';
import { Assignment } from './entities/assignment.entity';
import { isoDateText } from './iso-date';
import { preparedQuery } from './prepared-query';

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

const notFound = () =>
  new NotFoundException({ code: 'not_found', message: 'There is no assignment with this id.' });

interface Row {
  /** The assignment's JSON without its status or counts, as PostgreSQL wrote it. */
  view: string;
  due_at_ms: number;
  teacher_id: string;
  /** Whether a student caller is on the class's roster (false for others). */
  is_member: boolean;
  /** A student caller's own cell (null: nothing handed in). */
  passed: boolean | null;
  latest_state: AttemptSummary['latestState'] | null;
  /** For a teacher or admin: [passed, newest state, how many roster students] groups; null state: nothing handed in. */
  groups: [boolean | null, AttemptSummary['latestState'] | null, number][] | null;
}

/** What the list query selects of a row: the view and what the status rule needs. */
type ListRow = Pick<Row, 'view' | 'due_at_ms' | 'passed' | 'latest_state' | 'groups'>;

/**
 * A teacher's or student's list as read, with the counters of the caller's classes read just
 * before it, and its JSON as last sent with the time (ms) until which that text holds.
 */
interface KeptList {
  stamps: string;
  rows: ListRow[];
  json: string;
  jsonUntil: number;
}

/**
 * About how many bytes a kept list holds: each row's JSON text twice (in the row and in the list
 * sent; V8 keeps these one byte a character), the counters, and a little per row and entry.
 */
function keptSize(kept: KeptList): number {
  let bytes = 200 + kept.stamps.length;
  for (const row of kept.rows) bytes += 2 * row.view.length + 150;
  return bytes;
}

/**
 * The counters (see the AddClassListStamps migration) of every class whose assignments a
 * teacher's or a student's list shows, as one text: `class id:counter` in class id order. A
 * class made, joined, left or given away changes the set and so the text, as does any write to
 * what the list shows.
 */
const STAMPS_SQL = {
  teacher: `SELECT coalesce(string_agg(c.id || ':' || coalesce(s.stamp, 0), ',' ORDER BY c.id), '') AS stamps
              FROM classes c LEFT JOIN class_list_stamps s ON s.class_id = c.id
             WHERE c.teacher_id = $1`,
  student: `SELECT coalesce(string_agg(m.class_id || ':' || coalesce(s.stamp, 0), ',' ORDER BY m.class_id), '') AS stamps
              FROM class_members m LEFT JOIN class_list_stamps s ON s.class_id = m.class_id
             WHERE m.student_id = $1`,
};

/** Which list a caller gets: their own classes' (teacher, student) or every class's (admin). */
function listRole(caller: AuthUser): 'teacher' | 'student' | 'admin' {
  return caller.role === 'student' ? 'student' : caller.role === 'admin' ? 'admin' : 'teacher';
}

/** An assignment as parsed from the JSON the API sends, with its dates as Dates again. */
function withDates(view: AssignmentView): AssignmentView {
  return { ...view, dueAt: new Date(view.dueAt), createdAt: new Date(view.createdAt) };
}

@Injectable()
export class AssignmentsService {
  /** Teachers' and students' lists, by caller and filter, up to LIST_CACHE_MB; null when none are kept. */
  private readonly keptLists: LRUCache<string, KeptList> | null;

  constructor(
    @InjectRepository(Assignment) private readonly assignmentsRepository: Repository<Assignment>,
    private readonly classesService: ClassesService,
    private readonly drillsService: DrillsService,
    private readonly dataSource: DataSource,
    configService: ConfigService<AllConfigType>,
  ) {
    const megabytes = configService.getOrThrow('database.listCacheMb', { infer: true });
    this.keptLists =
      megabytes > 0
        ? new LRUCache<string, KeptList>({
            maxSize: megabytes * 1_000_000,
            sizeCalculation: keptSize,
          })
        : null;
  }

  async create(teacher: AuthUser, input: CreateAssignmentInput): Promise<AssignmentView> {
    await this.classesService.findOwned(teacher, input.classId);
    await this.drillsService.findVisible(teacher, input.drillId);
    const saved = await this.assignmentsRepository.save(
      this.assignmentsRepository.create({
        classId: input.classId,
        drillId: input.drillId,
        dueAt: input.dueAt,
        note: input.note,
      }),
    );
    return this.findOne(teacher, saved.id);
  }

  /** Teachers: assignments of the classes they run; students: of the classes they are on, with their status. */
  async findAll(caller: AuthUser, filter: { classId?: string } = {}): Promise<AssignmentView[]> {
    return (JSON.parse(await this.findAllJson(caller, filter)) as AssignmentView[]).map(withDates);
  }

  /**
   * The list as the JSON text the API sends: PostgreSQL writes each assignment's JSON as text
   * (one short row each); the status rule's part (a student's status, a teacher's counts) is
   * added to each object's text here. Parsing a 5 KB list and serialising it again, and pg's
   * parsing of 16 fields a row before that, were about a fifth of the route's server time.
   *
   * A teacher's or student's rows are kept and served again while the counters of the caller's
   * classes read now equal the ones read just before the rows were (then nothing the list shows
   * has been written since; see the AddClassListStamps migration). The status rule's text is
   * kept too until the next due date still ahead passes. An admin's list is always read.
   */
  async findAllJson(caller: AuthUser, filter: { classId?: string } = {}): Promise<string> {
    const role = listRole(caller);
    if (role === 'admin' || !this.keptLists) {
      return this.listJson(caller, await this.readList(caller, filter), Date.now()).json;
    }
    const [{ stamps }] = await preparedQuery<{ stamps: string }>(
      this.dataSource,
      `class-list-stamps-${role}`,
      STAMPS_SQL[role],
      [caller.id],
    );
    const key = `${role}:${caller.id}:${filter.classId ?? ''}`;
    let kept = this.keptLists.get(key);
    if (kept?.stamps !== stamps) {
      // Read after the counters: a write committed in between leaves these rows under counters
      // that are already old, and the next request reads the list again.
      kept = { stamps, rows: await this.readList(caller, filter), json: '', jsonUntil: -Infinity };
      this.keptLists.set(key, kept);
    }
    const now = Date.now();
    if (now > kept.jsonUntil) Object.assign(kept, this.listJson(caller, kept.rows, now));
    return kept.json;
  }

  /**
   * The list's JSON at `now` (ms), and until when it holds: the status rule looks at the clock
   * only to ask whether a due date has passed, so the text stays the same until the next due
   * date still ahead goes by.
   */
  private listJson(
    caller: AuthUser,
    rows: ListRow[],
    now: number,
  ): { json: string; jsonUntil: number } {
    let json = '[';
    let jsonUntil = Infinity;
    for (let i = 0; i < rows.length; i++) {
      if (i > 0) json += ',';
      json += this.withStanding(caller, rows[i], now);
      if (rows[i].due_at_ms >= now) jsonUntil = Math.min(jsonUntil, rows[i].due_at_ms);
    }
    return { json: `${json}]`, jsonUntil };
  }

  private async readList(caller: AuthUser, { classId }: { classId?: string }): Promise<ListRow[]> {
    const role = listRole(caller);
    let where =
      role === 'admin'
        ? 'TRUE'
        : role === 'teacher'
          ? 'c.teacher_id = $1'
          : 'EXISTS (SELECT 1 FROM class_members m WHERE m.class_id = a.class_id AND m.student_id = $1)';
    const params: unknown[] = [caller.id];
    if (classId) {
      params.push(classId);
      where += ' AND a.class_id = $2';
    }
    return preparedQuery<ListRow>(
      this.dataSource,
      `assignments-list-${role}${classId ? '-class' : ''}`,
      `SELECT l.view, l.due_at_ms, l.passed, l.latest_state, l.groups
         FROM (${this.listQuery(caller)} WHERE ${where}) l ORDER BY l.due_at_ms, l.id`,
      params,
    );
  }

  async findOne(caller: AuthUser, id: string): Promise<AssignmentView> {
    const forStudent = caller.role === 'student';
    const [row] = await preparedQuery<Row>(
      this.dataSource,
      `assignments-one-${forStudent ? 'student' : 'teacher'}`,
      `${this.listQuery(caller)} WHERE a.id = $2`,
      [caller.id, id],
    );
    if (!row || !this.canSee(caller, row)) throw notFound();
    return withDates(JSON.parse(this.withStanding(caller, row)) as AssignmentView);
  }

  async update(
    teacher: AuthUser,
    id: string,
    input: UpdateAssignmentInput,
  ): Promise<AssignmentView> {
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
    if (!assignment || !(await this.classesService.isMember(student.id, assignment.classId)))
      throw notFound();
    return assignment;
  }

  private canSee(caller: AuthUser, row: Row): boolean {
    return (
      caller.role === 'admin' ||
      row.teacher_id === caller.id ||
      (caller.role === 'student' && row.is_member)
    );
  }

  /**
   * Assignments with, in the same query, what the status rule needs, kept by PostgreSQL from the
   * attempts (see the AddAssignmentCells and AddAssignmentStandings migrations): for a student
   * their own assignment cell; for a teacher or admin the assignment's standings, how many roster
   * students are in each (passed, newest state) group. $1 is always the caller.
   */
  private listQuery(caller: AuthUser): string {
    const forStudent = caller.role === 'student';
    // The view's keys in AssignmentView's order; dates as the text Date.prototype.toJSON gives.
    // Written as text: the people's words go through to_json (JSON's escaping, RFC 8259 §7);
    // ids, the kind (an enum of plain words) and the dates need none. About a third of
    // PostgreSQL's time for the list less than json_build_object.
    return `SELECT a.id,
                   '{"id":"' || a.id || '","classId":"' || a.class_id || '","className":' || to_json(c.name)::text
                     || ',"drill":{"id":"' || d.id || '","title":' || to_json(d.title)::text || ',"kind":"' || d.kind
                     || '"},"dueAt":"' || ${isoDateText('a.due_at')} || '","note":' || to_json(a.note)::text
                     || ',"createdAt":"' || ${isoDateText('a.created_at')} || '"}' AS view,
                   floor(extract(epoch FROM a.due_at) * 1000)::float8 AS due_at_ms, c.teacher_id,
                   ${
                     forStudent
                       ? `EXISTS (SELECT 1 FROM class_members m WHERE m.class_id = a.class_id AND m.student_id = $1) AS is_member,
                          x.passed, x.latest_state, NULL::jsonb AS groups`
                       : `$1::uuid IS NULL AS is_member, NULL::boolean AS passed, NULL::attempt_state AS latest_state, st.groups`
                   }
              FROM assignments a
              JOIN classes c ON c.id = a.class_id
              JOIN drills d ON d.id = a.drill_id
              ${forStudent ? 'LEFT JOIN assignment_cells x ON x.assignment_id = a.id AND x.student_id = $1' : 'LEFT JOIN assignment_standings st ON st.assignment_id = a.id'}`;
  }

  /** The assignment's JSON with the status rule's part added: a student's status or a teacher's counts. */
  private withStanding(
    caller: AuthUser,
    { view, due_at_ms, passed, latest_state: latestState, groups }: ListRow,
    nowMs = Date.now(),
  ): string {
    const dueAt = new Date(due_at_ms);
    const now = new Date(nowMs);
    // The view is a JSON object PostgreSQL wrote; it ends in "}".
    const open = view.slice(0, view.lastIndexOf('}'));
    if (caller.role === 'student') {
      const status = statusFromSummary(
        latestState === null ? undefined : { passed: passed!, latestState },
        dueAt,
        now,
      );
      return `${open},"status":"${status}"}`;
    }
    const counts: Record<AssignmentStatus, number> = {
      'not-started': 0,
      submitted: 0,
      'needs-retake': 0,
      passed: 0,
      failed: 0,
      late: 0,
    };
    // A group with no newest state: roster students who have handed nothing in.
    for (const [groupPassed, groupState, students] of groups ?? []) {
      counts[
        statusFromSummary(
          groupState === null ? undefined : { passed: groupPassed!, latestState: groupState },
          dueAt,
          now,
        )
      ] += students;
    }
    return `${open},"counts":${JSON.stringify(counts)}}`;
  }
}
