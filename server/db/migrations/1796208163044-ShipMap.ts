import { MigrationInterface, QueryRunner } from "typeorm";

export class ShipMap1796208163044 implements MigrationInterface {
    name = 'ShipMap1796208163044'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "decks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "name" varchar(80) NOT NULL, "position" integer NOT NULL, "levelCode" varchar(3), "currentPlanId" integer, "planWidth" integer, "planHeight" integer, "metresPerUnit" real, "calibration" text, "centerlineY" real, "bowTo" varchar(5) NOT NULL DEFAULT ('right'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_6fe22ba5e2c3568b5c72343ed2" ON "decks" ("vesselId", "position") `);
        await queryRunner.query(`CREATE TABLE "compartments" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "deckId" integer NOT NULL, "designation" varchar(40) NOT NULL, "designationKey" varchar(40) NOT NULL, "name" varchar(120) NOT NULL, "description" text NOT NULL DEFAULT (''), "accessStatus" varchar(20) NOT NULL DEFAULT ('staff-only'), "virtualVisit" boolean NOT NULL DEFAULT (0), "outline" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_4e16e5800c51d0e9d91e87baa6" ON "compartments" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_1b1851df5828aad9a6584d0045" ON "compartments" ("deckId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a46a1cc52347d40cff3b9c90dd" ON "compartments" ("vesselId", "designationKey") `);
        await queryRunner.query(`CREATE TABLE "hazards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "compartmentId" integer NOT NULL, "kind" varchar(40) NOT NULL, "notes" text NOT NULL DEFAULT (''), "lastVerifiedOn" varchar(10), "verifiedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`CREATE INDEX "IDX_cc0f796539f9bf1d06986f3fe1" ON "hazards" ("compartmentId") `);
        await queryRunner.query(`DROP INDEX "IDX_6fe22ba5e2c3568b5c72343ed2"`);
        await queryRunner.query(`CREATE TABLE "temporary_decks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "name" varchar(80) NOT NULL, "position" integer NOT NULL, "levelCode" varchar(3), "currentPlanId" integer, "planWidth" integer, "planHeight" integer, "metresPerUnit" real, "calibration" text, "centerlineY" real, "bowTo" varchar(5) NOT NULL DEFAULT ('right'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_2ee74c56fa9e62aaf3d6f1ad891" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_decks"("id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version" FROM "decks"`);
        await queryRunner.query(`DROP TABLE "decks"`);
        await queryRunner.query(`ALTER TABLE "temporary_decks" RENAME TO "decks"`);
        await queryRunner.query(`CREATE INDEX "IDX_6fe22ba5e2c3568b5c72343ed2" ON "decks" ("vesselId", "position") `);
        await queryRunner.query(`DROP INDEX "IDX_4e16e5800c51d0e9d91e87baa6"`);
        await queryRunner.query(`DROP INDEX "IDX_1b1851df5828aad9a6584d0045"`);
        await queryRunner.query(`DROP INDEX "IDX_a46a1cc52347d40cff3b9c90dd"`);
        await queryRunner.query(`CREATE TABLE "temporary_compartments" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "deckId" integer NOT NULL, "designation" varchar(40) NOT NULL, "designationKey" varchar(40) NOT NULL, "name" varchar(120) NOT NULL, "description" text NOT NULL DEFAULT (''), "accessStatus" varchar(20) NOT NULL DEFAULT ('staff-only'), "virtualVisit" boolean NOT NULL DEFAULT (0), "outline" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_4e16e5800c51d0e9d91e87baa6d" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_1b1851df5828aad9a6584d0045d" FOREIGN KEY ("deckId") REFERENCES "decks" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_compartments"("id", "vesselId", "deckId", "designation", "designationKey", "name", "description", "accessStatus", "virtualVisit", "outline", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "deckId", "designation", "designationKey", "name", "description", "accessStatus", "virtualVisit", "outline", "createdAt", "updatedAt", "version" FROM "compartments"`);
        await queryRunner.query(`DROP TABLE "compartments"`);
        await queryRunner.query(`ALTER TABLE "temporary_compartments" RENAME TO "compartments"`);
        await queryRunner.query(`CREATE INDEX "IDX_4e16e5800c51d0e9d91e87baa6" ON "compartments" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_1b1851df5828aad9a6584d0045" ON "compartments" ("deckId") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a46a1cc52347d40cff3b9c90dd" ON "compartments" ("vesselId", "designationKey") `);
        await queryRunner.query(`DROP INDEX "IDX_cc0f796539f9bf1d06986f3fe1"`);
        await queryRunner.query(`CREATE TABLE "temporary_hazards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "compartmentId" integer NOT NULL, "kind" varchar(40) NOT NULL, "notes" text NOT NULL DEFAULT (''), "lastVerifiedOn" varchar(10), "verifiedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_cc0f796539f9bf1d06986f3fe10" FOREIGN KEY ("compartmentId") REFERENCES "compartments" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_e94916da131e5171e1e779528ef" FOREIGN KEY ("verifiedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_hazards"("id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt") SELECT "id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt" FROM "hazards"`);
        await queryRunner.query(`DROP TABLE "hazards"`);
        await queryRunner.query(`ALTER TABLE "temporary_hazards" RENAME TO "hazards"`);
        await queryRunner.query(`CREATE INDEX "IDX_cc0f796539f9bf1d06986f3fe1" ON "hazards" ("compartmentId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_cc0f796539f9bf1d06986f3fe1"`);
        await queryRunner.query(`ALTER TABLE "hazards" RENAME TO "temporary_hazards"`);
        await queryRunner.query(`CREATE TABLE "hazards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "compartmentId" integer NOT NULL, "kind" varchar(40) NOT NULL, "notes" text NOT NULL DEFAULT (''), "lastVerifiedOn" varchar(10), "verifiedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`INSERT INTO "hazards"("id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt") SELECT "id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "createdAt", "updatedAt" FROM "temporary_hazards"`);
        await queryRunner.query(`DROP TABLE "temporary_hazards"`);
        await queryRunner.query(`CREATE INDEX "IDX_cc0f796539f9bf1d06986f3fe1" ON "hazards" ("compartmentId") `);
        await queryRunner.query(`DROP INDEX "IDX_a46a1cc52347d40cff3b9c90dd"`);
        await queryRunner.query(`DROP INDEX "IDX_1b1851df5828aad9a6584d0045"`);
        await queryRunner.query(`DROP INDEX "IDX_4e16e5800c51d0e9d91e87baa6"`);
        await queryRunner.query(`ALTER TABLE "compartments" RENAME TO "temporary_compartments"`);
        await queryRunner.query(`CREATE TABLE "compartments" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "deckId" integer NOT NULL, "designation" varchar(40) NOT NULL, "designationKey" varchar(40) NOT NULL, "name" varchar(120) NOT NULL, "description" text NOT NULL DEFAULT (''), "accessStatus" varchar(20) NOT NULL DEFAULT ('staff-only'), "virtualVisit" boolean NOT NULL DEFAULT (0), "outline" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "compartments"("id", "vesselId", "deckId", "designation", "designationKey", "name", "description", "accessStatus", "virtualVisit", "outline", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "deckId", "designation", "designationKey", "name", "description", "accessStatus", "virtualVisit", "outline", "createdAt", "updatedAt", "version" FROM "temporary_compartments"`);
        await queryRunner.query(`DROP TABLE "temporary_compartments"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_a46a1cc52347d40cff3b9c90dd" ON "compartments" ("vesselId", "designationKey") `);
        await queryRunner.query(`CREATE INDEX "IDX_1b1851df5828aad9a6584d0045" ON "compartments" ("deckId") `);
        await queryRunner.query(`CREATE INDEX "IDX_4e16e5800c51d0e9d91e87baa6" ON "compartments" ("vesselId") `);
        await queryRunner.query(`DROP INDEX "IDX_6fe22ba5e2c3568b5c72343ed2"`);
        await queryRunner.query(`ALTER TABLE "decks" RENAME TO "temporary_decks"`);
        await queryRunner.query(`CREATE TABLE "decks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "name" varchar(80) NOT NULL, "position" integer NOT NULL, "levelCode" varchar(3), "currentPlanId" integer, "planWidth" integer, "planHeight" integer, "metresPerUnit" real, "calibration" text, "centerlineY" real, "bowTo" varchar(5) NOT NULL DEFAULT ('right'), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "decks"("id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "name", "position", "levelCode", "currentPlanId", "planWidth", "planHeight", "metresPerUnit", "calibration", "centerlineY", "bowTo", "createdAt", "updatedAt", "version" FROM "temporary_decks"`);
        await queryRunner.query(`DROP TABLE "temporary_decks"`);
        await queryRunner.query(`CREATE INDEX "IDX_6fe22ba5e2c3568b5c72343ed2" ON "decks" ("vesselId", "position") `);
        await queryRunner.query(`DROP INDEX "IDX_cc0f796539f9bf1d06986f3fe1"`);
        await queryRunner.query(`DROP TABLE "hazards"`);
        await queryRunner.query(`DROP INDEX "IDX_a46a1cc52347d40cff3b9c90dd"`);
        await queryRunner.query(`DROP INDEX "IDX_1b1851df5828aad9a6584d0045"`);
        await queryRunner.query(`DROP INDEX "IDX_4e16e5800c51d0e9d91e87baa6"`);
        await queryRunner.query(`DROP TABLE "compartments"`);
        await queryRunner.query(`DROP INDEX "IDX_6fe22ba5e2c3568b5c72343ed2"`);
        await queryRunner.query(`DROP TABLE "decks"`);
    }

}
