import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let vesselId: number;
let place: Awaited<ReturnType<typeof deckWithCompartments>>;

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  place = await deckWithCompartments(ctx.store, curator, vesselId);
});
afterEach(() => ctx.close());

describe('artifact records', () => {
  it('records an artifact in a compartment with its first history entry and audit event', async () => {
    const created = await addArtifact(curator, vesselId, { objectNumber: ' 2019.4.12 ', name: 'Boiler pressure gauge', category: 'instruments-and-gauges', compartmentId: place.first, point: [200, 300], height: 30, dimensionUnit: 'cm' });
    expect(created).toMatchObject({ objectNumber: '2019.4.12', status: 'in-place', location: { compartmentDesignation: '1-10-1-Q', deckName: 'Main deck', point: [200, 300] }, version: 1 });
    const moves = await curator.get(`/api/v1/artifacts/${created.id}/moves`);
    expect(moves.body).toHaveLength(1);
    expect(moves.body[0]).toMatchObject({ kind: 'recorded', from: null, to: { status: 'in-place', compartmentLabel: '1-10-1-Q Store room' } });
    const audit = await ctx.store.repos.auditEvents.latestFor('artifact', created.id, 5);
    expect(audit.map((e) => e.action)).toEqual(['create']);
  });

  it('checks the object number against the organisation pattern and per vessel', async () => {
    const bad = await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: '2019-4-12', name: 'Wrench', category: 'tools' });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields.objectNumber).toMatch(/YYYY\.N\.N.*2019\.4\.12/);
    await addArtifact(curator, vesselId, { objectNumber: '2019.4.12' });
    const duplicate = await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: '2019.4.12', name: 'Another', category: 'tools' });
    expect(duplicate.status).toBe(409);
    expect(duplicate.body.error.fields.objectNumber).toBe('Already in use on this vessel.');
    // The same number on another vessel is another object.
    const other = (await buildVessel(ctx.store)).id;
    expect((await curator.post(`/api/v1/vessels/${other}/artifacts`, { objectNumber: '2019.4.12', name: 'Other ship', category: 'tools', status: 'in-store' })).status).toBe(201);

    // An administrator changes the pattern; new numbers follow it.
    const admin = (await signedInAs(ctx.app, ctx.store, 'admin')).client;
    const settings = (await admin.get('/api/v1/settings')).body;
    expect((await admin.patch('/api/v1/settings', { objectNumberPattern: 'YYYY.N.x', version: settings.version })).status).toBe(400);
    expect((await admin.patch('/api/v1/settings', { objectNumberPattern: 'SK-YYYY-N', version: settings.version })).status).toBe(200);
    expect((await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: 'sk-2020-7', name: 'Lamp', category: 'furnishings', status: 'in-store' })).body.objectNumber).toBe('sk-2020-7');
    // Records made under the old pattern keep their numbers and can still be edited.
    const old = (await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=2019.4.12`)).body.items[0];
    const edited = await curator.patch(`/api/v1/artifacts/${old.id}`, { objectNumber: '2019.4.12', name: 'Renamed', version: old.version });
    expect(edited.status).toBe(200);
    expect((await curator.patch(`/api/v1/artifacts/${old.id}`, { objectNumber: '2019.4.13', version: edited.body.version })).status).toBe(422);
  });

  it('refuses a point outside the compartment, off the plan, or without a compartment', async () => {
    const outside = await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: '2019.1.1', name: 'Valve', category: 'valves-and-fittings', compartmentId: place.first, point: [1500, 500] });
    expect(outside.status).toBe(422);
    expect(outside.body.error.fields.point).toBe('Outside 1-10-1-Q.');
    const off = await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: '2019.1.1', name: 'Valve', category: 'valves-and-fittings', compartmentId: place.first, point: [5000, 500] });
    expect(off.body.error.fields.point).toBe('Off the plan.');
    const noRoom = await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: '2019.1.1', name: 'Valve', category: 'valves-and-fittings', point: [200, 200] });
    expect(noRoom.status).toBe(422);
    const inPlaceNowhere = await curator.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: '2019.1.1', name: 'Valve', category: 'valves-and-fittings', status: 'in-place' });
    expect(inPlaceNowhere.body.error.fields.compartmentId).toBeDefined();
    expect(await ctx.store.repos.artifacts.findByNumber(vesselId, '2019.1.1')).toBeNull();
  });

  it('puts an artifact on the plan of its own compartment as a placement: no reason, no move from a room to itself', async () => {
    const created = await addArtifact(curator, vesselId, { objectNumber: '2019.5.1', name: 'Oil can', compartmentId: place.first, status: 'in-store' });
    expect(created.location.point).toBeNull();
    const placed = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: place.first, point: [400, 500], status: 'in-store', version: created.version });
    expect(placed.status, JSON.stringify(placed.body)).toBe(201);
    expect(placed.body).toMatchObject({ status: 'in-store', location: { compartmentId: place.first, point: [400, 500] }, version: created.version + 1 });
    const history = (await curator.get(`/api/v1/artifacts/${created.id}/moves`)).body;
    expect(history.map((m: { kind: string }) => m.kind)).toEqual(['placed', 'recorded']);
    expect(history[0]).toMatchObject({ reason: '', to: { compartmentLabel: '1-10-1-Q Store room', point: [400, 500] } });
    expect(history.some((m: { kind: string }) => m.kind === 'moved')).toBe(false);
    const audit = await ctx.store.repos.auditEvents.latestFor('artifact', created.id, 5);
    expect(audit[0]).toMatchObject({ action: 'move', summary: 'Artifact 2019.5.1 placed on the plan in 1-10-1-Q Store room' });

    // Once on the plan, moving it within the room, or to another room, is a move and needs its reason.
    const noReason = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: place.first, point: [600, 500], status: 'in-store', version: placed.body.version });
    expect(noReason.status).toBe(422);
    expect(noReason.body.error.fields.reason).toBe('Reason is required.');
    const blank = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: place.second, point: [1500, 500], status: 'in-store', reason: ' ', version: placed.body.version });
    expect(blank.status).toBe(400);
    // A status change with the first point is not a bare placement either.
    const other = await addArtifact(curator, vesselId, { objectNumber: '2019.5.2', compartmentId: place.first, status: 'in-store' });
    const withStatus = await curator.post(`/api/v1/artifacts/${other.id}/moves`, { compartmentId: place.first, point: [400, 500], status: 'in-place', version: other.version });
    expect(withStatus.status).toBe(422);
    expect(withStatus.body.error.fields.reason).toBeDefined();
    // A stale placement answers 409 like any other change.
    expect((await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: place.first, point: [400, 500], status: 'in-store', version: created.version })).status).toBe(409);
  });

  it('keeps a moved artifact on the plan: at the centre of its new compartment until it is placed', async () => {
    const created = await addArtifact(curator, vesselId, { objectNumber: '2019.6.1', name: 'Lantern', compartmentId: place.first, point: [200, 300] });
    const moved = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: place.second, point: null, status: 'in-place', reason: 'Moved for display', version: created.version });
    expect(moved.status, JSON.stringify(moved.body)).toBe(201);
    // The Magazine's outline is the rectangle 1000-1900 by 100-900: its centroid is (1450, 500).
    expect(moved.body.location).toMatchObject({ compartmentId: place.second, point: [1450, 500] });
    const markers = (await curator.get(`/api/v1/decks/${place.deckId}/artifacts`)).body;
    expect(markers.find((m: { id: number }) => m.id === created.id)).toMatchObject({ point: [1450, 500] });
    const history = (await curator.get(`/api/v1/artifacts/${created.id}/moves`)).body;
    expect(history[0]).toMatchObject({ kind: 'moved', from: { compartmentLabel: '1-10-1-Q Store room', point: [200, 300] }, to: { compartmentLabel: '1-40-2-M Magazine', point: [1450, 500] } });
    // Off the ship, there is no point to keep.
    const ashore = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: null, point: null, status: 'in-store', reason: 'To the shore store', version: moved.body.version });
    expect(ashore.body.location.point).toBeNull();
  });

  it('answers a stale save with 409 naming what the other person changed, and keeps their change', async () => {
    const created = await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', name: 'Gauge' });
    const first = await curator.patch(`/api/v1/artifacts/${created.id}`, { name: 'Steam gauge', description: 'Bourdon tube', version: created.version });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(created.version + 1);
    const second = await curator.patch(`/api/v1/artifacts/${created.id}`, { maker: 'Someone', version: created.version });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('conflict');
    expect(second.body.error.message).toMatch(/\(name, description\)/);
    expect(second.body.error.fields.name).toMatch(/Steam gauge/);
    const now = (await curator.get(`/api/v1/artifacts/${created.id}`)).body;
    expect(now).toMatchObject({ name: 'Steam gauge', maker: '', version: created.version + 1 });
  });

  it('records moves and status changes as history, and never deletes: it deaccessions with a reason', async () => {
    const created = await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', compartmentId: place.first, point: [200, 300] });
    const moved = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: place.second, point: [1500, 500], status: 'in-place', reason: 'Back to its bracket after cleaning', version: created.version });
    expect(moved.status).toBe(201);
    expect(moved.body.location.compartmentDesignation).toBe('1-40-2-M');
    const future = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: null, point: null, status: 'in-store', reason: 'Planned', movedOn: '2999-01-01', version: moved.body.version });
    expect(future.status).toBe(422);
    expect(future.body.error.fields.movedOn).toMatch(/future/);
    const stored = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: null, point: null, status: 'in-store', reason: 'To the shore store for the winter', version: moved.body.version });
    expect(stored.status).toBe(201);
    const unchanged = await curator.post(`/api/v1/artifacts/${created.id}/moves`, { compartmentId: null, point: null, status: 'in-store', reason: 'Again', version: stored.body.version });
    expect(unchanged.status).toBe(422);

    expect((await curator.send('delete', `/api/v1/artifacts/${created.id}`)).status).toBe(404);
    const noReason = await curator.post(`/api/v1/artifacts/${created.id}/archive`, { reason: ' ', version: stored.body.version });
    expect(noReason.status).toBe(400);
    const archived = await curator.post(`/api/v1/artifacts/${created.id}/archive`, { reason: 'Transferred to another museum', version: stored.body.version });
    expect(archived.body).toMatchObject({ status: 'deaccessioned', deaccessionReason: 'Transferred to another museum', abilities: { move: false, archive: false } });
    const history = (await curator.get(`/api/v1/artifacts/${created.id}/moves`)).body;
    expect(history.map((m: { kind: string }) => m.kind)).toEqual(['deaccessioned', 'moved', 'moved', 'recorded']);
    expect(history[2]).toMatchObject({ movedOn: new Date().toISOString().slice(0, 10), from: { compartmentLabel: '1-10-1-Q Store room' }, to: { compartmentLabel: '1-40-2-M Magazine' }, reason: 'Back to its bracket after cleaning' });
    expect(history[0].by.name).toMatch(/curator/);
  });

  it('keeps a compartment that holds artifacts', async () => {
    await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', compartmentId: place.first });
    const res = await curator.send('delete', `/api/v1/compartments/${place.first}`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/holds an artifact/);
  });

  it('lists markers per deck, and lets other staff read but not change', async () => {
    await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', compartmentId: place.first, point: [200, 300] });
    await addArtifact(curator, vesselId, { objectNumber: '2019.4.13', compartmentId: place.first });
    const markers = await curator.get(`/api/v1/decks/${place.deckId}/artifacts`);
    expect(markers.body.map((m: { objectNumber: string }) => m.objectNumber)).toEqual(['2019.4.12']);
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    const list = await docent.get(`/api/v1/vessels/${vesselId}/artifacts`);
    expect(list.body.total).toBe(2);
    expect(list.body.items[0].abilities).toEqual({ update: false, move: false, archive: false });
    expect((await docent.post(`/api/v1/vessels/${vesselId}/artifacts`, { objectNumber: '2019.4.14', name: 'X', category: 'tools' })).status).toBe(403);
  });
});

describe('artifact list and search', () => {
  it('sorts object numbers in natural order and filters on the server', async () => {
    for (const n of ['2019.4.12', '2019.4.9', '2019.10.1', '2018.1.1']) await addArtifact(curator, vesselId, { objectNumber: n, category: n.startsWith('2018') ? 'electrical' : 'tools', compartmentId: place.first });
    const sorted = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?sort=objectNumber`);
    expect(sorted.body.items.map((a: { objectNumber: string }) => a.objectNumber)).toEqual(['2018.1.1', '2019.4.9', '2019.4.12', '2019.10.1']);
    const paged = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?sort=-objectNumber&pageSize=2&page=2`);
    expect(paged.body).toMatchObject({ total: 4, page: 2 });
    expect(paged.body.items.map((a: { objectNumber: string }) => a.objectNumber)).toEqual(['2019.4.9', '2018.1.1']);
    const electrical = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?category=electrical&deckId=${place.deckId}`);
    expect(electrical.body.items.map((a: { objectNumber: string }) => a.objectNumber)).toEqual(['2018.1.1']);
    expect((await curator.get(`/api/v1/vessels/${vesselId}/artifacts?compartmentId=${place.second}`)).body.total).toBe(0);
    expect((await curator.get(`/api/v1/vessels/${vesselId}/artifacts?sort=weight`)).status).toBe(400);
  });

  it('ranks an exact object-number match first, then by relevance, and marks the matches', async () => {
    await addArtifact(curator, vesselId, { objectNumber: '2019.4.1', name: 'Logbook', description: 'Refers to the gauge 2019.4.12 several times: 2019.4.12 was fitted in 1931; 2019.4.12 again.' });
    await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', name: 'Steam gauge', description: 'Bourdon-tube pressure gauge.' });
    await addArtifact(curator, vesselId, { objectNumber: '2019.5.3', name: 'Lamp', description: 'Nothing to do with it.' });
    const res = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=2019.4.12`);
    expect(res.body.items.map((a: { objectNumber: string }) => a.objectNumber)).toEqual(['2019.4.12', '2019.4.1']);
    expect(res.body.total).toBe(2);

    const words = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=${encodeURIComponent('pressure gau')}&sort=relevance`);
    expect(words.body.items.map((a: { objectNumber: string }) => a.objectNumber)).toEqual(['2019.4.12']);
    expect(words.body.items[0].highlight.snippet).toContain('\uE000pressure\uE001 \uE000gauge\uE001');

    // A name match outranks a passing mention in a long description (bm25 weights: title 5, body 1).
    await addArtifact(curator, vesselId, { objectNumber: '2019.6.1', name: 'Whistle', description: 'Steam whistle.' });
    await addArtifact(curator, vesselId, { objectNumber: '2019.6.2', name: 'Pump', description: 'A duplex pump; its whistle valve is missing, which a later survey of the whole engine room and its many fittings noted.' });
    const ranked = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=whistle&sort=relevance`);
    expect(ranked.body.items.map((a: { objectNumber: string }) => a.objectNumber)).toEqual(['2019.6.1', '2019.6.2']);
    expect(ranked.body.items[0].highlight.name).toBe('\uE000Whistle\uE001');

    // With a filter or another order the list joins the records; the exact number still leads.
    const byName = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=2019&sort=name&pageSize=3`);
    expect(byName.body.total).toBe(5);
    expect(byName.body.items.map((a: { name: string }) => a.name)).toEqual(['Lamp', 'Logbook', 'Pump']);
    const exactFirst = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=2019.4.12&sort=-name&category=tools`);
    expect(exactFirst.body.items.map((a: { objectNumber: string }) => a.objectNumber)).toEqual(['2019.4.12', '2019.4.1']);
    const filtered = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=whistle&status=missing`);
    expect(filtered.body).toMatchObject({ total: 0, items: [] });
  });

  it('keeps the index in step with edits, and treats search syntax as plain words', async () => {
    const created = await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', name: 'Gauge' });
    await curator.patch(`/api/v1/artifacts/${created.id}`, { name: 'Telegraph', version: created.version });
    expect((await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=gauge`)).body.total).toBe(0);
    expect((await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=telegraph`)).body.total).toBe(1);
    for (const q of ['"', 'NEAR(', 'name:x', '*', 'a OR', '-']) {
      const res = await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=${encodeURIComponent(q)}`);
      expect(res.status, q).toBe(200);
    }
  });

  it('finds word forms (porter stemmer) and accented names, and the last word as a prefix as it is typed', async () => {
    await addArtifact(curator, vesselId, { objectNumber: '2019.7.1', name: 'Brass oil lamps', description: 'Made by Müller & Sohn, polished.' });
    await addArtifact(curator, vesselId, { objectNumber: '2019.7.2', name: 'Ship bell', description: 'Cast bronze.' });
    const found = async (q: string) => (await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=${encodeURIComponent(q)}`)).body.items.map((a: { objectNumber: string }) => a.objectNumber);
    // Only the last word is a prefix: "lamp oil" and "polishing" need the stemmer.
    for (const q of ['lamp', 'lamps', 'lam', 'lamp oil', 'polishing', 'muller', 'Müller', 'brass l']) expect(await found(q), q).toEqual(['2019.7.1']);
    // Search syntax stays plain words: with OR as an operator these would find the lamps.
    for (const q of ['lamp" OR x', 'lamp OR bell', 'lamp NEAR(bell', 'title:bell lamp']) expect(await found(q), q).toEqual([]);
    for (const q of ['*', 'NEAR(', '"lamp']) expect((await curator.get(`/api/v1/vessels/${vesselId}/artifacts?q=${encodeURIComponent(q)}`)).status, q).toBe(200);
  });
});
