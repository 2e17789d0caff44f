import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let conservator: Client;
let vesselId: number;
let place: Awaited<ReturnType<typeof deckWithCompartments>>;

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  place = await deckWithCompartments(ctx.store, curator, vesselId);
});
afterEach(() => ctx.close());

describe('the risk register (ABC method)', () => {
  it('scores risks directly or from plain inputs and ranks them by MR', async () => {
    // Plain inputs on the logarithmic scales (anchors from memory, see REFERENCES.md): once in 10 years → A 4; 30 % → B 4.5; 1 % → C 3.
    const gauges = await conservator.post('/api/v1/risks', { vesselId, statement: 'Vandals break gauge glasses in the pump room', agent: 'thieves-and-vandals', yearsBetween: 10, lossPerItemPercent: 30, assetFractionPercent: 1, compartmentIds: [place.second] });
    expect(gauges.status, JSON.stringify(gauges.body)).toBe(201);
    expect(gauges.body).toMatchObject({ a: 4, b: 4.5, c: 3, magnitude: 11.5, band: 'very-high', bandLabel: 'Very high priority', yearsBetween: 10, compartments: [{ id: place.second, label: '1-40-2-M Magazine' }] });
    const damp = await conservator.post('/api/v1/risks', { vesselId, statement: 'Condensation rusts the store room deckhead', agent: 'incorrect-relative-humidity', a: 5, b: 2, c: 2.5, compartmentIds: [place.first] });
    expect(damp.body).toMatchObject({ magnitude: 9.5, band: 'high', yearsBetween: null });
    const register = (await curator.get(`/api/v1/risks?vesselId=${vesselId}`)).body;
    expect(register.items.map((r: { magnitude: number }) => r.magnitude)).toEqual([11.5, 9.5]);
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}&agent=incorrect-relative-humidity`)).body.items.map((r: { id: number }) => r.id)).toEqual([damp.body.id]);
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}&compartmentId=${place.second}`)).body.total).toBe(1);
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}&deckId=${place.deckId}`)).body.total).toBe(2);
  });

  it('refuses scores off the scale, and names the field and range', async () => {
    const half = await conservator.post('/api/v1/risks', { vesselId, statement: 'x', agent: 'fire', a: 4.2, b: 3, c: 3 });
    expect(half.status).toBe(422);
    expect(half.body.error.fields.a).toBe('Between 1 and 5 in steps of 0.5.');
    const pct = await conservator.post('/api/v1/risks', { vesselId, statement: 'x', agent: 'fire', a: 4, lossPerItemPercent: 120, c: 3 });
    expect(pct.body.error.fields.lossPerItemPercent).toBe('Loss of value to each affected item must be more than 0 and at most 100 %.');
    const missing = await conservator.post('/api/v1/risks', { vesselId, statement: 'x', agent: 'fire', a: 4, b: 3 });
    expect(missing.body.error.fields.c).toBe('Missing.');
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}`)).body.total).toBe(0);
  });

  it('is kept by conservators and read by all staff; a stale edit answers 409', async () => {
    expect((await curator.post('/api/v1/risks', { vesselId, statement: 'x', agent: 'fire', a: 3, b: 3, c: 3 })).status).toBe(403);
    const r = (await conservator.post('/api/v1/risks', { vesselId, statement: 'Galley fire spreads aft', agent: 'fire', a: 2, b: 5, c: 4 })).body;
    const changed = await conservator.patch(`/api/v1/risks/${r.id}`, { yearsBetween: 300, version: r.version });
    expect(changed.body).toMatchObject({ a: 2.5, magnitude: 11.5, yearsBetween: 300 });
    const stale = await conservator.patch(`/api/v1/risks/${r.id}`, { notes: 'x', version: r.version });
    expect(stale.status).toBe(409);
    const direct = await conservator.patch(`/api/v1/risks/${r.id}`, { a: 3, version: changed.body.version });
    expect(direct.body).toMatchObject({ a: 3, yearsBetween: null, magnitude: 12 });
  });
});

describe('the deck overlay', () => {
  it('gives each compartment its latest submitted grade and its open risks', async () => {
    const submit = async (subjectId: number, inspectedOn: string, severity: string) => {
      const r = (await conservator.post('/api/v1/condition-reports', { subjectType: 'compartment', subjectId, inspectedOn })).body;
      const f = (await conservator.post(`/api/v1/condition-reports/${r.id}/findings`, { agent: 'water', damageType: 'water-staining', severity })).body;
      return (await conservator.post(`/api/v1/condition-reports/${r.id}/submit`, { version: f.version })).body;
    };
    await submit(place.first, '2025-06-01', 'critical');
    const latest = await submit(place.first, '2026-06-01', 'moderate');
    await conservator.post('/api/v1/condition-reports', { subjectType: 'compartment', subjectId: place.second, inspectedOn: '2026-07-01' }); // a draft does not count
    await conservator.post('/api/v1/risks', { vesselId, statement: 'Leaks', agent: 'water', a: 4, b: 3, c: 3, compartmentIds: [place.first] });
    await conservator.post('/api/v1/risks', { vesselId, statement: 'Worse leaks', agent: 'water', a: 5, b: 4, c: 3, compartmentIds: [place.first] });
    await conservator.post('/api/v1/risks', { vesselId, statement: 'Treated', agent: 'water', a: 5, b: 5, c: 5, compartmentIds: [place.second], status: 'treated' });
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    const overlay = (await docent.get(`/api/v1/decks/${place.deckId}/condition`)).body.compartments;
    expect(overlay).toEqual([
      { compartmentId: place.first, grade: 'fair', reportId: latest.id, inspectedOn: '2026-06-01', openRisks: 2, maxMagnitude: 12, band: 'very-high' },
      { compartmentId: place.second, grade: null, reportId: null, inspectedOn: null, openRisks: 0, maxMagnitude: null, band: null },
    ]);
  });
});

