import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateStudiosAndUsers1764633600000 implements MigrationInterface {
  name = 'CreateStudiosAndUsers1764633600000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE "studios" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "name" text NOT NULL,
        "created_at" timestamptz NOT NULL DEFAULT now()
      )`);
    await queryRunner.query(`CREATE TYPE "user_role" AS ENUM ('admin', 'teacher', 'student')`);
    await queryRunner.query(`
      CREATE TABLE "users" (
        "id" uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        "email" text NOT NULL,
        "display_name" text NOT NULL,
        "role" "user_role" NOT NULL DEFAULT 'student',
        "password_hash" text NOT NULL,
        "studio_id" uuid REFERENCES "studios" ("id") ON DELETE SET NULL,
        "created_at" timestamptz NOT NULL DEFAULT now(),
        "updated_at" timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "users_email_key" UNIQUE ("email"),
        CONSTRAINT "users_email_lower" CHECK ("email" = lower("email"))
      )`);
    await queryRunner.query(`CREATE INDEX "users_studio_id_idx" ON "users" ("studio_id")`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`DROP TYPE "user_role"`);
    await queryRunner.query(`DROP TABLE "studios"`);
  }
}
