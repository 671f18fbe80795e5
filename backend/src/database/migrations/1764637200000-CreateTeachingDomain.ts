import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Sign-in tokens, classes and their rosters, drills, assignments, attempts with their marks,
 * each user's palette, and the shared counters of the sign-in rate limit.
 */
export class CreateTeachingDomain1764637200000 implements MigrationInterface {
  name = 'CreateTeachingDomain1764637200000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "refresh_tokens" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "user_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "family_id" uuid NOT NULL,
        "token_hash" text NOT NULL,
        "expires_at" timestamptz NOT NULL,
        "revoked_at" timestamptz,
        "replaced_by_id" uuid,
        "created_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX "refresh_tokens_family_idx" ON "refresh_tokens" ("family_id")`);
    await queryRunner.query(`CREATE INDEX "refresh_tokens_user_idx" ON "refresh_tokens" ("user_id")`);
    await queryRunner.query(`
      CREATE TABLE "password_resets" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "user_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "token_hash" text NOT NULL,
        "expires_at" timestamptz NOT NULL,
        "used_at" timestamptz,
        "created_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`
      CREATE TABLE "classes" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "teacher_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "studio_id" uuid REFERENCES "studios" ("id") ON DELETE SET NULL,
        "name" text NOT NULL,
        "code" text NOT NULL,
        "archived_at" timestamptz,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "classes_code_key" UNIQUE ("code")
      )`);
    await queryRunner.query(`CREATE INDEX "classes_teacher_idx" ON "classes" ("teacher_id")`);
    await queryRunner.query(`
      CREATE TABLE "class_members" (
        "class_id" uuid NOT NULL REFERENCES "classes" ("id") ON DELETE CASCADE,
        "student_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "joined_at" timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY ("class_id", "student_id")
      )`);
    await queryRunner.query(`CREATE INDEX "class_members_student_idx" ON "class_members" ("student_id")`);
    await queryRunner.query(`
      CREATE TABLE "invitations" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "class_id" uuid NOT NULL REFERENCES "classes" ("id") ON DELETE CASCADE,
        "email" text NOT NULL,
        "token_hash" text NOT NULL,
        "expires_at" timestamptz NOT NULL,
        "accepted_at" timestamptz,
        "accepted_by_id" uuid REFERENCES "users" ("id") ON DELETE SET NULL,
        "created_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX "invitations_class_idx" ON "invitations" ("class_id")`);
    await queryRunner.query(`CREATE TYPE "drill_kind" AS ENUM ('match', 'value-ladder', 'temperature-pair', 'neutral', 'graded-wash', 'flat-wash')`);
    await queryRunner.query(`CREATE TYPE "drill_visibility" AS ENUM ('private', 'public')`);
    await queryRunner.query(`
      CREATE TABLE "drills" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "owner_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "title" text NOT NULL,
        "kind" "drill_kind" NOT NULL,
        "instructions" text NOT NULL DEFAULT '',
        "targets" jsonb NOT NULL,
        "tolerance" jsonb NOT NULL DEFAULT '{}',
        "palette" jsonb NOT NULL DEFAULT '[]',
        "visibility" "drill_visibility" NOT NULL DEFAULT 'private',
        "deleted_at" timestamptz,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX "drills_owner_idx" ON "drills" ("owner_id") WHERE "deleted_at" IS NULL`);
    await queryRunner.query(`CREATE INDEX "drills_public_idx" ON "drills" ("visibility") WHERE "deleted_at" IS NULL`);
    await queryRunner.query(`
      CREATE TABLE "assignments" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "class_id" uuid NOT NULL REFERENCES "classes" ("id") ON DELETE CASCADE,
        "drill_id" uuid NOT NULL REFERENCES "drills" ("id"),
        "due_at" timestamptz NOT NULL,
        "note" text NOT NULL DEFAULT '',
        "created_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX "assignments_class_idx" ON "assignments" ("class_id", "due_at")`);
    await queryRunner.query(`CREATE TYPE "attempt_state" AS ENUM ('queued', 'measuring', 'graded', 'needs-retake', 'failed')`);
    await queryRunner.query(`
      CREATE TABLE "attempts" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "student_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "drill_id" uuid NOT NULL REFERENCES "drills" ("id"),
        "assignment_id" uuid REFERENCES "assignments" ("id") ON DELETE SET NULL,
        "state" "attempt_state" NOT NULL DEFAULT 'queued',
        "photo_key" text NOT NULL,
        "overlay_key" text,
        "photo_bytes" integer NOT NULL,
        "quality" jsonb NOT NULL DEFAULT '{"errors":[],"warnings":[]}',
        "failure_reason" text,
        "readings" jsonb,
        "mark" jsonb,
        "score" integer,
        "pass" boolean,
        "override_score" integer,
        "override_pass" boolean,
        "override_comment" text,
        "overridden_by_id" uuid REFERENCES "users" ("id") ON DELETE SET NULL,
        "overridden_at" timestamptz,
        "tries" integer NOT NULL DEFAULT 0,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "graded_at" timestamptz
      )`);
    await queryRunner.query(`CREATE INDEX "attempts_student_idx" ON "attempts" ("student_id", "created_at")`);
    await queryRunner.query(`CREATE INDEX "attempts_assignment_idx" ON "attempts" ("assignment_id", "student_id")`);
    await queryRunner.query(`CREATE INDEX "attempts_drill_idx" ON "attempts" ("drill_id")`);
    await queryRunner.query(`CREATE TYPE "paint_opacity" AS ENUM ('transparent', 'semi-transparent', 'semi-opaque', 'opaque')`);
    await queryRunner.query(`CREATE TYPE "paint_staining" AS ENUM ('non-staining', 'low', 'medium', 'high')`);
    await queryRunner.query(`
      CREATE TABLE "paints" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "owner_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "name" text NOT NULL,
        "pigments" text[] NOT NULL DEFAULT '{}',
        "opacity" "paint_opacity",
        "staining" "paint_staining",
        "granulating" boolean NOT NULL DEFAULT false,
        "swatch_lab" jsonb,
        "created_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE INDEX "paints_owner_idx" ON "paints" ("owner_id")`);
    await queryRunner.query(`
      CREATE TABLE "rate_limits" (
        "key" text NOT NULL,
        "window_start" timestamptz NOT NULL,
        "hits" integer NOT NULL,
        PRIMARY KEY ("key", "window_start")
      )`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "rate_limits"`);
    await queryRunner.query(`DROP TABLE "paints"`);
    await queryRunner.query(`DROP TYPE "paint_staining"`);
    await queryRunner.query(`DROP TYPE "paint_opacity"`);
    await queryRunner.query(`DROP TABLE "attempts"`);
    await queryRunner.query(`DROP TYPE "attempt_state"`);
    await queryRunner.query(`DROP TABLE "assignments"`);
    await queryRunner.query(`DROP TABLE "drills"`);
    await queryRunner.query(`DROP TYPE "drill_visibility"`);
    await queryRunner.query(`DROP TYPE "drill_kind"`);
    await queryRunner.query(`DROP TABLE "invitations"`);
    await queryRunner.query(`DROP TABLE "class_members"`);
    await queryRunner.query(`DROP TABLE "classes"`);
    await queryRunner.query(`DROP TABLE "password_resets"`);
    await queryRunner.query(`DROP TABLE "refresh_tokens"`);
  }
}
