import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What an attempt's overlay draws, kept as JSON when the photo is measured; the overlay PNG is
 * drawn from it and the stored photo the first time someone opens it (see
 * `measurement/render-overlay.ts`), so grading workers spend no time drawing pictures nobody
 * may look at. Attempts graded before this keep their drawn overlay.
 */
export class AddAttemptOverlayPlan1764810000000 implements MigrationInterface {
  name = 'AddAttemptOverlayPlan1764810000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "attempts" ADD COLUMN "overlay_plan" jsonb`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "attempts" DROP COLUMN "overlay_plan"`);
  }
}
