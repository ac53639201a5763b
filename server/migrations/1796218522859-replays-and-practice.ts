import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ReplaysAndPractice1796218522859 implements MigrationInterface {
  name = 'ReplaysAndPractice1796218522859';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "practice_attempt" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "userId" varchar NOT NULL, "runId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepSeq" integer NOT NULL, "checkId" text NOT NULL, "asked" text NOT NULL, "answer" text NOT NULL, "expected" text NOT NULL, "correct" boolean NOT NULL, "createdAt" datetime NOT NULL)`);
    await queryRunner.query(`CREATE INDEX "IDX_f494699f9fe66e122af260d2ac" ON "practice_attempt" ("shopId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_7b9dd43c6573763d873a726f71" ON "practice_attempt" ("userId", "runId", "stepSeq", "asked") `);
    await queryRunner.query(`CREATE TABLE "step_comment" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepSeq" integer NOT NULL, "authorId" varchar NOT NULL, "body" text NOT NULL, "createdAt" datetime NOT NULL)`);
    await queryRunner.query(`CREATE INDEX "IDX_00bcd079cce305ccc6196a86bf" ON "step_comment" ("diagnosisId", "stepSeq") `);
    await queryRunner.query(`DROP INDEX "IDX_f494699f9fe66e122af260d2ac"`);
    await queryRunner.query(`DROP INDEX "IDX_7b9dd43c6573763d873a726f71"`);
    await queryRunner.query(`CREATE TABLE "temporary_practice_attempt" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "userId" varchar NOT NULL, "runId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepSeq" integer NOT NULL, "checkId" text NOT NULL, "asked" text NOT NULL, "answer" text NOT NULL, "expected" text NOT NULL, "correct" boolean NOT NULL, "createdAt" datetime NOT NULL, CONSTRAINT "FK_a317717474551b719fcdc3fd6ec" FOREIGN KEY ("userId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_a5a06571a7b4196a01bd31cabf7" FOREIGN KEY ("diagnosisId") REFERENCES "diagnosis" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_practice_attempt"("id", "shopId", "userId", "runId", "diagnosisId", "stepSeq", "checkId", "asked", "answer", "expected", "correct", "createdAt") SELECT "id", "shopId", "userId", "runId", "diagnosisId", "stepSeq", "checkId", "asked", "answer", "expected", "correct", "createdAt" FROM "practice_attempt"`);
    await queryRunner.query(`DROP TABLE "practice_attempt"`);
    await queryRunner.query(`ALTER TABLE "temporary_practice_attempt" RENAME TO "practice_attempt"`);
    await queryRunner.query(`CREATE INDEX "IDX_f494699f9fe66e122af260d2ac" ON "practice_attempt" ("shopId", "createdAt") `);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_7b9dd43c6573763d873a726f71" ON "practice_attempt" ("userId", "runId", "stepSeq", "asked") `);
    await queryRunner.query(`DROP INDEX "IDX_00bcd079cce305ccc6196a86bf"`);
    await queryRunner.query(`CREATE TABLE "temporary_step_comment" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepSeq" integer NOT NULL, "authorId" varchar NOT NULL, "body" text NOT NULL, "createdAt" datetime NOT NULL, CONSTRAINT "FK_7473b027e6819e6ea3367fa7f7f" FOREIGN KEY ("diagnosisId") REFERENCES "diagnosis" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_cf9cb53e20e53c2b5f82136aa92" FOREIGN KEY ("authorId") REFERENCES "user" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_step_comment"("id", "shopId", "diagnosisId", "stepSeq", "authorId", "body", "createdAt") SELECT "id", "shopId", "diagnosisId", "stepSeq", "authorId", "body", "createdAt" FROM "step_comment"`);
    await queryRunner.query(`DROP TABLE "step_comment"`);
    await queryRunner.query(`ALTER TABLE "temporary_step_comment" RENAME TO "step_comment"`);
    await queryRunner.query(`CREATE INDEX "IDX_00bcd079cce305ccc6196a86bf" ON "step_comment" ("diagnosisId", "stepSeq") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_00bcd079cce305ccc6196a86bf"`);
    await queryRunner.query(`ALTER TABLE "step_comment" RENAME TO "temporary_step_comment"`);
    await queryRunner.query(`CREATE TABLE "step_comment" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepSeq" integer NOT NULL, "authorId" varchar NOT NULL, "body" text NOT NULL, "createdAt" datetime NOT NULL)`);
    await queryRunner.query(`INSERT INTO "step_comment"("id", "shopId", "diagnosisId", "stepSeq", "authorId", "body", "createdAt") SELECT "id", "shopId", "diagnosisId", "stepSeq", "authorId", "body", "createdAt" FROM "temporary_step_comment"`);
    await queryRunner.query(`DROP TABLE "temporary_step_comment"`);
    await queryRunner.query(`CREATE INDEX "IDX_00bcd079cce305ccc6196a86bf" ON "step_comment" ("diagnosisId", "stepSeq") `);
    await queryRunner.query(`DROP INDEX "IDX_7b9dd43c6573763d873a726f71"`);
    await queryRunner.query(`DROP INDEX "IDX_f494699f9fe66e122af260d2ac"`);
    await queryRunner.query(`ALTER TABLE "practice_attempt" RENAME TO "temporary_practice_attempt"`);
    await queryRunner.query(`CREATE TABLE "practice_attempt" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text NOT NULL, "userId" varchar NOT NULL, "runId" text NOT NULL, "diagnosisId" varchar NOT NULL, "stepSeq" integer NOT NULL, "checkId" text NOT NULL, "asked" text NOT NULL, "answer" text NOT NULL, "expected" text NOT NULL, "correct" boolean NOT NULL, "createdAt" datetime NOT NULL)`);
    await queryRunner.query(`INSERT INTO "practice_attempt"("id", "shopId", "userId", "runId", "diagnosisId", "stepSeq", "checkId", "asked", "answer", "expected", "correct", "createdAt") SELECT "id", "shopId", "userId", "runId", "diagnosisId", "stepSeq", "checkId", "asked", "answer", "expected", "correct", "createdAt" FROM "temporary_practice_attempt"`);
    await queryRunner.query(`DROP TABLE "temporary_practice_attempt"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_7b9dd43c6573763d873a726f71" ON "practice_attempt" ("userId", "runId", "stepSeq", "asked") `);
    await queryRunner.query(`CREATE INDEX "IDX_f494699f9fe66e122af260d2ac" ON "practice_attempt" ("shopId", "createdAt") `);
    await queryRunner.query(`DROP INDEX "IDX_00bcd079cce305ccc6196a86bf"`);
    await queryRunner.query(`DROP TABLE "step_comment"`);
    await queryRunner.query(`DROP INDEX "IDX_7b9dd43c6573763d873a726f71"`);
    await queryRunner.query(`DROP INDEX "IDX_f494699f9fe66e122af260d2ac"`);
    await queryRunner.query(`DROP TABLE "practice_attempt"`);
  }
}
