import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs, waitForMail } from '../support/http.js';
import { cameraJpeg } from '../support/images.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let docent: Client;
let conservator: Client;
let curatorEmail: string;
let docentEmail: string;
let vesselId: number;
let artifactId: number;
let compartmentId: number;
let emptyCompartmentId: number;

const doc = (...paragraphs: string[]): RichTextDoc => ({ type: 'doc', content: paragraphs.map((text) => ({ type: 'paragraph', content: [{ type: 'text', text }] })) });
const LABEL = doc('This brass gauge showed the steam pressure in the boilers.');
const STORY = doc('Firemen watched this gauge all watch long.', 'If the needle climbed too high, a safety valve lifted with a roar.');

beforeEach(async () => {
  ctx = await createTestApp();
  const c = await signedInAs(ctx.app, ctx.store, 'curator');
  const d = await signedInAs(ctx.app, ctx.store, 'docent');
  curator = c.client;
  docent = d.client;
  curatorEmail = c.user.email;
  docentEmail = d.user.email;
  conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  const place = await deckWithCompartments(ctx.store, curator, vesselId);
  compartmentId = place.first;
  emptyCompartmentId = place.second;
  artifactId = (await addArtifact(curator, vesselId, { objectNumber: '2026.1.1', name: 'Steam gauge', compartmentId })).id;
});
afterEach(() => ctx.close());

const path = (id = artifactId) => `/api/v1/artifacts/${id}/interpretation`;

