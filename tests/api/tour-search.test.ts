import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { HIGHLIGHT_END, HIGHLIGHT_START } from '../../shared/schemas/artifacts.js';
import { deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let docent: Client;
let curator: Client;
let vesselId: number;
let place: Awaited<ReturnType<typeof deckWithCompartments>>;

const paragraph = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
const ids = (page: { items: { id: number }[] }) => page.items.map((t) => t.id);

async function newTour(title: string, slug: string, summary = '') {
  const res = await docent.post(`/api/v1/vessels/${vesselId}/tours`, { title, slug, summary });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

beforeEach(async () => {
  ctx = await createTestApp();
  docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  vesselId = (await buildVessel(ctx.store)).id;
  place = await deckWithCompartments(ctx.store, curator, vesselId);
});
afterEach(() => ctx.close());

describe('tours in the full-text search', () => {
  it('finds a tour by a word only in a stop’s text, and no longer after the stop is edited', async () => {
    const below = await newTour('Below the waterline', 'below-the-waterline', 'Down the ladders to the shaft alley.');
    const deck = await newTour('Along the main deck', 'along-the-main-deck', 'Step-free, from the gangway aft.');
    const withStop = (await docent.post(`/api/v1/tours/${below.id}/stops`, { compartmentId: place.first, title: 'The store room', textDoc: paragraph('Spare gauge glasses were kept below, in oilcloth.') })).body;
    const stop = withStop.stops[0];

    const found = (await docent.get(`/api/v1/vessels/${vesselId}/tours?q=oilcloth`)).body;
    expect(ids(found)).toEqual([below.id]);
    expect(found.items[0].snippet).toBe(`The store room: Spare gauge glasses were kept below, in ${HIGHLIGHT_START}oilcloth${HIGHLIGHT_END}.`);
    // The tour's own words, stemmed like every search ("gangway" from "gangways"), and a typed prefix.
    expect(ids((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=gangways`)).body)).toEqual([deck.id]);
    expect(ids((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=waterl`)).body)).toEqual([below.id]);
    // A word of the title and of a stop: the stop's marked words are the snippet, not the unmarked summary.
    const both = (await docent.get(`/api/v1/vessels/${vesselId}/tours?q=below`)).body;
    expect(both.items.map((t: { id: number; snippet: string }) => [t.id, t.snippet])).toEqual([[below.id, `The store room: Spare gauge glasses were kept ${HIGHLIGHT_START}below${HIGHLIGHT_END}, in oilcloth.`]]);
    expect((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=gangway`)).body.items[0].snippet).toBe(`Step-free, from the ${HIGHLIGHT_START}gangway${HIGHLIGHT_END} aft.`);

    const edited = await docent.patch(`/api/v1/tours/${below.id}/stops/${stop.id}`, { textDoc: paragraph('Spare gauge glasses were kept in sawdust.'), version: stop.version });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    expect((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=oilcloth`)).body).toMatchObject({ items: [], total: 0 });
    expect(ids((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=sawdust`)).body)).toEqual([below.id]);

    expect((await docent.send('delete', `/api/v1/tours/${below.id}/stops/${stop.id}`)).status).toBe(200);
    expect((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=sawdust`)).body.total).toBe(0);
    // Restoring the revision with the stop brings its words back.
    const now = (await docent.get(`/api/v1/tours/${below.id}`)).body;
    const restored = await docent.post(`/api/v1/tours/${below.id}/revisions/3/restore`, { version: now.version });
    expect(restored.status, JSON.stringify(restored.body)).toBe(200);
    expect(ids((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=sawdust`)).body)).toEqual([below.id]);
  });

  it('keeps each vessel’s tours to itself, and an operator typed into the box is only a word', async () => {
    const mine = await newTour('Boiler room', 'boiler-room', 'Firing the boilers.');
    const other = (await buildVessel(ctx.store)).id;
    const res = await docent.post(`/api/v1/vessels/${other}/tours`, { title: 'Boiler flats', slug: 'boiler-flats' });
    expect(res.status).toBe(201);
    expect(ids((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=boiler`)).body)).toEqual([mine.id]);
    const injected = await docent.get(`/api/v1/vessels/${vesselId}/tours?q=${encodeURIComponent('title : "* OR')}`);
    expect(injected.status).toBe(200);
    expect(injected.body.total).toBe(0);
  });

  it('docents and fundraisers may search; a visitor gets 401', async () => {
    await newTour('Boiler room', 'boiler-room', 'Firing the boilers.');
    const fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
    expect((await fundraiser.get(`/api/v1/vessels/${vesselId}/tours?q=firing`)).body.total).toBe(1);
    expect((await docent.get(`/api/v1/vessels/${vesselId}/tours?q=firing`)).body.total).toBe(1);
    expect((await new Client(ctx.app).get(`/api/v1/vessels/${vesselId}/tours?q=firing`)).status).toBe(401);
  });
});
