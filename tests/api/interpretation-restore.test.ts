import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let docent: Client;
let vesselId: number;
let artifactId: number;
let compartmentId: number;

const doc = (text: string): RichTextDoc => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
const path = (base: string) => `/api/v1/${base}/interpretation`;

async function save(client: Client, base: string, version: number, label: string) {
  const res = await client.send('put', path(base), { version, general: { label: doc(label), story: null } });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

beforeEach(async () => {
  ctx = await createTestApp();
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
  vesselId = (await buildVessel(ctx.store)).id;
  compartmentId = (await deckWithCompartments(ctx.store, curator, vesselId)).first;
  artifactId = (await addArtifact(curator, vesselId, { objectNumber: '2026.4.1', name: 'Lamp', compartmentId })).id;
});
afterEach(() => ctx.close());

describe('restoring a revision of interpretive text', () => {
  it('a docent restores an earlier revision as a new one; the published text stays, the state goes back to draft, the search follows', async () => {
    const base = `artifacts/${artifactId}`;
    await save(docent, base, 0, 'A brass lamp from the chartroom.');
    const second = await save(curator, base, 1, 'A brass lamp from the wheelhouse.');
    const published = (await curator.post(`${path(base)}/approve`, { version: second.version })).body;
    expect(published.state).toBe('published');

    const stale = await docent.post(`${path(base)}/revisions/1/restore`, { version: published.version - 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/changed this interpretation since you opened it/);

    const restored = await docent.post(`${path(base)}/revisions/1/restore`, { version: published.version });
    expect(restored.status, JSON.stringify(restored.body)).toBe(200);
    expect(restored.body.state).toBe('draft');
    expect(restored.body.draft.general.label.text).toBe('A brass lamp from the chartroom.');
    expect(restored.body.published.general.label.text).toBe('A brass lamp from the wheelhouse.');
    const revisions = (await docent.get(`${path(base)}/revisions`)).body;
    expect(revisions.map((r: { number: number; texts: { general: { label: { text: string } } } }) => [r.number, r.texts.general.label.text])).toEqual([
      [3, 'A brass lamp from the chartroom.'],
      [2, 'A brass lamp from the wheelhouse.'],
      [1, 'A brass lamp from the chartroom.'],
    ]);
    // The public still reads what was approved.
    expect((await new Client(ctx.app).get(`/api/v1/visit${path(base).slice('/api/v1'.length)}`)).body.audiences.general.label).toBe('<p>A brass lamp from the wheelhouse.</p>');
    const search = async (q: string) => (await docent.get(`/api/v1/vessels/${vesselId}/interpretations?q=${q}`)).body.total;
    expect([await search('chartroom'), await search('wheelhouse')]).toEqual([1, 0]);

    expect((await docent.post(`${path(base)}/revisions/9/restore`, { version: restored.body.version })).status).toBe(404);
  });

  it('takes a compartment’s text out of review when restored; fundraisers may not restore (403)', async () => {
    const base = `compartments/${compartmentId}`;
    await save(docent, base, 0, 'Stores were kept here.');
    const second = await save(docent, base, 1, 'Spare parts were kept here.');
    const inReview = (await docent.post(`${path(base)}/submit`, { version: second.version })).body;
    expect(inReview.state).toBe('in-review');
    const fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
    expect((await fundraiser.post(`${path(base)}/revisions/1/restore`, { version: inReview.version })).status).toBe(403);
    expect((await new Client(ctx.app).post(`${path(base)}/revisions/1/restore`, { version: inReview.version })).status).toBe(401);
    const restored = await docent.post(`${path(base)}/revisions/1/restore`, { version: inReview.version });
    expect(restored.status, JSON.stringify(restored.body)).toBe(200);
    expect(restored.body).toMatchObject({ state: 'draft', draft: { general: { label: { text: 'Stores were kept here.' } } } });
  });
});
