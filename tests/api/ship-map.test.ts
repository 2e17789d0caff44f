import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let vesselId: number;

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  vesselId = (await buildVessel(ctx.store, { name: 'SS Test Plan', designationScheme: 'us-navy-1949' })).id;
});
afterEach(() => ctx.close());

async function addDeck(name: string, levelCode: string | null = null, plan: { width: number; height: number } | null = { width: 2000, height: 1000 }) {
  const res = await curator.post(`/api/v1/vessels/${vesselId}/decks`, { name, levelCode });
  expect(res.status).toBe(201);
  if (plan) {
    // Stands in for a processed plan upload: the deck's coordinate space is its plan's pixels.
    const deck = (await ctx.store.repos.decks.findById(res.body.id))!;
    deck.planWidth = plan.width;
    deck.planHeight = plan.height;
    await ctx.store.repos.decks.save(deck);
  }
  return (await curator.get(`/api/v1/decks/${res.body.id}`)).body;
}

describe('decks', () => {
  it('keeps decks in order from the top down, and reorders them', async () => {
    const main = await addDeck('Main deck', '1');
    const second = await addDeck('Second deck', '2');
    const platform = await addDeck('First platform', '3');
    expect((await curator.get(`/api/v1/vessels/${vesselId}/decks`)).body.map((d: { name: string }) => d.name)).toEqual(['Main deck', 'Second deck', 'First platform']);
    const moved = await curator.patch(`/api/v1/decks/${platform.id}`, { position: 0, version: platform.version });
    expect(moved.status).toBe(200);
    expect((await curator.get(`/api/v1/vessels/${vesselId}/decks`)).body.map((d: { name: string; position: number }) => `${d.position}:${d.name}`)).toEqual(['0:First platform', '1:Main deck', '2:Second deck']);
    expect(main.abilities).toEqual({ update: true, delete: true });
    expect(second.levelCode).toBe('2');
  });

  it('refuses a duplicate deck name and a bad level', async () => {
    await addDeck('Main deck');
    expect((await curator.post(`/api/v1/vessels/${vesselId}/decks`, { name: 'main deck' })).status).toBe(409);
    const bad = await curator.post(`/api/v1/vessels/${vesselId}/decks`, { name: 'Hold', levelCode: '0' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.levelCode).toMatch(/main deck/);
  });

  it('refuses a calibration that gives no finite, sane scale with 422 naming the field', async () => {
    const deck = await addDeck('Main deck', '1');
    const cases = [
      [{ method: 'points', a: [100, 100], b: [400, 500], realMetres: 1e308 }, 'realMetres'],
      [{ method: 'points', a: [100, 100], b: [400, 500], realMetres: 1e-300 }, 'realMetres'],
      [{ method: 'points', a: [0, 0], b: [1e308, 1e308], realMetres: 10 }, 'a,b'],
      [{ method: 'frames', a: [100, 100], b: [400, 100], frameSpaces: 1e12, frameSpacingMetres: 0.6 }, 'frameSpaces'],
      [{ method: 'frames', a: [100, 100], b: [400, 100], frameSpaces: 10, frameSpacingMetres: 1e308 }, 'frameSpacingMetres'],
    ] as const;
    for (const [body, field] of cases) {
      const res = await curator.post(`/api/v1/decks/${deck.id}/calibration`, { ...body, version: deck.version });
      expect(res.status, JSON.stringify(body)).toBe(422);
      expect(Object.keys(res.body.error.fields).join(','), JSON.stringify(body)).toBe(field);
    }
    const after = (await curator.get(`/api/v1/decks/${deck.id}`)).body;
    expect(after.calibration).toBeNull();
    expect(after.version).toBe(deck.version);
  });

  it('calibrates from two points, and from frames; every figure follows', async () => {
    const deck = await addDeck('Main deck', '1');
    // 500 plan units = 50 ft = 15.24 m (1 ft = 0.3048 m, NIST SP 811), so 1 unit = 0.03048 m.
    const res = await curator.post(`/api/v1/decks/${deck.id}/calibration`, { method: 'points', a: [100, 100], b: [400, 500], realMetres: 15.24, version: deck.version });
    expect(res.status).toBe(200);
    expect(res.body.calibration.metresPerUnit).toBeCloseTo(0.03048, 12);
    const room = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, {
      deckId: deck.id,
      designation: '1-20-0-Q',
      name: 'Store',
      outline: [[100, 100], [400, 100], [400, 300], [100, 300]],
    });
    // 300 × 200 units = 60 000 units² × 0.03048² = 55.74 m² = 600 ft² (by hand: 30 ft × 20 ft).
    expect(room.body.floorArea.squareFeet).toBeCloseTo(600, 9);
    expect(room.body.floorArea.squareMetres).toBeCloseTo(55.7418, 4);
    expect(room.body.perimeter.feet).toBeCloseTo(100, 9);

    // Re-calibrating recomputes: 10 frame spaces of 2 ft over the same 500 units halves the scale.
    const frames = await curator.post(`/api/v1/decks/${deck.id}/calibration`, { method: 'frames', a: [100, 100], b: [400, 500], frameSpaces: 10, frameSpacingMetres: 0.6096, version: res.body.version });
    expect(frames.body.calibration).toMatchObject({ method: 'frames', frameSpaces: 10, realMetres: expect.closeTo(6.096, 9) });
    expect((await curator.get(`/api/v1/compartments/${room.body.id}`)).body.floorArea.squareFeet).toBeCloseTo(96, 9);
  });

  it('refuses calibration points off the plan or on top of each other', async () => {
    const deck = await addDeck('Main deck');
    const off = await curator.post(`/api/v1/decks/${deck.id}/calibration`, { method: 'points', a: [100, 100], b: [5000, 100], realMetres: 3, version: deck.version });
    expect(off.status).toBe(422);
    const same = await curator.post(`/api/v1/decks/${deck.id}/calibration`, { method: 'points', a: [100, 100], b: [100, 100], realMetres: 3, version: deck.version });
    expect(same.status).toBe(422);
    expect(same.body.error.message).toBe('Click two different points on the plan.');
    const zero = await curator.post(`/api/v1/decks/${deck.id}/calibration`, { method: 'points', a: [0, 0], b: [10, 0], realMetres: 0, version: deck.version });
    expect(zero.status).toBe(400);
    expect(zero.body.error.fields.realMetres).toBe('The real distance must be more than zero.');
  });

  it('will not delete a deck that still has compartments', async () => {
    const deck = await addDeck('Main deck');
    await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '1-10-0-L', name: 'Cabin' });
    const res = await ctx.store.repos.decks.findById(deck.id);
    const refused = await curator.send('delete', `/api/v1/decks/${deck.id}`);
    expect(refused.status).toBe(409);
    expect(res).not.toBeNull();
  });
});

