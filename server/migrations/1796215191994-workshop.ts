import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Workshop1796215191994 implements MigrationInterface {
  name = 'Workshop1796215191994';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "machine" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "make" text NOT NULL, "model" text NOT NULL, "year" integer NOT NULL, "engine" text NOT NULL DEFAULT (''), "vin" text NOT NULL DEFAULT (''), "mileage" integer, "mileageUnit" text NOT NULL DEFAULT ('km'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_5b75f0b3cb8a2a1effcf020993" ON "machine" ("shopId", "createdAt") `);
    await queryRunner.query(`CREATE TABLE "job" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "machineId" varchar NOT NULL, "customerName" text NOT NULL, "customerContact" text NOT NULL DEFAULT (''), "customerEmail" text NOT NULL DEFAULT (''), "complaint" text NOT NULL, "reference" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_1e3544e5357e815999b83f5546" ON "job" ("shopId", "createdAt") `);
    await queryRunner.query(`CREATE TABLE "meter" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "name" text NOT NULL, "model" text NOT NULL DEFAULT (''), "ranges" text NOT NULL, "active" boolean NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "procedure" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "title" text NOT NULL, "complaint" text NOT NULL, "family" text NOT NULL, "createdById" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_63c090f1f630dc015f832e5397" ON "procedure" ("shopId", "title") `);
    await queryRunner.query(`CREATE TABLE "procedure_version" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "procedureId" varchar NOT NULL, "status" text NOT NULL, "number" integer, "revision" integer NOT NULL DEFAULT (1), "document" text NOT NULL, "updatedById" text NOT NULL, "publishedAt" datetime, "publishedById" text, "retiredAt" datetime, "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_f7f794017aadb31856fa49a207" ON "procedure_version" ("shopId", "status") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_644ebc191a99743af5de2376f0" ON "procedure_version" ("procedureId", "number") `);
    await queryRunner.query(`CREATE TABLE "diagnosis" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "versionId" varchar NOT NULL, "machineId" varchar NOT NULL, "jobId" varchar NOT NULL, "meterId" varchar NOT NULL, "ambientC" real NOT NULL, "startedById" varchar NOT NULL, "status" text NOT NULL, "currentCheckId" text NOT NULL, "conclusion" text, "abandonReason" text, "startedAt" datetime NOT NULL, "endedAt" datetime)`);
    await queryRunner.query(`CREATE INDEX "IDX_cf3d874a73e233e192dde10d92" ON "diagnosis" ("shopId", "status", "startedAt") `);
    await queryRunner.query(`CREATE TABLE "diagnosis_step" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "seq" integer NOT NULL, "checkId" text NOT NULL, "readingText" text, "valueSi" real, "overRange" boolean NOT NULL DEFAULT (0), "verdict" text, "choiceId" text, "evaluation" text, "nextCheckId" text, "note" text NOT NULL DEFAULT (''), "byId" varchar NOT NULL, "recordedAt" datetime NOT NULL, "retracted" boolean NOT NULL DEFAULT (0), "retractedAt" datetime, "idempotencyKey" text)`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_74418deb6a1e785f353290d44f" ON "diagnosis_step" ("diagnosisId", "seq") `);
    await queryRunner.query(`CREATE TABLE "idempotency_record" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "userId" text NOT NULL, "key" text NOT NULL, "fingerprint" text NOT NULL, "status" integer NOT NULL, "body" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_1dfaa78fe0dae5fb4ac8e86482" ON "idempotency_record" ("shopId", "userId", "key") `);
    await queryRunner.query(`DROP INDEX "IDX_1e3544e5357e815999b83f5546"`);
    await queryRunner.query(`CREATE TABLE "temporary_job" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "machineId" varchar NOT NULL, "customerName" text NOT NULL, "customerContact" text NOT NULL DEFAULT (''), "customerEmail" text NOT NULL DEFAULT (''), "complaint" text NOT NULL, "reference" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_c6f22b52ffb5ecc22343e9ab47b" FOREIGN KEY ("machineId") REFERENCES "machine" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_job"("id", "shopId", "machineId", "customerName", "customerContact", "customerEmail", "complaint", "reference", "createdAt") SELECT "id", "shopId", "machineId", "customerName", "customerContact", "customerEmail", "complaint", "reference", "createdAt" FROM "job"`);
    await queryRunner.query(`DROP TABLE "job"`);
    await queryRunner.query(`ALTER TABLE "temporary_job" RENAME TO "job"`);
    await queryRunner.query(`CREATE INDEX "IDX_1e3544e5357e815999b83f5546" ON "job" ("shopId", "createdAt") `);
    await queryRunner.query(`DROP INDEX "IDX_f7f794017aadb31856fa49a207"`);
    await queryRunner.query(`DROP INDEX "IDX_644ebc191a99743af5de2376f0"`);
    await queryRunner.query(`CREATE TABLE "temporary_procedure_version" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "procedureId" varchar NOT NULL, "status" text NOT NULL, "number" integer, "revision" integer NOT NULL DEFAULT (1), "document" text NOT NULL, "updatedById" text NOT NULL, "publishedAt" datetime, "publishedById" text, "retiredAt" datetime, "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_a14d7bb5a88c190e58e9d494798" FOREIGN KEY ("procedureId") REFERENCES "procedure" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_procedure_version"("id", "shopId", "procedureId", "status", "number", "revision", "document", "updatedById", "publishedAt", "publishedById", "retiredAt", "updatedAt") SELECT "id", "shopId", "procedureId", "status", "number", "revision", "document", "updatedById", "publishedAt", "publishedById", "retiredAt", "updatedAt" FROM "procedure_version"`);
    await queryRunner.query(`DROP TABLE "procedure_version"`);
    await queryRunner.query(`ALTER TABLE "temporary_procedure_version" RENAME TO "procedure_version"`);
    await queryRunner.query(`CREATE INDEX "IDX_f7f794017aadb31856fa49a207" ON "procedure_version" ("shopId", "status") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_644ebc191a99743af5de2376f0" ON "procedure_version" ("procedureId", "number") `);
    await queryRunner.query(`DROP INDEX "IDX_cf3d874a73e233e192dde10d92"`);
    await queryRunner.query(`CREATE TABLE "temporary_diagnosis" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "versionId" varchar NOT NULL, "machineId" varchar NOT NULL, "jobId" varchar NOT NULL, "meterId" varchar NOT NULL, "ambientC" real NOT NULL, "startedById" varchar NOT NULL, "status" text NOT NULL, "currentCheckId" text NOT NULL, "conclusion" text, "abandonReason" text, "startedAt" datetime NOT NULL, "endedAt" datetime, CONSTRAINT "FK_25e92391b6cd1117d986d82d1be" FOREIGN KEY ("versionId") REFERENCES "procedure_version" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_09eeacae01b0dd2a274a15701eb" FOREIGN KEY ("machineId") REFERENCES "machine" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_3e29b3a1a7df00ef2324fcbea7c" FOREIGN KEY ("jobId") REFERENCES "job" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_e72f51e6567e37e7a3c58d9d463" FOREIGN KEY ("meterId") REFERENCES "meter" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_00553d051a2a3e02032fd394d3f" FOREIGN KEY ("startedById") REFERENCES "user" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_diagnosis"("id", "shopId", "versionId", "machineId", "jobId", "meterId", "ambientC", "startedById", "status", "currentCheckId", "conclusion", "abandonReason", "startedAt", "endedAt") SELECT "id", "shopId", "versionId", "machineId", "jobId", "meterId", "ambientC", "startedById", "status", "currentCheckId", "conclusion", "abandonReason", "startedAt", "endedAt" FROM "diagnosis"`);
    await queryRunner.query(`DROP TABLE "diagnosis"`);
    await queryRunner.query(`ALTER TABLE "temporary_diagnosis" RENAME TO "diagnosis"`);
    await queryRunner.query(`CREATE INDEX "IDX_cf3d874a73e233e192dde10d92" ON "diagnosis" ("shopId", "status", "startedAt") `);
    await queryRunner.query(`DROP INDEX "IDX_74418deb6a1e785f353290d44f"`);
    await queryRunner.query(`CREATE TABLE "temporary_diagnosis_step" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "seq" integer NOT NULL, "checkId" text NOT NULL, "readingText" text, "valueSi" real, "overRange" boolean NOT NULL DEFAULT (0), "verdict" text, "choiceId" text, "evaluation" text, "nextCheckId" text, "note" text NOT NULL DEFAULT (''), "byId" varchar NOT NULL, "recordedAt" datetime NOT NULL, "retracted" boolean NOT NULL DEFAULT (0), "retractedAt" datetime, "idempotencyKey" text, CONSTRAINT "FK_692b160cbb249381c8507f671ea" FOREIGN KEY ("diagnosisId") REFERENCES "diagnosis" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_bea4fc388ea01a964575f4b7dcd" FOREIGN KEY ("byId") REFERENCES "user" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_diagnosis_step"("id", "shopId", "diagnosisId", "seq", "checkId", "readingText", "valueSi", "overRange", "verdict", "choiceId", "evaluation", "nextCheckId", "note", "byId", "recordedAt", "retracted", "retractedAt", "idempotencyKey") SELECT "id", "shopId", "diagnosisId", "seq", "checkId", "readingText", "valueSi", "overRange", "verdict", "choiceId", "evaluation", "nextCheckId", "note", "byId", "recordedAt", "retracted", "retractedAt", "idempotencyKey" FROM "diagnosis_step"`);
    await queryRunner.query(`DROP TABLE "diagnosis_step"`);
    await queryRunner.query(`ALTER TABLE "temporary_diagnosis_step" RENAME TO "diagnosis_step"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_74418deb6a1e785f353290d44f" ON "diagnosis_step" ("diagnosisId", "seq") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_74418deb6a1e785f353290d44f"`);
    await queryRunner.query(`ALTER TABLE "diagnosis_step" RENAME TO "temporary_diagnosis_step"`);
    await queryRunner.query(`CREATE TABLE "diagnosis_step" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "seq" integer NOT NULL, "checkId" text NOT NULL, "readingText" text, "valueSi" real, "overRange" boolean NOT NULL DEFAULT (0), "verdict" text, "choiceId" text, "evaluation" text, "nextCheckId" text, "note" text NOT NULL DEFAULT (''), "byId" varchar NOT NULL, "recordedAt" datetime NOT NULL, "retracted" boolean NOT NULL DEFAULT (0), "retractedAt" datetime, "idempotencyKey" text)`);
    await queryRunner.query(`INSERT INTO "diagnosis_step"("id", "shopId", "diagnosisId", "seq", "checkId", "readingText", "valueSi", "overRange", "verdict", "choiceId", "evaluation", "nextCheckId", "note", "byId", "recordedAt", "retracted", "retractedAt", "idempotencyKey") SELECT "id", "shopId", "diagnosisId", "seq", "checkId", "readingText", "valueSi", "overRange", "verdict", "choiceId", "evaluation", "nextCheckId", "note", "byId", "recordedAt", "retracted", "retractedAt", "idempotencyKey" FROM "temporary_diagnosis_step"`);
    await queryRunner.query(`DROP TABLE "temporary_diagnosis_step"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_74418deb6a1e785f353290d44f" ON "diagnosis_step" ("diagnosisId", "seq") `);
    await queryRunner.query(`DROP INDEX "IDX_cf3d874a73e233e192dde10d92"`);
    await queryRunner.query(`ALTER TABLE "diagnosis" RENAME TO "temporary_diagnosis"`);
    await queryRunner.query(`CREATE TABLE "diagnosis" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "versionId" varchar NOT NULL, "machineId" varchar NOT NULL, "jobId" varchar NOT NULL, "meterId" varchar NOT NULL, "ambientC" real NOT NULL, "startedById" varchar NOT NULL, "status" text NOT NULL, "currentCheckId" text NOT NULL, "conclusion" text, "abandonReason" text, "startedAt" datetime NOT NULL, "endedAt" datetime)`);
    await queryRunner.query(`INSERT INTO "diagnosis"("id", "shopId", "versionId", "machineId", "jobId", "meterId", "ambientC", "startedById", "status", "currentCheckId", "conclusion", "abandonReason", "startedAt", "endedAt") SELECT "id", "shopId", "versionId", "machineId", "jobId", "meterId", "ambientC", "startedById", "status", "currentCheckId", "conclusion", "abandonReason", "startedAt", "endedAt" FROM "temporary_diagnosis"`);
    await queryRunner.query(`DROP TABLE "temporary_diagnosis"`);
    await queryRunner.query(`CREATE INDEX "IDX_cf3d874a73e233e192dde10d92" ON "diagnosis" ("shopId", "status", "startedAt") `);
    await queryRunner.query(`DROP INDEX "IDX_644ebc191a99743af5de2376f0"`);
    await queryRunner.query(`DROP INDEX "IDX_f7f794017aadb31856fa49a207"`);
    await queryRunner.query(`ALTER TABLE "procedure_version" RENAME TO "temporary_procedure_version"`);
    await queryRunner.query(`CREATE TABLE "procedure_version" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "procedureId" varchar NOT NULL, "status" text NOT NULL, "number" integer, "revision" integer NOT NULL DEFAULT (1), "document" text NOT NULL, "updatedById" text NOT NULL, "publishedAt" datetime, "publishedById" text, "retiredAt" datetime, "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "procedure_version"("id", "shopId", "procedureId", "status", "number", "revision", "document", "updatedById", "publishedAt", "publishedById", "retiredAt", "updatedAt") SELECT "id", "shopId", "procedureId", "status", "number", "revision", "document", "updatedById", "publishedAt", "publishedById", "retiredAt", "updatedAt" FROM "temporary_procedure_version"`);
    await queryRunner.query(`DROP TABLE "temporary_procedure_version"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_644ebc191a99743af5de2376f0" ON "procedure_version" ("procedureId", "number") `);
    await queryRunner.query(`CREATE INDEX "IDX_f7f794017aadb31856fa49a207" ON "procedure_version" ("shopId", "status") `);
    await queryRunner.query(`DROP INDEX "IDX_1e3544e5357e815999b83f5546"`);
    await queryRunner.query(`ALTER TABLE "job" RENAME TO "temporary_job"`);
    await queryRunner.query(`CREATE TABLE "job" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "machineId" varchar NOT NULL, "customerName" text NOT NULL, "customerContact" text NOT NULL DEFAULT (''), "customerEmail" text NOT NULL DEFAULT (''), "complaint" text NOT NULL, "reference" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "job"("id", "shopId", "machineId", "customerName", "customerContact", "customerEmail", "complaint", "reference", "createdAt") SELECT "id", "shopId", "machineId", "customerName", "customerContact", "customerEmail", "complaint", "reference", "createdAt" FROM "temporary_job"`);
    await queryRunner.query(`DROP TABLE "temporary_job"`);
    await queryRunner.query(`CREATE INDEX "IDX_1e3544e5357e815999b83f5546" ON "job" ("shopId", "createdAt") `);
    await queryRunner.query(`DROP INDEX "IDX_1dfaa78fe0dae5fb4ac8e86482"`);
    await queryRunner.query(`DROP TABLE "idempotency_record"`);
    await queryRunner.query(`DROP INDEX "IDX_74418deb6a1e785f353290d44f"`);
    await queryRunner.query(`DROP TABLE "diagnosis_step"`);
    await queryRunner.query(`DROP INDEX "IDX_cf3d874a73e233e192dde10d92"`);
    await queryRunner.query(`DROP TABLE "diagnosis"`);
    await queryRunner.query(`DROP INDEX "IDX_644ebc191a99743af5de2376f0"`);
    await queryRunner.query(`DROP INDEX "IDX_f7f794017aadb31856fa49a207"`);
    await queryRunner.query(`DROP TABLE "procedure_version"`);
    await queryRunner.query(`DROP INDEX "IDX_63c090f1f630dc015f832e5397"`);
    await queryRunner.query(`DROP TABLE "procedure"`);
    await queryRunner.query(`DROP TABLE "meter"`);
    await queryRunner.query(`DROP INDEX "IDX_1e3544e5357e815999b83f5546"`);
    await queryRunner.query(`DROP TABLE "job"`);
    await queryRunner.query(`DROP INDEX "IDX_5b75f0b3cb8a2a1effcf020993"`);
    await queryRunner.query(`DROP TABLE "machine"`);
  }
}
