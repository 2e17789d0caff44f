import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { DataSource } from 'typeorm';
import { afterEach, describe, expect, it } from 'vitest';
import { HazardVersions1796284659278 } from '../../server/db/migrations/1796284659278-HazardVersions.js';
import { SearchStemming1796285944020 } from '../../server/db/migrations/1796285944020-SearchStemming.js';
import { MediaPublicUse1796286347768 } from '../../server/db/migrations/1796286347768-MediaPublicUse.js';
import { DeckFramesRiskScale1796298366780 } from '../../server/db/migrations/1796298366780-DeckFramesRiskScale.js';
import { migrations } from '../../server/db/migrations/index.js';
import { signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(() => ctx?.close());

/** A database migrated up to (not including) `migration`, with `seed` run against it. */
async function databaseBefore(migration: (typeof migrations)[number], seed: (db: DataSource) => Promise<void>) {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-migration-'));
  const db = new DataSource({ type: 'better-sqlite3', database: path.join(dataDir, 'shipkeeper.sqlite'), migrations: migrations.slice(0, migrations.indexOf(migration)), migrationsTransactionMode: 'each' });
  await db.initialize();
  await db.runMigrations();
  await seed(db);
  await db.destroy();
  return dataDir;
}

describe('migrations', () => {
  it('DeckFramesRiskScale gives the existing settings row the ABC defaults and keeps its values; decks get no frame numbering', async () => {
    const dataDir = await databaseBefore(DeckFramesRiskScale1796298366780, async (db) => {
      await db.query(`INSERT INTO "organisation_settings" ("id", "organisationName", "country", "unitSystem", "version") VALUES (1, 'Harbour Trust', 'GB', 'metric', 4)`);
      await db.query(`INSERT INTO "vessels" ("id", "name", "vesselType", "version") VALUES (1, 'SS Test Migration', 'Steamship', 1)`);
      await db.query(`INSERT INTO "decks" ("id", "vesselId", "name", "position", "centerlineY", "version") VALUES (1, 1, 'Main deck', 0, 400, 2)`);
    });
    ctx = await createTestApp({}, { dataDir, mail: false });
    const { client } = await signedInAs(ctx.app, ctx.store, 'curator');
    expect((await client.get('/api/v1/settings')).body).toMatchObject({
      organisationName: 'Harbour Trust',
      unitSystem: 'metric',
      version: 4,
      riskScale: { aYearsAtFive: 1, stepFactor: 10, bandFloors: { low: 3, medium: 7.5, high: 9.5, 'very-high': 11.5, extreme: 13.5 } },
    });
    expect(await ctx.dataSource.query(`SELECT "centerlineY", "frames", "version" FROM "decks"`)).toEqual([{ centerlineY: 400, frames: null, version: 2 }]);
  });

  it('MediaPublicUse keeps publishable the photos that were (an artifact’s or compartment’s, with alt text), and no others', async () => {
    const dataDir = await databaseBefore(MediaPublicUse1796286347768, async (db) => {
      await db.query(`INSERT INTO "vessels" ("id", "name", "vesselType", "version") VALUES (1, 'SS Test Migration', 'Steamship', 1)`);
      const row = (id: number, ownerType: string, kind: string, altText: string) =>
        db.query(`INSERT INTO "media" ("id", "vesselId", "ownerType", "ownerId", "kind", "mimeType", "fileName", "byteSize", "sha256", "storageKey", "altText", "version") VALUES (?, 1, ?, 1, ?, 'image/jpeg', 'a.jpg', 1, 'x', ?, ?, 1)`, [id, ownerType, kind, `k${id}`, altText]);
      await row(1, 'artifact', 'photo', 'A brass gauge');
      await row(2, 'artifact', 'photo', '');
      await row(3, 'incident', 'photo', 'Paint on the bulkhead');
      await row(4, 'compartment', 'document', 'A plan');
    });
    ctx = await createTestApp({}, { dataDir, mail: false });
    const rows = await ctx.dataSource.query(`SELECT "id", "publicUse" FROM "media" ORDER BY "id"`);
    expect(rows.map((r: { publicUse: number }) => Number(r.publicUse))).toEqual([1, 0, 0, 0]);
  });


  it('HazardVersions keeps every hazard and starts it at version 1, so the next edit on version 1 lands', async () => {
    const dataDir = await databaseBefore(HazardVersions1796284659278, async (db) => {
      expect((await db.query(`PRAGMA table_info("hazards")`)).map((c: { name: string }) => c.name)).not.toContain('version');
      await db.query(`INSERT INTO "users" ("id", "email", "name", "role", "version") VALUES (7, 'checker@example.test', 'Checker', 'conservator', 1)`);
      await db.query(`INSERT INTO "vessels" ("id", "name", "vesselType", "version") VALUES (1, 'SS Test Migration', 'Steamship', 1)`);
      await db.query(`INSERT INTO "decks" ("id", "vesselId", "name", "position", "version") VALUES (1, 1, 'Fourth deck', 0, 1)`);
      await db.query(`INSERT INTO "compartments" ("id", "vesselId", "deckId", "designation", "designationKey", "name", "version") VALUES (3, 1, 1, 'Feed tank', 'FEED TANK', 'Feed water tank', 1)`);
      await db.query(`INSERT INTO "hazards" ("id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById") VALUES (5, 3, 'confined-space', 'Single manhole', '2026-01-15', 7)`);
    });

    ctx = await createTestApp({}, { dataDir, mail: false });
    const [row] = await ctx.dataSource.query(`SELECT "id", "compartmentId", "kind", "notes", "lastVerifiedOn", "verifiedById", "version" FROM "hazards"`);
    expect(row).toEqual({ id: 5, compartmentId: 3, kind: 'confined-space', notes: 'Single manhole', lastVerifiedOn: '2026-01-15', verifiedById: 7, version: 1 });

    const { client } = await signedInAs(ctx.app, ctx.store, 'conservator');
    expect((await client.get('/api/v1/compartments/3/hazards')).body[0]).toMatchObject({ id: 5, version: 1, verifiedBy: { id: 7, name: 'Checker' } });
    const edited = await client.patch('/api/v1/compartments/3/hazards/5', { notes: 'Single manhole, no ventilation', version: 1 });
    expect(edited.status).toBe(200);
    expect(edited.body.version).toBe(2);
    expect((await client.patch('/api/v1/compartments/3/hazards/5', { kind: 'asbestos', version: 1 })).status).toBe(409);
  });

  it('SearchStemming keeps every search document, now found by other forms of its words', async () => {
    const dataDir = await databaseBefore(SearchStemming1796285944020, async (db) => {
      await db.query(`INSERT INTO "vessels" ("id", "name", "vesselType", "version") VALUES (1, 'SS Test Migration', 'Steamship', 1)`);
      await db.query(`INSERT INTO "artifacts" ("id", "vesselId", "objectNumber", "objectNumberSort", "name", "category", "status", "version") VALUES (4, 1, '2019.7.1', '2019.7.1', 'Brass oil lamps', 'tools', 'in-store', 1)`);
      await db.query(`INSERT INTO "search_documents" (rowid, kind, record_id, vessel_id, scope, number, title, body, extra) VALUES (64, 'artifact', 4, 1, 'artifact1', '2019.7.1', 'Brass oil lamps', 'Made by Müller, polished', '')`);
      // Before: the unstemmed index does not take "lamp" for "lamps".
      expect(await db.query(`SELECT record_id FROM "search_documents" WHERE "search_documents" MATCH '"lamp"'`)).toEqual([]);
    });

    ctx = await createTestApp({}, { dataDir, mail: false });
    const { client } = await signedInAs(ctx.app, ctx.store, 'curator');
    for (const q of ['lamp oil', 'polishing', 'lam', 'muller']) {
      expect((await client.get(`/api/v1/vessels/1/artifacts?q=${encodeURIComponent(q)}`)).body.items.map((a: { id: number }) => a.id), q).toEqual([4]);
    }
    const [row] = await ctx.dataSource.query(`SELECT rowid, kind, record_id, vessel_id, scope, number FROM "search_documents"`);
    expect(row).toEqual({ rowid: 64, kind: 'artifact', record_id: 4, vessel_id: 1, scope: 'artifact1', number: '2019.7.1' });

    // And down() puts the unstemmed table back with its documents.
    await new SearchStemming1796285944020().down(ctx.dataSource.createQueryRunner());
    expect(await ctx.dataSource.query(`SELECT record_id FROM "search_documents" WHERE "search_documents" MATCH '"lamp"'`)).toEqual([]);
    expect(await ctx.dataSource.query(`SELECT record_id FROM "search_documents" WHERE "search_documents" MATCH '"lamps"'`)).toEqual([{ record_id: 4 }]);
  });
});
