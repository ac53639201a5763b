import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Pictures of procedure checks; a published version may show any of them, so the database never lets one go. */
export class ProcedurePictures1796224770693 implements MigrationInterface {
  name = 'ProcedurePictures1796224770693';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "procedure_picture" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "procedureId" text NOT NULL, "storageKey" text NOT NULL, "contentType" text NOT NULL, "size" integer NOT NULL, "uploadedById" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_1b8e71474601212811b7ad552b" ON "procedure_picture" ("shopId", "createdAt") `);
    await queryRunner.query(`CREATE TRIGGER "procedure_picture_kept" BEFORE DELETE ON "procedure_picture"
      BEGIN SELECT RAISE(ABORT, 'procedure pictures are never deleted'); END`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "procedure_picture_kept"`);
    await queryRunner.query(`DROP INDEX "IDX_1b8e71474601212811b7ad552b"`);
    await queryRunner.query(`DROP TABLE "procedure_picture"`);
  }
}
