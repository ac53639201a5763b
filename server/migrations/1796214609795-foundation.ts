import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1796214609795 implements MigrationInterface {
  name = 'Foundation1796214609795';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE "shop" ("id" varchar PRIMARY KEY NOT NULL, "name" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE TABLE "user" ("id" varchar PRIMARY KEY NOT NULL, "shopId" varchar NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "active" boolean NOT NULL DEFAULT (1), "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `);
    await queryRunner.query(`CREATE TABLE "password_reset" ("id" varchar PRIMARY KEY NOT NULL, "userId" varchar NOT NULL, "tokenHash" text NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_dc6908de54eb09f588adfdb285" ON "password_reset" ("tokenHash") `);
    await queryRunner.query(`CREATE TABLE "invite" ("id" varchar PRIMARY KEY NOT NULL, "shopId" varchar NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "invitedById" varchar NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "revokedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `);
    await queryRunner.query(`CREATE TABLE "mail_message" ("id" varchar PRIMARY KEY NOT NULL, "shopId" text, "fromAddress" text NOT NULL, "toAddress" text NOT NULL, "subject" text NOT NULL, "text" text NOT NULL, "html" text, "attachments" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`CREATE INDEX "IDX_04e698122c111c85ad1eabdf2d" ON "mail_message" ("shopId") `);
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(`CREATE TABLE "temporary_user" ("id" varchar PRIMARY KEY NOT NULL, "shopId" varchar NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "active" boolean NOT NULL DEFAULT (1), "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_b3eecbc38c05d841d8ebc94ca0f" FOREIGN KEY ("shopId") REFERENCES "shop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_user"("id", "shopId", "email", "name", "role", "active", "passwordHash", "createdAt") SELECT "id", "shopId", "email", "name", "role", "active", "passwordHash", "createdAt" FROM "user"`);
    await queryRunner.query(`DROP TABLE "user"`);
    await queryRunner.query(`ALTER TABLE "temporary_user" RENAME TO "user"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `);
    await queryRunner.query(`DROP INDEX "IDX_dc6908de54eb09f588adfdb285"`);
    await queryRunner.query(`CREATE TABLE "temporary_password_reset" ("id" varchar PRIMARY KEY NOT NULL, "userId" varchar NOT NULL, "tokenHash" text NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_05baebe80e9f8fab8207eda250c" FOREIGN KEY ("userId") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_password_reset"("id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt") SELECT "id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt" FROM "password_reset"`);
    await queryRunner.query(`DROP TABLE "password_reset"`);
    await queryRunner.query(`ALTER TABLE "temporary_password_reset" RENAME TO "password_reset"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_dc6908de54eb09f588adfdb285" ON "password_reset" ("tokenHash") `);
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(`CREATE TABLE "temporary_invite" ("id" varchar PRIMARY KEY NOT NULL, "shopId" varchar NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "invitedById" varchar NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "revokedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_1e3d1ec5eca2fbce3c8e947da41" FOREIGN KEY ("shopId") REFERENCES "shop" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_5a182e8b3e225b14ddf6df7e6c3" FOREIGN KEY ("invitedById") REFERENCES "user" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
    await queryRunner.query(`INSERT INTO "temporary_invite"("id", "shopId", "email", "role", "tokenHash", "invitedById", "expiresAt", "acceptedAt", "revokedAt", "createdAt") SELECT "id", "shopId", "email", "role", "tokenHash", "invitedById", "expiresAt", "acceptedAt", "revokedAt", "createdAt" FROM "invite"`);
    await queryRunner.query(`DROP TABLE "invite"`);
    await queryRunner.query(`ALTER TABLE "temporary_invite" RENAME TO "invite"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(`ALTER TABLE "invite" RENAME TO "temporary_invite"`);
    await queryRunner.query(`CREATE TABLE "invite" ("id" varchar PRIMARY KEY NOT NULL, "shopId" varchar NOT NULL, "email" text NOT NULL, "role" text NOT NULL, "tokenHash" text NOT NULL, "invitedById" varchar NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "revokedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "invite"("id", "shopId", "email", "role", "tokenHash", "invitedById", "expiresAt", "acceptedAt", "revokedAt", "createdAt") SELECT "id", "shopId", "email", "role", "tokenHash", "invitedById", "expiresAt", "acceptedAt", "revokedAt", "createdAt" FROM "temporary_invite"`);
    await queryRunner.query(`DROP TABLE "temporary_invite"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_72cb13a7fef50b50f06e2b107f" ON "invite" ("tokenHash") `);
    await queryRunner.query(`DROP INDEX "IDX_dc6908de54eb09f588adfdb285"`);
    await queryRunner.query(`ALTER TABLE "password_reset" RENAME TO "temporary_password_reset"`);
    await queryRunner.query(`CREATE TABLE "password_reset" ("id" varchar PRIMARY KEY NOT NULL, "userId" varchar NOT NULL, "tokenHash" text NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "password_reset"("id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt") SELECT "id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt" FROM "temporary_password_reset"`);
    await queryRunner.query(`DROP TABLE "temporary_password_reset"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_dc6908de54eb09f588adfdb285" ON "password_reset" ("tokenHash") `);
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(`ALTER TABLE "user" RENAME TO "temporary_user"`);
    await queryRunner.query(`CREATE TABLE "user" ("id" varchar PRIMARY KEY NOT NULL, "shopId" varchar NOT NULL, "email" text NOT NULL, "name" text NOT NULL, "role" text NOT NULL, "active" boolean NOT NULL DEFAULT (1), "passwordHash" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
    await queryRunner.query(`INSERT INTO "user"("id", "shopId", "email", "name", "role", "active", "passwordHash", "createdAt") SELECT "id", "shopId", "email", "name", "role", "active", "passwordHash", "createdAt" FROM "temporary_user"`);
    await queryRunner.query(`DROP TABLE "temporary_user"`);
    await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e12875dfb3b1d92d7d7c5377e2" ON "user" ("email") `);
    await queryRunner.query(`DROP INDEX "IDX_04e698122c111c85ad1eabdf2d"`);
    await queryRunner.query(`DROP TABLE "mail_message"`);
    await queryRunner.query(`DROP INDEX "IDX_72cb13a7fef50b50f06e2b107f"`);
    await queryRunner.query(`DROP TABLE "invite"`);
    await queryRunner.query(`DROP INDEX "IDX_dc6908de54eb09f588adfdb285"`);
    await queryRunner.query(`DROP TABLE "password_reset"`);
    await queryRunner.query(`DROP INDEX "IDX_e12875dfb3b1d92d7d7c5377e2"`);
    await queryRunner.query(`DROP TABLE "user"`);
    await queryRunner.query(`DROP TABLE "shop"`);
  }
}
