import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Interpretive text and its revisions, and the organisation's reading targets. The settings column
 * is added in place (not by rebuilding the table) so that other migrations adding settings columns
 * keep theirs whichever runs first.
 */
export class Interpretation1796410455538 implements MigrationInterface {
    name = 'Interpretation1796410455538'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "interpretations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "subjectType" varchar(20) NOT NULL, "subjectId" integer NOT NULL, "state" varchar(12) NOT NULL DEFAULT ('draft'), "draft" text NOT NULL, "published" text, "publishedAt" datetime, "publishedById" integer, "submittedAt" datetime, "submittedById" integer, "lastEditedById" integer, "returnComment" text, "returnedAt" datetime, "returnedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_9967eeae2dde593ddfb17aa2a6d" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_9f2caf6a61d58bca8fffee5ec97" FOREIGN KEY ("publishedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_7c6374eb15aade18063270903bf" FOREIGN KEY ("submittedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_7b9bf672574554f31394d1e224f" FOREIGN KEY ("lastEditedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_6cfb08e42b28795fdc8b6190f9f" FOREIGN KEY ("returnedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`CREATE INDEX "IDX_e757a16da5c100f1c5897ab00b" ON "interpretations" ("vesselId", "state") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_7d6dd9355af02e37d5b4189346" ON "interpretations" ("subjectType", "subjectId") `);
        await queryRunner.query(`CREATE TABLE "interpretation_revisions" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "interpretationId" integer NOT NULL, "number" integer NOT NULL, "content" text NOT NULL, "savedById" integer, "savedAt" datetime NOT NULL, CONSTRAINT "FK_4a2e39327027850b5a08295f28b" FOREIGN KEY ("interpretationId") REFERENCES "interpretations" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_cb83280feb98303cd756c763678" FOREIGN KEY ("savedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_6b4064f0e64b3619ca696b8ac6" ON "interpretation_revisions" ("interpretationId", "number") `);
        await queryRunner.query(`ALTER TABLE "organisation_settings" ADD COLUMN "interpretationTargets" text NOT NULL DEFAULT ('{"labelMaxWords":75,"maxGrade":{"general":8,"families":8,"technical":null}}')`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation_settings" DROP COLUMN "interpretationTargets"`);
        await queryRunner.query(`DROP INDEX "IDX_6b4064f0e64b3619ca696b8ac6"`);
        await queryRunner.query(`DROP TABLE "interpretation_revisions"`);
        await queryRunner.query(`DROP INDEX "IDX_7d6dd9355af02e37d5b4189346"`);
        await queryRunner.query(`DROP INDEX "IDX_e757a16da5c100f1c5897ab00b"`);
        await queryRunner.query(`DROP TABLE "interpretations"`);
    }
}
