import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The change note a lead writes when publishing a version. Added in place rather than by rebuilding the
 * table (what the generator wrote), so the immutability triggers on procedure_version stay as they are.
 */
export class VersionNotes1796218508600 implements MigrationInterface {
  name = 'VersionNotes1796218508600';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "procedure_version" ADD COLUMN "note" text`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "procedure_version" DROP COLUMN "note"`);
  }
}
