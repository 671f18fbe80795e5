import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Each person's choice to get the weekly progress digest (on unless they turn it off), and the
 * record of digests sent: one row per person and ISO week, so that a retried or repeated run of
 * the week never mails anyone twice (see `digest/weekly-digest.service.ts`).
 */
export class AddWeeklyDigestPreference1764723600000 implements MigrationInterface {
  name = 'AddWeeklyDigestPreference1764723600000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" ADD COLUMN "weekly_digest" boolean NOT NULL DEFAULT true`);
    await queryRunner.query(`
      CREATE TABLE "weekly_digests" (
        "user_id" uuid NOT NULL REFERENCES "users" ("id") ON DELETE CASCADE,
        "iso_week" text NOT NULL,
        "sent_at" timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY ("user_id", "iso_week")
      )`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "weekly_digests"`);
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "weekly_digest"`);
  }
}
