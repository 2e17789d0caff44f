import { MigrationInterface, QueryRunner } from "typeorm";

export class Tours1796410076474 implements MigrationInterface {
    name = 'Tours1796410076474'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "tours" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "title" varchar(160) NOT NULL, "slug" varchar(80) NOT NULL, "summary" text NOT NULL DEFAULT (''), "audience" varchar(20) NOT NULL DEFAULT ('general'), "mode" varchar(20) NOT NULL DEFAULT ('on-board'), "accessibility" varchar(20) NOT NULL DEFAULT ('some-stairs'), "coverMediaId" integer, "language" varchar(10) NOT NULL DEFAULT ('en'), "state" varchar(20) NOT NULL DEFAULT ('draft'), "revision" integer NOT NULL DEFAULT (0), "publishedSnapshot" text, "publishedRevision" integer, "publishedAt" datetime, "submittedById" integer, "submittedAt" datetime, "createdById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_1ef3b11928651065f9d41810c6" ON "tours" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_9cd736a85d59e9c3b6dbd61656" ON "tours" ("state") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_85d1d463126bc5cef98f6d0b15" ON "tours" ("vesselId", "slug") `);
        await queryRunner.query(`CREATE TABLE "tour_stops" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "position" integer NOT NULL, "compartmentId" integer NOT NULL, "artifactIds" text NOT NULL DEFAULT ('[]'), "title" varchar(160) NOT NULL, "textDoc" text NOT NULL, "textHtml" text NOT NULL DEFAULT (''), "textPlain" text NOT NULL DEFAULT (''), "audioMediaId" integer, "transcript" text NOT NULL DEFAULT (''), "dwellMinutes" integer NOT NULL DEFAULT (3), "accessNotes" text NOT NULL DEFAULT (''), "lookFor" text NOT NULL DEFAULT (''), "virtual" boolean NOT NULL DEFAULT (0), "point" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`CREATE INDEX "IDX_a53b1fc02c1473e622800a0011" ON "tour_stops" ("compartmentId") `);
        await queryRunner.query(`CREATE INDEX "IDX_8586c33a451fc4c5e5e606799c" ON "tour_stops" ("tourId", "position") `);
        await queryRunner.query(`CREATE TABLE "tour_revisions" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "number" integer NOT NULL, "note" varchar(300) NOT NULL, "snapshot" text NOT NULL, "authorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_551c75c3b9e729d58fe2496380" ON "tour_revisions" ("tourId", "number") `);
        await queryRunner.query(`CREATE TABLE "tour_comments" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "stopId" integer, "body" text NOT NULL, "revision" integer NOT NULL, "authorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`CREATE INDEX "IDX_e10a2bac1d38bd9ae14a746748" ON "tour_comments" ("tourId") `);
        await queryRunner.query(`CREATE TABLE "tour_route_settings" ("vesselId" integer PRIMARY KEY NOT NULL, "walkingPaceMetresPerSecond" real NOT NULL DEFAULT (0.5), "deckChangeMetres" real NOT NULL DEFAULT (10), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`DROP INDEX "IDX_1ef3b11928651065f9d41810c6"`);
        await queryRunner.query(`DROP INDEX "IDX_9cd736a85d59e9c3b6dbd61656"`);
        await queryRunner.query(`DROP INDEX "IDX_85d1d463126bc5cef98f6d0b15"`);
        await queryRunner.query(`CREATE TABLE "temporary_tours" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "title" varchar(160) NOT NULL, "slug" varchar(80) NOT NULL, "summary" text NOT NULL DEFAULT (''), "audience" varchar(20) NOT NULL DEFAULT ('general'), "mode" varchar(20) NOT NULL DEFAULT ('on-board'), "accessibility" varchar(20) NOT NULL DEFAULT ('some-stairs'), "coverMediaId" integer, "language" varchar(10) NOT NULL DEFAULT ('en'), "state" varchar(20) NOT NULL DEFAULT ('draft'), "revision" integer NOT NULL DEFAULT (0), "publishedSnapshot" text, "publishedRevision" integer, "publishedAt" datetime, "submittedById" integer, "submittedAt" datetime, "createdById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_1ef3b11928651065f9d41810c61" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_4a3e847dc17f535e47047016c9c" FOREIGN KEY ("submittedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_tours"("id", "vesselId", "title", "slug", "summary", "audience", "mode", "accessibility", "coverMediaId", "language", "state", "revision", "publishedSnapshot", "publishedRevision", "publishedAt", "submittedById", "submittedAt", "createdById", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "title", "slug", "summary", "audience", "mode", "accessibility", "coverMediaId", "language", "state", "revision", "publishedSnapshot", "publishedRevision", "publishedAt", "submittedById", "submittedAt", "createdById", "createdAt", "updatedAt", "version" FROM "tours"`);
        await queryRunner.query(`DROP TABLE "tours"`);
        await queryRunner.query(`ALTER TABLE "temporary_tours" RENAME TO "tours"`);
        await queryRunner.query(`CREATE INDEX "IDX_1ef3b11928651065f9d41810c6" ON "tours" ("vesselId") `);
        await queryRunner.query(`CREATE INDEX "IDX_9cd736a85d59e9c3b6dbd61656" ON "tours" ("state") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_85d1d463126bc5cef98f6d0b15" ON "tours" ("vesselId", "slug") `);
        await queryRunner.query(`DROP INDEX "IDX_a53b1fc02c1473e622800a0011"`);
        await queryRunner.query(`DROP INDEX "IDX_8586c33a451fc4c5e5e606799c"`);
        await queryRunner.query(`CREATE TABLE "temporary_tour_stops" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "position" integer NOT NULL, "compartmentId" integer NOT NULL, "artifactIds" text NOT NULL DEFAULT ('[]'), "title" varchar(160) NOT NULL, "textDoc" text NOT NULL, "textHtml" text NOT NULL DEFAULT (''), "textPlain" text NOT NULL DEFAULT (''), "audioMediaId" integer, "transcript" text NOT NULL DEFAULT (''), "dwellMinutes" integer NOT NULL DEFAULT (3), "accessNotes" text NOT NULL DEFAULT (''), "lookFor" text NOT NULL DEFAULT (''), "virtual" boolean NOT NULL DEFAULT (0), "point" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_1e5c3a823a37245456e210fd19b" FOREIGN KEY ("tourId") REFERENCES "tours" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_a53b1fc02c1473e622800a0011d" FOREIGN KEY ("compartmentId") REFERENCES "compartments" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_tour_stops"("id", "tourId", "position", "compartmentId", "artifactIds", "title", "textDoc", "textHtml", "textPlain", "audioMediaId", "transcript", "dwellMinutes", "accessNotes", "lookFor", "virtual", "point", "createdAt", "updatedAt", "version") SELECT "id", "tourId", "position", "compartmentId", "artifactIds", "title", "textDoc", "textHtml", "textPlain", "audioMediaId", "transcript", "dwellMinutes", "accessNotes", "lookFor", "virtual", "point", "createdAt", "updatedAt", "version" FROM "tour_stops"`);
        await queryRunner.query(`DROP TABLE "tour_stops"`);
        await queryRunner.query(`ALTER TABLE "temporary_tour_stops" RENAME TO "tour_stops"`);
        await queryRunner.query(`CREATE INDEX "IDX_a53b1fc02c1473e622800a0011" ON "tour_stops" ("compartmentId") `);
        await queryRunner.query(`CREATE INDEX "IDX_8586c33a451fc4c5e5e606799c" ON "tour_stops" ("tourId", "position") `);
        await queryRunner.query(`DROP INDEX "IDX_551c75c3b9e729d58fe2496380"`);
        await queryRunner.query(`CREATE TABLE "temporary_tour_revisions" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "number" integer NOT NULL, "note" varchar(300) NOT NULL, "snapshot" text NOT NULL, "authorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_02165e846c1ce15bfc4b3f630da" FOREIGN KEY ("tourId") REFERENCES "tours" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_0eb5cfa216747f0532add8e529a" FOREIGN KEY ("authorId") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_tour_revisions"("id", "tourId", "number", "note", "snapshot", "authorId", "createdAt") SELECT "id", "tourId", "number", "note", "snapshot", "authorId", "createdAt" FROM "tour_revisions"`);
        await queryRunner.query(`DROP TABLE "tour_revisions"`);
        await queryRunner.query(`ALTER TABLE "temporary_tour_revisions" RENAME TO "tour_revisions"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_551c75c3b9e729d58fe2496380" ON "tour_revisions" ("tourId", "number") `);
        await queryRunner.query(`DROP INDEX "IDX_e10a2bac1d38bd9ae14a746748"`);
        await queryRunner.query(`CREATE TABLE "temporary_tour_comments" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "stopId" integer, "body" text NOT NULL, "revision" integer NOT NULL, "authorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_e10a2bac1d38bd9ae14a7467482" FOREIGN KEY ("tourId") REFERENCES "tours" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_5afd9f69651903e7d5df0475711" FOREIGN KEY ("authorId") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_tour_comments"("id", "tourId", "stopId", "body", "revision", "authorId", "createdAt") SELECT "id", "tourId", "stopId", "body", "revision", "authorId", "createdAt" FROM "tour_comments"`);
        await queryRunner.query(`DROP TABLE "tour_comments"`);
        await queryRunner.query(`ALTER TABLE "temporary_tour_comments" RENAME TO "tour_comments"`);
        await queryRunner.query(`CREATE INDEX "IDX_e10a2bac1d38bd9ae14a746748" ON "tour_comments" ("tourId") `);
        await queryRunner.query(`CREATE TABLE "temporary_tour_route_settings" ("vesselId" integer PRIMARY KEY NOT NULL, "walkingPaceMetresPerSecond" real NOT NULL DEFAULT (0.5), "deckChangeMetres" real NOT NULL DEFAULT (10), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL, CONSTRAINT "FK_7abf8a0175849101ab6b87237a7" FOREIGN KEY ("vesselId") REFERENCES "vessels" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`);
        await queryRunner.query(`INSERT INTO "temporary_tour_route_settings"("vesselId", "walkingPaceMetresPerSecond", "deckChangeMetres", "updatedAt", "version") SELECT "vesselId", "walkingPaceMetresPerSecond", "deckChangeMetres", "updatedAt", "version" FROM "tour_route_settings"`);
        await queryRunner.query(`DROP TABLE "tour_route_settings"`);
        await queryRunner.query(`ALTER TABLE "temporary_tour_route_settings" RENAME TO "tour_route_settings"`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "tour_route_settings" RENAME TO "temporary_tour_route_settings"`);
        await queryRunner.query(`CREATE TABLE "tour_route_settings" ("vesselId" integer PRIMARY KEY NOT NULL, "walkingPaceMetresPerSecond" real NOT NULL DEFAULT (0.5), "deckChangeMetres" real NOT NULL DEFAULT (10), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "tour_route_settings"("vesselId", "walkingPaceMetresPerSecond", "deckChangeMetres", "updatedAt", "version") SELECT "vesselId", "walkingPaceMetresPerSecond", "deckChangeMetres", "updatedAt", "version" FROM "temporary_tour_route_settings"`);
        await queryRunner.query(`DROP TABLE "temporary_tour_route_settings"`);
        await queryRunner.query(`DROP INDEX "IDX_e10a2bac1d38bd9ae14a746748"`);
        await queryRunner.query(`ALTER TABLE "tour_comments" RENAME TO "temporary_tour_comments"`);
        await queryRunner.query(`CREATE TABLE "tour_comments" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "stopId" integer, "body" text NOT NULL, "revision" integer NOT NULL, "authorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`INSERT INTO "tour_comments"("id", "tourId", "stopId", "body", "revision", "authorId", "createdAt") SELECT "id", "tourId", "stopId", "body", "revision", "authorId", "createdAt" FROM "temporary_tour_comments"`);
        await queryRunner.query(`DROP TABLE "temporary_tour_comments"`);
        await queryRunner.query(`CREATE INDEX "IDX_e10a2bac1d38bd9ae14a746748" ON "tour_comments" ("tourId") `);
        await queryRunner.query(`DROP INDEX "IDX_551c75c3b9e729d58fe2496380"`);
        await queryRunner.query(`ALTER TABLE "tour_revisions" RENAME TO "temporary_tour_revisions"`);
        await queryRunner.query(`CREATE TABLE "tour_revisions" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "number" integer NOT NULL, "note" varchar(300) NOT NULL, "snapshot" text NOT NULL, "authorId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')))`);
        await queryRunner.query(`INSERT INTO "tour_revisions"("id", "tourId", "number", "note", "snapshot", "authorId", "createdAt") SELECT "id", "tourId", "number", "note", "snapshot", "authorId", "createdAt" FROM "temporary_tour_revisions"`);
        await queryRunner.query(`DROP TABLE "temporary_tour_revisions"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_551c75c3b9e729d58fe2496380" ON "tour_revisions" ("tourId", "number") `);
        await queryRunner.query(`DROP INDEX "IDX_8586c33a451fc4c5e5e606799c"`);
        await queryRunner.query(`DROP INDEX "IDX_a53b1fc02c1473e622800a0011"`);
        await queryRunner.query(`ALTER TABLE "tour_stops" RENAME TO "temporary_tour_stops"`);
        await queryRunner.query(`CREATE TABLE "tour_stops" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "tourId" integer NOT NULL, "position" integer NOT NULL, "compartmentId" integer NOT NULL, "artifactIds" text NOT NULL DEFAULT ('[]'), "title" varchar(160) NOT NULL, "textDoc" text NOT NULL, "textHtml" text NOT NULL DEFAULT (''), "textPlain" text NOT NULL DEFAULT (''), "audioMediaId" integer, "transcript" text NOT NULL DEFAULT (''), "dwellMinutes" integer NOT NULL DEFAULT (3), "accessNotes" text NOT NULL DEFAULT (''), "lookFor" text NOT NULL DEFAULT (''), "virtual" boolean NOT NULL DEFAULT (0), "point" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "tour_stops"("id", "tourId", "position", "compartmentId", "artifactIds", "title", "textDoc", "textHtml", "textPlain", "audioMediaId", "transcript", "dwellMinutes", "accessNotes", "lookFor", "virtual", "point", "createdAt", "updatedAt", "version") SELECT "id", "tourId", "position", "compartmentId", "artifactIds", "title", "textDoc", "textHtml", "textPlain", "audioMediaId", "transcript", "dwellMinutes", "accessNotes", "lookFor", "virtual", "point", "createdAt", "updatedAt", "version" FROM "temporary_tour_stops"`);
        await queryRunner.query(`DROP TABLE "temporary_tour_stops"`);
        await queryRunner.query(`CREATE INDEX "IDX_8586c33a451fc4c5e5e606799c" ON "tour_stops" ("tourId", "position") `);
        await queryRunner.query(`CREATE INDEX "IDX_a53b1fc02c1473e622800a0011" ON "tour_stops" ("compartmentId") `);
        await queryRunner.query(`DROP INDEX "IDX_85d1d463126bc5cef98f6d0b15"`);
        await queryRunner.query(`DROP INDEX "IDX_9cd736a85d59e9c3b6dbd61656"`);
        await queryRunner.query(`DROP INDEX "IDX_1ef3b11928651065f9d41810c6"`);
        await queryRunner.query(`ALTER TABLE "tours" RENAME TO "temporary_tours"`);
        await queryRunner.query(`CREATE TABLE "tours" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "vesselId" integer NOT NULL, "title" varchar(160) NOT NULL, "slug" varchar(80) NOT NULL, "summary" text NOT NULL DEFAULT (''), "audience" varchar(20) NOT NULL DEFAULT ('general'), "mode" varchar(20) NOT NULL DEFAULT ('on-board'), "accessibility" varchar(20) NOT NULL DEFAULT ('some-stairs'), "coverMediaId" integer, "language" varchar(10) NOT NULL DEFAULT ('en'), "state" varchar(20) NOT NULL DEFAULT ('draft'), "revision" integer NOT NULL DEFAULT (0), "publishedSnapshot" text, "publishedRevision" integer, "publishedAt" datetime, "submittedById" integer, "submittedAt" datetime, "createdById" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "version" integer NOT NULL)`);
        await queryRunner.query(`INSERT INTO "tours"("id", "vesselId", "title", "slug", "summary", "audience", "mode", "accessibility", "coverMediaId", "language", "state", "revision", "publishedSnapshot", "publishedRevision", "publishedAt", "submittedById", "submittedAt", "createdById", "createdAt", "updatedAt", "version") SELECT "id", "vesselId", "title", "slug", "summary", "audience", "mode", "accessibility", "coverMediaId", "language", "state", "revision", "publishedSnapshot", "publishedRevision", "publishedAt", "submittedById", "submittedAt", "createdById", "createdAt", "updatedAt", "version" FROM "temporary_tours"`);
        await queryRunner.query(`DROP TABLE "temporary_tours"`);
        await queryRunner.query(`CREATE UNIQUE INDEX "IDX_85d1d463126bc5cef98f6d0b15" ON "tours" ("vesselId", "slug") `);
        await queryRunner.query(`CREATE INDEX "IDX_9cd736a85d59e9c3b6dbd61656" ON "tours" ("state") `);
        await queryRunner.query(`CREATE INDEX "IDX_1ef3b11928651065f9d41810c6" ON "tours" ("vesselId") `);
        await queryRunner.query(`DROP TABLE "tour_route_settings"`);
        await queryRunner.query(`DROP INDEX "IDX_e10a2bac1d38bd9ae14a746748"`);
        await queryRunner.query(`DROP TABLE "tour_comments"`);
        await queryRunner.query(`DROP INDEX "IDX_551c75c3b9e729d58fe2496380"`);
        await queryRunner.query(`DROP TABLE "tour_revisions"`);
        await queryRunner.query(`DROP INDEX "IDX_8586c33a451fc4c5e5e606799c"`);
        await queryRunner.query(`DROP INDEX "IDX_a53b1fc02c1473e622800a0011"`);
        await queryRunner.query(`DROP TABLE "tour_stops"`);
        await queryRunner.query(`DROP INDEX "IDX_85d1d463126bc5cef98f6d0b15"`);
        await queryRunner.query(`DROP INDEX "IDX_9cd736a85d59e9c3b6dbd61656"`);
        await queryRunner.query(`DROP INDEX "IDX_1ef3b11928651065f9d41810c6"`);
        await queryRunner.query(`DROP TABLE "tours"`);
    }

}
