import { MigrationInterface, QueryRunner } from "typeorm";

export class HazardVersions1796284659278 implements MigrationInterface {
    name = 'HazardVersions1796284659278'

    public async up(queryRunner: QueryRunner): Promise<void> {
        // Hand-edited: the rebuild copies every hazard at version 1 (the generated copy left the new NOT NULL column out).
        await queryRunner.query(`DROP INDEX "IDX_cc0f796539f9bf1d06986f3fe1"`);
        await queryRunner.query(`CREATE TABLE "temporary_hazards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "compartmentId" integer NOT NULL, "kind" varchar(40) NOT NULL, "notes" text NOT NULL DEFAULT (''), "lastVerifiedOn" varchar(10), "verifiedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_e94916da131e5171e1e779528ef" FOREIGN KEY ("verifiedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_cc0f796539f9bf1d06986f3fe10" FOREIGN KEY ("compartmentId") REFERENCES "compartments" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_hazards"("id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt", "version") SELECT "id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt", 1 FROM "hazards"`);
        await queryRunner.query(`DROP TABLE "hazards"`);
        await queryRunner.query(`ALTER TABLE "temporary_hazards" RENAME TO "hazards"`);
        await queryRunner.query(`CREATE INDEX "IDX_cc0f796539f9bf1d06986f3fe1" ON "hazards" ("compartmentId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_cc0f796539f9bf1d06986f3fe1"`);
        await queryRunner.query(`ALTER TABLE "hazards" RENAME TO "temporary_hazards"`);
        await queryRunner.query(`CREATE TABLE "hazards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "compartmentId" integer NOT NULL, "kind" varchar(40) NOT NULL, "notes" text NOT NULL DEFAULT (''), "lastVerifiedOn" varchar(10), "verifiedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_e94916da131e5171e1e779528ef" FOREIGN KEY ("verifiedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_cc0f796539f9bf1d06986f3fe10" FOREIGN KEY ("compartmentId") REFERENCES "compartments" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "hazards"("id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt") SELECT "id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt" FROM "temporary_hazards"`);
        await queryRunner.query(`DROP TABLE "temporary_hazards"`);
        await queryRunner.query(`CREATE INDEX "IDX_cc0f796539f9bf1d06986f3fe1" ON "hazards" ("compartmentId") `);
    }

}
