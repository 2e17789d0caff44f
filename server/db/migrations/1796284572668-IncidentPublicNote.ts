import { MigrationInterface, QueryRunner } from "typeorm";

export class IncidentPublicNote1796284572668 implements MigrationInterface {
    name = 'IncidentPublicNote1796284572668'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_b8809ab2aaa7ac6fab8edca265"`);
        await queryRunner.query(`CREATE TABLE "temporary_incidents" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "kind" varchar(20) NOT NULL, "title" varchar(200) NOT NULL, "foundOn" varchar(10) NOT NULL, "occurredOn" varchar(10), "description" text NOT NULL DEFAULT (''), "reportedTo" varchar(300) NOT NULL DEFAULT (''), "policeReference" varchar(100) NOT NULL DEFAULT (''), "actionsTaken" text NOT NULL DEFAULT (''), "closedCompartmentIds" text NOT NULL, "reportIds" text NOT NULL, "loggedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "publicNote" varchar(200) NOT NULL DEFAULT (''), CONSTRAINT "FK_6fa1930d6de112d18b98743674c" FOREIGN KEY ("loggedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_1dc8ca233b57725a69b305c764d" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_incidents"("id", "vesselId", "kind", "title", "foundOn", "occurredOn", "description", "reportedTo", "policeReference", "actionsTaken", "closedCompartmentIds", "reportIds", "loggedById", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "kind", "title", "foundOn", "occurredOn", "description", "reportedTo", "policeReference", "actionsTaken", "closedCompartmentIds", "reportIds", "loggedById", "createdAt", "updatedAt", "version" FROM "incidents"`);
        await queryRunner.query(`DROP TABLE "incidents"`);
        await queryRunner.query(`ALTER TABLE "temporary_incidents" RENAME TO "incidents"`);
        await queryRunner.query(`CREATE INDEX "IDX_b8809ab2aaa7ac6fab8edca265" ON "incidents" ("vesselId", "foundOn") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_b8809ab2aaa7ac6fab8edca265"`);
        await queryRunner.query(`ALTER TABLE "incidents" RENAME TO "temporary_incidents"`);
        await queryRunner.query(`CREATE TABLE "incidents" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "kind" varchar(20) NOT NULL, "title" varchar(200) NOT NULL, "foundOn" varchar(10) NOT NULL, "occurredOn" varchar(10), "description" text NOT NULL DEFAULT (''), "reportedTo" varchar(300) NOT NULL DEFAULT (''), "policeReference" varchar(100) NOT NULL DEFAULT (''), "actionsTaken" text NOT NULL DEFAULT (''), "closedCompartmentIds" text NOT NULL, "reportIds" text NOT NULL, "loggedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_6fa1930d6de112d18b98743674c" FOREIGN KEY ("loggedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_1dc8ca233b57725a69b305c764d" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "incidents"("id", "vesselId", "kind", "title", "foundOn", "occurredOn", "description", "reportedTo", "policeReference", "actionsTaken", "closedCompartmentIds", "reportIds", "loggedById", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "kind", "title", "foundOn", "occurredOn", "description", "reportedTo", "policeReference", "actionsTaken", "closedCompartmentIds", "reportIds", "loggedById", "createdAt", "updatedAt", "version" FROM "temporary_incidents"`);
        await queryRunner.query(`DROP TABLE "temporary_incidents"`);
        await queryRunner.query(`CREATE INDEX "IDX_b8809ab2aaa7ac6fab8edca265" ON "incidents" ("vesselId", "foundOn") `);
    }

}
