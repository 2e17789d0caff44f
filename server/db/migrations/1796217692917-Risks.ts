import { MigrationInterface, QueryRunner } from "typeorm";

export class Risks1796217692917 implements MigrationInterface {
    name = 'Risks1796217692917'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "risks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "statement" varchar(300) NOT NULL, "agent" varchar(40) NOT NULL, "status" varchar(10) NOT NULL DEFAULT ('open'), "a" real NOT NULL, "b" real NOT NULL, "c" real NOT NULL, "yearsBetween" real, "lossPerItemPercent" real, "assetFractionPercent" real, "magnitude" real NOT NULL, "band" varchar(10) NOT NULL, "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_25d7cd766b60a27040d806dc88" ON "risks" ("vesselId", "status", "magnitude") `);
        await queryRunner.query(`CREATE TABLE "risk_subjects" ("riskId" integer NOT NULL, "subjectType" varchar(20) NOT NULL, "subjectId" integer NOT NULL, "deckId" integer, PRIMARY KEY ("riskId", "subjectType", "subjectId"))`);
        await queryRunner.query(`CREATE INDEX "IDX_f79409ce9aeaa80881c59ddff1" ON "risk_subjects" ("deckId") `);
        await queryRunner.query(`CREATE INDEX "IDX_9cf78a535657b85f65373fd561" ON "risk_subjects" ("subjectType", "subjectId") `);
        await queryRunner.query(`DROP INDEX "IDX_25d7cd766b60a27040d806dc88"`);
        await queryRunner.query(`CREATE TABLE "temporary_risks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "statement" varchar(300) NOT NULL, "agent" varchar(40) NOT NULL, "status" varchar(10) NOT NULL DEFAULT ('open'), "a" real NOT NULL, "b" real NOT NULL, "c" real NOT NULL, "yearsBetween" real, "lossPerItemPercent" real, "assetFractionPercent" real, "magnitude" real NOT NULL, "band" varchar(10) NOT NULL, "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_b3315b6a236e8c2ca98cb971aff" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_risks"("id", "vesselId", "statement", "agent", "status", "a", "b", "c", "yearsBetween", "lossPerItemPercent", "assetFractionPercent", "magnitude", "band", "notes", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "statement", "agent", "status", "a", "b", "c", "yearsBetween", "lossPerItemPercent", "assetFractionPercent", "magnitude", "band", "notes", "createdAt", "updatedAt", "version" FROM "risks"`);
        await queryRunner.query(`DROP TABLE "risks"`);
        await queryRunner.query(`ALTER TABLE "temporary_risks" RENAME TO "risks"`);
        await queryRunner.query(`CREATE INDEX "IDX_25d7cd766b60a27040d806dc88" ON "risks" ("vesselId", "status", "magnitude") `);
        await queryRunner.query(`DROP INDEX "IDX_f79409ce9aeaa80881c59ddff1"`);
        await queryRunner.query(`DROP INDEX "IDX_9cf78a535657b85f65373fd561"`);
        await queryRunner.query(`CREATE TABLE "temporary_risk_subjects" ("riskId" integer NOT NULL, "subjectType" varchar(20) NOT NULL, "subjectId" integer NOT NULL, "deckId" integer, CONSTRAINT "FK_a673593322b60a78747d3981f9c" FOREIGN KEY ("riskId") REFERENCES "risks" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, PRIMARY KEY ("riskId", "subjectType", "subjectId"))`);
        await queryRunner.query(`INSERT INTO "temporary_risk_subjects"("riskId", "subjectType", "subjectId", "deckId") SELECT "riskId", "subjectType", "subjectId", "deckId" FROM "risk_subjects"`);
        await queryRunner.query(`DROP TABLE "risk_subjects"`);
        await queryRunner.query(`ALTER TABLE "temporary_risk_subjects" RENAME TO "risk_subjects"`);
        await queryRunner.query(`CREATE INDEX "IDX_f79409ce9aeaa80881c59ddff1" ON "risk_subjects" ("deckId") `);
        await queryRunner.query(`CREATE INDEX "IDX_9cf78a535657b85f65373fd561" ON "risk_subjects" ("subjectType", "subjectId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_9cf78a535657b85f65373fd561"`);
        await queryRunner.query(`DROP INDEX "IDX_f79409ce9aeaa80881c59ddff1"`);
        await queryRunner.query(`ALTER TABLE "risk_subjects" RENAME TO "temporary_risk_subjects"`);
        await queryRunner.query(`CREATE TABLE "risk_subjects" ("riskId" integer NOT NULL, "subjectType" varchar(20) NOT NULL, "subjectId" integer NOT NULL, "deckId" integer, PRIMARY KEY ("riskId", "subjectType", "subjectId"))`);
        await queryRunner.query(`INSERT INTO "risk_subjects"("riskId", "subjectType", "subjectId", "deckId") SELECT "riskId", "subjectType", "subjectId", "deckId" FROM "temporary_risk_subjects"`);
        await queryRunner.query(`DROP TABLE "temporary_risk_subjects"`);
        await queryRunner.query(`CREATE INDEX "IDX_9cf78a535657b85f65373fd561" ON "risk_subjects" ("subjectType", "subjectId") `);
        await queryRunner.query(`CREATE INDEX "IDX_f79409ce9aeaa80881c59ddff1" ON "risk_subjects" ("deckId") `);
        await queryRunner.query(`DROP INDEX "IDX_25d7cd766b60a27040d806dc88"`);
        await queryRunner.query(`ALTER TABLE "risks" RENAME TO "temporary_risks"`);
        await queryRunner.query(`CREATE TABLE "risks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "statement" varchar(300) NOT NULL, "agent" varchar(40) NOT NULL, "status" varchar(10) NOT NULL DEFAULT ('open'), "a" real NOT NULL, "b" real NOT NULL, "c" real NOT NULL, "yearsBetween" real, "lossPerItemPercent" real, "assetFractionPercent" real, "magnitude" real NOT NULL, "band" varchar(10) NOT NULL, "notes" text NOT NULL DEFAULT (''), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "risks"("id", "vesselId", "statement", "agent", "status", "a", "b", "c", "yearsBetween", "lossPerItemPercent", "assetFractionPercent", "magnitude", "band", "notes", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "statement", "agent", "status", "a", "b", "c", "yearsBetween", "lossPerItemPercent", "assetFractionPercent", "magnitude", "band", "notes", "createdAt", "updatedAt", "version" FROM "temporary_risks"`);
        await queryRunner.query(`DROP TABLE "temporary_risks"`);
        await queryRunner.query(`CREATE INDEX "IDX_25d7cd766b60a27040d806dc88" ON "risks" ("vesselId", "status", "magnitude") `);
        await queryRunner.query(`DROP INDEX "IDX_9cf78a535657b85f65373fd561"`);
        await queryRunner.query(`DROP INDEX "IDX_f79409ce9aeaa80881c59ddff1"`);
        await queryRunner.query(`DROP TABLE "risk_subjects"`);
        await queryRunner.query(`DROP INDEX "IDX_25d7cd766b60a27040d806dc88"`);
        await queryRunner.query(`DROP TABLE "risks"`);
    }

}
