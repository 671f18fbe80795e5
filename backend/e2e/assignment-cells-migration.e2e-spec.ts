import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { DataSource } from 'typeorm';
import { dataSourceOptions } from '../src/database/data-source';
import { AddAssignmentCells1764892800000 } from '../src/database/migrations/1764892800000-AddAssignmentCells';
import { AddAssignmentStandings1764896400000 } from '../src/database/migrations/1764896400000-AddAssignmentStandings';
import {
  recomputedCells,
  recomputedStandings,
  storedCells,
  storedStandings,
} from './assignment-cells-expected';
import { migratedTestDatabase } from './throwaway-cluster.mjs';

const migrationName = new AddAssignmentCells1764892800000().name;
const standingsName = new AddAssignmentStandings1764896400000().name;

/** The AddAssignmentCells migration down and up again on a database of its own, with attempts in it. */
describe('assignment cells migration: up, down, up (e2e, real PostgreSQL)', () => {
  let db: DataSource;
  let assignmentIds: string[];

  beforeAll(async () => {
    const url = await migratedTestDatabase('mixmark_cells_migration_e2e');
    db = await new DataSource(dataSourceOptions({ url, poolSize: 2 })).initialize();
    const [teacher] = await db.query(
      `INSERT INTO users (email, display_name, role, password_hash) VALUES ('t@cells.test', 'T', 'teacher', 'x') RETURNING id`,
    );
    const students = await db.query<{ id: string }[]>(
      `INSERT INTO users (email, display_name, role, password_hash) SELECT 's' || i || '@cells.test', 'S' || i, 'student', 'x' FROM generate_series(1, 3) i RETURNING id`,
    );
    const [klass] = await db.query(
      `INSERT INTO classes (teacher_id, name, code) VALUES ($1, 'C', 'CELLS1') RETURNING id`,
      [teacher.id],
    );
    await db.query(
      `INSERT INTO class_members (class_id, student_id) SELECT $1, unnest($2::uuid[])`,
      [klass.id, students.map((s) => s.id)],
    );
    const [drill] = await db.query(
      `INSERT INTO drills (owner_id, title, kind, targets) VALUES ($1, 'D', 'neutral', '[]') RETURNING id`,
      [teacher.id],
    );
    const made = await db.query<{ id: string }[]>(
      `INSERT INTO assignments (class_id, drill_id, due_at) SELECT $1, $2, now() + i * interval '1 day' FROM generate_series(-1, 1) i RETURNING id`,
      [klass.id, drill.id],
    );
    assignmentIds = made.map((a) => a.id);
    await db.query(
      `INSERT INTO attempts (student_id, drill_id, assignment_id, state, photo_key, photo_bytes, score, pass, created_at)
       SELECT s, $2, a, (ARRAY['graded', 'needs-retake', 'queued']::attempt_state[])[1 + k % 3], 'p', 1, CASE WHEN k % 3 = 0 THEN (k * 17) % 101 END, k % 2 = 0,
              now() - k * interval '1 hour'
         FROM unnest($1::uuid[]) s CROSS JOIN unnest($3::uuid[]) a CROSS JOIN generate_series(0, 4) k`,
      [students.map((s) => s.id), drill.id, assignmentIds],
    );
  });
  afterAll(async () => {
    await db?.destroy();
  });

  const expectKeptUp = async () => {
    expect(Object.fromEntries(await storedCells(db, assignmentIds))).toEqual(
      Object.fromEntries(await recomputedCells(db, assignmentIds)),
    );
    expect(await storedStandings(db, assignmentIds)).toEqual(
      await recomputedStandings(db, assignmentIds),
    );
  };
  const applied = async () =>
    (await db.query<{ name: string }[]>(`SELECT name FROM migrations`)).map((r) => r.name);
  const leftovers = () =>
    db.query<{ n: number }[]>(
      `SELECT (SELECT count(*) FROM pg_trigger WHERE tgname LIKE '%cells%' OR tgname LIKE '%standings%')::int
            + (SELECT count(*) FROM pg_proc WHERE proname LIKE '%cells%' OR proname LIKE '%standings%')::int
            + (to_regclass('assignment_cells') IS NOT NULL)::int
            + (to_regclass('assignment_standings') IS NOT NULL)::int AS n`,
    );

  it('should keep the cells from the start, drop everything on the way down, and backfill on the way up', async () => {
    expect(await applied()).toEqual(expect.arrayContaining([migrationName, standingsName]));
    await expectKeptUp();
    expect((await storedCells(db, assignmentIds)).size).toBe(9);
    expect(Object.keys(await storedStandings(db, assignmentIds))).toHaveLength(3);

    // Down: undo migrations until this one is undone (any added after it go first).
    while ((await applied()).includes(migrationName))
      await db.undoLastMigration({ transaction: 'each' });
    const [{ n }] = await leftovers();
    expect(n).toBe(0);
    // Attempts and the roster change while there are no cells: an override, a delete, a student leaving.
    await db.query(
      `UPDATE attempts SET override_score = 99, override_pass = true WHERE state = 'needs-retake'`,
    );
    await db.query(`DELETE FROM attempts WHERE assignment_id = $1 AND state = 'queued'`, [
      assignmentIds[0],
    ]);
    await db.query(
      `DELETE FROM class_members WHERE student_id = (SELECT id FROM users WHERE email = 's3@cells.test')`,
    );

    // Up again: the cells are made from the attempts as they now are.
    await db.runMigrations({ transaction: 'each' });
    expect(await applied()).toEqual(expect.arrayContaining([migrationName, standingsName]));
    await expectKeptUp();
    const cells = await storedCells(db, assignmentIds);
    expect([...cells.values()].some((c) => c.bestScore === 99)).toBe(true);
    // And the triggers work again.
    await db.query(`UPDATE attempts SET state = 'graded', pass = true WHERE state = 'queued'`);
    await expectKeptUp();
    expect([...(await storedCells(db, assignmentIds)).values()].every((c) => c.passed)).toBe(true);
  });

  it('should empty the cells when the attempts are truncated', async () => {
    await db.query(`TRUNCATE attempts`);
    expect((await storedCells(db, assignmentIds)).size).toBe(0);
    await expectKeptUp();
  });
});
