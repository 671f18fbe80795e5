import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * One row per assignment: how many students of the class roster stand in each (passed, newest
 * state) group of their assignment cell, with a (null, null) group for those who have handed
 * nothing in. The teacher's assignment list reads these few groups per assignment and applies the
 * status rule (`statusFromSummary`, with the clock for lateness) to each group, instead of reading
 * every student's cell on every request.
 *
 * PostgreSQL keeps them from their sources, recomputing an assignment's groups from its cells and
 * the roster (about one row per student) whenever
 * - a cell's passed or newest state changes or a cell goes (statement triggers on
 *   `assignment_cells`, which the attempts' triggers write; a cell is made, then filled in by an
 *   update, so the update is what counts);
 * - a student joins or leaves a class (`class_members`), for every assignment of the class;
 * - an assignment is made or moved to another class (`assignments`).
 * As for the cells, the rows are locked (made when missing) in key order before they are
 * recomputed in a later statement, so concurrent writers under READ COMMITTED do not lose counts.
 */
export class AddAssignmentStandings1764896400000 implements MigrationInterface {
  name = 'AddAssignmentStandings1764896400000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "assignment_standings" (
        "assignment_id" uuid PRIMARY KEY REFERENCES "assignments" ("id") ON DELETE CASCADE,
        "groups" jsonb NOT NULL DEFAULT '[]'
      )`);
    await queryRunner.query(`
      CREATE FUNCTION "assignment_standings_refresh"(assignment_ids uuid[]) RETURNS void
      LANGUAGE plpgsql AS $fn$
      BEGIN
        INSERT INTO assignment_standings AS s (assignment_id)
        SELECT a.id FROM assignments a WHERE a.id = ANY(assignment_ids) ORDER BY a.id
        ON CONFLICT (assignment_id) DO UPDATE SET groups = s.groups;

        UPDATE assignment_standings s
           SET groups = (SELECT COALESCE(jsonb_agg(jsonb_build_array(g.passed, g.latest_state, g.students) ORDER BY g.passed, g.latest_state), '[]')
                           FROM (SELECT x.passed, x.latest_state, count(*)::int AS students
                                   FROM assignments a
                                   JOIN class_members m ON m.class_id = a.class_id
                                   LEFT JOIN assignment_cells x ON x.assignment_id = a.id AND x.student_id = m.student_id
                                  WHERE a.id = s.assignment_id
                                  GROUP BY x.passed, x.latest_state) g)
         WHERE s.assignment_id = ANY(assignment_ids);
      END
      $fn$`);

    await queryRunner.query(`
      CREATE FUNCTION "assignment_cells_after_update"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        PERFORM assignment_standings_refresh(array_agg(DISTINCT k.assignment_id))
           FROM (SELECT o.assignment_id FROM old_cells o JOIN new_cells n ON n.assignment_id = o.assignment_id AND n.student_id = o.student_id
                  WHERE (o.passed, o.latest_state) IS DISTINCT FROM (n.passed, n.latest_state)
                 UNION ALL
                 SELECT n.assignment_id FROM new_cells n
                  WHERE NOT EXISTS (SELECT 1 FROM old_cells o WHERE o.assignment_id = n.assignment_id AND o.student_id = n.student_id)
                 UNION ALL
                 SELECT o.assignment_id FROM old_cells o
                  WHERE NOT EXISTS (SELECT 1 FROM new_cells n WHERE n.assignment_id = o.assignment_id AND n.student_id = o.student_id)) k
         HAVING count(*) > 0;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "assignment_cells_after_delete"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        PERFORM assignment_standings_refresh(array_agg(DISTINCT o.assignment_id)) FROM old_cells o HAVING count(*) > 0;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "class_members_standings_after_change"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        IF TG_OP IN ('INSERT', 'UPDATE') THEN
          PERFORM assignment_standings_refresh(array_agg(a.id)) FROM assignments a WHERE a.class_id IN (SELECT class_id FROM new_members) HAVING count(*) > 0;
        END IF;
        IF TG_OP IN ('DELETE', 'UPDATE') THEN
          PERFORM assignment_standings_refresh(array_agg(a.id)) FROM assignments a WHERE a.class_id IN (SELECT class_id FROM old_members) HAVING count(*) > 0;
        END IF;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "assignments_standings_after_change"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        IF TG_OP = 'INSERT' THEN
          PERFORM assignment_standings_refresh(array_agg(n.id)) FROM new_assignments n HAVING count(*) > 0;
        ELSE
          PERFORM assignment_standings_refresh(array_agg(n.id))
             FROM new_assignments n JOIN old_assignments o ON o.id = n.id
            WHERE o.class_id IS DISTINCT FROM n.class_id HAVING count(*) > 0;
        END IF;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(
      `CREATE TRIGGER "assignment_cells_standings_update" AFTER UPDATE ON "assignment_cells" REFERENCING OLD TABLE AS old_cells NEW TABLE AS new_cells FOR EACH STATEMENT EXECUTE FUNCTION assignment_cells_after_update()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "assignment_cells_standings_delete" AFTER DELETE ON "assignment_cells" REFERENCING OLD TABLE AS old_cells FOR EACH STATEMENT EXECUTE FUNCTION assignment_cells_after_delete()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "class_members_standings_insert" AFTER INSERT ON "class_members" REFERENCING NEW TABLE AS new_members FOR EACH STATEMENT EXECUTE FUNCTION class_members_standings_after_change()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "class_members_standings_update" AFTER UPDATE ON "class_members" REFERENCING OLD TABLE AS old_members NEW TABLE AS new_members FOR EACH STATEMENT EXECUTE FUNCTION class_members_standings_after_change()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "class_members_standings_delete" AFTER DELETE ON "class_members" REFERENCING OLD TABLE AS old_members FOR EACH STATEMENT EXECUTE FUNCTION class_members_standings_after_change()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "assignments_standings_insert" AFTER INSERT ON "assignments" REFERENCING NEW TABLE AS new_assignments FOR EACH STATEMENT EXECUTE FUNCTION assignments_standings_after_change()`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "assignments_standings_update" AFTER UPDATE ON "assignments" REFERENCING OLD TABLE AS old_assignments NEW TABLE AS new_assignments FOR EACH STATEMENT EXECUTE FUNCTION assignments_standings_after_change()`,
    );
    // Backfill every assignment.
    await queryRunner.query(
      `SELECT assignment_standings_refresh(array_agg(id)) FROM assignments HAVING count(*) > 0`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "assignments_standings_update" ON "assignments"`);
    await queryRunner.query(`DROP TRIGGER "assignments_standings_insert" ON "assignments"`);
    await queryRunner.query(`DROP TRIGGER "class_members_standings_delete" ON "class_members"`);
    await queryRunner.query(`DROP TRIGGER "class_members_standings_update" ON "class_members"`);
    await queryRunner.query(`DROP TRIGGER "class_members_standings_insert" ON "class_members"`);
    await queryRunner.query(
      `DROP TRIGGER "assignment_cells_standings_delete" ON "assignment_cells"`,
    );
    await queryRunner.query(
      `DROP TRIGGER "assignment_cells_standings_update" ON "assignment_cells"`,
    );
    await queryRunner.query(`DROP FUNCTION "assignments_standings_after_change"()`);
    await queryRunner.query(`DROP FUNCTION "class_members_standings_after_change"()`);
    await queryRunner.query(`DROP FUNCTION "assignment_cells_after_delete"()`);
    await queryRunner.query(`DROP FUNCTION "assignment_cells_after_update"()`);
    await queryRunner.query(`DROP FUNCTION "assignment_standings_refresh"(uuid[])`);
    await queryRunner.query(`DROP TABLE "assignment_standings"`);
  }
}
