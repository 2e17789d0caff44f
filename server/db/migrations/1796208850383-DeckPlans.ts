import { MigrationInterface, QueryRunner } from "typeorm";

export class DeckPlans1796208850383 implements MigrationInterface {
    name = 'DeckPlans1796208850383'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "plans" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "deckId" integer NOT NULL, "status" varchar(20) NOT NULL, "originalName" varchar(200) NOT NULL, "mimeType" varchar(40) NOT NULL, "byteSize" integer NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, "maxZoom" integer NOT NULL, "tilesTotal" integer NOT NULL, "tilesDone" integer NOT NULL DEFAULT (0), "contentHash" varchar(64) NOT NULL, "storageKey" varchar(200), "error" varchar(500), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "finishedAt" datetime)`);
        await queryRunner.query(`CREATE INDEX "IDX_365c19a078c2e601f33515f7fa" ON "plans" ("deckId") `);
        await queryRunner.query(`DROP INDEX "IDX_365c19a078c2e601f33515f7fa"`);
        await queryRunner.query(`CREATE TABLE "temporary_plans" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "deckId" integer NOT NULL, "status" varchar(20) NOT NULL, "originalName" varchar(200) NOT NULL, "mimeType" varchar(40) NOT NULL, "byteSize" integer NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, "maxZoom" integer NOT NULL, "tilesTotal" integer NOT NULL, "tilesDone" integer NOT NULL DEFAULT (0), "contentHash" varchar(64) NOT NULL, "storageKey" varchar(200), "error" varchar(500), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "finishedAt" datetime, CONSTRAINT "FK_365c19a078c2e601f33515f7faa" FOREIGN KEY ("deckId") REFERENCES "decks" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_plans"("id", "deckId", "status", "originalName", "mimeType", "byteSize", "width", "height", "maxZoom", "tilesTotal", "tilesDone", "contentHash", "storageKey", "error", "uploadedById", "createdAt", "finishedAt") SELECT "id", "deckId", "status", "originalName", "mimeType", "byteSize", "width", "height", "maxZoom", "tilesTotal", "tilesDone", "contentHash", "storageKey", "error", "uploadedById", "createdAt", "finishedAt" FROM "plans"`);
        await queryRunner.query(`DROP TABLE "plans"`);
        await queryRunner.query(`ALTER TABLE "temporary_plans" RENAME TO "plans"`);
        await queryRunner.query(`CREATE INDEX "IDX_365c19a078c2e601f33515f7fa" ON "plans" ("deckId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_365c19a078c2e601f33515f7fa"`);
        await queryRunner.query(`ALTER TABLE "plans" RENAME TO "temporary_plans"`);
        await queryRunner.query(`CREATE TABLE "plans" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "deckId" integer NOT NULL, "status" varchar(20) NOT NULL, "originalName" varchar(200) NOT NULL, "mimeType" varchar(40) NOT NULL, "byteSize" integer NOT NULL, "width" integer NOT NULL, "height" integer NOT NULL, "maxZoom" integer NOT NULL, "tilesTotal" integer NOT NULL, "tilesDone" integer NOT NULL DEFAULT (0), "contentHash" varchar(64) NOT NULL, "storageKey" varchar(200), "error" varchar(500), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "finishedAt" datetime)`);
        await queryRunner.query(`INSERT INTO "plans"("id", "deckId", "status", "originalName", "mimeType", "byteSize", "width", "height", "maxZoom", "tilesTotal", "tilesDone", "contentHash", "storageKey", "error", "uploadedById", "createdAt", "finishedAt") SELECT "id", "deckId", "status", "originalName", "mimeType", "byteSize", "width", "height", "maxZoom", "tilesTotal", "tilesDone", "contentHash", "storageKey", "error", "uploadedById", "createdAt", "finishedAt" FROM "temporary_plans"`);
        await queryRunner.query(`DROP TABLE "temporary_plans"`);
        await queryRunner.query(`CREATE INDEX "IDX_365c19a078c2e601f33515f7fa" ON "plans" ("deckId") `);
        await queryRunner.query(`DROP INDEX "IDX_365c19a078c2e601f33515f7fa"`);
        await queryRunner.query(`DROP TABLE "plans"`);
    }

}
