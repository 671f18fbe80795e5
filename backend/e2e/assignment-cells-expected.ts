import type { DataSource } from 'typeorm';
import {
  assignmentStatus,
  statusFromSummary,
  type AssignmentStatus,
  type AttemptFacts,
} from '../src/assignments/assignment-status';

/** What a cell should hold, worked out in TypeScript from the raw attempts (not from the cells). */
export interface ExpectedCell {
  attempts: number;
  passed: boolean;
  latestAttemptId: string;
  latestState: AttemptFacts['state'];
  latestPass: boolean | null;
  latestSubmittedAt: number;
  latestScore: number | null;
  bestScore: number | null;
}

export interface StoredCell extends ExpectedCell {
  assignmentId: string;
  studentId: string;
}

interface RawAttempt {
  id: string;
  student_id: string;
  assignment_id: string;
  state: AttemptFacts['state'];
  score: number | null;
  pass: boolean | null;
  override_score: number | null;
  override_pass: boolean | null;
  created_at: Date;
  created_us: string;
}

/** Attempts of these assignments, newest first (created_at, then id: the cells' tie-break), per "assignment/student". */
export async function attemptsByCell(
  db: DataSource,
  assignmentIds: string[],
): Promise<Map<string, RawAttempt[]>> {
  const rows = await db.query<RawAttempt[]>(
    `SELECT id, student_id, assignment_id, state, score, pass, override_score, override_pass, created_at,
            (extract(epoch FROM created_at) * 1000000)::bigint::text AS created_us
       FROM attempts WHERE assignment_id = ANY($1)`,
    [assignmentIds],
  );
  // By the microsecond, as PostgreSQL orders them (a JavaScript Date keeps milliseconds only).
  const us = (row: RawAttempt) => BigInt(row.created_us);
  rows.sort((x, y) =>
    us(x) !== us(y) ? (us(y) > us(x) ? 1 : -1) : x.id < y.id ? 1 : x.id > y.id ? -1 : 0,
  );
  const byCell = new Map<string, RawAttempt[]>();
  for (const row of rows) {
    const key = `${row.assignment_id}/${row.student_id}`;
    byCell.set(key, [...(byCell.get(key) ?? []), row]);
  }
  return byCell;
}

/** A cell recomputed from its attempts (newest first). */
export function expectedCell(attempts: RawAttempt[]): ExpectedCell {
  const effectiveScores = attempts
    .map((a) => a.override_score ?? a.score)
    .filter((s): s is number => s !== null);
  return {
    attempts: attempts.length,
    // A teacher's pass stands on any attempt they may mark (graded or sent back for a retake).
    passed: attempts.some((a) => (a.override_pass ?? (a.state === 'graded' && a.pass)) === true),
    latestAttemptId: attempts[0].id,
    latestState: attempts[0].state,
    latestPass: attempts[0].override_pass ?? attempts[0].pass,
    latestSubmittedAt: Math.max(...attempts.map((a) => a.created_at.getTime())),
    latestScore: effectiveScores[0] ?? null,
    bestScore: effectiveScores.length ? Math.max(...effectiveScores) : null,
  };
}

/** The status through the existing rule over the raw attempts (`assignmentStatus`, newest first). */
export function expectedStatus(
  attempts: RawAttempt[] | undefined,
  dueAt: Date,
  now: Date,
): AssignmentStatus {
  return assignmentStatus(
    (attempts ?? []).map((a) => ({
      state: a.state,
      pass: a.override_pass ?? a.pass,
      overridden: a.override_pass !== null,
      createdAt: a.created_at,
    })),
    dueAt,
    now,
  );
}

/** The status the readers give a stored cell (`statusFromSummary` on passed and the newest state). */
export function statusOfCell(
  cell: StoredCell | undefined,
  dueAt: Date,
  now: Date,
): AssignmentStatus {
  return statusFromSummary(
    cell ? { passed: cell.passed, latestState: cell.latestState } : undefined,
    dueAt,
    now,
  );
}

export async function storedCells(
  db: DataSource,
  assignmentIds: string[],
): Promise<Map<string, StoredCell>> {
  const rows = await db.query<
    {
      assignment_id: string;
      student_id: string;
      attempts: number;
      passed: boolean;
      latest_attempt_id: string;
      latest_state: AttemptFacts['state'];
      latest_pass: boolean | null;
      latest_submitted_at: Date;
      latest_score: number | null;
      best_score: number | null;
    }[]
  >(`SELECT * FROM assignment_cells WHERE assignment_id = ANY($1)`, [assignmentIds]);
  return new Map(
    rows.map((r) => [
      `${r.assignment_id}/${r.student_id}`,
      {
        assignmentId: r.assignment_id,
        studentId: r.student_id,
        attempts: r.attempts,
        passed: r.passed,
        latestAttemptId: r.latest_attempt_id,
        latestState: r.latest_state,
        latestPass: r.latest_pass,
        latestSubmittedAt: r.latest_submitted_at.getTime(),
        latestScore: r.latest_score,
        bestScore: r.best_score,
      },
    ]),
  );
}

/** Every cell recomputed from the attempts, keyed like `storedCells`, with no key for a cell without attempts. */
export async function recomputedCells(
  db: DataSource,
  assignmentIds: string[],
): Promise<Map<string, ExpectedCell & { assignmentId: string; studentId: string }>> {
  const byCell = await attemptsByCell(db, assignmentIds);
  return new Map(
    [...byCell].map(([key, attempts]) => {
      const [assignmentId, studentId] = key.split('/');
      return [key, { assignmentId, studentId, ...expectedCell(attempts) }];
    }),
  );
}

/** A small seeded generator (mulberry32), so that a failing sequence can be replayed. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Group = [boolean | null, AttemptFacts['state'] | null, number];
const byGroup = (x: Group, y: Group) =>
  JSON.stringify(x.slice(0, 2)).localeCompare(JSON.stringify(y.slice(0, 2)));

/** The standings PostgreSQL keeps per assignment, groups sorted. */
export async function storedStandings(
  db: DataSource,
  assignmentIds: string[],
): Promise<Record<string, Group[]>> {
  const rows = await db.query<{ assignment_id: string; groups: Group[] }[]>(
    `SELECT assignment_id, groups FROM assignment_standings WHERE assignment_id = ANY($1)`,
    [assignmentIds],
  );
  return Object.fromEntries(rows.map((r) => [r.assignment_id, [...r.groups].sort(byGroup)]));
}

/** The standings recomputed from the raw attempts and the roster: roster students per (passed, newest state) of their cell. */
export async function recomputedStandings(
  db: DataSource,
  assignmentIds: string[],
): Promise<Record<string, Group[]>> {
  const cells = await recomputedCells(db, assignmentIds);
  const rosters = await db.query<{ id: string; students: string[] | null }[]>(
    `SELECT a.id, array_remove(array_agg(m.student_id), NULL) AS students
       FROM assignments a LEFT JOIN class_members m ON m.class_id = a.class_id WHERE a.id = ANY($1) GROUP BY a.id`,
    [assignmentIds],
  );
  return Object.fromEntries(
    rosters.map(({ id, students }) => {
      const groups = new Map<string, Group>();
      for (const student of students ?? []) {
        const cell = cells.get(`${id}/${student}`);
        const group: Group = cell ? [cell.passed, cell.latestState, 0] : [null, null, 0];
        const key = JSON.stringify(group.slice(0, 2));
        if (!groups.has(key)) groups.set(key, group);
        groups.get(key)![2] += 1;
      }
      return [id, [...groups.values()].sort(byGroup)];
    }),
  );
}
