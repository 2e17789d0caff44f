import { MigrationInterface, QueryRunner } from "typeorm";

export class MediaPublicUse1796286347768 implements MigrationInterface {
    name = 'MediaPublicUse1796286347768'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_1d7059788a50a43fab4781a037"`);
        await queryRunner.query(`DROP INDEX "IDX_89db8720bd9718c66dafea2e14"`);
        await queryRunner.query(`CREATE TABLE "temporary_media" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "ownerType" varchar(20) NOT NULL, "ownerId" integer NOT NULL, "kind" varchar(10) NOT NULL, "mimeType" varchar(40) NOT NULL, "fileName" varchar(255) NOT NULL, "byteSize" integer NOT NULL, "sha256" varchar(64) NOT NULL, "storageKey" varchar(200) NOT NULL, "width" integer, "height" integer, "takenAt" varchar(19), "caption" varchar(500) NOT NULL DEFAULT (''), "credit" varchar(200) NOT NULL DEFAULT (''), "altText" varchar(300) NOT NULL DEFAULT (''), "rights" varchar(500) NOT NULL DEFAULT (''), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "publicUse" boolean NOT NULL DEFAULT (0), CONSTRAINT "FK_4974d31d47717ebefc8b613eb27" FOREIGN KEY ("uploadedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_89db8720bd9718c66dafea2e144" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        // hand-edited: photos that were publishable before (an artifact's or compartment's, with alt text) stay so
        await queryRunner.query(`INSERT INTO "temporary_media"("id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version", "publicUse") SELECT "id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version", CASE WHEN "kind" = 'photo' AND "ownerType" IN ('artifact', 'compartment') AND "altText" != '' THEN 1 ELSE 0 END FROM "media"`);
        await queryRunner.query(`DROP TABLE "media"`);
        await queryRunner.query(`ALTER TABLE "temporary_media" RENAME TO "media"`);
        await queryRunner.query(`CREATE INDEX "IDX_1d7059788a50a43fab4781a037" ON "media" ("ownerType", "ownerId") `);
        await queryRunner.query(`CREATE INDEX "IDX_89db8720bd9718c66dafea2e14" ON "media" ("vesselId") `);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX "IDX_89db8720bd9718c66dafea2e14"`);
        await queryRunner.query(`DROP INDEX "IDX_1d7059788a50a43fab4781a037"`);
        await queryRunner.query(`ALTER TABLE "media" RENAME TO "temporary_media"`);
        await queryRunner.query(`CREATE TABLE "media" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "ownerType" varchar(20) NOT NULL, "ownerId" integer NOT NULL, "kind" varchar(10) NOT NULL, "mimeType" varchar(40) NOT NULL, "fileName" varchar(255) NOT NULL, "byteSize" integer NOT NULL, "sha256" varchar(64) NOT NULL, "storageKey" varchar(200) NOT NULL, "width" integer, "height" integer, "takenAt" varchar(19), "caption" varchar(500) NOT NULL DEFAULT (''), "credit" varchar(200) NOT NULL DEFAULT (''), "altText" varchar(300) NOT NULL DEFAULT (''), "rights" varchar(500) NOT NULL DEFAULT (''), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_4974d31d47717ebefc8b613eb27" FOREIGN KEY ("uploadedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_89db8720bd9718c66dafea2e144" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "media"("id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version" FROM "temporary_media"`);
        await queryRunner.query(`DROP TABLE "temporary_media"`);
        await queryRunner.query(`CREATE INDEX "IDX_89db8720bd9718c66dafea2e14" ON "media" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_1d7059788a50a43fab4781a037" ON "media" ("ownerType", "ownerId") `);
    }

}
