import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A published or retired version never changes its content or number, and
 * steps are never deleted: enforced by the database itself, whatever code runs.
 */
export class PublishedVersionsImmutable1796215191995 implements MigrationInterface {
  name = 'PublishedVersionsImmutable1796215191995';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TRIGGER "procedure_version_immutable" BEFORE UPDATE OF "document", "number", "procedureId" ON "procedure_version"
      WHEN OLD."status" != 'draft'
      BEGIN SELECT RAISE(ABORT, 'published procedure versions are immutable'); END`);
    await queryRunner.query(`CREATE TRIGGER "procedure_version_no_unpublish" BEFORE UPDATE OF "status" ON "procedure_version"
      WHEN OLD."status" != 'draft' AND NEW."status" = 'draft'
      BEGIN SELECT RAISE(ABORT, 'a published version cannot become a draft again'); END`);
    await queryRunner.query(`CREATE TRIGGER "procedure_version_no_delete" BEFORE DELETE ON "procedure_version"
      WHEN OLD."status" != 'draft'
      BEGIN SELECT RAISE(ABORT, 'published procedure versions are never deleted'); END`);
    await queryRunner.query(`CREATE TRIGGER "diagnosis_step_kept" BEFORE DELETE ON "diagnosis_step"
      BEGIN SELECT RAISE(ABORT, 'diagnosis steps are retracted, never deleted'); END`);
    await queryRunner.query(`CREATE TRIGGER "diagnosis_step_reading_kept" BEFORE UPDATE OF "readingText", "valueSi", "overRange", "verdict", "choiceId", "checkId", "seq", "recordedAt", "byId" ON "diagnosis_step"
      BEGIN SELECT RAISE(ABORT, 'a recorded reading never changes'); END`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "diagnosis_step_reading_kept"`);
    await queryRunner.query(`DROP TRIGGER "diagnosis_step_kept"`);
    await queryRunner.query(`DROP TRIGGER "procedure_version_no_delete"`);
    await queryRunner.query(`DROP TRIGGER "procedure_version_no_unpublish"`);
    await queryRunner.query(`DROP TRIGGER "procedure_version_immutable"`);
  }
}
