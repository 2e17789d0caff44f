import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let conservator: Client;
let hazardsPath: string;

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
  const vesselId = (await buildVessel(ctx.store, { name: 'SS Test Hazards' })).id;
  const deck = (await curator.post(`/api/v1/vessels/${vesselId}/decks`, { name: 'Fourth deck' })).body;
  const tank = (await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: 'Feed tank', name: 'Feed water tank' })).body;
  hazardsPath = `/api/v1/compartments/${tank.id}/hazards`;
});
afterEach(() => ctx.close());

async function addHazard() {
  const res = await conservator.post(hazardsPath, { kind: 'confined-space', notes: 'Single manhole' });
  expect(res.status).toBe(201);
  return res.body;
}

describe('hazard versions', () => {
  it('starts at version 1 and moves by one with each change; an unchanged save keeps it', async () => {
    const hazard = await addHazard();
    expect(hazard.version).toBe(1);
    const changed = await conservator.patch(`${hazardsPath}/${hazard.id}`, { notes: 'Single manhole, no ventilation', version: 1 });
    expect(changed.status).toBe(200);
    expect(changed.body.version).toBe(2);
    const same = await conservator.patch(`${hazardsPath}/${hazard.id}`, { notes: 'Single manhole, no ventilation', version: 2 });
    expect(same.body.version).toBe(2);
    expect((await conservator.get(hazardsPath)).body[0].version).toBe(2);
  });

  it('refuses a change without a version with 400', async () => {
    const hazard = await addHazard();
    const res = await conservator.patch(`${hazardsPath}/${hazard.id}`, { notes: 'No version' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.version).toBeDefined();
  });

  it('answers a save on an old version with 409 naming what the other person changed, and keeps their change', async () => {
    const hazard = await addHazard();
    const colleague = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
    const today = new Date().toISOString().slice(0, 10);
    const first = await colleague.patch(`${hazardsPath}/${hazard.id}`, { notes: 'Manhole bolted shut', lastVerifiedOn: today, version: 1 });
    expect(first.status).toBe(200);
    const stale = await conservator.patch(`${hazardsPath}/${hazard.id}`, { kind: 'asbestos', version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.error.message).toMatch(/^Someone else changed this hazard since you opened it \(notes, lastVerifiedOn\)\./);
    expect(stale.body.error.fields).toMatchObject({ version: 'current version is 2', notes: expect.stringContaining('Manhole bolted shut'), lastVerifiedOn: expect.stringContaining(today) });
    expect(stale.body.error.fields.kind).toBeUndefined();
    const now = (await conservator.get(hazardsPath)).body[0];
    expect(now).toMatchObject({ kind: 'confined-space', notes: 'Manhole bolted shut', version: 2 });
    const [{ n }] = await ctx.dataSource.query(`SELECT COUNT(*) AS n FROM audit_events WHERE entityType = 'hazard' AND action = 'update'`);
    expect(n).toBe(1);
  });

  it('of 50 edits sent at once on the same version exactly one lands; the other 49 answer 409 naming the field', async () => {
    const hazard = await addHazard();
    const answers = await Promise.all(Array.from({ length: 50 }, (_, i) => conservator.patch(`${hazardsPath}/${hazard.id}`, { notes: `Edit ${i}`, version: 1 })));
    const statuses = answers.map((r) => r.status);
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    const winner = answers.find((r) => r.status === 200)!.body;
    expect(winner.version).toBe(2);
    for (const lost of answers.filter((r) => r.status === 409)) {
      expect(lost.body.error.fields).toEqual({ version: 'current version is 2', notes: expect.stringContaining(JSON.stringify(winner.notes)) });
    }
    const now = (await conservator.get(hazardsPath)).body[0];
    expect(now).toMatchObject({ notes: winner.notes, version: 2 });
    const [{ n }] = await ctx.dataSource.query(`SELECT COUNT(*) AS n FROM audit_events WHERE entityType = 'hazard' AND action = 'update'`);
    expect(n).toBe(1);
  });
});
