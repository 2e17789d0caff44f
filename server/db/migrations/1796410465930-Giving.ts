import { MigrationInterface, QueryRunner } from "typeorm";

export class Giving1796410465930 implements MigrationInterface {
    name = 'Giving1796410465930'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "appeal_month_totals" ("appealId" integer NOT NULL, "month" varchar(7) NOT NULL, "raisedCents" integer NOT NULL DEFAULT (0), "refundedCents" integer NOT NULL DEFAULT (0), "giftCount" integer NOT NULL DEFAULT (0), PRIMARY KEY ("appealId", "month"))`);
        await queryRunner.query(`CREATE TABLE "appeals" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "repairProjectId" integer NOT NULL, "storyDoc" text, "storyHtml" text NOT NULL DEFAULT (''), "storyText" text NOT NULL DEFAULT (''), "goalCents" integer NOT NULL, "photos" text NOT NULL, "publishedAt" datetime, "raisedCents" integer NOT NULL DEFAULT (0), "refundedCents" integer NOT NULL DEFAULT (0), "giftCount" integer NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_3369659e815b8e05edf43f1297" ON "appeals" ("repairProjectId") `);
        await queryRunner.query(`CREATE TABLE "donations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "appealId" integer NOT NULL, "reference" varchar(36) NOT NULL, "checkoutSessionId" varchar(255) NOT NULL, "paymentIntentId" varchar(255), "amountCents" integer NOT NULL, "currency" varchar(3) NOT NULL, "status" varchar(20) NOT NULL, "refundedCents" integer NOT NULL DEFAULT (0), "donorName" varchar(120) NOT NULL, "donorEmail" varchar(254) NOT NULL, "showFirstName" boolean NOT NULL DEFAULT (0), "anonymous" boolean NOT NULL DEFAULT (1), "dedicationKind" varchar(10), "dedicationName" varchar(120) NOT NULL DEFAULT (''), "failureMessage" varchar(300) NOT NULL DEFAULT (''), "succeededAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_886502829ac274e30af4eb505c" ON "donations" ("reference") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e934df44997c41c83b6ed44e86" ON "donations" ("checkoutSessionId") `);
        await queryRunner.query(`CREATE INDEX "IDX_d600b82628f92b5231a7bc099d" ON "donations" ("paymentIntentId") `);
        await queryRunner.query(`CREATE INDEX "IDX_84606535846413a14e495f40e6" ON "donations" ("vesselId", "createdAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_43a71045572937b363233cd04e" ON "donations" ("appealId", "createdAt") `);
        await queryRunner.query(`CREATE TABLE "stripe_events" ("id" varchar(255) PRIMARY KEY NOT NULL, "type" varchar(100) NOT NULL, "donationId" integer, "processedAt" datetime NOT NULL)`);
        await queryRunner.query(`DROP INDEX "IDX_3369659e815b8e05edf43f1297"`);
        await queryRunner.query(`CREATE TABLE "temporary_appeals" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "repairProjectId" integer NOT NULL, "storyDoc" text, "storyHtml" text NOT NULL DEFAULT (''), "storyText" text NOT NULL DEFAULT (''), "goalCents" integer NOT NULL, "photos" text NOT NULL, "publishedAt" datetime, "raisedCents" integer NOT NULL DEFAULT (0), "refundedCents" integer NOT NULL DEFAULT (0), "giftCount" integer NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_38b632088a8cfb77019d81b9151" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_3369659e815b8e05edf43f1297a" FOREIGN KEY ("repairProjectId") REFERENCES "repair_project" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_appeals"("id", "vesselId", "repairProjectId", "storyDoc", "storyHtml", "storyText", "goalCents", "photos", "publishedAt", "raisedCents", "refundedCents", "giftCount", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "repairProjectId", "storyDoc", "storyHtml", "storyText", "goalCents", "photos", "publishedAt", "raisedCents", "refundedCents", "giftCount", "createdAt", "updatedAt", "version" FROM "appeals"`);
        await queryRunner.query(`DROP TABLE "appeals"`);
        await queryRunner.query(`ALTER TABLE "temporary_appeals" RENAME TO "appeals"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_3369659e815b8e05edf43f1297" ON "appeals" ("repairProjectId") `);
        await queryRunner.query(`DROP INDEX "IDX_886502829ac274e30af4eb505c"`);
        await queryRunner.query(`DROP INDEX "IDX_e934df44997c41c83b6ed44e86"`);
        await queryRunner.query(`DROP INDEX "IDX_d600b82628f92b5231a7bc099d"`);
        await queryRunner.query(`DROP INDEX "IDX_84606535846413a14e495f40e6"`);
        await queryRunner.query(`DROP INDEX "IDX_43a71045572937b363233cd04e"`);
        await queryRunner.query(`CREATE TABLE "temporary_donations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "appealId" integer NOT NULL, "reference" varchar(36) NOT NULL, "checkoutSessionId" varchar(255) NOT NULL, "paymentIntentId" varchar(255), "amountCents" integer NOT NULL, "currency" varchar(3) NOT NULL, "status" varchar(20) NOT NULL, "refundedCents" integer NOT NULL DEFAULT (0), "donorName" varchar(120) NOT NULL, "donorEmail" varchar(254) NOT NULL, "showFirstName" boolean NOT NULL DEFAULT (0), "anonymous" boolean NOT NULL DEFAULT (1), "dedicationKind" varchar(10), "dedicationName" varchar(120) NOT NULL DEFAULT (''), "failureMessage" varchar(300) NOT NULL DEFAULT (''), "succeededAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_053cfe57db493bea2e6820d4e53" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_a4303bccf3f86aa394be68e9796" FOREIGN KEY ("appealId") REFERENCES "appeals" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_donations"("id", "vesselId", "appealId", "reference", "checkoutSessionId", "paymentIntentId", "amountCents", "currency", "status", "refundedCents", "donorName", "donorEmail", "showFirstName", "anonymous", "dedicationKind", "dedicationName", "failureMessage", "succeededAt", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "appealId", "reference", "checkoutSessionId", "paymentIntentId", "amountCents", "currency", "status", "refundedCents", "donorName", "donorEmail", "showFirstName", "anonymous", "dedicationKind", "dedicationName", "failureMessage", "succeededAt", "createdAt", "updatedAt", "version" FROM "donations"`);
        await queryRunner.query(`DROP TABLE "donations"`);
        await queryRunner.query(`ALTER TABLE "temporary_donations" RENAME TO "donations"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_886502829ac274e30af4eb505c" ON "donations" ("reference") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e934df44997c41c83b6ed44e86" ON "donations" ("checkoutSessionId") `);
        await queryRunner.query(`CREATE INDEX "IDX_d600b82628f92b5231a7bc099d" ON "donations" ("paymentIntentId") `);
        await queryRunner.query(`CREATE INDEX "IDX_84606535846413a14e495f40e6" ON "donations" ("vesselId", "createdAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_43a71045572937b363233cd04e" ON "donations" ("appealId", "createdAt") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_43a71045572937b363233cd04e"`);
        await queryRunner.query(`DROP INDEX "IDX_84606535846413a14e495f40e6"`);
        await queryRunner.query(`DROP INDEX "IDX_d600b82628f92b5231a7bc099d"`);
        await queryRunner.query(`DROP INDEX "IDX_e934df44997c41c83b6ed44e86"`);
        await queryRunner.query(`DROP INDEX "IDX_886502829ac274e30af4eb505c"`);
        await queryRunner.query(`ALTER TABLE "donations" RENAME TO "temporary_donations"`);
        await queryRunner.query(`CREATE TABLE "donations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "appealId" integer NOT NULL, "reference" varchar(36) NOT NULL, "checkoutSessionId" varchar(255) NOT NULL, "paymentIntentId" varchar(255), "amountCents" integer NOT NULL, "currency" varchar(3) NOT NULL, "status" varchar(20) NOT NULL, "refundedCents" integer NOT NULL DEFAULT (0), "donorName" varchar(120) NOT NULL, "donorEmail" varchar(254) NOT NULL, "showFirstName" boolean NOT NULL DEFAULT (0), "anonymous" boolean NOT NULL DEFAULT (1), "dedicationKind" varchar(10), "dedicationName" varchar(120) NOT NULL DEFAULT (''), "failureMessage" varchar(300) NOT NULL DEFAULT (''), "succeededAt" datetime, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "donations"("id", "vesselId", "appealId", "reference", "checkoutSessionId", "paymentIntentId", "amountCents", "currency", "status", "refundedCents", "donorName", "donorEmail", "showFirstName", "anonymous", "dedicationKind", "dedicationName", "failureMessage", "succeededAt", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "appealId", "reference", "checkoutSessionId", "paymentIntentId", "amountCents", "currency", "status", "refundedCents", "donorName", "donorEmail", "showFirstName", "anonymous", "dedicationKind", "dedicationName", "failureMessage", "succeededAt", "createdAt", "updatedAt", "version" FROM "temporary_donations"`);
        await queryRunner.query(`DROP TABLE "temporary_donations"`);
        await queryRunner.query(`CREATE INDEX "IDX_43a71045572937b363233cd04e" ON "donations" ("appealId", "createdAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_84606535846413a14e495f40e6" ON "donations" ("vesselId", "createdAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_d600b82628f92b5231a7bc099d" ON "donations" ("paymentIntentId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_e934df44997c41c83b6ed44e86" ON "donations" ("checkoutSessionId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_886502829ac274e30af4eb505c" ON "donations" ("reference") `);
        await queryRunner.query(`DROP INDEX "IDX_3369659e815b8e05edf43f1297"`);
        await queryRunner.query(`ALTER TABLE "appeals" RENAME TO "temporary_appeals"`);
        await queryRunner.query(`CREATE TABLE "appeals" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "repairProjectId" integer NOT NULL, "storyDoc" text, "storyHtml" text NOT NULL DEFAULT (''), "storyText" text NOT NULL DEFAULT (''), "goalCents" integer NOT NULL, "photos" text NOT NULL, "publishedAt" datetime, "raisedCents" integer NOT NULL DEFAULT (0), "refundedCents" integer NOT NULL DEFAULT (0), "giftCount" integer NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "appeals"("id", "vesselId", "repairProjectId", "storyDoc", "storyHtml", "storyText", "goalCents", "photos", "publishedAt", "raisedCents", "refundedCents", "giftCount", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "repairProjectId", "storyDoc", "storyHtml", "storyText", "goalCents", "photos", "publishedAt", "raisedCents", "refundedCents", "giftCount", "createdAt", "updatedAt", "version" FROM "temporary_appeals"`);
        await queryRunner.query(`DROP TABLE "temporary_appeals"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_3369659e815b8e05edf43f1297" ON "appeals" ("repairProjectId") `);
        await queryRunner.query(`DROP TABLE "stripe_events"`);
        await queryRunner.query(`DROP INDEX "IDX_43a71045572937b363233cd04e"`);
        await queryRunner.query(`DROP INDEX "IDX_84606535846413a14e495f40e6"`);
        await queryRunner.query(`DROP INDEX "IDX_d600b82628f92b5231a7bc099d"`);
        await queryRunner.query(`DROP INDEX "IDX_e934df44997c41c83b6ed44e86"`);
        await queryRunner.query(`DROP INDEX "IDX_886502829ac274e30af4eb505c"`);
        await queryRunner.query(`DROP TABLE "donations"`);
        await queryRunner.query(`DROP INDEX "IDX_3369659e815b8e05edf43f1297"`);
        await queryRunner.query(`DROP TABLE "appeals"`);
        await queryRunner.query(`DROP TABLE "appeal_month_totals"`);
    }

}
