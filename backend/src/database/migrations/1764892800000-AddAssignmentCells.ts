import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * One row per student and assignment with everything the assignment lists and the gradebook show
 * of that student's attempts: how many, whether a graded one passed (the teacher's override
 * first), the newest attempt (id, state, effective pass, when), the newest effective score and the
 * best one. Lists read these cells (and the class roster) instead of every attempt.
 *
 * PostgreSQL keeps them: statement triggers on `attempts` (insert, update, delete, truncate)
 * recompute the cells of every (assignment, student) a statement touched from that cell's attempts
 * (`assignment_cells_refresh`). Recomputing from the attempts, rather than adding and subtracting,
 * keeps deletes and overrides exact; a cell has a handful of attempts, found by
 * `attempts_assignment_idx`. No application code path (upload, grading worker, override, seed,
 * deletes by foreign key) needs to know about the cells.
 *
 * Concurrency: the cells of a statement are locked (created when missing) in key order before
 * they are recomputed, and the recompute is a later statement, so under READ COMMITTED (the
 * application's level) it sees every attempt committed by a transaction it waited for. Two uploads
 * to one cell at once therefore both count.
 *
 * Lateness ("late") depends on the clock, so it is not stored: readers apply `statusFromSummary`
 * to `passed` and `latest_state` with the due date.
 */
export class AddAssignmentCells1764892800000 implements MigrationInterface {
  name = 'AddAssignmentCells1764892800000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "assignment_cells" (
        "assignment_id" uuid NOT NULL REFERENCES "assignments" ("id") ON DELETE CASCADE,
        "student_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "attempts" integer NOT NULL DEFAULT 0,
        "passed" boolean NOT NULL DEFAULT false,
        "latest_attempt_id" uuid,
        "latest_state" "attempt_state",
        "latest_pass" boolean,
        "latest_submitted_at" timestamptz,
        "latest_score" integer,
        "best_score" integer,
        PRIMARY KEY ("assignment_id", "student_id")
      )`);
    await queryRunner.query(
      `CREATE INDEX "assignment_cells_student_idx" ON "assignment_cells" ("student_id")`,
    );

    // The one definition of a cell: newest is by created_at, then id (a deterministic tie-break).
    await queryRunner.query(`
      CREATE FUNCTION "assignment_cells_refresh"(assignment_ids uuid[], student_ids uuid[]) RETURNS void
      LANGUAGE plpgsql AS $fn$
      BEGIN
        -- 1. Lock the cells (making the missing ones), in key order so that statements touching
        --    several cells cannot deadlock each other. A cell of an assignment or student deleted
        --    in this transaction is not made (its attempts are gone or detached).
        INSERT INTO assignment_cells AS c (assignment_id, student_id)
        SELECT k.assignment_id, k.student_id
          FROM (SELECT DISTINCT u.assignment_id, u.student_id FROM unnest(assignment_ids, student_ids) AS u (assignment_id, student_id)
                 WHERE u.assignment_id IS NOT NULL AND u.student_id IS NOT NULL) k
         WHERE EXISTS (SELECT 1 FROM assignments s WHERE s.id = k.assignment_id)
           AND EXISTS (SELECT 1 FROM users p WHERE p.id = k.student_id)
         ORDER BY k.assignment_id, k.student_id
        ON CONFLICT (assignment_id, student_id) DO UPDATE SET attempts = c.attempts;

        -- 2. Recompute them (a new statement: a new snapshot, taken after the locks were granted).
        UPDATE assignment_cells c
           SET attempts = g.attempts, passed = g.passed, latest_attempt_id = g.latest_attempt_id, latest_state = g.latest_state,
               latest_pass = g.latest_pass, latest_submitted_at = g.latest_submitted_at, latest_score = g.latest_score, best_score = g.best_score
          FROM (SELECT t.assignment_id, t.student_id,
                       count(*)::int AS attempts,
                       COALESCE(bool_or(t.state = 'graded' AND COALESCE(t.override_pass, t.pass)), false) AS passed,
                       (array_agg(t.id ORDER BY t.created_at DESC, t.id DESC))[1] AS latest_attempt_id,
                       (array_agg(t.state ORDER BY t.created_at DESC, t.id DESC))[1] AS latest_state,
                       (array_agg(COALESCE(t.override_pass, t.pass) ORDER BY t.created_at DESC, t.id DESC))[1] AS latest_pass,
                       max(t.created_at) AS latest_submitted_at,
                       (array_agg(COALESCE(t.override_score, t.score) ORDER BY t.created_at DESC, t.id DESC)
                          FILTER (WHERE COALESCE(t.override_score, t.score) IS NOT NULL))[1] AS latest_score,
                       max(COALESCE(t.override_score, t.score)) AS best_score
                  FROM attempts t
                  JOIN (SELECT DISTINCT * FROM unnest(assignment_ids, student_ids) AS u (assignment_id, student_id)) k
                    ON k.assignment_id = t.assignment_id AND k.student_id = t.student_id
                 GROUP BY t.assignment_id, t.student_id) g
         WHERE c.assignment_id = g.assignment_id AND c.student_id = g.student_id;

        -- 3. A cell with no attempts left is no cell.
        DELETE FROM assignment_cells c
         USING (SELECT DISTINCT * FROM unnest(assignment_ids, student_ids) AS u (assignment_id, student_id)) k
         WHERE c.assignment_id = k.assignment_id AND c.student_id = k.student_id
           AND NOT EXISTS (SELECT 1 FROM attempts t WHERE t.assignment_id = c.assignment_id AND t.student_id = c.student_id);
      END
      $fn$`);

    await queryRunner.query(`
      CREATE FUNCTION "attempts_cells_after_insert"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        PERFORM assignment_cells_refresh(array_agg(n.assignment_id), array_agg(n.student_id)) FROM new_attempts n WHERE n.assignment_id IS NOT NULL;
        RETURN NULL;
      END
      $fn$`);
    // Only the cells whose inputs changed: a write of the overlay key or the tries counter alone leaves them be.
    await queryRunner.query(`
      CREATE FUNCTION "attempts_cells_after_update"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        PERFORM assignment_cells_refresh(array_agg(k.assignment_id), array_agg(k.student_id))
           FROM (SELECT o.assignment_id, o.student_id, n.assignment_id AS new_assignment_id, n.student_id AS new_student_id
                   FROM old_attempts o FULL JOIN new_attempts n ON n.id = o.id
                  WHERE o.id IS NULL OR n.id IS NULL
                     OR (o.assignment_id, o.student_id, o.state, o.pass, o.score, o.override_pass, o.override_score, o.created_at)
                        IS DISTINCT FROM (n.assignment_id, n.student_id, n.state, n.pass, n.score, n.override_pass, n.override_score, n.created_at)) c
          CROSS JOIN LATERAL (VALUES (c.assignment_id, c.student_id), (c.new_assignment_id, c.new_student_id)) AS k (assignment_id, student_id)
          WHERE k.assignment_id IS NOT NULL;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "attempts_cells_after_delete"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        PERFORM assignment_cells_refresh(array_agg(o.assignment_id), array_agg(o.student_id)) FROM old_attempts o WHERE o.assignment_id IS NOT NULL;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "attempts_cells_after_truncate"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        DELETE FROM assignment_cells;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(
      `CREATE TRIGGER "attempts_cells_insert" AFTER INSERT ON "attempts" REFERENCING NEW TABLE AS new_attempts FOR EACH STATEMENT EXECUTE FUNCTION attempts_cells_after_insert()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "attempts_cells_update" AFTER UPDATE ON "attempts" REFERENCING OLD TABLE AS old_attempts NEW TABLE AS new_attempts FOR EACH STATEMENT EXECUTE FUNCTION attempts_cells_after_update()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "attempts_cells_delete" AFTER DELETE ON "attempts" REFERENCING OLD TABLE AS old_attempts FOR EACH STATEMENT EXECUTE FUNCTION attempts_cells_after_delete()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "attempts_cells_truncate" AFTER TRUNCATE ON "attempts" FOR EACH STATEMENT EXECUTE FUNCTION attempts_cells_after_truncate()`,
    );

    // Backfill every cell from the attempts there are.
    await queryRunner.query(`
      SELECT assignment_cells_refresh(array_agg(k.assignment_id), array_agg(k.student_id))
        FROM (SELECT DISTINCT assignment_id, student_id FROM attempts WHERE assignment_id IS NOT NULL) k`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "attempts_cells_truncate" ON "attempts"`);
    await queryRunner.query(`DROP TRIGGER "attempts_cells_delete" ON "attempts"`);
    await queryRunner.query(`DROP TRIGGER "attempts_cells_update" ON "attempts"`);
    await queryRunner.query(`DROP TRIGGER "attempts_cells_insert" ON "attempts"`);
    await queryRunner.query(`DROP FUNCTION "attempts_cells_after_truncate"()`);
    await queryRunner.query(`DROP FUNCTION "attempts_cells_after_delete"()`);
    await queryRunner.query(`DROP FUNCTION "attempts_cells_after_update"()`);
    await queryRunner.query(`DROP FUNCTION "attempts_cells_after_insert"()`);
    await queryRunner.query(`DROP FUNCTION "assignment_cells_refresh"(uuid[], uuid[])`);
    await queryRunner.query(`DROP TABLE "assignment_cells"`);
  }
}
