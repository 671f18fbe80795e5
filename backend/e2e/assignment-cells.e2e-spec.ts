import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { DataSource } from 'typeorm';
import type { AssignmentStatus } from '../src/assignments/assignment-status';
import {
  attemptsByCell,
  expectedCell,
  expectedStatus,
  recomputedCells,
  recomputedStandings,
  seededRandom,
  storedCells,
  storedStandings,
} from './assignment-cells-expected';
import { createTestApp } from './create-test-app';
import { registerAccount, type TestAccount } from './helpers';

const dayMs = 86_400_000;
const noCounts = (): Record<AssignmentStatus, number> => ({
  'not-started': 0,
  submitted: 0,
  'needs-retake': 0,
  passed: 0,
  failed: 0,
  late: 0,
});

/**
 * The assignment cells (kept by PostgreSQL triggers on attempts) against a recomputation from the
 * raw attempts through the existing status rule, after a seeded random sequence of the writes the
 * application makes (uploads, the worker's claims and grades, needs-retake, failures, overrides,
 * deletes) and a few it does not (bulk updates, moving and detaching attempts); then the lists and
 * the gradebook, which read the cells, against the same recomputation.
 */
describe('assignment cells (e2e, real PostgreSQL triggers)', () => {
  let app: INestApplication;
  let http: ReturnType<INestApplication['getHttpServer']>;
  let db: DataSource;
  let teacher: TestAccount;
  let students: TestAccount[];
  let drifter: TestAccount;
  let classId: string;
  let drillId: string;
  let assignments: { id: string; dueAt: Date }[];

  beforeAll(async () => {
    app = await createTestApp();
    http = app.getHttpServer();
    db = app.get(DataSource);
    teacher = await registerAccount(app, 'teacher');
    students = await Promise.all(
      [0, 1, 2, 3, 4].map((i) => registerAccount(app, 'student', `Cell student ${i}`)),
    );
    const klass = await request(http)
      .post('/api/classes')
      .set(teacher.auth)
      .send({ name: 'Cells class' })
      .expect(201);
    classId = klass.body.id;
    for (const s of students)
      await request(http)
        .post('/api/classes/join')
        .set(s.auth)
        .send({ code: klass.body.code })
        .expect(200);
    const drill = await request(http)
      .post('/api/drills')
      .set(teacher.auth)
      .send({ title: 'Cell grey', kind: 'neutral', targets: [{ lab: { L: 50, a: 0, b: 0 } }] })
      .expect(201);
    drillId = drill.body.id;
    drifter = await registerAccount(app, 'student', 'Cell drifter');
    assignments = [];
    for (const days of [-3, 2, 9]) {
      const dueAt = new Date(Date.now() + days * dayMs);
      // A new assignment is due from now on; a past one is made by moving its due date.
      const made = await request(http)
        .post('/api/assignments')
        .set(teacher.auth)
        .send({ classId, drillId, dueAt: new Date(Math.max(dueAt.getTime(), Date.now() + dayMs)).toISOString() })
        .expect(201);
      const moved = await request(http).patch(`/api/assignments/${made.body.id}`).set(teacher.auth).send({ dueAt: dueAt.toISOString() }).expect(200);
      assignments.push({ id: made.body.id, dueAt: new Date(moved.body.dueAt) });
    }
  });
  afterAll(async () => {
    await app.close();
  });

  const ids = () => assignments.map((a) => a.id);

  async function expectCellsMatchAttempts(context: string) {
    const [stored, recomputed] = await Promise.all([
      storedCells(db, ids()),
      recomputedCells(db, ids()),
    ]);
    expect({ context, cells: Object.fromEntries(stored) }).toEqual({
      context,
      cells: Object.fromEntries(recomputed),
    });
    // The standings (roster students per passed and newest state) for every assignment.
    expect({ context, standings: await storedStandings(db, ids()) }).toEqual({
      context,
      standings: await recomputedStandings(db, ids()),
    });
  }

  it('should equal a recomputation from the attempts after a seeded random sequence of writes, and the lists and gradebook should agree', async () => {
    const random = seededRandom(20261202);
    const pick = <T>(list: T[]): T => list[Math.floor(random() * list.length)];
    const live: string[] = [];
    const base = Date.now() - 10 * dayMs;
    let lastCreated = base;
    const counts: Record<string, number> = {};
    for (let step = 0; step < 400; step += 1) {
      const roll = random();
      const op =
        live.length === 0 || roll < 0.24
          ? 'insert'
          : roll < 0.32
            ? 'measuring'
            : roll < 0.5
              ? 'grade'
              : roll < 0.57
                ? 'needs-retake'
                : roll < 0.6
                  ? 'failed'
                  : roll < 0.7
                    ? 'override'
                    : roll < 0.73
                      ? 'clear-override'
                      : roll < 0.76
                        ? 'overlay-only'
                        : roll < 0.84
                          ? 'delete'
                          : roll < 0.87
                            ? 'bulk-grade'
                            : roll < 0.9
                              ? 'move'
                              : roll < 0.92
                                ? 'detach'
                                : roll < 0.94
                                  ? 'bulk-delete'
                                  : roll < 0.97
                                    ? 'reattach'
                                    : roll < 0.985
                                      ? 'join'
                                      : 'leave';
      counts[op] = (counts[op] ?? 0) + 1;
      const id = live.length ? pick(live) : '';
      switch (op) {
        case 'insert': {
          // Now and then two attempts share a created_at: the cells break the tie by id.
          const createdAt =
            random() < 0.1 ? lastCreated : (lastCreated += 1000 + Math.floor(random() * 60_000));
          const [row] = await db.query<{ id: string }[]>(
            `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes, created_at)
             VALUES ($1, $2, $3, 'queued', 'attempts/none/photo.jpg', 1, $4) RETURNING id`,
            [
              pick([...students, drifter]).id,
              drillId,
              random() < 0.05 ? null : pick(assignments).id,
              new Date(createdAt),
            ],
          );
          live.push(row.id);
          break;
        }
        case 'measuring':
          await db.query(
            `UPDATE attempts SET state = 'measuring', tries = tries + 1 WHERE id = $1`,
            [id],
          );
          break;
        case 'grade':
          await db.query(
            `UPDATE attempts SET state = 'graded', score = $2, pass = $3, graded_at = now() WHERE id = $1`,
            [id, Math.floor(random() * 101), random() < 0.5],
          );
          break;
        case 'needs-retake':
          await db.query(
            `UPDATE attempts SET state = 'needs-retake', graded_at = now() WHERE id = $1`,
            [id],
          );
          break;
        case 'failed':
          await db.query(
            `UPDATE attempts SET state = 'failed', failure_reason = 'gave up' WHERE id = $1`,
            [id],
          );
          break;
        case 'override':
          await db.query(
            `UPDATE attempts SET override_score = $2, override_pass = $3, override_comment = 'teacher says', overridden_by_id = $4, overridden_at = now() WHERE id = $1`,
            [id, Math.floor(random() * 101), random() < 0.5, teacher.id],
          );
          break;
        case 'clear-override':
          await db.query(
            `UPDATE attempts SET override_score = NULL, override_pass = NULL, override_comment = NULL, overridden_at = NULL WHERE id = $1`,
            [id],
          );
          break;
        case 'overlay-only':
          await db.query(
            `UPDATE attempts SET overlay_key = 'attempts/none/overlay.png' WHERE id = $1`,
            [id],
          );
          break;
        case 'delete':
          await db.query(`DELETE FROM attempts WHERE id = $1`, [id]);
          live.splice(live.indexOf(id), 1);
          break;
        case 'bulk-grade':
          // One statement over many cells at once.
          await db.query(
            `UPDATE attempts SET state = 'graded', score = $2, pass = $3 WHERE assignment_id = ANY($1) AND state IN ('queued', 'measuring')`,
            [ids(), Math.floor(random() * 101), random() < 0.5],
          );
          break;
        case 'move':
          await db.query(`UPDATE attempts SET assignment_id = $2 WHERE id = $1`, [
            id,
            pick(assignments).id,
          ]);
          break;
        case 'detach':
          await db.query(`UPDATE attempts SET assignment_id = NULL WHERE id = $1`, [id]);
          break;
        case 'reattach':
          await db.query(
            `UPDATE attempts SET assignment_id = $2 WHERE id = $1 AND assignment_id IS NULL`,
            [id, pick(assignments).id],
          );
          break;
        // A student who is on the roster now and then, with attempts either way.
        case 'join':
          await db.query(
            `INSERT INTO class_members (class_id, student_id) VALUES ($1, $2) ON CONFLICT DO NOTHING`,
            [classId, drifter.id],
          );
          break;
        case 'leave':
          await db.query(`DELETE FROM class_members WHERE class_id = $1 AND student_id = $2`, [
            classId,
            drifter.id,
          ]);
          break;
        case 'bulk-delete': {
          const gone = await db.query<{ id: string }[]>(
            `DELETE FROM attempts WHERE student_id = $1 AND assignment_id = $2 RETURNING id`,
            [pick(students).id, pick(assignments).id],
          );
          for (const row of gone) live.splice(live.indexOf(row.id), 1);
          break;
        }
      }
      if (step % 25 === 24) await expectCellsMatchAttempts(`after step ${step} (${op})`);
    }
    // Every kind of write happened, and the cells hold more than one state.
    expect(Object.keys(counts).sort()).toEqual(
      [
        'bulk-delete',
        'bulk-grade',
        'clear-override',
        'delete',
        'detach',
        'failed',
        'grade',
        'insert',
        'join',
        'leave',
        'measuring',
        'move',
        'needs-retake',
        'overlay-only',
        'override',
        'reattach',
      ].sort(),
    );
    await expectCellsMatchAttempts('at the end');
    const stored = await storedCells(db, ids());
    expect(stored.size).toBeGreaterThanOrEqual(10);
    expect(new Set([...stored.values()].map((c) => c.latestState)).size).toBeGreaterThanOrEqual(3);

    // One student leaves the class: their cells stay, the counts and the gradebook leave them out.
    await db.query(`DELETE FROM class_members WHERE class_id = $1 AND student_id = $2`, [
      classId,
      drifter.id,
    ]);
    await expectCellsMatchAttempts('after the drifter left');
    const leaver = students[4];
    await request(http)
      .delete(`/api/classes/${classId}/students/${leaver.id}`)
      .set(teacher.auth)
      .expect(204);
    const roster = students.slice(0, 4);

    const now = new Date();
    const byCell = await attemptsByCell(db, ids());
    const book = await request(http)
      .get(`/api/classes/${classId}/gradebook`)
      .set(teacher.auth)
      .expect(200);
    expect(
      book.body.assignments.map((a: { id: string; dueAt: string }) => [a.id, a.dueAt]),
    ).toEqual(assignments.map((a) => [a.id, a.dueAt.toISOString()]));
    expect(book.body.students.map((s: { id: string }) => s.id).sort()).toEqual(
      roster.map((s) => s.id).sort(),
    );
    for (const s of book.body.students as { id: string; cells: Record<string, unknown> }[]) {
      for (const a of assignments) {
        const mine = byCell.get(`${a.id}/${s.id}`);
        const cell = mine ? expectedCell(mine) : undefined;
        expect({ student: s.id, assignment: a.id, cell: s.cells[a.id] }).toEqual({
          student: s.id,
          assignment: a.id,
          cell: {
            status: expectedStatus(mine, a.dueAt, now),
            attempts: cell?.attempts ?? 0,
            latestScore: cell?.latestScore ?? null,
            bestScore: cell?.bestScore ?? null,
            latestAttemptId: cell?.latestAttemptId ?? null,
          },
        });
      }
    }

    const list = await request(http)
      .get(`/api/assignments?classId=${classId}`)
      .set(teacher.auth)
      .expect(200);
    expect(list.body.map((a: { id: string }) => a.id)).toEqual(ids());
    // Dates as JSON: the same ISO text a Date gives.
    expect(list.body.map((a: { dueAt: string }) => a.dueAt)).toEqual(
      assignments.map((a) => a.dueAt.toISOString()),
    );
    for (const a of list.body as { createdAt: string }[])
      expect(new Date(a.createdAt).toISOString()).toBe(a.createdAt);
    for (const view of list.body as { id: string; counts: Record<AssignmentStatus, number> }[]) {
      const a = assignments.find((x) => x.id === view.id)!;
      const counts = noCounts();
      for (const s of roster)
        counts[expectedStatus(byCell.get(`${a.id}/${s.id}`), a.dueAt, now)] += 1;
      expect({ assignment: a.id, counts: view.counts }).toEqual({ assignment: a.id, counts });
    }
    // The counts are not all in one status (the sequence reached several).
    const statuses = new Set(
      (list.body as { counts: Record<string, number> }[]).flatMap((v) =>
        Object.entries(v.counts)
          .filter(([, n]) => n > 0)
          .map(([k]) => k),
      ),
    );
    expect(statuses.size).toBeGreaterThanOrEqual(2);

    for (const s of roster) {
      const mine = await request(http).get('/api/assignments').set(s.auth).expect(200);
      expect(mine.body.map((v: { id: string; status: string }) => [v.id, v.status])).toEqual(
        assignments.map((a) => [a.id, expectedStatus(byCell.get(`${a.id}/${s.id}`), a.dueAt, now)]),
      );
      const one = await request(http)
        .get(`/api/assignments/${assignments[0].id}`)
        .set(s.auth)
        .expect(200);
      expect(one.body.status).toBe(
        expectedStatus(byCell.get(`${assignments[0].id}/${s.id}`), assignments[0].dueAt, now),
      );
    }
    // The student who left no longer sees the class's assignments.
    await request(http).get(`/api/assignments/${assignments[0].id}`).set(leaver.auth).expect(404);
    expect((await request(http).get('/api/assignments').set(leaver.auth).expect(200)).body).toEqual(
      [],
    );
  });

  it('should count two uploads to one cell made at the same time by two transactions', async () => {
    const student = students[0];
    const assignment = assignments[1];
    const before =
      (await storedCells(db, [assignment.id])).get(`${assignment.id}/${student.id}`)?.attempts ?? 0;
    const first = db.createQueryRunner();
    const second = db.createQueryRunner();
    await first.connect();
    await second.connect();
    try {
      const insert = (runner: typeof first) =>
        runner.query(
          `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes) VALUES ($1, $2, $3, 'queued', 'attempts/none/photo.jpg', 1)`,
          [student.id, drillId, assignment.id],
        );
      await first.startTransaction();
      await second.startTransaction();
      await insert(first);
      // The second transaction's trigger waits for the first one's lock on the cell...
      const secondInsert = insert(second);
      await new Promise((resolve) => setTimeout(resolve, 200));
      await first.commitTransaction();
      // ...and recomputes after it commits, so it sees both attempts.
      await secondInsert;
      await second.commitTransaction();
    } finally {
      await first.release();
      await second.release();
    }
    const after = (await storedCells(db, [assignment.id])).get(`${assignment.id}/${student.id}`)!;
    expect(after.attempts).toBe(before + 2);
    await expectCellsMatchAttempts('after two concurrent uploads');
  });

  it('should count two students passing one assignment at the same time in its standings', async () => {
    const made = await request(http)
      .post('/api/assignments')
      .set(teacher.auth)
      .send({ classId, drillId, dueAt: new Date(Date.now() + dayMs).toISOString() })
      .expect(201);
    const assignmentId: string = made.body.id;
    const runners = [db.createQueryRunner(), db.createQueryRunner()];
    try {
      for (const runner of runners) {
        await runner.connect();
        await runner.startTransaction();
      }
      const pass = (i: number) =>
        runners[i].query(
          `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes, score, pass)
           VALUES ($1, $2, $3, 'graded', 'attempts/none/photo.jpg', 1, 90, true)`,
          [students[i].id, drillId, assignmentId],
        );
      await pass(0);
      // Different cells, one assignment: the second waits for the first one's lock on the standings.
      const second = pass(1);
      await new Promise((resolve) => setTimeout(resolve, 200));
      await runners[0].commitTransaction();
      await second;
      await runners[1].commitTransaction();
    } finally {
      for (const runner of runners) await runner.release();
    }
    expect(await storedStandings(db, [assignmentId])).toEqual(
      await recomputedStandings(db, [assignmentId]),
    );
    const view = await request(http)
      .get(`/api/assignments/${assignmentId}`)
      .set(teacher.auth)
      .expect(200);
    expect(view.body.counts).toEqual({ ...noCounts(), passed: 2, 'not-started': 2 });
    await request(http).delete(`/api/assignments/${assignmentId}`).set(teacher.auth).expect(204);
  });

  it('should drop the cells of a deleted assignment and of a deleted student, with their attempts detached or deleted by the foreign keys', async () => {
    const gone = assignments[2];
    const student = students[1];
    await db.query(
      `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes, score, pass)
       SELECT s, $2, a, 'graded', 'attempts/none/photo.jpg', 1, 70, true FROM unnest($1::uuid[]) s CROSS JOIN unnest($3::uuid[]) a`,
      [students.map((s) => s.id), drillId, ids()],
    );
    const [{ withAttempts }] = await db.query<{ withAttempts: number }[]>(
      `SELECT count(DISTINCT student_id)::int AS "withAttempts" FROM attempts WHERE assignment_id = $1`,
      [gone.id],
    );
    expect(withAttempts).toBeGreaterThanOrEqual(students.length);
    expect((await storedCells(db, [gone.id])).size).toBe(withAttempts);
    await request(http).delete(`/api/assignments/${gone.id}`).set(teacher.auth).expect(204);
    expect((await storedCells(db, [gone.id])).size).toBe(0);
    const [{ detached }] = await db.query<{ detached: number }[]>(
      `SELECT count(*)::int AS detached FROM attempts WHERE assignment_id IS NULL AND drill_id = $1`,
      [drillId],
    );
    expect(detached).toBeGreaterThanOrEqual(students.length);
    assignments = assignments.filter((a) => a.id !== gone.id);

    await db.query(`DELETE FROM users WHERE id = $1`, [student.id]);
    const [{ left }] = await db.query<{ left: number }[]>(
      `SELECT count(*)::int AS left FROM assignment_cells WHERE student_id = $1`,
      [student.id],
    );
    expect(left).toBe(0);
    await expectCellsMatchAttempts('after the deletes');
    // The gradebook still answers for the rest of the class.
    const book = await request(http)
      .get(`/api/classes/${classId}/gradebook`)
      .set(teacher.auth)
      .expect(200);
    expect(book.body.assignments.map((a: { id: string }) => a.id)).toEqual(ids());
  });
});