describe('interpretation of an artifact', () => {
  it('starts empty at version 0 with the default targets, marked as common practice in the schema', async () => {
    const res = await conservator.get(path());
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      subjectType: 'artifact',
      subjectId: artifactId,
      subjectLabel: '2026.1.1 Steam gauge',
      state: 'draft',
      version: 0,
      draft: { general: null, families: null, technical: null },
      published: null,
      // Common practice, no published source: a label of at most 75 words, grade 8 for general readers and families.
      targets: { labelMaxWords: 75, maxGrade: { general: 8, families: 8, technical: null } },
      abilities: { update: false, submit: false, approve: false, return: false },
    });
    expect((await docent.get(path())).body.abilities).toEqual({ update: true, submit: false, approve: false, return: false });
    expect((await docent.get(path(999999))).status).toBe(404);
  });

  it('renders at save, keeps each save as a revision, and answers 409 to a stale version', async () => {
    const first = await docent.send('put', path(), { version: 0, general: { label: LABEL, story: STORY }, families: { label: doc(''), story: null } });
    expect(first.status, JSON.stringify(first.body)).toBe(200);
    expect(first.body.version).toBe(1);
    expect(first.body.revisions).toBe(1);
    expect(first.body.draft.general.label.html).toBe('<p>This brass gauge showed the steam pressure in the boilers.</p>');
    expect(first.body.draft.general.story.text).toBe('Firemen watched this gauge all watch long.\nIf the needle climbed too high, a safety valve lifted with a roar.');
    // An empty document counts as none.
    expect(first.body.draft.families).toBeNull();

    const stale = await curator.send('put', path(), { version: 0, general: { label: doc('Other'), story: null } });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toBe('Someone else changed this interpretation since you opened it. Reload to see their changes.');
    expect((await docent.get(path())).body.draft.general.label.text).toBe('This brass gauge showed the steam pressure in the boilers.');

    const second = await docent.send('put', path(), { version: 1, general: { label: LABEL, story: doc('A shorter story.') } });
    expect(second.body).toMatchObject({ version: 2, revisions: 2 });
    // Saving the same text again writes nothing.
    const same = await docent.send('put', path(), { version: 2, general: { label: LABEL, story: doc('A shorter story.') } });
    expect(same.body).toMatchObject({ version: 2, revisions: 2 });
    const revisions = (await conservator.get(`${path()}/revisions`)).body;
    expect(revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(revisions[1].texts.general.story.text).toBe('Firemen watched this gauge all watch long.\nIf the needle climbed too high, a safety valve lifted with a roar.');
    expect(revisions[0]).toMatchObject({ savedBy: { name: expect.any(String) }, texts: { general: { story: { text: 'A shorter story.' } } } });
  });

  it('refuses what the editor does not make, and a script link never reaches the html', async () => {
    const bad = await docent.send('put', path(), { version: 0, general: { label: { type: 'doc', content: [{ type: 'codeBlock', content: [{ type: 'text', text: 'x' }] }] }, story: null } });
    expect(bad.status).toBe(422);
    expect(bad.body.error).toMatchObject({ code: 'invalid_rich_text', fields: { 'general.label': 'The text holds a "codeBlock" block, which stories do not use.' } });
    const link = { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'click', marks: [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }] }] }] };
    const saved = await docent.send('put', path(), { version: 0, general: { label: null, story: link } });
    expect(saved.status).toBe(200);
    expect(saved.body.draft.general.story.html).not.toContain('javascript');
    const wrong = await docent.send('put', path(), { version: 1, general: { label: 'plain', story: null } });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields['general.label']).toBe('General label must be a rich-text document.');
    expect((await conservator.send('put', path(), { version: 1, general: null })).status).toBe(403);
  });

  it('goes through review: a docent submits (curators are told), cannot approve, a curator returns it with a comment (the docent is told)', async () => {
    const saved = (await docent.send('put', path(), { version: 0, general: { label: LABEL, story: STORY } })).body;
    const submitted = await docent.post(`${path()}/submit`, { version: saved.version });
    expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
    expect(submitted.body).toMatchObject({ state: 'in-review', submittedBy: { name: expect.any(String) }, abilities: { submit: false, approve: false } });
    const toCurator = await waitForMail(ctx.fakeMail, curatorEmail);
    expect(toCurator.subject).toBe('Interpretation to review: 2026.1.1 Steam gauge');
    expect(toCurator.text).toContain(`/app/collection/${artifactId}`);

    const docentApproves = await docent.post(`${path()}/approve`, { version: submitted.body.version });
    expect(docentApproves.status).toBe(403);
    expect(docentApproves.body.error.message).toBe('Your role does not allow this.');
    expect((await docent.post(`${path()}/submit`, { version: submitted.body.version })).body.error.message).toBe('This interpretation is already in review.');

    const noComment = await curator.post(`${path()}/return`, { version: submitted.body.version, comment: '  ' });
    expect(noComment.status).toBe(400);
    expect(noComment.body.error.fields.comment).toBe('Comment is required.');
    const returned = await curator.post(`${path()}/return`, { version: submitted.body.version, comment: 'Say what a safety valve is for families.' });
    expect(returned.body).toMatchObject({ state: 'draft', returnComment: 'Say what a safety valve is for families.', published: null });
    const toDocent = await waitForMail(ctx.fakeMail, docentEmail);
    expect(toDocent.subject).toBe('Returned with a comment: 2026.1.1 Steam gauge');
    expect(toDocent.text).toContain('Say what a safety valve is for families.');
    expect((await curator.post(`${path()}/return`, { version: returned.body.version, comment: 'again' })).body.error.message).toBe('Only text in review can be returned.');
  });

  it('publishes a snapshot on approval that a later draft does not change; the public sees only the published html', async () => {
    const saved = (await docent.send('put', path(), { version: 0, general: { label: LABEL, story: STORY } })).body;
    const submitted = (await docent.post(`${path()}/submit`, { version: saved.version })).body;
    ctx.fakeMail.clear();
    const approved = await curator.post(`${path()}/approve`, { version: submitted.version });
    expect(approved.status, JSON.stringify(approved.body)).toBe(200);
    expect(approved.body).toMatchObject({ state: 'published', differsFromPublished: false, publishedBy: { name: expect.any(String) } });
    expect(approved.body.published.general.label.html).toBe('<p>This brass gauge showed the steam pressure in the boilers.</p>');
    const toDocent = await waitForMail(ctx.fakeMail, docentEmail);
    expect(toDocent.subject).toBe('Published: 2026.1.1 Steam gauge');

    const redraft = await docent.send('put', path(), { version: approved.body.version, general: { label: doc('A new draft label nobody approved.'), story: STORY } });
    expect(redraft.body).toMatchObject({ state: 'draft', differsFromPublished: true });
    expect(redraft.body.published.general.label.html).toBe('<p>This brass gauge showed the steam pressure in the boilers.</p>');
    // Revisions count saves only: submitting and approving change the version, not the numbering.
    expect(redraft.body.revisions).toBe(2);
    expect((await docent.get(`${path()}/revisions`)).body.map((r: { number: number }) => r.number)).toEqual([2, 1]);

    const visitor = new Client(ctx.app);
    const pub = await visitor.get(`/api/v1/visit/artifacts/${artifactId}/interpretation`);
    expect(pub.status).toBe(200);
    expect(pub.body).toEqual({
      subjectType: 'artifact',
      subjectId: artifactId,
      title: 'Steam gauge',
      publishedAt: approved.body.publishedAt,
      audiences: {
        general: { label: '<p>This brass gauge showed the steam pressure in the boilers.</p>', story: '<p>Firemen watched this gauge all watch long.</p><p>If the needle climbed too high, a safety valve lifted with a roar.</p>' },
        families: null,
        technical: null,
      },
    });
    expect(JSON.stringify(pub.body)).not.toContain('nobody approved');
  });

  it('lets a curator publish their own draft, but not a docent’s draft that was never submitted', async () => {
    const docentDraft = (await docent.send('put', path(), { version: 0, general: { label: LABEL, story: null } })).body;
    const early = await curator.post(`${path()}/approve`, { version: docentDraft.version });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toBe('This draft has not been submitted for review. Its author submits it first, or you save your own changes and publish them.');
    const own = (await curator.send('put', path(), { version: docentDraft.version, general: { label: LABEL, story: STORY } })).body;
    expect(own.abilities.approve).toBe(true);
    const published = await curator.post(`${path()}/approve`, { version: own.version });
    expect(published.body.state).toBe('published');
    expect((await curator.post(`${path()}/approve`, { version: published.body.version })).body.error.message).toBe('This interpretation is already published.');
  });

  it('refuses to submit nothing, and lists every photo problem at once before publishing', async () => {
    const empty = (await docent.send('put', path(), { version: 0, general: { label: doc('x'), story: null } })).body;
    const cleared = (await docent.send('put', path(), { version: empty.version, general: null })).body;
    const nothing = await docent.post(`${path()}/submit`, { version: cleared.version });
    expect(nothing.status).toBe(422);
    expect(nothing.body.error.message).toBe('Write a label or a story for at least one audience first.');

    const upload = await curator.agent.post(`/api/v1/media?ownerType=artifact&ownerId=${artifactId}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), 'gauge.jpg');
    expect(upload.status, JSON.stringify(upload.body)).toBe(201);
    const mediaId = upload.body.id as number;
    const withPhotos: RichTextDoc = {
      type: 'doc',
      content: [
        { type: 'image', attrs: { src: `/api/v1/media/${mediaId}/display`, alt: '' } },
        { type: 'image', attrs: { src: `/api/v1/media/${mediaId}/display`, alt: 'A round brass gauge' } },
      ],
    };
    const saved = (await docent.send('put', path(), { version: cleared.version, general: { label: LABEL, story: withPhotos } })).body;
    const refused = await docent.post(`${path()}/submit`, { version: saved.version });
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toBe('General story: the photo “gauge.jpg” has no alt text. General story: the photo “gauge.jpg” is not marked for public use.');
  });
});

describe('interpretation of a compartment', () => {
  it('works the same way and is served publicly once published', async () => {
    const base = `/api/v1/compartments/${emptyCompartmentId}/interpretation`;
    const saved = (await curator.send('put', base, { version: 0, families: { label: doc('This room kept the powder dry.'), story: null } })).body;
    expect(saved.subjectLabel).toBe('1-40-2-M Magazine');
    const visitor = new Client(ctx.app);
    expect((await visitor.get(`/api/v1/visit/compartments/${emptyCompartmentId}/interpretation`)).status).toBe(404);
    await curator.post(`${base}/approve`, { version: saved.version });
    const pub = (await visitor.get(`/api/v1/visit/compartments/${emptyCompartmentId}/interpretation`)).body;
    expect(pub.audiences.families.label).toBe('<p>This room kept the powder dry.</p>');
    const remove = await curator.send('delete', `/api/v1/compartments/${emptyCompartmentId}`);
    expect(remove.status).toBe(409);
    expect(remove.body.error.message).toBe('1-40-2-M has published interpretive text that visitors read. The compartment stays; change its access status instead.');
  });
});

describe('the list of a vessel’s interpretive texts', () => {
  it('is the review queue by state, and searches the words of every audience', async () => {
    const a = (await docent.send('put', path(), { version: 0, general: { label: LABEL, story: STORY } })).body;
    await docent.post(`${path()}/submit`, { version: a.version });
    await curator.send('put', `/api/v1/compartments/${emptyCompartmentId}/interpretation`, { version: 0, families: { label: doc('Gunpowder was kept here, far from any flame.'), story: null } });

    const all = (await conservator.get(`/api/v1/vessels/${vesselId}/interpretations`)).body;
    expect(all.total).toBe(2);
    const queue = (await curator.get(`/api/v1/vessels/${vesselId}/interpretations?state=in-review`)).body;
    expect(queue.items).toEqual([
      expect.objectContaining({ subjectType: 'artifact', subjectId: artifactId, subjectLabel: '2026.1.1 Steam gauge', state: 'in-review', audiences: ['general'], hasPublished: false, snippet: null }),
    ]);

    // "valves" finds "valve" (stemmed), in the general story.
    const found = (await conservator.get(`/api/v1/vessels/${vesselId}/interpretations?q=valves`)).body;
    expect(found.items.map((i: { subjectLabel: string }) => i.subjectLabel)).toEqual(['2026.1.1 Steam gauge']);
    expect(found.items[0].snippet).toContain('safety');
    const powder = (await conservator.get(`/api/v1/vessels/${vesselId}/interpretations?q=gunpowder`)).body;
    expect(powder.items.map((i: { subjectLabel: string }) => i.subjectLabel)).toEqual(['1-40-2-M Magazine']);
    expect((await conservator.get(`/api/v1/vessels/${vesselId}/interpretations?q=${encodeURIComponent('"*')}`)).body.total).toBe(0);
    const bad = await conservator.get(`/api/v1/vessels/${vesselId}/interpretations?state=approved`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.state).toBe('Choose draft, in-review or published.');
  });
});

describe('reading targets', () => {
  it('come from the organisation settings, which the administrator changes within bounds', async () => {
    const admin = (await signedInAs(ctx.app, ctx.store, 'admin')).client;
    const settings = (await admin.get('/api/v1/settings')).body;
    const bad = await admin.patch('/api/v1/settings', { version: settings.version, interpretationTargets: { labelMaxWords: 2, maxGrade: { general: 8, families: 30, technical: null } } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ 'interpretationTargets.labelMaxWords': 'A label may have at least 5 words.', 'interpretationTargets.maxGrade.families': 'A grade target is at most 18.' });
    const ok = await admin.patch('/api/v1/settings', { version: settings.version, interpretationTargets: { labelMaxWords: 60, maxGrade: { general: 7, families: 6, technical: 12 } } });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect((await docent.get(path())).body.targets).toEqual({ labelMaxWords: 60, maxGrade: { general: 7, families: 6, technical: 12 } });
  });
});
