import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs } from '../support/http.js';
import { cameraJpeg } from '../support/images.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let visitor: Client;
let artifactId: number;
let compartmentId: number;

const ALT = 'A round brass gauge with a black needle';

async function publicPhoto(ownerType: 'artifact' | 'compartment', ownerId: number, name: string) {
  const upload = await curator.agent.post(`/api/v1/media?ownerType=${ownerType}&ownerId=${ownerId}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), name);
  expect(upload.status, JSON.stringify(upload.body)).toBe(201);
  const marked = await curator.patch(`/api/v1/media/${upload.body.id}`, { altText: ALT, publicUse: true, version: upload.body.version });
  expect(marked.status, JSON.stringify(marked.body)).toBe(200);
  return marked.body as { id: number; version: number };
}

const withPhoto = (mediaId: number): RichTextDoc => ({
  type: 'doc',
  content: [
    { type: 'image', attrs: { src: `/api/v1/media/${mediaId}/display`, alt: ALT } },
    { type: 'paragraph', content: [{ type: 'text', text: 'Firemen watched this gauge all watch long.' }] },
  ],
});

/** A curator writes and publishes their own text (no review needed). */
async function publish(base: string, story: RichTextDoc) {
  const saved = await curator.send('put', base, { version: 0, general: { label: null, story } });
  expect(saved.status, JSON.stringify(saved.body)).toBe(200);
  const approved = await curator.post(`${base}/approve`, { version: saved.body.version });
  expect(approved.status, JSON.stringify(approved.body)).toBe(200);
  return approved.body;
}

beforeEach(async () => {
  ctx = await createTestApp();
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  visitor = new Client(ctx.app);
  const vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  compartmentId = (await deckWithCompartments(ctx.store, curator, vesselId)).first;
  artifactId = (await addArtifact(curator, vesselId, { objectNumber: '2026.1.1', name: 'Steam gauge', compartmentId })).id;
});
afterEach(() => ctx.close());

describe('photos of published interpretation, for visitors', () => {
  it('points the published html at the public route, which serves the photo to a visitor; the staff route stays closed', async () => {
    const photo = await publicPhoto('artifact', artifactId, 'gauge.jpg');
    const published = await publish(`/api/v1/artifacts/${artifactId}/interpretation`, withPhoto(photo.id));
    const src = `/api/v1/visit/artifacts/${artifactId}/interpretation/media/${photo.id}/display`;
    // The draft document keeps the staff path for the editor; only the published html changes.
    expect(published.draft.general.story.doc.content[0].attrs.src).toBe(`/api/v1/media/${photo.id}/display`);
    const read = await visitor.get(`/api/v1/visit/artifacts/${artifactId}/interpretation`);
    expect(read.status).toBe(200);
    expect(read.body.audiences.general.story).toBe(`<img src="${src}" alt="${ALT}" /><p>Firemen watched this gauge all watch long.</p>`);
    const file = await visitor.get(src);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/webp');
    expect((await visitor.get(`/api/v1/visit/artifacts/${artifactId}/interpretation/media/${photo.id}/thumb`)).status).toBe(200);
    expect((await visitor.get(`/api/v1/media/${photo.id}/display`)).status).toBe(401);
  });

  it('answers 404 for a photo the published text does not show, even one marked for public use', async () => {
    const shown = await publicPhoto('artifact', artifactId, 'gauge.jpg');
    const other = await publicPhoto('artifact', artifactId, 'other.jpg');
    await publish(`/api/v1/artifacts/${artifactId}/interpretation`, withPhoto(shown.id));
    expect((await visitor.get(`/api/v1/visit/artifacts/${artifactId}/interpretation/media/${other.id}/display`)).status).toBe(404);
    // Nor through another subject's route.
    expect((await visitor.get(`/api/v1/visit/compartments/${compartmentId}/interpretation/media/${shown.id}/display`)).status).toBe(404);
  });

  it('stops serving a photo withdrawn from public use after publishing, and leaves its image out of the html', async () => {
    const photo = await publicPhoto('compartment', compartmentId, 'boiler-room.jpg');
    const base = `/api/v1/compartments/${compartmentId}/interpretation`;
    await publish(base, withPhoto(photo.id));
    const src = `/api/v1/visit/compartments/${compartmentId}/interpretation/media/${photo.id}/display`;
    expect((await visitor.get(src)).status).toBe(200);
    const withdrawn = await curator.patch(`/api/v1/media/${photo.id}`, { publicUse: false, version: photo.version });
    expect(withdrawn.status).toBe(200);
    expect((await visitor.get(src)).status).toBe(404);
    expect((await visitor.get(`/api/v1/visit/compartments/${compartmentId}/interpretation`)).body.audiences.general.story).toBe('<p>Firemen watched this gauge all watch long.</p>');
    // Cleared again, but without alt text: still left out.
    const noAlt = await curator.patch(`/api/v1/media/${photo.id}`, { publicUse: true, altText: '', version: withdrawn.body.version });
    expect(noAlt.status).toBe(200);
    expect((await visitor.get(`/api/v1/visit/compartments/${compartmentId}/interpretation`)).body.audiences.general.story).toBe('<p>Firemen watched this gauge all watch long.</p>');
    expect((await visitor.get(src)).status).toBe(404);
    await curator.patch(`/api/v1/media/${photo.id}`, { altText: ALT, version: noAlt.body.version });
    expect((await visitor.get(`/api/v1/visit/compartments/${compartmentId}/interpretation`)).body.audiences.general.story).toContain(`<img src="${src}"`);
  });
});
