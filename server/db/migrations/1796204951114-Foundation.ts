import { MigrationInterface, QueryRunner } from "typeorm";

export class Foundation1796204951114 implements MigrationInterface {
    name = 'Foundation1796204951114'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "email" varchar(254) NOT NULL, "name" varchar(120) NOT NULL, "role" varchar(20) NOT NULL, "status" varchar(20) NOT NULL DEFAULT ('active'), "passwordHash" varchar(100), "lastSignInAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_97672ac88f789774dd47f7c8be" ON "users" ("email") `);
        await queryRunner.query(`CREATE TABLE "audit_events" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "at" datetime NOT NULL, "actorId" integer, "action" varchar(30) NOT NULL, "entityType" varchar(60) NOT NULL, "entityId" varchar(60), "vesselId" integer, "summary" varchar(300) NOT NULL, "changes" text, "ipAddress" varchar(64))`);
        await queryRunner.query(`CREATE INDEX "IDX_3648e11676f1929b9875ee272b" ON "audit_events" ("at") `);
        await queryRunner.query(`CREATE INDEX "IDX_9e76ea4cc84a0e407c5a3aeb05" ON "audit_events" ("actorId") `);
        await queryRunner.query(`CREATE INDEX "IDX_dd2f1d365be537f915c62d5269" ON "audit_events" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_746df228cec6a874b390563e1b" ON "audit_events" ("entityType", "entityId") `);
        await queryRunner.query(`CREATE TABLE "invitations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "email" varchar(254) NOT NULL, "name" varchar(120) NOT NULL, "role" varchar(20) NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "revokedAt" datetime, "sentCount" integer NOT NULL DEFAULT (1), "invitedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`CREATE INDEX "IDX_97ab59cb592c7cec109741b592" ON "invitations" ("email") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a6eb6f2543de8a5a4c148b32a1" ON "invitations" ("tokenHash") `);
        await queryRunner.query(`CREATE TABLE "organisation_settings" ("id" integer PRIMARY KEY NOT NULL, "organisationName" varchar(160) NOT NULL, "country" varchar(2) NOT NULL DEFAULT ('US'), "currency" varchar(3) NOT NULL DEFAULT ('USD'), "unitSystem" varchar(20) NOT NULL DEFAULT ('us-customary'), "contactEmail" varchar(254) NOT NULL DEFAULT (''), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE TABLE "password_resets" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "userId" integer NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`CREATE INDEX "IDX_d95569f623f28a0bf034a55099" ON "password_resets" ("userId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_7f6aae0fcc807c9e7194ca5cc4" ON "password_resets" ("tokenHash") `);
        await queryRunner.query(`CREATE TABLE "sessions" ("sid" varchar(128) PRIMARY KEY NOT NULL, "userId" integer, "expiresAt" bigint NOT NULL, "data" text NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_57de40bc620f456c7311aa3a1e" ON "sessions" ("userId") `);
        await queryRunner.query(`CREATE INDEX "IDX_50762206f116cd47d1c3fec396" ON "sessions" ("expiresAt") `);
        await queryRunner.query(`CREATE TABLE "vessels" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "name" varchar(120) NOT NULL, "vesselType" varchar(120) NOT NULL, "builtYear" integer, "berth" varchar(200) NOT NULL DEFAULT (''), "summary" text NOT NULL DEFAULT (''), "designationScheme" varchar(30) NOT NULL DEFAULT ('free-text'), "archivedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`DROP INDEX "IDX_3648e11676f1929b9875ee272b"`);
        await queryRunner.query(`DROP INDEX "IDX_9e76ea4cc84a0e407c5a3aeb05"`);
        await queryRunner.query(`DROP INDEX "IDX_dd2f1d365be537f915c62d5269"`);
        await queryRunner.query(`DROP INDEX "IDX_746df228cec6a874b390563e1b"`);
        await queryRunner.query(`CREATE TABLE "temporary_audit_events" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "at" datetime NOT NULL, "actorId" integer, "action" varchar(30) NOT NULL, "entityType" varchar(60) NOT NULL, "entityId" varchar(60), "vesselId" integer, "summary" varchar(300) NOT NULL, "changes" text, "ipAddress" varchar(64), CONSTRAINT "FK_9e76ea4cc84a0e407c5a3aeb054" FOREIGN KEY ("actorId") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_audit_events"("id", "at", "actorId", "action", "entityType", "entityId", "vesselId", "summary", "changes", "ipAddress") SELECT "id", "at", "actorId", "action", "entityType", "entityId", "vesselId", "summary", "changes", "ipAddress" FROM "audit_events"`);
        await queryRunner.query(`DROP TABLE "audit_events"`);
        await queryRunner.query(`ALTER TABLE "temporary_audit_events" RENAME TO "audit_events"`);
        await queryRunner.query(`CREATE INDEX "IDX_3648e11676f1929b9875ee272b" ON "audit_events" ("at") `);
        await queryRunner.query(`CREATE INDEX "IDX_9e76ea4cc84a0e407c5a3aeb05" ON "audit_events" ("actorId") `);
        await queryRunner.query(`CREATE INDEX "IDX_dd2f1d365be537f915c62d5269" ON "audit_events" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_746df228cec6a874b390563e1b" ON "audit_events" ("entityType", "entityId") `);
        await queryRunner.query(`DROP INDEX "IDX_97ab59cb592c7cec109741b592"`);
        await queryRunner.query(`DROP INDEX "IDX_a6eb6f2543de8a5a4c148b32a1"`);
        await queryRunner.query(`CREATE TABLE "temporary_invitations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "email" varchar(254) NOT NULL, "name" varchar(120) NOT NULL, "role" varchar(20) NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "revokedAt" datetime, "sentCount" integer NOT NULL DEFAULT (1), "invitedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_b60325e5302be0dad38b423314c" FOREIGN KEY ("invitedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_invitations"("id", "email", "name", "role", "tokenHash", "expiresAt", "acceptedAt", "revokedAt", "sentCount", "invitedById", "createdAt") SELECT "id", "email", "name", "role", "tokenHash", "expiresAt", "acceptedAt", "revokedAt", "sentCount", "invitedById", "createdAt" FROM "invitations"`);
        await queryRunner.query(`DROP TABLE "invitations"`);
        await queryRunner.query(`ALTER TABLE "temporary_invitations" RENAME TO "invitations"`);
        await queryRunner.query(`CREATE INDEX "IDX_97ab59cb592c7cec109741b592" ON "invitations" ("email") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a6eb6f2543de8a5a4c148b32a1" ON "invitations" ("tokenHash") `);
        await queryRunner.query(`DROP INDEX "IDX_d95569f623f28a0bf034a55099"`);
        await queryRunner.query(`DROP INDEX "IDX_7f6aae0fcc807c9e7194ca5cc4"`);
        await queryRunner.query(`CREATE TABLE "temporary_password_resets" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "userId" integer NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_d95569f623f28a0bf034a55099e" FOREIGN KEY ("userId") REFERENCES "users" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_password_resets"("id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt") SELECT "id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt" FROM "password_resets"`);
        await queryRunner.query(`DROP TABLE "password_resets"`);
        await queryRunner.query(`ALTER TABLE "temporary_password_resets" RENAME TO "password_resets"`);
        await queryRunner.query(`CREATE INDEX "IDX_d95569f623f28a0bf034a55099" ON "password_resets" ("userId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_7f6aae0fcc807c9e7194ca5cc4" ON "password_resets" ("tokenHash") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_7f6aae0fcc807c9e7194ca5cc4"`);
        await queryRunner.query(`DROP INDEX "IDX_d95569f623f28a0bf034a55099"`);
        await queryRunner.query(`ALTER TABLE "password_resets" RENAME TO "temporary_password_resets"`);
        await queryRunner.query(`CREATE TABLE "password_resets" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "userId" integer NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "usedAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`INSERT INTO "password_resets"("id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt") SELECT "id", "userId", "tokenHash", "expiresAt", "usedAt", "createdAt" FROM "temporary_password_resets"`);
        await queryRunner.query(`DROP TABLE "temporary_password_resets"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_7f6aae0fcc807c9e7194ca5cc4" ON "password_resets" ("tokenHash") `);
        await queryRunner.query(`CREATE INDEX "IDX_d95569f623f28a0bf034a55099" ON "password_resets" ("userId") `);
        await queryRunner.query(`DROP INDEX "IDX_a6eb6f2543de8a5a4c148b32a1"`);
        await queryRunner.query(`DROP INDEX "IDX_97ab59cb592c7cec109741b592"`);
        await queryRunner.query(`ALTER TABLE "invitations" RENAME TO "temporary_invitations"`);
        await queryRunner.query(`CREATE TABLE "invitations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "email" varchar(254) NOT NULL, "name" varchar(120) NOT NULL, "role" varchar(20) NOT NULL, "tokenHash" varchar(64) NOT NULL, "expiresAt" datetime NOT NULL, "acceptedAt" datetime, "revokedAt" datetime, "sentCount" integer NOT NULL DEFAULT (1), "invitedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`INSERT INTO "invitations"("id", "email", "name", "role", "tokenHash", "expiresAt", "acceptedAt", "revokedAt", "sentCount", "invitedById", "createdAt") SELECT "id", "email", "name", "role", "tokenHash", "expiresAt", "acceptedAt", "revokedAt", "sentCount", "invitedById", "createdAt" FROM "temporary_invitations"`);
        await queryRunner.query(`DROP TABLE "temporary_invitations"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a6eb6f2543de8a5a4c148b32a1" ON "invitations" ("tokenHash") `);
        await queryRunner.query(`CREATE INDEX "IDX_97ab59cb592c7cec109741b592" ON "invitations" ("email") `);
        await queryRunner.query(`DROP INDEX "IDX_746df228cec6a874b390563e1b"`);
        await queryRunner.query(`DROP INDEX "IDX_dd2f1d365be537f915c62d5269"`);
        await queryRunner.query(`DROP INDEX "IDX_9e76ea4cc84a0e407c5a3aeb05"`);
        await queryRunner.query(`DROP INDEX "IDX_3648e11676f1929b9875ee272b"`);
        await queryRunner.query(`ALTER TABLE "audit_events" RENAME TO "temporary_audit_events"`);
        await queryRunner.query(`CREATE TABLE "audit_events" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "at" datetime NOT NULL, "actorId" integer, "action" varchar(30) NOT NULL, "entityType" varchar(60) NOT NULL, "entityId" varchar(60), "vesselId" integer, "summary" varchar(300) NOT NULL, "changes" text, "ipAddress" varchar(64))`);
        await queryRunner.query(`INSERT INTO "audit_events"("id", "at", "actorId", "action", "entityType", "entityId", "vesselId", "summary", "changes", "ipAddress") SELECT "id", "at", "actorId", "action", "entityType", "entityId", "vesselId", "summary", "changes", "ipAddress" FROM "temporary_audit_events"`);
        await queryRunner.query(`DROP TABLE "temporary_audit_events"`);
        await queryRunner.query(`CREATE INDEX "IDX_746df228cec6a874b390563e1b" ON "audit_events" ("entityType", "entityId") `);
        await queryRunner.query(`CREATE INDEX "IDX_dd2f1d365be537f915c62d5269" ON "audit_events" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_9e76ea4cc84a0e407c5a3aeb05" ON "audit_events" ("actorId") `);
        await queryRunner.query(`CREATE INDEX "IDX_3648e11676f1929b9875ee272b" ON "audit_events" ("at") `);
        await queryRunner.query(`DROP TABLE "vessels"`);
        await queryRunner.query(`DROP INDEX "IDX_50762206f116cd47d1c3fec396"`);
        await queryRunner.query(`DROP INDEX "IDX_57de40bc620f456c7311aa3a1e"`);
        await queryRunner.query(`DROP TABLE "sessions"`);
        await queryRunner.query(`DROP INDEX "IDX_7f6aae0fcc807c9e7194ca5cc4"`);
        await queryRunner.query(`DROP INDEX "IDX_d95569f623f28a0bf034a55099"`);
        await queryRunner.query(`DROP TABLE "password_resets"`);
        await queryRunner.query(`DROP TABLE "organisation_settings"`);
        await queryRunner.query(`DROP INDEX "IDX_a6eb6f2543de8a5a4c148b32a1"`);
        await queryRunner.query(`DROP INDEX "IDX_97ab59cb592c7cec109741b592"`);
        await queryRunner.query(`DROP TABLE "invitations"`);
        await queryRunner.query(`DROP INDEX "IDX_746df228cec6a874b390563e1b"`);
        await queryRunner.query(`DROP INDEX "IDX_dd2f1d365be537f915c62d5269"`);
        await queryRunner.query(`DROP INDEX "IDX_9e76ea4cc84a0e407c5a3aeb05"`);
        await queryRunner.query(`DROP INDEX "IDX_3648e11676f1929b9875ee272b"`);
        await queryRunner.query(`DROP TABLE "audit_events"`);
        await queryRunner.query(`DROP INDEX "IDX_97672ac88f789774dd47f7c8be"`);
        await queryRunner.query(`DROP TABLE "users"`);
    }

}
