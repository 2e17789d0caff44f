import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let vesselId: number;

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  await deckWithCompartments(ctx.store, curator, vesselId);
  await addArtifact(curator, vesselId, { objectNumber: '2019.1.1', name: 'Already here' });
});
afterEach(() => ctx.close());

const CSV = [
  'object_number,name,category,description,height,dimension_unit,status,compartment',
  '2020.1.1,Feed pump,Pumps and piping,"Duplex pump, steam driven",120,cm,in-place,1-10-1-Q',
  '2020.1.2,Oil can,tools,,,,in-store,',
  '2020/1/3,Bad number,tools,,,,in-store,',
  '2020.1.4,Lost room,tools,,,,in-place,9-99-9-Z',
  '2020.1.1,Twice in the file,tools,,,,in-store,',
  '2019.1.1,Already in the collection,tools,,,,in-store,',
  '2020.1.7,Odd size,tools,,tall,,in-store,',
  '2020.1.8,Nowhere,tools,,,,in-place,',
].join('\r\n');

function importCsv(mode: string, csv = CSV, client = curator) {
  return client.agent.post(`/api/v1/vessels/${vesselId}/artifacts/import?mode=${mode}`).set('x-csrf-token', client.csrf).attach('file', Buffer.from(csv), 'artifacts.csv');
}

async function count() {
  return (await curator.get(`/api/v1/vessels/${vesselId}/artifacts`)).body.total as number;
}

describe('CSV import', () => {
  it('previews every row with its errors and writes nothing', async () => {
    const res = await importCsv('preview');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ mode: 'preview', total: 8, valid: 2, invalid: 6, imported: 0, fileErrors: [] });
    const errorsByLine = Object.fromEntries(res.body.rows.map((r: { line: number; errors: { column: string; message: string }[] }) => [r.line, r.errors]));
    expect(errorsByLine[2]).toEqual([]);
    expect(errorsByLine[4]).toEqual([{ column: 'object_number', message: expect.stringMatching(/does not follow the pattern YYYY\.N\.N/) }]);
    expect(errorsByLine[5]).toEqual([{ column: 'compartment', message: 'No compartment 9-99-9-Z on this vessel.' }]);
    expect(errorsByLine[6]).toEqual([{ column: 'object_number', message: '2020.1.1 is also on line 2.' }]);
    expect(errorsByLine[7]).toEqual([{ column: 'object_number', message: '2019.1.1 is already in the collection.' }]);
    expect(errorsByLine[8]).toEqual([{ column: 'height', message: 'Height must be a number.' }]);
    expect(errorsByLine[9]).toEqual([{ column: 'compartment', message: expect.stringMatching(/choose its compartment/) }]);
    expect(await count()).toBe(1);
  });

  it('imports all rows only when every row is valid, in one go', async () => {
    const refused = await importCsv('all');
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toMatch(/6 of 8 rows have errors, so nothing was imported/);
    expect(await count()).toBe(1);

    const clean = CSV.split('\r\n').slice(0, 3).join('\r\n');
    const ok = await importCsv('all', clean);
    expect(ok.body).toMatchObject({ mode: 'all', imported: 2 });
    expect(await count()).toBe(3);
    const pump = (await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=2020.1.1`)).body.items[0];
    expect(pump).toMatchObject({ category: 'pumps-and-piping', height: 120, description: 'Duplex pump, steam driven', location: { compartmentDesignation: '1-10-1-Q' } });
    const history = (await curator.get(`/api/v1/artifacts/${pump.id}/moves`)).body;
    expect(history[0].reason).toBe('Imported from artifacts.csv (line 2)');
  });

  it('imports only the valid rows when asked, and the import is in the audit trail', async () => {
    const res = await importCsv('valid-only');
    expect(res.body).toMatchObject({ imported: 2, invalid: 6 });
    expect(await count()).toBe(3);
    const events = await ctx.store.repos.auditEvents.page({ page: 1, pageSize: 5, sort: '-at', action: 'import' } as never);
    expect(events.items[0]!.summary).toBe('2 artifacts imported from artifacts.csv (6 rows with errors left out)');
    // The same file again: every row is now a duplicate or invalid.
    expect((await importCsv('valid-only')).body).toMatchObject({ imported: 0, valid: 0 });
  });

  it('names missing columns and refuses files that are not UTF-8 text', async () => {
    const missing = await importCsv('preview', 'name,category\r\nPump,tools');
    expect(missing.body.fileErrors).toEqual(['Missing column: object_number.']);
    expect((await importCsv('all', 'name,category\r\nPump,tools')).status).toBe(422);
    const binary = await curator.agent.post(`/api/v1/vessels/${vesselId}/artifacts/import`).set('x-csrf-token', curator.csrf).attach('file', Buffer.from([0xff, 0xfe, 0x00, 0xd8, 0xff]), 'x.csv');
    expect(binary.status).toBe(415);
  });

  it('is for curators only', async () => {
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    await docent.fetchCsrf();
    expect((await importCsv('preview', CSV, docent)).status).toBe(403);
  });
});

describe('CSV export', () => {
  it('writes the filtered list with the import columns, defusing formulas, and reads back in', async () => {
    await addArtifact(curator, vesselId, { objectNumber: '2019.1.2', name: '=HYPERLINK("x")', category: 'electrical', description: 'Line one\nline "two"' });
    const res = await curator.get(`/api/v1/vessels/${vesselId}/artifacts/export?category=electrical`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="artifacts-vessel-\d+-\d{4}-\d{2}-\d{2}\.csv"/);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toBe('object_number,name,category,description,date_or_period,maker,materials,height,width,depth,dimension_unit,significance,status,compartment,deck');
    expect(lines[1]).toMatch(/^2019\.1\.2,/);
    expect(res.text).toContain(`2019.1.2,"'=HYPERLINK(""x"")",electrical,"Line one\nline ""two"""`);
    expect(res.text).not.toContain('Already here');

    // Everything, read back by the import preview of another vessel of the same museum.
    const all = await curator.get(`/api/v1/vessels/${vesselId}/artifacts/export`);
    vesselId = (await buildVessel(ctx.store)).id;
    const back = await importCsv('preview', all.text);
    expect(back.body.fileErrors).toEqual([]);
    expect(back.body.rows.map((r: { objectNumber: string; errors: unknown[] }) => [r.objectNumber, r.errors])).toEqual([
      ['2019.1.1', []],
      ['2019.1.2', []],
    ]);
  });
});

describe('statuses as registrars write them', () => {
  it('reads "In situ", "On display" and "Under treatment" by their labels; on display needs a compartment', async () => {
    const csv = [
      'object_number,name,category,status,compartment',
      '2021.1.1,Engine-room clock,tools,In situ,1-10-1-Q',
      '2021.1.2,Builder’s model,tools,On display,1-10-1-Q',
      '2021.1.3,Steam whistle,tools,under treatment,',
      '2021.1.4,Bell,tools,on display,',
    ].join('\r\n');
    const preview = (await importCsv('preview', csv)).body;
    const errors = Object.fromEntries(preview.rows.map((r: { objectNumber: string; errors: { column: string }[] }) => [r.objectNumber, r.errors.map((e) => e.column)]));
    expect(errors).toEqual({ '2021.1.1': [], '2021.1.2': [], '2021.1.3': [], '2021.1.4': ['compartment'] });
    expect((await importCsv('valid-only', csv)).status).toBe(200);
    const list = (await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=2021.1&sort=objectNumber`)).body.items;
    expect(list.map((a: { status: string }) => a.status)).toEqual(['in-place', 'on-display', 'under-treatment']);
  });
});
