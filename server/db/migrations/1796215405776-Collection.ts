import { MigrationInterface, QueryRunner } from "typeorm";

export class Collection1796215405776 implements MigrationInterface {
    name = 'Collection1796215405776'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "artifacts" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "objectNumber" varchar(40) NOT NULL, "objectNumberSort" varchar(120) NOT NULL, "name" varchar(160) NOT NULL, "category" varchar(40) NOT NULL, "description" text NOT NULL DEFAULT (''), "dateOrPeriod" varchar(80) NOT NULL DEFAULT (''), "maker" varchar(200) NOT NULL DEFAULT (''), "materials" varchar(400) NOT NULL DEFAULT (''), "height" real, "width" real, "depth" real, "dimensionUnit" varchar(4) NOT NULL DEFAULT ('cm'), "significance" text NOT NULL DEFAULT (''), "status" varchar(20) NOT NULL DEFAULT ('in-place'), "deaccessionReason" text, "compartmentId" integer, "point" text, "coverMediaId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_4fc9f8b0b1f1465118712233ad" ON "artifacts" ("compartmentId") `);
        await queryRunner.query(`CREATE INDEX "IDX_41bde8ffece96f88c75e9d0133" ON "artifacts" ("vesselId", "updatedAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_f97c539ab76b211d20facbb6fe" ON "artifacts" ("vesselId", "name") `);
        await queryRunner.query(`CREATE INDEX "IDX_362c9f09516fbdd2c0613bedaa" ON "artifacts" ("vesselId", "status") `);
        await queryRunner.query(`CREATE INDEX "IDX_8b778ae08de548acf1a97ae7e4" ON "artifacts" ("vesselId", "category") `);
        await queryRunner.query(`CREATE INDEX "IDX_e87844a564f3a1a18751d7c61b" ON "artifacts" ("vesselId", "objectNumberSort") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_093b946c1ed360702620867d8c" ON "artifacts" ("vesselId", "objectNumber") `);
        await queryRunner.query(`CREATE TABLE "artifact_moves" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "artifactId" integer NOT NULL, "kind" varchar(20) NOT NULL, "movedOn" varchar(10) NOT NULL, "fromStatus" varchar(20), "fromCompartmentId" integer, "fromLabel" varchar(200), "fromPoint" text, "toStatus" varchar(20) NOT NULL, "toCompartmentId" integer, "toLabel" varchar(200), "toPoint" text, "reason" text NOT NULL, "actorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`CREATE INDEX "IDX_a7c1b36b2bc2afde16da69bf32" ON "artifact_moves" ("artifactId", "movedOn") `);
        await queryRunner.query(`CREATE TABLE "media" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "ownerType" varchar(20) NOT NULL, "ownerId" integer NOT NULL, "kind" varchar(10) NOT NULL, "mimeType" varchar(40) NOT NULL, "fileName" varchar(255) NOT NULL, "byteSize" integer NOT NULL, "sha256" varchar(64) NOT NULL, "storageKey" varchar(200) NOT NULL, "width" integer, "height" integer, "takenAt" varchar(19), "caption" varchar(500) NOT NULL DEFAULT (''), "credit" varchar(200) NOT NULL DEFAULT (''), "altText" varchar(300) NOT NULL DEFAULT (''), "rights" varchar(500) NOT NULL DEFAULT (''), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_89db8720bd9718c66dafea2e14" ON "media" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_1d7059788a50a43fab4781a037" ON "media" ("ownerType", "ownerId") `);
        await queryRunner.query(`CREATE TABLE "temporary_organisation_settings" ("id" integer PRIMARY KEY NOT NULL, "organisationName" varchar(160) NOT NULL, "country" varchar(2) NOT NULL DEFAULT ('US'), "currency" varchar(3) NOT NULL DEFAULT ('USD'), "unitSystem" varchar(20) NOT NULL DEFAULT ('us-customary'), "contactEmail" varchar(254) NOT NULL DEFAULT (''), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, "objectNumberPattern" varchar(40) NOT NULL DEFAULT ('YYYY.N.N'))`);
        await queryRunner.query(`INSERT INTO "temporary_organisation_settings"("id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version") SELECT "id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version" FROM "organisation_settings"`);
        await queryRunner.query(`DROP TABLE "organisation_settings"`);
        await queryRunner.query(`ALTER TABLE "temporary_organisation_settings" RENAME TO "organisation_settings"`);
        await queryRunner.query(`DROP INDEX "IDX_4fc9f8b0b1f1465118712233ad"`);
        await queryRunner.query(`DROP INDEX "IDX_41bde8ffece96f88c75e9d0133"`);
        await queryRunner.query(`DROP INDEX "IDX_f97c539ab76b211d20facbb6fe"`);
        await queryRunner.query(`DROP INDEX "IDX_362c9f09516fbdd2c0613bedaa"`);
        await queryRunner.query(`DROP INDEX "IDX_8b778ae08de548acf1a97ae7e4"`);
        await queryRunner.query(`DROP INDEX "IDX_e87844a564f3a1a18751d7c61b"`);
        await queryRunner.query(`DROP INDEX "IDX_093b946c1ed360702620867d8c"`);
        await queryRunner.query(`CREATE TABLE "temporary_artifacts" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "objectNumber" varchar(40) NOT NULL, "objectNumberSort" varchar(120) NOT NULL, "name" varchar(160) NOT NULL, "category" varchar(40) NOT NULL, "description" text NOT NULL DEFAULT (''), "dateOrPeriod" varchar(80) NOT NULL DEFAULT (''), "maker" varchar(200) NOT NULL DEFAULT (''), "materials" varchar(400) NOT NULL DEFAULT (''), "height" real, "width" real, "depth" real, "dimensionUnit" varchar(4) NOT NULL DEFAULT ('cm'), "significance" text NOT NULL DEFAULT (''), "status" varchar(20) NOT NULL DEFAULT ('in-place'), "deaccessionReason" text, "compartmentId" integer, "point" text, "coverMediaId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_70d1c7203c1648bb415b79a6a65" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_4fc9f8b0b1f1465118712233ad1" FOREIGN KEY ("compartmentId") REFERENCES "compartments" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_artifacts"("id", "vesselId", "objectNumber", "objectNumberSort", "name", "category", "description", "dateOrPeriod", "maker", "materials", "height", "width", "depth", "dimensionUnit", "significance", "status", "deaccessionReason", "compartmentId", "point", "coverMediaId", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "objectNumber", "objectNumberSort", "name", "category", "description", "dateOrPeriod", "maker", "materials", "height", "width", "depth", "dimensionUnit", "significance", "status", "deaccessionReason", "compartmentId", "point", "coverMediaId", "createdAt", "updatedAt", "version" FROM "artifacts"`);
        await queryRunner.query(`DROP TABLE "artifacts"`);
        await queryRunner.query(`ALTER TABLE "temporary_artifacts" RENAME TO "artifacts"`);
        await queryRunner.query(`CREATE INDEX "IDX_4fc9f8b0b1f1465118712233ad" ON "artifacts" ("compartmentId") `);
        await queryRunner.query(`CREATE INDEX "IDX_41bde8ffece96f88c75e9d0133" ON "artifacts" ("vesselId", "updatedAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_f97c539ab76b211d20facbb6fe" ON "artifacts" ("vesselId", "name") `);
        await queryRunner.query(`CREATE INDEX "IDX_362c9f09516fbdd2c0613bedaa" ON "artifacts" ("vesselId", "status") `);
        await queryRunner.query(`CREATE INDEX "IDX_8b778ae08de548acf1a97ae7e4" ON "artifacts" ("vesselId", "category") `);
        await queryRunner.query(`CREATE INDEX "IDX_e87844a564f3a1a18751d7c61b" ON "artifacts" ("vesselId", "objectNumberSort") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_093b946c1ed360702620867d8c" ON "artifacts" ("vesselId", "objectNumber") `);
        await queryRunner.query(`DROP INDEX "IDX_a7c1b36b2bc2afde16da69bf32"`);
        await queryRunner.query(`CREATE TABLE "temporary_artifact_moves" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "artifactId" integer NOT NULL, "kind" varchar(20) NOT NULL, "movedOn" varchar(10) NOT NULL, "fromStatus" varchar(20), "fromCompartmentId" integer, "fromLabel" varchar(200), "fromPoint" text, "toStatus" varchar(20) NOT NULL, "toCompartmentId" integer, "toLabel" varchar(200), "toPoint" text, "reason" text NOT NULL, "actorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_43c3f14fcf6347c129a9f4ede98" FOREIGN KEY ("artifactId") REFERENCES "artifacts" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_e0fdfdff91d746ce9e751dfd6f2" FOREIGN KEY ("actorId") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_artifact_moves"("id", "artifactId", "kind", "movedOn", "fromStatus", "fromCompartmentId", "fromLabel", "fromPoint", "toStatus", "toCompartmentId", "toLabel", "toPoint", "reason", "actorId", "createdAt") SELECT "id", "artifactId", "kind", "movedOn", "fromStatus", "fromCompartmentId", "fromLabel", "fromPoint", "toStatus", "toCompartmentId", "toLabel", "toPoint", "reason", "actorId", "createdAt" FROM "artifact_moves"`);
        await queryRunner.query(`DROP TABLE "artifact_moves"`);
        await queryRunner.query(`ALTER TABLE "temporary_artifact_moves" RENAME TO "artifact_moves"`);
        await queryRunner.query(`CREATE INDEX "IDX_a7c1b36b2bc2afde16da69bf32" ON "artifact_moves" ("artifactId", "movedOn") `);
        await queryRunner.query(`DROP INDEX "IDX_89db8720bd9718c66dafea2e14"`);
        await queryRunner.query(`DROP INDEX "IDX_1d7059788a50a43fab4781a037"`);
        await queryRunner.query(`CREATE TABLE "temporary_media" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "ownerType" varchar(20) NOT NULL, "ownerId" integer NOT NULL, "kind" varchar(10) NOT NULL, "mimeType" varchar(40) NOT NULL, "fileName" varchar(255) NOT NULL, "byteSize" integer NOT NULL, "sha256" varchar(64) NOT NULL, "storageKey" varchar(200) NOT NULL, "width" integer, "height" integer, "takenAt" varchar(19), "caption" varchar(500) NOT NULL DEFAULT (''), "credit" varchar(200) NOT NULL DEFAULT (''), "altText" varchar(300) NOT NULL DEFAULT (''), "rights" varchar(500) NOT NULL DEFAULT (''), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_89db8720bd9718c66dafea2e144" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_4974d31d47717ebefc8b613eb27" FOREIGN KEY ("uploadedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_media"("id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version" FROM "media"`);
        await queryRunner.query(`DROP TABLE "media"`);
        await queryRunner.query(`ALTER TABLE "temporary_media" RENAME TO "media"`);
        await queryRunner.query(`CREATE INDEX "IDX_89db8720bd9718c66dafea2e14" ON "media" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_1d7059788a50a43fab4781a037" ON "media" ("ownerType", "ownerId") `);
        // Written by hand: the full-text index is not an entity (server/search/search-index.ts).
        await queryRunner.query(`CREATE VIRTUAL TABLE "search_documents" USING fts5(kind UNINDEXED, record_id UNINDEXED, vessel_id UNINDEXED, scope, number, title, body, extra, tokenize = 'unicode61 remove_diacritics 2', prefix = '2 3')`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP TABLE "search_documents"`);
        await queryRunner.query(`DROP INDEX "IDX_1d7059788a50a43fab4781a037"`);
        await queryRunner.query(`DROP INDEX "IDX_89db8720bd9718c66dafea2e14"`);
        await queryRunner.query(`ALTER TABLE "media" RENAME TO "temporary_media"`);
        await queryRunner.query(`CREATE TABLE "media" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "ownerType" varchar(20) NOT NULL, "ownerId" integer NOT NULL, "kind" varchar(10) NOT NULL, "mimeType" varchar(40) NOT NULL, "fileName" varchar(255) NOT NULL, "byteSize" integer NOT NULL, "sha256" varchar(64) NOT NULL, "storageKey" varchar(200) NOT NULL, "width" integer, "height" integer, "takenAt" varchar(19), "caption" varchar(500) NOT NULL DEFAULT (''), "credit" varchar(200) NOT NULL DEFAULT (''), "altText" varchar(300) NOT NULL DEFAULT (''), "rights" varchar(500) NOT NULL DEFAULT (''), "uploadedById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "media"("id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "width", "height", "takenAt", "caption", "credit", "altText", "rights", "uploadedById", "createdAt", "updatedAt", "version" FROM "temporary_media"`);
        await queryRunner.query(`DROP TABLE "temporary_media"`);
        await queryRunner.query(`CREATE INDEX "IDX_1d7059788a50a43fab4781a037" ON "media" ("ownerType", "ownerId") `);
        await queryRunner.query(`CREATE INDEX "IDX_89db8720bd9718c66dafea2e14" ON "media" ("vesselId") `);
        await queryRunner.query(`DROP INDEX "IDX_a7c1b36b2bc2afde16da69bf32"`);
        await queryRunner.query(`ALTER TABLE "artifact_moves" RENAME TO "temporary_artifact_moves"`);
        await queryRunner.query(`CREATE TABLE "artifact_moves" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "artifactId" integer NOT NULL, "kind" varchar(20) NOT NULL, "movedOn" varchar(10) NOT NULL, "fromStatus" varchar(20), "fromCompartmentId" integer, "fromLabel" varchar(200), "fromPoint" text, "toStatus" varchar(20) NOT NULL, "toCompartmentId" integer, "toLabel" varchar(200), "toPoint" text, "reason" text NOT NULL, "actorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`INSERT INTO "artifact_moves"("id", "artifactId", "kind", "movedOn", "fromStatus", "fromCompartmentId", "fromLabel", "fromPoint", "toStatus", "toCompartmentId", "toLabel", "toPoint", "reason", "actorId", "createdAt") SELECT "id", "artifactId", "kind", "movedOn", "fromStatus", "fromCompartmentId", "fromLabel", "fromPoint", "toStatus", "toCompartmentId", "toLabel", "toPoint", "reason", "actorId", "createdAt" FROM "temporary_artifact_moves"`);
        await queryRunner.query(`DROP TABLE "temporary_artifact_moves"`);
        await queryRunner.query(`CREATE INDEX "IDX_a7c1b36b2bc2afde16da69bf32" ON "artifact_moves" ("artifactId", "movedOn") `);
        await queryRunner.query(`DROP INDEX "IDX_093b946c1ed360702620867d8c"`);
        await queryRunner.query(`DROP INDEX "IDX_e87844a564f3a1a18751d7c61b"`);
        await queryRunner.query(`DROP INDEX "IDX_8b778ae08de548acf1a97ae7e4"`);
        await queryRunner.query(`DROP INDEX "IDX_362c9f09516fbdd2c0613bedaa"`);
        await queryRunner.query(`DROP INDEX "IDX_f97c539ab76b211d20facbb6fe"`);
        await queryRunner.query(`DROP INDEX "IDX_41bde8ffece96f88c75e9d0133"`);
        await queryRunner.query(`DROP INDEX "IDX_4fc9f8b0b1f1465118712233ad"`);
        await queryRunner.query(`ALTER TABLE "artifacts" RENAME TO "temporary_artifacts"`);
        await queryRunner.query(`CREATE TABLE "artifacts" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "objectNumber" varchar(40) NOT NULL, "objectNumberSort" varchar(120) NOT NULL, "name" varchar(160) NOT NULL, "category" varchar(40) NOT NULL, "description" text NOT NULL DEFAULT (''), "dateOrPeriod" varchar(80) NOT NULL DEFAULT (''), "maker" varchar(200) NOT NULL DEFAULT (''), "materials" varchar(400) NOT NULL DEFAULT (''), "height" real, "width" real, "depth" real, "dimensionUnit" varchar(4) NOT NULL DEFAULT ('cm'), "significance" text NOT NULL DEFAULT (''), "status" varchar(20) NOT NULL DEFAULT ('in-place'), "deaccessionReason" text, "compartmentId" integer, "point" text, "coverMediaId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "artifacts"("id", "vesselId", "objectNumber", "objectNumberSort", "name", "category", "description", "dateOrPeriod", "maker", "materials", "height", "width", "depth", "dimensionUnit", "significance", "status", "deaccessionReason", "compartmentId", "point", "coverMediaId", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "objectNumber", "objectNumberSort", "name", "category", "description", "dateOrPeriod", "maker", "materials", "height", "width", "depth", "dimensionUnit", "significance", "status", "deaccessionReason", "compartmentId", "point", "coverMediaId", "createdAt", "updatedAt", "version" FROM "temporary_artifacts"`);
        await queryRunner.query(`DROP TABLE "temporary_artifacts"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_093b946c1ed360702620867d8c" ON "artifacts" ("vesselId", "objectNumber") `);
        await queryRunner.query(`CREATE INDEX "IDX_e87844a564f3a1a18751d7c61b" ON "artifacts" ("vesselId", "objectNumberSort") `);
        await queryRunner.query(`CREATE INDEX "IDX_8b778ae08de548acf1a97ae7e4" ON "artifacts" ("vesselId", "category") `);
        await queryRunner.query(`CREATE INDEX "IDX_362c9f09516fbdd2c0613bedaa" ON "artifacts" ("vesselId", "status") `);
        await queryRunner.query(`CREATE INDEX "IDX_f97c539ab76b211d20facbb6fe" ON "artifacts" ("vesselId", "name") `);
        await queryRunner.query(`CREATE INDEX "IDX_41bde8ffece96f88c75e9d0133" ON "artifacts" ("vesselId", "updatedAt") `);
        await queryRunner.query(`CREATE INDEX "IDX_4fc9f8b0b1f1465118712233ad" ON "artifacts" ("compartmentId") `);
        await queryRunner.query(`ALTER TABLE "organisation_settings" RENAME TO "temporary_organisation_settings"`);
        await queryRunner.query(`CREATE TABLE "organisation_settings" ("id" integer PRIMARY KEY NOT NULL, "organisationName" varchar(160) NOT NULL, "country" varchar(2) NOT NULL DEFAULT ('US'), "currency" varchar(3) NOT NULL DEFAULT ('USD'), "unitSystem" varchar(20) NOT NULL DEFAULT ('us-customary'), "contactEmail" varchar(254) NOT NULL DEFAULT (''), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "organisation_settings"("id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version") SELECT "id", "organisationName", "country", "currency", "unitSystem", "contactEmail", "updatedAt", "version" FROM "temporary_organisation_settings"`);
        await queryRunner.query(`DROP TABLE "temporary_organisation_settings"`);
        await queryRunner.query(`DROP INDEX "IDX_1d7059788a50a43fab4781a037"`);
        await queryRunner.query(`DROP INDEX "IDX_89db8720bd9718c66dafea2e14"`);
        await queryRunner.query(`DROP TABLE "media"`);
        await queryRunner.query(`DROP INDEX "IDX_a7c1b36b2bc2afde16da69bf32"`);
        await queryRunner.query(`DROP TABLE "artifact_moves"`);
        await queryRunner.query(`DROP INDEX "IDX_093b946c1ed360702620867d8c"`);
        await queryRunner.query(`DROP INDEX "IDX_e87844a564f3a1a18751d7c61b"`);
        await queryRunner.query(`DROP INDEX "IDX_8b778ae08de548acf1a97ae7e4"`);
        await queryRunner.query(`DROP INDEX "IDX_362c9f09516fbdd2c0613bedaa"`);
        await queryRunner.query(`DROP INDEX "IDX_f97c539ab76b211d20facbb6fe"`);
        await queryRunner.query(`DROP INDEX "IDX_41bde8ffece96f88c75e9d0133"`);
        await queryRunner.query(`DROP INDEX "IDX_4fc9f8b0b1f1465118712233ad"`);
        await queryRunner.query(`DROP TABLE "artifacts"`);
    }

}