describe('compartments', () => {
  it('explains a designation in words and refuses one that does not parse, naming the part', async () => {
    const deck = await addDeck('Third deck', '3');
    const ok = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '3-110-2-e', name: 'Evaporator room', accessStatus: 'guided-only' });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ designation: '3-110-2-E', designationExplanation: 'third deck, frame 110, first compartment to port, engineering space', designationWarnings: [], accessStatus: 'guided-only' });
    const bad = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '3-110-2-Z', name: 'Nowhere' });
    expect(bad.status).toBe(422);
    expect(bad.body.error.fields['designation.use']).toMatch(/not a use letter/);
  });

  it('refuses a duplicate designation in the vessel with 409, whatever its case', async () => {
    const deck = await addDeck('Third deck', '3');
    await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '3-110-2-E', name: 'A' });
    const dup = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '3-110-2-e', name: 'B' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields.designation).toBe('Already in use on this vessel.');
  });

  it('takes any designation on a free-text vessel, unique per vessel', async () => {
    const tug = await buildVessel(ctx.store, { name: 'Tug Free', designationScheme: 'free-text' });
    const deck = (await curator.post(`/api/v1/vessels/${tug.id}/decks`, { name: 'Main deck' })).body;
    const res = await curator.post(`/api/v1/vessels/${tug.id}/compartments`, { deckId: deck.id, designation: 'Engine room (aft)', name: 'Engine room' });
    expect(res.status).toBe(201);
    expect(res.body.designationExplanation).toBeNull();
  });

  it.each([
    [[[0, 0], [100, 100], [100, 0], [0, 100]], 'The outline crosses itself. Move the corners so that no two edges cross.'],
    [[[0, 0], [2500, 0], [100, 100]], 'Every corner must lie on the plan.'],
    [[[0, 0], [100, 100]], 'A compartment needs at least three corners.'],
  ])('refuses the outline %j with 422 and the message the drawing tool shows', async (outline, message) => {
    const deck = await addDeck('Main deck', '1');
    const res = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '1-10-0-L', name: 'Cabin', outline });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ message, fields: { outline: message } });
    expect((await curator.get(`/api/v1/vessels/${vesselId}/compartments`)).body.total).toBe(0);
  });

  it('refuses an outline on a deck that has no plan yet', async () => {
    const deck = await addDeck('Orlop', null, null);
    const res = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '4-10-0-V', name: 'Void', outline: [[0, 0], [10, 0], [10, 10]] });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/no plan yet/);
  });

  it('warns where the designation disagrees with the drawing: wrong deck, wrong side', async () => {
    const deck = await addDeck('Second deck', '2');
    await curator.patch(`/api/v1/decks/${deck.id}`, { centerlineY: 500, bowTo: 'right', version: deck.version });
    // Bow to the right: starboard is below the centerline (larger y). Position 2 is to port, drawn to starboard here.
    const res = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, {
      deckId: deck.id,
      designation: '3-40-2-A',
      name: 'Stores',
      outline: [[100, 600], [300, 600], [300, 800], [100, 800]],
    });
    expect(res.status).toBe(201);
    expect(res.body.designationWarnings).toEqual([
      'The designation says third deck, but the compartment is on Second deck (deck 2).',
      'An even position means a compartment to port, but the outline reaches to starboard of the centerline.',
    ]);
    const fixed = await curator.patch(`/api/v1/compartments/${res.body.id}`, { designation: '2-40-1-A', version: res.body.version });
    expect(fixed.body.designationWarnings).toEqual([]);
  });

  it('checks the designation against the numbered frames of a calibrated plan: beyond the last frame is 422, outside the outline a warning', async () => {
    const deck = await addDeck('Second deck', '2');
    // 0.03048 m per unit, frame 0 at x 1900, 24 in between frames (20 units), frames number aft (leftward, bow right) to frame 90.
    await curator.post(`/api/v1/decks/${deck.id}/calibration`, { method: 'frames', a: [1900, 500], b: [1700, 500], frameSpaces: 10, frameSpacingMetres: 0.6096, version: deck.version });
    const calibrated = (await curator.get(`/api/v1/decks/${deck.id}`)).body;
    const badFrames = await curator.patch(`/api/v1/decks/${deck.id}`, { frames: { referenceFrame: 40, referenceX: 1900, spacingMetres: 0.6096, lastFrame: 20 }, version: calibrated.version });
    expect(badFrames.status).toBe(400);
    expect(badFrames.body.error.fields).toEqual({ 'frames.lastFrame': 'The last frame cannot be forward of the reference frame.' });
    const framed = await curator.patch(`/api/v1/decks/${deck.id}`, { centerlineY: 500, frames: { referenceFrame: 0, referenceX: 1900, spacingMetres: 0.6096, lastFrame: 90 }, version: calibrated.version });
    expect(framed.status, JSON.stringify(framed.body)).toBe(200);
    expect(framed.body.frames).toEqual({ referenceFrame: 0, referenceX: 1900, spacingMetres: 0.6096, lastFrame: 90 });
    const outline = [[1100, 520], [700, 520], [700, 650], [1100, 650]]; // frames 40–60, to starboard
    const beyond = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '2-95-1-E', name: 'Boiler room', outline });
    expect(beyond.status).toBe(422);
    const message = "Frame 95 is beyond the last frame of Second deck's plan (frame 90).";
    expect(beyond.body.error).toMatchObject({ message, fields: { designation: message, 'designation.frame': message } });
    expect((await curator.get(`/api/v1/vessels/${vesselId}/compartments`)).body.total).toBe(0);
    const off = await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '2-70-1-E', name: 'Boiler room', outline });
    expect(off.status).toBe(201);
    expect(off.body.designationWarnings).toEqual(['The designation says frame 70, but the outline spans frames 40–60; designations use the foremost, 40.']);
    const stillBeyond = await curator.patch(`/api/v1/compartments/${off.body.id}`, { designation: '2-91-1-E', version: off.body.version });
    expect(stillBeyond.status).toBe(422);
    const fixed = await curator.patch(`/api/v1/compartments/${off.body.id}`, { designation: '2-40-1-E', version: off.body.version });
    expect(fixed.body.designationWarnings).toEqual([]);
  });

  it('filters by deck, access and hazard; records every change in the audit trail', async () => {
    const conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
    const upper = await addDeck('Main deck', '1');
    const lower = await addDeck('Second deck', '2');
    const a = (await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: upper.id, designation: '1-10-0-L', name: 'Saloon', accessStatus: 'open' })).body;
    await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: lower.id, designation: '2-60-0-E', name: 'Engine room', accessStatus: 'guided-only' });
    await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: lower.id, designation: '2-80-0-V', name: 'Void', accessStatus: 'sealed' });
    await conservator.post(`/api/v1/compartments/${a.id}/hazards`, { kind: 'asbestos', notes: 'Lagging on the steam line' });
    const list = (q: string) => curator.get(`/api/v1/vessels/${vesselId}/compartments?${q}`).then((r) => r.body.items.map((c: { name: string }) => c.name));
    expect(await list(`deckId=${lower.id}`)).toEqual(['Engine room', 'Void']);
    expect(await list('accessStatus=sealed')).toEqual(['Void']);
    expect(await list('hazard=asbestos')).toEqual(['Saloon']);
    expect(await list('q=engine')).toEqual(['Engine room']);
    const audit = await ctx.dataSource.query(`SELECT entityType, action FROM audit_events WHERE entityType IN ('compartment', 'hazard') ORDER BY id`);
    expect(audit).toEqual([
      { entityType: 'compartment', action: 'create' },
      { entityType: 'compartment', action: 'create' },
      { entityType: 'compartment', action: 'create' },
      { entityType: 'hazard', action: 'create' },
    ]);
  });
});

