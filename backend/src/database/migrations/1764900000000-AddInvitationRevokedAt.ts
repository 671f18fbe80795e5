import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A teacher may revoke an invitation: its link then names nothing (invitation_unknown). */
export class AddInvitationRevokedAt1764900000000 implements MigrationInterface {
  name = 'AddInvitationRevokedAt1764900000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "invitations" ADD COLUMN "revoked_at" timestamptz`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "invitations" DROP COLUMN "revoked_at"`);
  }
}
