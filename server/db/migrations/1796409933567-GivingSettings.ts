import { MigrationInterface, QueryRunner } from "typeorm";

export class GivingSettings1796409933567 implements MigrationInterface {
    name = 'GivingSettings1796409933567'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "temporary_organisation_settings" ("id" integer PRIMARY KEY NOT NULL, "organisationName" varchar(160) NOT NULL, "country" varchar(2) NOT NULL DEFAULT ('US'), "currency" varchar(3) NOT NULL DEFAULT ('USD'), "unitSystem" varchar(20) NOT NULL DEFAULT ('us-customary'), "contactEmail" varchar(254) NOT NULL DEFAULT (''), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "objectNumberPattern" varchar(40) NOT NULL DEFAULT ('YYYY.N.N'), "riskScale" text NOT NULL DEFAULT ('{"aYearsAtFive":1,"stepFactor":10,"bandFloors":{"low":3,"medium":7.5,"high":9.5,"very-high":11.5,"extreme":13.5}}'), "giving" text NOT NULL DEFAULT ('{"minimumCents":100,"maximumCents":2500000,"presetCents":[2500,5000,10000,25000],"acknowledgmentThresholdCents":25000,"legalName":"","taxId":"","acknowledgmentStatement":"No goods or services were provided by the organization in return for this contribution."}'))`);
        await queryRunner.query(`INSERT INTO "temporary_organisation_settings"("id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern", "riskScale") SELECT "id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern", "riskScale" FROM "organisation_settings"`);
        await queryRunner.query(`DROP TABLE "organisation_settings"`);
        await queryRunner.query(`ALTER TABLE "temporary_organisation_settings" RENAME TO "organisation_settings"`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "organisation_settings" RENAME TO "temporary_organisation_settings"`);
        await queryRunner.query(`CREATE TABLE "organisation_settings" ("id" integer PRIMARY KEY NOT NULL, "organisationName" varchar(160) NOT NULL, "country" varchar(2) NOT NULL DEFAULT ('US'), "currency" varchar(3) NOT NULL DEFAULT ('USD'), "unitSystem" varchar(20) NOT NULL DEFAULT ('us-customary'), "contactEmail" varchar(254) NOT NULL DEFAULT (''), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "objectNumberPattern" varchar(40) NOT NULL DEFAULT ('YYYY.N.N'), "riskScale" text NOT NULL DEFAULT ('{"aYearsAtFive":1,"stepFactor":10,"bandFloors":{"low":3,"medium":7.5,"high":9.5,"very-high":11.5,"extreme":13.5}}'))`);
        await queryRunner.query(`INSERT INTO "organisation_settings"("id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern", "riskScale") SELECT "id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version", "objectNumberPattern", "riskScale" FROM "temporary_organisation_settings"`);
        await queryRunner.query(`DROP TABLE "temporary_organisation_settings"`);
    }

}
