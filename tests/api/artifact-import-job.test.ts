import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { writeLock } from '../../server/db/write-lock.js';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

// The CSV import runs on a worker thread with a connection of its own (issue 9, item 11): these
// check that it leaves the same rows as a single create, writes nothing when it fails half-way,
// and that the server answers other requests while it runs.

let ctx: TestApp;
let curator: Client;
let vesselId: number;

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  await deckWithCompartments(ctx.store, curator, vesselId);
});
afterEach(() => ctx.close());

const HEADER = 'object_number,name,category,description,date_or_period,maker,materials,height,width,depth,dimension_unit,significance,status,compartment';

/** `rows` valid rows, alternately in compartment 1-10-1-Q and in store. */
function bigCsv(rows: number, name = (i: number) => `Gauge ${i}`) {
  const lines = [HEADER];
  for (let i = 0; i < rows; i++) {
    const aboard = i % 2 === 0;
    lines.push(`2024.${1 + Math.floor(i / 100)}.${1 + (i % 100)},${name(i)},tools,"Gauge, number ${i}",c. 1920,Maker,brass,${10 + (i % 7)},,,cm,Fitted new.,${aboard ? 'in-place' : 'in-store'},${aboard ? '1-10-1-Q' : ''}`);
  }
  return lines.join('\r\n');
}

function importCsv(mode: string, csv: string, fileName = 'artifacts.csv') {
  return curator.agent.post(`/api/v1/vessels/${vesselId}/artifacts/import?mode=${mode}`).set('x-csrf-token', curator.csrf).attach('file', Buffer.from(csv), fileName);
}

async function counts() {
  const [row] = (await ctx.dataSource.query(
    `SELECT (SELECT COUNT(*) FROM artifacts) AS artifacts, (SELECT COUNT(*) FROM artifact_moves) AS moves, (SELECT COUNT(*) FROM search_documents) AS documents, (SELECT COUNT(*) FROM audit_events WHERE entityType = 'artifact') AS audits`,
  )) as { artifacts: number; moves: number; documents: number; audits: number }[];
  return row!;
}

async function rowsOf(artifactId: number) {
  const one = async (sql: string, param: unknown = artifactId) => ((await ctx.dataSource.query(sql, [param])) as Record<string, unknown>[])[0]!;
  return {
    artifact: await one(`SELECT *, typeof(height) AS heightType, typeof(createdAt) AS createdType FROM artifacts WHERE id = ?`),
    move: await one(`SELECT *, typeof(createdAt) AS createdType FROM artifact_moves WHERE artifactId = ?`),
    document: await one(`SELECT kind, record_id, typeof(record_id) AS recordType, vessel_id, typeof(vessel_id) AS vesselType, scope, number, title, body, extra FROM search_documents WHERE kind = 'artifact' AND record_id = ?`),
    audit: await one(`SELECT *, typeof(entityId) AS entityIdType FROM audit_events WHERE entityType = 'artifact' AND action = 'create' AND entityId = ?`, String(artifactId)),
  };
}