describe('hazards', () => {
  it('every hazard kind brings its own caution to the compartment, lead paint included', async () => {
    const conservator = await signedInAs(ctx.app, ctx.store, 'conservator');
    const deck = await addDeck('Second deck', '2');
    const room = (await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '2-62-0-E', name: 'Engine room' })).body;
    expect(room.hazardCautions).toEqual([]);
    await conservator.client.post(`/api/v1/compartments/${room.id}/hazards`, { kind: 'lead-paint', notes: 'Engine columns tested positive' });
    await conservator.client.post(`/api/v1/compartments/${room.id}/hazards`, { kind: 'steep-ladder' });
    const after = (await curator.get(`/api/v1/compartments/${room.id}`)).body;
    expect(after.entryCaution).toBeNull();
    expect(after.hazardCautions.map((h: { kind: string }) => h.kind)).toEqual(['lead-paint', 'steep-ladder']);
    expect(after.hazardCautions[0]).toMatchObject({ label: 'Lead-based paint', caution: expect.stringMatching(/lead-safe methods.*site safety plan and local codes/) });
  });

  it('a confined space or asbestos puts the entry caution on the compartment; the check is signed', async () => {
    const conservator = await signedInAs(ctx.app, ctx.store, 'conservator');
    const deck = await addDeck('Fourth deck', '4');
    const tank = (await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '4-70-0-W', name: 'Feed water tank', accessStatus: 'sealed' })).body;
    expect(tank.entryCaution).toBeNull();
    const today = new Date().toISOString().slice(0, 10);
    const created = await conservator.client.post(`/api/v1/compartments/${tank.id}/hazards`, { kind: 'confined-space', notes: 'Single manhole, no ventilation', lastVerifiedOn: today });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ kind: 'confined-space', lastVerifiedOn: today, verifiedBy: { id: conservator.user.id } });
    const withCaution = (await curator.get(`/api/v1/compartments/${tank.id}`)).body;
    expect(withCaution.hazardKinds).toEqual(['confined-space']);
    expect(withCaution.entryCaution).toMatch(/confined-space entry permit/);
    expect(withCaution.entryCaution).toMatch(/never declares a space safe/);

    const future = await conservator.client.post(`/api/v1/compartments/${tank.id}/hazards`, { kind: 'other', lastVerifiedOn: '2999-01-01' });
    expect(future.status).toBe(400);
    expect(future.body.error.fields.lastVerifiedOn).toMatch(/future/);

    const removed = await conservator.client.send('delete', `/api/v1/compartments/${tank.id}/hazards/${created.body.id}`);
    expect(removed.status).toBe(204);
    expect((await curator.get(`/api/v1/compartments/${tank.id}`)).body.entryCaution).toBeNull();
  });

  it('answers 404 for a hazard of another compartment', async () => {
    const conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
    const deck = await addDeck('Main deck', '1');
    const one = (await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '1-10-0-L', name: 'A' })).body;
    const two = (await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: '1-20-0-L', name: 'B' })).body;
    const hazard = (await conservator.post(`/api/v1/compartments/${one.id}/hazards`, { kind: 'steep-ladder' })).body;
    expect((await conservator.patch(`/api/v1/compartments/${two.id}/hazards/${hazard.id}`, { notes: 'x', version: hazard.version })).status).toBe(404);
  });
});
