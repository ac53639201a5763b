import type { MigrationInterface, QueryRunner } from 'typeorm';

export class DiagnosisPhotos1796218456203 implements MigrationInterface {
  name = 'DiagnosisPhotos1796218456203';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "diagnosis_photo" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepId" text, "storageKey" text NOT NULL, "contentType" text NOT NULL, "size" integer NOT NULL, "uploadedById" varchar NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_fb178efe907008d09319955b37" ON "diagnosis_photo" ("diagnosisId", "createdAt") `);
    await queryRunner.query(`DROP INDEX "IDX_fb178efe907008d09319955b37"`);
    await queryRunner.query(`CREATE TABLE "temporary_diagnosis_photo" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepId" text, "storageKey" text NOT NULL, "contentType" text NOT NULL, "size" integer NOT NULL, "uploadedById" varchar NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_c5d8ce861a88ac191dbff0aceaa" FOREIGN KEY ("diagnosisId") REFERENCES "diagnosis" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_42f704481edc7b56f5f9022a94a" FOREIGN KEY ("uploadedById") REFERENCES "user" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_diagnosis_photo"("id", "shopId", "diagnosisId", "stepId", "storageKey", "contentType", "size", "uploadedById", "createdAt") SELECT "id", "shopId", "diagnosisId", "stepId", "storageKey", "contentType", "size", "uploadedById", "createdAt" FROM "diagnosis_photo"`);
    await queryRunner.query(`DROP TABLE "diagnosis_photo"`);
    await queryRunner.query(`ALTER TABLE "temporary_diagnosis_photo" RENAME TO "diagnosis_photo"`);
    await queryRunner.query(`CREATE INDEX "IDX_fb178efe907008d09319955b37" ON "diagnosis_photo" ("diagnosisId", "createdAt") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_fb178efe907008d09319955b37"`);
    await queryRunner.query(`ALTER TABLE "diagnosis_photo" RENAME TO "temporary_diagnosis_photo"`);
    await queryRunner.query(`CREATE TABLE "diagnosis_photo" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepId" text, "storageKey" text NOT NULL, "contentType" text NOT NULL, "size" integer NOT NULL, "uploadedById" varchar NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "diagnosis_photo"("id", "shopId", "diagnosisId", "stepId", "storageKey", "contentType", "size", "uploadedById", "createdAt") SELECT "id", "shopId", "diagnosisId", "stepId", "storageKey", "contentType", "size", "uploadedById", "createdAt" FROM "temporary_diagnosis_photo"`);
    await queryRunner.query(`DROP TABLE "temporary_diagnosis_photo"`);
    await queryRunner.query(`CREATE INDEX "IDX_fb178efe907008d09319955b37" ON "diagnosis_photo" ("diagnosisId", "createdAt") `);
    await queryRunner.query(`DROP INDEX "IDX_fb178efe907008d09319955b37"`);
    await queryRunner.query(`DROP TABLE "diagnosis_photo"`);
  }
}