describe('what a risk concerns', () => {
  it('moves the version when only its compartments change, so a stale edit of them answers 409', async () => {
    const r = (await conservator.post('/api/v1/risks', { vesselId, statement: 'Leaks', agent: 'water', a: 3, b: 3, c: 3, compartmentIds: [place.first] })).body;
    const first = await conservator.patch(`/api/v1/risks/${r.id}`, { compartmentIds: [place.second], version: r.version });
    expect(first.body.version).toBe(r.version + 1);
    const second = await conservator.patch(`/api/v1/risks/${r.id}`, { compartmentIds: [place.first, place.second], version: r.version });
    expect(second.status).toBe(409);
    expect(second.body.error.fields.subjects).toBeDefined();
    const same = await conservator.patch(`/api/v1/risks/${r.id}`, { compartmentIds: [place.second], version: first.body.version });
    expect(same.body.version).toBe(first.body.version);
  });
});

describe('deck filters follow the places', () => {
  it('when an artifact moves or a compartment changes deck', async () => {
    const gauge = (await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', compartmentId: place.first, point: [200, 200] }));
    const r = (await conservator.post('/api/v1/risks', { vesselId, statement: 'Gauge glass broken', agent: 'thieves-and-vandals', a: 3, b: 3, c: 3, artifactIds: [gauge.id] })).body;
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}&deckId=${place.deckId}`)).body.total).toBe(1);
    const lower = (await curator.post(`/api/v1/vessels/${vesselId}/decks`, { name: 'Lower deck', levelCode: '2' })).body;
    const room = (await curator.get(`/api/v1/compartments/${place.first}`)).body;
    expect((await curator.patch(`/api/v1/compartments/${place.first}`, { deckId: lower.id, designation: '2-10-1-Q', version: room.version })).status).toBe(200);
    // The artifact is still in its compartment but no longer on a plan point of another deck.
    const loc = (await curator.get(`/api/v1/artifacts/${gauge.id}`)).body.location;
    expect(loc, JSON.stringify(loc)).toMatchObject({ compartmentId: place.first, point: null, deckId: lower.id });
    await curator.post(`/api/v1/artifacts/${gauge.id}/moves`, { compartmentId: place.second, point: null, status: 'in-place', reason: 'Moved', version: (await curator.get(`/api/v1/artifacts/${gauge.id}`)).body.version });
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}&deckId=${place.deckId}`)).body.items.map((x: { id: number }) => x.id)).toEqual([r.id]);
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}&deckId=${lower.id}`)).body.total).toBe(0);
  });
});

describe('the ABC scale as organisation settings', () => {
  it('starts at the defaults, refuses bands that do not rise, and re-scores the register when changed', async () => {
    const admin = (await signedInAs(ctx.app, ctx.store, 'admin')).client;
    const current = (await curator.get('/api/v1/settings')).body;
    expect(current.riskScale).toEqual({ aYearsAtFive: 1, stepFactor: 10, bandFloors: { low: 3, medium: 7.5, high: 9.5, 'very-high': 11.5, extreme: 13.5 } });
    const fromYears = (await conservator.post('/api/v1/risks', { vesselId, statement: 'Damp in the hold', agent: 'water', yearsBetween: 10, b: 3, c: 3 })).body;
    const direct = (await conservator.post('/api/v1/risks', { vesselId, statement: 'Fire in the galley', agent: 'fire', a: 3, b: 3, c: 2 })).body;
    expect(fromYears).toMatchObject({ a: 4, magnitude: 10, band: 'high' });
    expect(direct).toMatchObject({ magnitude: 8, band: 'medium' });

    const bad = await admin.patch('/api/v1/settings', { riskScale: { ...current.riskScale, bandFloors: { ...current.riskScale.bandFloors, high: 7 } }, version: current.version });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ 'riskScale.bandFloors.high': 'High priority must start above medium priority (MR 7.5): the bands rise from low to extreme.' });
    expect((await curator.get('/api/v1/settings')).body).toMatchObject({ riskScale: current.riskScale, version: current.version });
    expect((await curator.patch('/api/v1/settings', { riskScale: current.riskScale, version: current.version })).status).toBe(403);

    const riskScale = { aYearsAtFive: 1, stepFactor: 100, bandFloors: { low: 3, medium: 7, high: 8, 'very-high': 11, extreme: 13 } };
    const ok = await admin.patch('/api/v1/settings', { riskScale, version: current.version });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.riskScale).toEqual(riskScale);
    // Ten years under a factor of 100: 5 − log100(10) = 4.5; MR 10.5 stays high under the new floors (very high starts at 11).
    expect((await curator.get(`/api/v1/risks/${fromYears.id}`)).body).toMatchObject({ a: 4.5, magnitude: 10.5, band: 'high' });
    expect((await curator.get(`/api/v1/risks/${direct.id}`)).body).toMatchObject({ a: 3, magnitude: 8, band: 'high' });
    expect((await curator.get(`/api/v1/risks?vesselId=${vesselId}&band=high`)).body.total).toBe(2);
    const fresh = await conservator.post('/api/v1/risks', { vesselId, statement: 'Theft', agent: 'thieves-and-vandals', a: 4, b: 4, c: 3 });
    expect(fresh.body).toMatchObject({ magnitude: 11, band: 'very-high' });
  });
});
