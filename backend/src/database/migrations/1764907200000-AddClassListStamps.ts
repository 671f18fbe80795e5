import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A counter per class that goes up, in the same transaction, with every write the assignment
 * list of the class can show: an assignment made, changed or deleted; the class renamed or
 * handed to another teacher; a drill of one of its assignments edited; a student joining or
 * leaving; a student's assignment cell changing (the attempts' triggers write the cells, and the
 * teacher's standings follow from cells, roster and assignments, all counted here already).
 *
 * A server keeps a caller's list with the counters of the caller's classes it read *before* the
 * list (see AssignmentsService): while one short indexed read finds the same counters, nothing
 * the list shows has been committed since, and the kept list is the list. A write that lands
 * between the two reads leaves the kept list under counters that are already old, so the next
 * request reads the list again; it is never the other way round. Every server process checks
 * against the same rows, so processes on several machines stay right.
 *
 * Writers hold the counter's row lock until they commit (an upsert, in class id order), so two
 * transactions writing to one class's list follow each other from that point. Every path takes
 * the locks in one order: the written rows (attempts, cells, roster, assignments), then the
 * counter, then the standings rows (see `triggerName`).
 */
export class AddClassListStamps1764907200000 implements MigrationInterface {
  name = 'AddClassListStamps1764907200000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "class_list_stamps" (
        "class_id" uuid PRIMARY KEY,
        "stamp" bigint NOT NULL
      )`);
    // No foreign key: a class being deleted cascades to its assignments and roster, whose
    // triggers run while the class is already gone. The bump only counts classes that exist,
    // and the classes' delete trigger takes the counter away.
    await queryRunner.query(`
      CREATE FUNCTION "class_list_stamps_bump"(class_ids uuid[]) RETURNS void LANGUAGE sql AS $fn$
        INSERT INTO class_list_stamps AS s (class_id, stamp)
        SELECT c.id, 1 FROM classes c WHERE c.id = ANY(class_ids) ORDER BY c.id
        ON CONFLICT (class_id) DO UPDATE SET stamp = s.stamp + 1
      $fn$`);

    // One function per source table; each trigger is for one event (PostgreSQL allows transition
    // tables only on single-event triggers), so the function looks at TG_OP.
    await queryRunner.query(`
      CREATE FUNCTION "class_list_stamps_from_class_ids"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        -- assignments and class_members: the class_id of the rows before and after.
        IF TG_OP IN ('INSERT', 'UPDATE') THEN
          PERFORM class_list_stamps_bump(array_agg(DISTINCT n.class_id)) FROM new_rows n HAVING count(*) > 0;
        END IF;
        IF TG_OP IN ('DELETE', 'UPDATE') THEN
          PERFORM class_list_stamps_bump(array_agg(DISTINCT o.class_id)) FROM old_rows o HAVING count(*) > 0;
        END IF;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "class_list_stamps_from_cells"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        IF TG_OP IN ('INSERT', 'UPDATE') THEN
          PERFORM class_list_stamps_bump(array_agg(DISTINCT a.class_id))
             FROM assignments a WHERE a.id IN (SELECT n.assignment_id FROM new_rows n) HAVING count(*) > 0;
        ELSE
          PERFORM class_list_stamps_bump(array_agg(DISTINCT a.class_id))
             FROM assignments a WHERE a.id IN (SELECT o.assignment_id FROM old_rows o) HAVING count(*) > 0;
        END IF;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "class_list_stamps_from_classes"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        IF TG_OP = 'UPDATE' THEN
          PERFORM class_list_stamps_bump(array_agg(n.id)) FROM new_rows n HAVING count(*) > 0;
        ELSE
          DELETE FROM class_list_stamps WHERE class_id IN (SELECT o.id FROM old_rows o);
        END IF;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`
      CREATE FUNCTION "class_list_stamps_from_drills"() RETURNS trigger LANGUAGE plpgsql AS $fn$
      BEGIN
        PERFORM class_list_stamps_bump(array_agg(DISTINCT a.class_id))
           FROM assignments a WHERE a.drill_id IN (SELECT n.id FROM new_rows n) HAVING count(*) > 0;
        RETURN NULL;
      END
      $fn$`);
    await queryRunner.query(`CREATE INDEX "assignments_drill_idx" ON "assignments" ("drill_id")`);

    for (const [table, fn, events] of TRIGGERS) {
      for (const event of events) {
        const referencing =
          event === 'INSERT'
            ? 'NEW TABLE AS new_rows'
            : event === 'DELETE'
              ? 'OLD TABLE AS old_rows'
              : 'OLD TABLE AS old_rows NEW TABLE AS new_rows';
        await queryRunner.query(
          `CREATE TRIGGER "${triggerName(table, event)}" AFTER ${event} ON "${table}" REFERENCING ${referencing} FOR EACH STATEMENT EXECUTE FUNCTION ${fn}()`,
        );
      }
    }
    // Every existing class starts at 1.
    await queryRunner.query(
      `INSERT INTO class_list_stamps (class_id, stamp) SELECT id, 1 FROM classes`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    for (const [table, , events] of TRIGGERS) {
      for (const event of events) {
        await queryRunner.query(`DROP TRIGGER "${triggerName(table, event)}" ON "${table}"`);
      }
    }
    await queryRunner.query(`DROP INDEX "assignments_drill_idx"`);
    await queryRunner.query(`DROP FUNCTION "class_list_stamps_from_drills"()`);
    await queryRunner.query(`DROP FUNCTION "class_list_stamps_from_classes"()`);
    await queryRunner.query(`DROP FUNCTION "class_list_stamps_from_cells"()`);
    await queryRunner.query(`DROP FUNCTION "class_list_stamps_from_class_ids"()`);
    await queryRunner.query(`DROP FUNCTION "class_list_stamps_bump"(uuid[])`);
    await queryRunner.query(`DROP TABLE "class_list_stamps"`);
  }
}

type Event = 'INSERT' | 'UPDATE' | 'DELETE';

const TRIGGERS: [table: string, fn: string, events: Event[]][] = [
  ['assignments', 'class_list_stamps_from_class_ids', ['INSERT', 'UPDATE', 'DELETE']],
  ['class_members', 'class_list_stamps_from_class_ids', ['INSERT', 'UPDATE', 'DELETE']],
  ['assignment_cells', 'class_list_stamps_from_cells', ['INSERT', 'UPDATE', 'DELETE']],
  ['classes', 'class_list_stamps_from_classes', ['UPDATE', 'DELETE']],
  ['drills', 'class_list_stamps_from_drills', ['UPDATE']],
];

/**
 * PostgreSQL fires a table's AFTER triggers in name order: "a_class_list_…" runs before the
 * standings' triggers ("assignment_cells_standings_…", "class_members_standings_…"), so every
 * writer takes the class counter's lock before the standings rows' locks, in one order.
 */
function triggerName(table: string, event: Event): string {
  return `a_class_list_stamp_${table}_${event.toLowerCase()}`;
}
