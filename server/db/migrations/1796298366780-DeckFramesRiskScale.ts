import { MigrationInterface, QueryRunner } from "typeorm";

export class DeckFramesRiskScale1796298366780 implements MigrationInterface {
    name = 'DeckFramesRiskScale1796298366780'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_6fe22ba5e2c3568b5c72343ed2"`);
        await queryRunner.query(`CREATE TABLE "temporary_decks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "name" varchar(80) NOT NULL, "position" integer NOT NULL, "levelCode" varchar(3), "currentPlanId" integer, "planWidth" integer, "planHeight" integer, "metresPerUnit" real, "calibration" text, "centerlineY" real, "bowTo" varchar(5) NOT NULL DEFAULT ('right'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "frames" text, CONSTRAINT "FK_2ee74c56fa9e62aaf3d6f1ad891" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_decks"("id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version" FROM "decks"`);
        await queryRunner.query(`DROP TABLE "decks"`);
        await queryRunner.query(`ALTER TABLE "temporary_decks" RENAME TO "decks"`);
        await queryRunner.query(`CREATE INDEX "IDX_6fe22ba5e2c3568b5c72343ed2" ON "decks" ("vesselId", "position") `);
        await queryRunner.query(`CREATE TABLE "temporary_organisation_settings" ("id" integer PRIMARY KEY NOT NULL, "organisationName" varchar(160) NOT NULL, "country" varchar(2) NOT NULL DEFAULT ('US'), "currency" varchar(3) NOT NULL DEFAULT ('USD'), "unitSystem" varchar(20) NOT NULL DEFAULT ('us-customary'), "contactEmail" varchar(254) NOT NULL DEFAULT (''), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "objectNumberPattern" varchar(40) NOT NULL DEFAULT ('YYYY.N.N'), "riskScale" text NOT NULL DEFAULT ('{"aYearsAtFive":1,"stepFactor":10,"bandFloors":{"low":3,"medium":7.5,"high":9.5,"very-high":11.5,"extreme":13.5}}'))`);
        await queryRunner.query(`INSERT INTO "temporary_organisation_settings"("id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern") SELECT "id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern" FROM "organisation_settings"`);
        await queryRunner.query(`DROP TABLE "organisation_settings"`);
        await queryRunner.query(`ALTER TABLE "temporary_organisation_settings" RENAME TO "organisation_settings"`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation_settings" RENAME TO "temporary_organisation_settings"`);
        await queryRunner.query(`CREATE TABLE "organisation_settings" ("id" integer PRIMARY KEY NOT NULL, "organisationName" varchar(160) NOT NULL, "country" varchar(2) NOT NULL DEFAULT ('US'), "currency" varchar(3) NOT NULL DEFAULT ('USD'), "unitSystem" varchar(20) NOT NULL DEFAULT ('us-customary'), "contactEmail" varchar(254) NOT NULL DEFAULT (''), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "objectNumberPattern" varchar(40) NOT NULL DEFAULT ('YYYY.N.N'))`);
        await queryRunner.query(`INSERT INTO "organisation_settings"("id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern") SELECT "id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern" FROM "temporary_organisation_settings"`);
        await queryRunner.query(`DROP TABLE "temporary_organisation_settings"`);
        await queryRunner.query(`DROP INDEX "IDX_6fe22ba5e2c3568b5c72343ed2"`);
        await queryRunner.query(`ALTER TABLE "decks" RENAME TO "temporary_decks"`);
        await queryRunner.query(`CREATE TABLE "decks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "name" varchar(80) NOT NULL, "position" integer NOT NULL, "levelCode" varchar(3), "currentPlanId" integer, "planWidth" integer, "planHeight" integer, "metresPerUnit" real, "calibration" text, "centerlineY" real, "bowTo" varchar(5) NOT NULL DEFAULT ('right'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_2ee74c56fa9e62aaf3d6f1ad891" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "decks"("id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version" FROM "temporary_decks"`);
        await queryRunner.query(`DROP TABLE "temporary_decks"`);
        await queryRunner.query(`CREATE INDEX "IDX_6fe22ba5e2c3568b5c72343ed2" ON "decks" ("vesselId", "position") `);
    }

}
