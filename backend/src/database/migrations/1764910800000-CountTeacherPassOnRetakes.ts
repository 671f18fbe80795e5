import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A teacher's pass counts wherever it is given. A teacher may override the mark of an attempt
 * the machine sent back for a retake (a photo it could not read well enough) as well as of a
 * graded one; until now a cell counted as passed only through a graded attempt, so a teacher
 * passing a retake left the assignment unpassed. An attempt's pass is now the teacher's when
 * there is one, else the machine's for a graded attempt. Only `passed` changes; the function is
 * otherwise the AddAssignmentCells one (`refreshFunction`). The cells with such attempts are recomputed.
 */
export class CountTeacherPassOnRetakes1764910800000 implements MigrationInterface {
  name = 'CountTeacherPassOnRetakes1764910800000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      refreshFunction(`COALESCE(t.override_pass, t.state = 'graded' AND t.pass)`),
    );
    await recomputeOverriddenRetakes(queryRunner);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      refreshFunction(`t.state = 'graded' AND COALESCE(t.override_pass, t.pass)`),
    );
    await recomputeOverriddenRetakes(queryRunner);
  }
}

/** AddAssignmentCells' `assignment_cells_refresh` with `passed` (a per-attempt boolean) as given. */
function refreshFunction(passed: string): string {
  return `
      CREATE OR REPLACE FUNCTION "assignment_cells_refresh"(assignment_ids uuid[], student_ids uuid[]) RETURNS void
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
                       COALESCE(bool_or(${passed}), false) AS passed,
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
      $fn$`;
}

function recomputeOverriddenRetakes(queryRunner: QueryRunner): Promise<unknown> {
  return queryRunner.query(
    `SELECT assignment_cells_refresh(array_agg(assignment_id), array_agg(student_id))
       FROM attempts WHERE override_pass IS NOT NULL AND state <> 'graded' AND assignment_id IS NOT NULL HAVING count(*) > 0`,
  );
}