describe('CSV import on a worker thread', () => {
  it('writes the same rows as a single create (artifact, first move, search document, audit event)', async () => {
    const fields = { name: 'Feed pump', category: 'pumps-and-piping', description: 'Duplex, steam driven', dateOrPeriod: 'c. 1920', maker: 'Maker & Co.', materials: 'cast iron; brass', height: 120, width: 40.5, dimensionUnit: 'cm', significance: 'Original fit.', status: 'in-place' };
    const created = await addArtifact(curator, vesselId, { ...fields, objectNumber: '2021.1.1', compartmentId: (await ctx.store.repos.compartments.findByDesignation(vesselId, '1-10-1-Q'))!.id });
    const csv = [HEADER, '2021.1.2,Feed pump,Pumps and piping,"Duplex, steam driven",c. 1920,Maker & Co.,cast iron; brass,120,40.5,,cm,Original fit.,in-place,1-10-1-Q'].join('\r\n');
    const res = await importCsv('all', csv);
    expect(res.body).toMatchObject({ imported: 1 });
    const importedId = (await ctx.store.repos.artifacts.findByNumber(vesselId, '2021.1.2'))!.id;

    const single = await rowsOf(created.id);
    const bulk = await rowsOf(importedId);
    const unlike = (rows: Awaited<ReturnType<typeof rowsOf>>, id: number, number: string) => ({
      artifact: { ...rows.artifact, id: 'ID', objectNumber: 'N', objectNumberSort: 'S', createdAt: 'T', updatedAt: 'T' },
      move: { ...rows.move, id: 'ID', artifactId: id === rows.move.artifactId ? 'ID' : rows.move.artifactId, reason: 'R', createdAt: 'T' },
      document: { ...rows.document, record_id: id === rows.document.record_id ? 'ID' : rows.document.record_id, number: number === rows.document.number ? 'N' : rows.document.number },
      audit: {
        ...rows.audit,
        id: 'ID',
        at: 'T',
        entityId: String(id) === rows.audit.entityId ? 'ID' : rows.audit.entityId,
        summary: String(rows.audit.summary).replace(number, 'N'),
        changes: String(rows.audit.changes).replace(number, 'N'),
      },
    });
    expect(unlike(bulk, importedId, '2021.1.2')).toEqual(unlike(single, created.id, '2021.1.1'));
    // What differs by nature: the reason of the first move, and the timestamps' values (not their form).
    expect(bulk.move.reason).toBe('Imported from artifacts.csv (line 2)');
    expect(String(bulk.artifact.createdAt)).toMatch(/^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d$/);
    expect(String(bulk.audit.at)).toMatch(/^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3}$/);
    expect(String(single.audit.at)).toMatch(/^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3}$/);
    // The import's own event, and the search finds the imported record.
    expect((await ctx.store.repos.auditEvents.page({ page: 1, pageSize: 1, sort: '-at', action: 'import' } as never)).items[0]!.summary).toBe('1 artifacts imported from artifacts.csv');
    expect((await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=${encodeURIComponent('feed pump')}`)).body.total).toBe(2);
  });

  it('writes nothing when a row fails in the database half-way through', async () => {
    await addArtifact(curator, vesselId, { objectNumber: '2019.1.1', name: 'Already here' });
    const before = await counts();
    // A failure no check foresees (the disk, a constraint): the 1,500th row is refused by SQLite itself.
    await ctx.dataSource.query(`CREATE TRIGGER refuse_one BEFORE INSERT ON artifacts WHEN NEW.name = 'Gauge 1499' BEGIN SELECT RAISE(ABORT, 'refused for the test'); END`);
    const res = await importCsv('all', bigCsv(2000));
    expect(res.status).toBe(500);
    expect(await counts()).toEqual(before);
    await ctx.dataSource.query('DROP TRIGGER refuse_one');
    // The lock was let go and the job's worker still serves: the same file now goes in whole.
    expect((await importCsv('all', bigCsv(2000))).body).toMatchObject({ imported: 2000 });
    expect(await counts()).toEqual({ artifacts: before.artifacts + 2000, moves: before.moves + 2000, documents: before.documents + 2000, audits: before.audits + 2001 });
  });

  it('answers a public request while a 5,000-row import runs', async () => {
    // Learn when the import holds the write lock, i.e. is at work on the server.
    const lock = writeLock(ctx.dataSource);
    const run = lock.run.bind(lock);
    let atWork!: () => void;
    const started = new Promise<void>((resolve) => (atWork = resolve));
    lock.run = (work) => run(() => (atWork(), work()));

    const order: string[] = [];
    const importing = importCsv('all', bigCsv(5000)).then((res) => (order.push('import'), res));
    await started;
    const visitor = request(ctx.app)
      .get('/api/v1/visit/site')
      .then((res) => (order.push('public'), res));
    const [imported, visit] = await Promise.all([importing, visitor]);

    expect(visit.status).toBe(200);
    expect(imported.status, JSON.stringify(imported.body).slice(0, 300)).toBe(200);
    expect(imported.body).toMatchObject({ mode: 'all', total: 5000, valid: 5000, imported: 5000 });
    expect(order).toEqual(['public', 'import']);
    expect((await counts()).artifacts).toBe(5000);
  });

  it('answers a public request while a 5,000-row export runs (the export works in short slices)', async () => {
    expect((await importCsv('all', bigCsv(5000))).body).toMatchObject({ imported: 5000 });
    const order: string[] = [];
    let firstChunk!: () => void;
    const writing = new Promise<void>((resolve) => (firstChunk = resolve));
    const exporting = curator.agent
      .get(`/api/v1/vessels/${vesselId}/artifacts/export`)
      .buffer(true)
      .parse((res, done) => {
        let text = '';
        res.setEncoding('utf8');
        res.on('data', (chunk: string) => {
          if (!text) firstChunk();
          text += chunk;
        });
        res.on('end', () => done(null, text));
      })
      .then((res) => (order.push('export'), res));
    await writing;
    const visitor = request(ctx.app)
      .get('/api/v1/visit/site')
      .then((res) => (order.push('public'), res));
    const [exported, visit] = await Promise.all([exporting, visitor]);

    expect(visit.status).toBe(200);
    expect(exported.status).toBe(200);
    expect((exported.body as string).trim().split('\r\n')).toHaveLength(5001);
    expect(order).toEqual(['public', 'export']);
  });
});
