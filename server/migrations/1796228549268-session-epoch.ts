import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The user's session epoch. Written by hand as one ADD COLUMN: the generated rebuild of "user" would
 * drop and re-create a table that most others point at.
 */
export class SessionEpoch1796228549268 implements MigrationInterface {
  name = 'SessionEpoch1796228549268';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "user" ADD COLUMN "sessionEpoch" integer NOT NULL DEFAULT (0)`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "user" DROP COLUMN "sessionEpoch"`);
  }
}
