import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs, waitForMail } from '../support/http.js';
import { cameraJpeg } from '../support/images.js';
import { tinyMp3 } from '../support/audio.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let docent: Client;
let docentEmail: string;
let curatorEmail: string;
let vesselId: number;
let place: Awaited<ReturnType<typeof deckWithCompartments>>;

const paragraph = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });

async function setAccess(compartmentId: number, accessStatus: string) {
  const room = (await curator.get(`/api/v1/compartments/${compartmentId}`)).body;
  const res = await curator.patch(`/api/v1/compartments/${compartmentId}`, { accessStatus, version: room.version });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
}

async function newTour(fields: Record<string, unknown> = {}) {
  const res = await docent.post(`/api/v1/vessels/${vesselId}/tours`, { title: 'Below the waterline', slug: 'below-the-waterline', ...fields });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

async function addStop(tourId: number, fields: Record<string, unknown> = {}) {
  const res = await docent.post(`/api/v1/tours/${tourId}/stops`, { compartmentId: place.first, title: 'The store room', textDoc: paragraph('Spare gauge glasses were kept here.'), ...fields });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

beforeEach(async () => {
  ctx = await createTestApp();
  const c = await signedInAs(ctx.app, ctx.store, 'curator');
  curator = c.client;
  curatorEmail = c.user.email;
  const d = await signedInAs(ctx.app, ctx.store, 'docent');
  docent = d.client;
  docentEmail = d.user.email;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  place = await deckWithCompartments(ctx.store, curator, vesselId);
  await setAccess(place.first, 'open');
});
afterEach(() => ctx.close());

describe('tours', () => {
  it('a docent writes a tour and its stops, each save a revision; the text is stored rendered', async () => {
    const tour = await newTour();
    expect(tour).toMatchObject({ state: 'draft', revision: 1, stopCount: 0, published: null, abilities: { update: true, submit: true, approve: false } });
    const withStop = await addStop(tour.id);
    expect(withStop.stops[0]).toMatchObject({ position: 0, title: 'The store room', textHtml: '<p>Spare gauge glasses were kept here.</p>', textPlain: 'Spare gauge glasses were kept here.', place: { compartmentId: place.first, label: '1-10-1-Q Store room', closedNow: false } });
    expect(withStop.revision).toBe(2);
    const dup = await docent.post(`/api/v1/vessels/${vesselId}/tours`, { title: 'Again', slug: 'below-the-waterline' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.message).toBe('Another tour of this vessel already uses the slug “below-the-waterline”.');
    const badSlug = await docent.post(`/api/v1/vessels/${vesselId}/tours`, { title: 'Again', slug: 'Below The Waterline' });
    expect(badSlug.status).toBe(400);
    expect(badSlug.body.error.fields.slug).toBe('Use lower-case letters, digits and single hyphens (e.g. engine-room-tour).');
  });

  it('refuses a stop in a space of another vessel (422) and keeps nothing', async () => {
    const tour = await newTour();
    const other = (await buildVessel(ctx.store)).id;
    const elsewhere = await deckWithCompartments(ctx.store, curator, other);
    const res = await docent.post(`/api/v1/tours/${tour.id}/stops`, { compartmentId: elsewhere.first, title: 'Wrong ship' });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'unprocessable', message: 'The space of a stop must be on the tour’s vessel.', fields: { compartmentId: 'On another vessel.' } });
    expect((await docent.get(`/api/v1/tours/${tour.id}`)).body.stops).toEqual([]);
    expect((await docent.get(`/api/v1/tours/${tour.id}/revisions`)).body).toHaveLength(1);
  });

  it('answers the second of two saves of one stop 409 with the newer version', async () => {
    const tour = await addStop((await newTour()).id);
    const stop = tour.stops[0];
    const first = await docent.patch(`/api/v1/tours/${tour.id}/stops/${stop.id}`, { title: 'The spares store', version: stop.version });
    expect(first.status).toBe(200);
    const second = await curator.patch(`/api/v1/tours/${tour.id}/stops/${stop.id}`, { dwellMinutes: 9, version: stop.version });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toBe('Someone else changed this stop since you opened it (title). Reload to see their changes; yours are not saved.');
    expect(second.body.error.fields.version).toBe(`current version is ${stop.version + 1}`);
  });

  it('lists every problem that stops publishing in one 422', async () => {
    await setAccess(place.second, 'sealed');
    const tour = await newTour();
    const photo = await curator.agent.post(`/api/v1/media?ownerType=compartment&ownerId=${place.first}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), 'store.jpg');
    expect(photo.status).toBe(201);
    const audio = await docent.agent.post(`/api/v1/tours/${tour.id}/audio`).set('x-csrf-token', docent.csrf).attach('file', tinyMp3(), 'welcome.mp3');
    expect(audio.status, JSON.stringify(audio.body)).toBe(201);
    expect(audio.body).toMatchObject({ kind: 'audio', mimeType: 'audio/mpeg', ownerType: 'tour', ownerId: tour.id });
    const notAudio = await docent.agent.post(`/api/v1/tours/${tour.id}/audio`).set('x-csrf-token', docent.csrf).attach('file', await cameraJpeg(), 'sneaky.mp3');
    expect(notAudio.status).toBe(415);
    expect(notAudio.body.error.message).toBe('This file is not an MP3, M4A or Ogg audio file, whatever its name says.');

    const image = { type: 'image', attrs: { src: `/api/v1/media/${photo.body.id}/display`, alt: '' } };
    await addStop(tour.id, { title: 'Spares', textDoc: { type: 'doc', content: [image] }, audioMediaId: audio.body.id });
    await addStop(tour.id, { title: 'Nothing yet', textDoc: { type: 'doc', content: [{ type: 'paragraph' }] } });
    await addStop(tour.id, { compartmentId: place.second, title: 'The magazine', textDoc: paragraph('Powder was stored here.') });

    const res = await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: (await docent.get(`/api/v1/tours/${tour.id}`)).body.version });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toBe(
      'The tour cannot be submitted yet (4 problems): Stop 1 (“Spares”): an image has no alt text. Stop 1 (“Spares”): the audio has no transcript (WCAG 2.2, success criterion 1.2.1). Stop 2 (“Nothing yet”) has no text. Stop 3 (“The magazine”) is on board in 1-40-2-M Magazine, which is sealed: make it a virtual stop or choose another space.',
    );
    expect(Object.keys(res.body.error.fields)).toEqual(['stops.1.textDoc', 'stops.1.transcript', 'stops.2.textDoc', 'stops.3.virtual']);
    expect((await docent.get(`/api/v1/tours/${tour.id}`)).body.state).toBe('draft');
  });

  it('review round trip: submitted to the curators, returned with stop comments, approved; e-mails both ways', async () => {
    const tour = await addStop((await newTour()).id);
    const submitted = await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: tour.version });
    expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
    expect(submitted.body.state).toBe('in_review');
    const toCurator = await waitForMail(ctx.fakeMail, curatorEmail);
    expect(toCurator.subject).toBe('Tour for review: Below the waterline');

    const docentApproves = await docent.post(`/api/v1/tours/${tour.id}/approve`, { version: submitted.body.version });
    expect(docentApproves.status).toBe(403);
    const editInReview = await docent.patch(`/api/v1/tours/${tour.id}`, { title: 'Sneaky', version: submitted.body.version });
    expect(editInReview.status).toBe(409);
    expect(editInReview.body.error.message).toBe('This tour is in review, so it does not change until a curator returns it.');

    const comment = await curator.post(`/api/v1/tours/${tour.id}/comments`, { stopId: tour.stops[0].id, body: 'Say what the glasses were for.' });
    expect(comment.status).toBe(201);
    expect(comment.body).toMatchObject({ stopId: tour.stops[0].id, stopTitle: 'The store room', body: 'Say what the glasses were for.' });
    const returned = await curator.post(`/api/v1/tours/${tour.id}/return`, { version: submitted.body.version, comment: 'Nearly there.' });
    expect(returned.status).toBe(200);
    expect(returned.body.state).toBe('draft');
    const back = await waitForMail(ctx.fakeMail, docentEmail);
    expect(back.subject).toBe('Tour returned: Below the waterline');
    expect(back.text).toContain('Comment: Nearly there.');
    expect(back.text).toContain('Stop 1 “The store room”: Say what the glasses were for.');

    const fixed = await docent.patch(`/api/v1/tours/${tour.id}/stops/${tour.stops[0].id}`, { textDoc: paragraph('Spare gauge glasses for the boiler water gauges were kept here.'), version: tour.stops[0].version });
    expect(fixed.status).toBe(200);
    const again = await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: fixed.body.version });
    expect(again.status).toBe(200);
    const approved = await curator.post(`/api/v1/tours/${tour.id}/approve`, { version: again.body.version });
    expect(approved.status, JSON.stringify(approved.body)).toBe(200);
    expect(approved.body.tour).toMatchObject({ state: 'published', published: { revision: fixed.body.revision } });
    expect(approved.body.warnings).toEqual([]);
    const published = await waitForMail({ list: () => ctx.fakeMail.list().filter((m) => m.subject.startsWith('Tour published')) }, docentEmail);
    expect(published.subject).toBe('Tour published: Below the waterline');
    expect(published.text).toContain(`Revision ${fixed.body.revision} is now on the public site.`);
    const subjects = ctx.fakeMail.list().map((m) => `${m.to.join(',')} ${m.subject}`).sort();
    expect(subjects).toEqual([
      `${curatorEmail} Tour for review: Below the waterline`,
      `${curatorEmail} Tour for review: Below the waterline`,
      `${docentEmail} Tour published: Below the waterline`,
      `${docentEmail} Tour returned: Below the waterline`,
    ].sort());
  });

  it('the public API serves only the published snapshot, unchanged by later drafts', async () => {
    const tour = await addStop((await newTour()).id);
    const anonymous = new Client(ctx.app);
    expect((await anonymous.get('/api/v1/visit/tours/below-the-waterline')).status).toBe(404);
    expect((await anonymous.get('/api/v1/visit/tours')).body).toEqual([]);

    const submitted = (await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: tour.version })).body;
    expect((await anonymous.get('/api/v1/visit/tours/below-the-waterline')).status).toBe(404);
    await curator.post(`/api/v1/tours/${tour.id}/approve`, { version: submitted.version });

    const before = await anonymous.get('/api/v1/visit/tours/below-the-waterline');
    expect(before.status).toBe(200);
    expect(before.body).toMatchObject({ slug: 'below-the-waterline', title: 'Below the waterline', stopCount: 1 });
    expect(before.body.stops[0]).toEqual({
      number: 1,
      title: 'The store room',
      html: '<p>Spare gauge glasses were kept here.</p>',
      space: 'Store room',
      deck: 'Main deck',
      virtual: false,
      notice: null,
      audio: null,
      dwellMinutes: 3,
      accessNotes: '',
      lookFor: '',
      cautions: [],
    });
    expect(before.body).not.toHaveProperty('mediaIds');
    expect(before.body.stops[0]).not.toHaveProperty('compartmentId');

    const current = (await docent.get(`/api/v1/tours/${tour.id}`)).body;
    const draft = await docent.patch(`/api/v1/tours/${tour.id}/stops/${current.stops[0].id}`, { title: 'A draft title', textDoc: paragraph('Not reviewed yet.'), version: current.stops[0].version });
    expect(draft.status).toBe(200);
    expect(draft.body.state).toBe('draft');
    expect(draft.body.published).toEqual({ revision: submitted.revision, at: expect.any(String) });
    const after = await anonymous.get('/api/v1/visit/tours/below-the-waterline');
    expect(after.body).toEqual(before.body);
    expect((await anonymous.get('/api/v1/visit/tours')).body.map((t: { title: string }) => t.title)).toEqual(['Below the waterline']);
  });

  it('shows a published stop as virtual while an incident closes its space, and warns before publishing', async () => {
    const tour = await addStop((await newTour()).id);
    const submitted = (await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: tour.version })).body;
    await curator.post(`/api/v1/tours/${tour.id}/approve`, { version: submitted.version });
    const incident = await curator.post('/api/v1/incidents', { vesselId, kind: 'water-ingress', title: 'Leak over the store', foundOn: '2026-11-29', compartmentIds: [place.first], closeCompartmentIds: [place.first], severity: 'slight' });
    expect(incident.status, JSON.stringify(incident.body)).toBe(201);
    const stop = (await new Client(ctx.app).get('/api/v1/visit/tours/below-the-waterline')).body.stops[0];
    expect(stop).toMatchObject({ virtual: true, notice: 'This space is closed to visitors today, so the stop is shown here as a virtual stop.' });
    const check = (await docent.get(`/api/v1/tours/${tour.id}/publish-check`)).body;
    expect(check.problems).toEqual([]);
    expect(check.warnings).toEqual([{ stop: 1, message: 'Stop 1 (“The store room”) is in 1-10-1-Q Store room, closed to visitors now (since 2026-11-29): the public tour shows it as a virtual stop until the space reopens.' }]);
    expect((await docent.get(`/api/v1/tours/${tour.id}`)).body.stops[0]).toMatchObject({ effectivelyVirtual: true, place: { closedNow: true } });
  });

  it('compares two revisions and restores one as a new revision', async () => {
    const tour = await addStop((await newTour()).id);
    const stop = tour.stops[0];
    const changed = (await docent.patch(`/api/v1/tours/${tour.id}/stops/${stop.id}`, { title: 'The spares store', dwellMinutes: 6, version: stop.version })).body;
    const second = (await docent.post(`/api/v1/tours/${tour.id}/stops`, { compartmentId: place.first, title: 'Second look', textDoc: paragraph('Again.') })).body;
    expect(second.revision).toBe(4);
    const revisions = (await docent.get(`/api/v1/tours/${tour.id}/revisions`)).body;
    expect(revisions.map((r: { number: number; note: string }) => [r.number, r.note])).toEqual([
      [4, 'Stop 2 “Second look” added'],
      [3, 'Stop 1 “The spares store” changed: title, dwellMinutes'],
      [2, 'Stop 1 “The store room” added'],
      [1, 'Tour created'],
    ]);
    const compare = (await docent.get(`/api/v1/tours/${tour.id}/revisions/compare?from=2&to=4`)).body;
    expect(compare.stopChanges).toEqual([
      { stopId: stop.id, title: 'The spares store', change: 'changed', fields: ['title', 'dwellMinutes'] },
      { stopId: second.stops[1].id, title: 'Second look', change: 'added', fields: [] },
    ]);
    expect(compare.from.snapshot.stops[0].title).toBe('The store room');

    expect(changed.version).toBe(tour.version);
    const renamed = (await curator.patch(`/api/v1/tours/${tour.id}`, { summary: 'Down the ladders.', version: tour.version })).body;
    const stale = await docent.post(`/api/v1/tours/${tour.id}/revisions/2/restore`, { version: tour.version });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toBe('Someone else changed this tour since you opened it. Reload to see their changes.');
    const restored = await docent.post(`/api/v1/tours/${tour.id}/revisions/2/restore`, { version: renamed.version });
    expect(restored.status, JSON.stringify(restored.body)).toBe(200);
    expect(restored.body.revision).toBe(6);
    expect(restored.body.summary).toBe('');
    expect(restored.body.stops.map((s: { id: number; title: string; dwellMinutes: number }) => [s.id, s.title, s.dwellMinutes])).toEqual([[stop.id, 'The store room', 3]]);
    expect((await docent.get(`/api/v1/tours/${tour.id}/revisions`)).body[0].note).toBe('Revision 2 restored');
  });

  it('reorders stops, and refuses an order made on stale stops', async () => {
    const tour = await addStop((await newTour()).id);
    const two = await addStop(tour.id, { title: 'Second' });
    const ids = two.stops.map((s: { id: number }) => s.id);
    const res = await docent.send('put', `/api/v1/tours/${tour.id}/stop-order`, { stopIds: [ids[1], ids[0]] });
    expect(res.status).toBe(200);
    expect(res.body.stops.map((s: { title: string }) => s.title)).toEqual(['Second', 'The store room']);
    const stale = await docent.send('put', `/api/v1/tours/${tour.id}/stop-order`, { stopIds: [ids[0]] });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toBe('The stops of this tour changed since you opened it. Reload to see them; the order is not saved.');
  });

  it('prints QR placards of the published tour: one per stop and a sheet of all stops', async () => {
    const { extractText, getDocumentProxy } = await import('unpdf');
    const tour = await addStop((await newTour()).id, { textDoc: paragraph('Spare gauge glasses were kept here. They broke often.') });
    await addStop(tour.id, { title: 'Second look', textDoc: paragraph('Lamp oil in cans.') });
    const notYet = await docent.get(`/api/v1/tours/${tour.id}/placards.pdf`);
    expect(notYet.status).toBe(422);
    expect(notYet.body.error.message).toBe('Placards are printed from the published tour, whose pages their codes open: publish it first.');
    const submitted = (await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: tour.version })).body;
    expect((await curator.post(`/api/v1/tours/${tour.id}/approve`, { version: submitted.version })).status).toBe(200);

    const one = await docent.getBytes(`/api/v1/tours/${tour.id}/placards.pdf?stop=1`);
    expect(one.status).toBe(200);
    expect(one.headers['content-type']).toBe('application/pdf');
    const onePdf = await getDocumentProxy(new Uint8Array(one.body as Buffer));
    expect(onePdf.numPages).toBe(1);
    const oneText = (await extractText(onePdf, { mergePages: true })).text;
    expect(oneText).toContain('The store room');
    expect(oneText).toContain('Spare gauge glasses were kept here.');
    expect(oneText).not.toContain('They broke often.');
    expect(oneText).toContain(`${ctx.config.publicUrl}/visit/tours/below-the-waterline/stops/1`);

    const sheet = await docent.getBytes(`/api/v1/tours/${tour.id}/placards.pdf?sheet=true`);
    const sheetText = (await extractText(await getDocumentProxy(new Uint8Array(sheet.body as Buffer)), { mergePages: true })).text;
    expect(sheetText).toContain('Second look');
    expect(sheetText).toContain('Lamp oil in cans.');
    expect((await docent.get(`/api/v1/tours/${tour.id}/placards.pdf?stop=9`)).status).toBe(404);
  });

  it('keeps a stop’s audio for the staff, refuses audio through the general upload, and strips unsafe links from the text', async () => {
    const tour = await newTour();
    const audio = await docent.agent.post(`/api/v1/tours/${tour.id}/audio`).set('x-csrf-token', docent.csrf).attach('file', tinyMp3(), 'welcome.mp3');
    expect(audio.status).toBe(201);
    const fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
    const clip = await fundraiser.getBytes(`/api/v1/media/${audio.body.id}/original`);
    expect(clip.status).toBe(200);
    expect(clip.headers['content-type']).toBe('audio/mpeg');
    expect((await new Client(ctx.app).get(`/api/v1/media/${audio.body.id}/original`)).status).toBe(401);
    const viaGeneral = await docent.agent.post(`/api/v1/media?ownerType=tour&ownerId=${tour.id}`).set('x-csrf-token', docent.csrf).attach('file', tinyMp3(), 'welcome.mp3');
    expect(viaGeneral.status).toBe(415);

    const link = (href: string) => ({ type: 'text', text: 'here', marks: [{ type: 'link', attrs: { href } }] });
    const withLinks = await addStop(tour.id, { textDoc: { type: 'doc', content: [{ type: 'paragraph', content: [link('javascript:alert(1)'), { type: 'text', text: ' and ' }, link('https://example.test/engines')] }] } });
    const html = withLinks.stops[0].textHtml as string;
    expect(html).not.toContain('javascript:');
    expect(html).toBe('<p><a rel="noopener noreferrer nofollow">here</a> and <a rel="noopener noreferrer nofollow" href="https://example.test/engines">here</a></p>');
    const script = await docent.post(`/api/v1/tours/${tour.id}/stops`, { compartmentId: place.first, title: 'Sneaky', textDoc: { type: 'doc', content: [{ type: 'codeBlock', content: [{ type: 'text', text: '<script>alert(1)</script>' }] }] } });
    expect(script.status).toBe(422);
    expect(script.body.error.code).toBe('invalid_rich_text');
  });

  it('stops serving a published tour’s photo once it is withdrawn from public use', async () => {
    const upload = await curator.agent.post(`/api/v1/media?ownerType=compartment&ownerId=${place.first}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), 'store.jpg');
    expect(upload.status).toBe(201);
    const marked = await curator.patch(`/api/v1/media/${upload.body.id}`, { altText: 'Shelves of spare gauge glasses', publicUse: true, version: upload.body.version });
    expect(marked.status, JSON.stringify(marked.body)).toBe(200);
    const image = { type: 'image', attrs: { src: `/api/v1/media/${upload.body.id}/display`, alt: 'Shelves of spare gauge glasses' } };
    const tour = await addStop((await newTour()).id, { textDoc: { type: 'doc', content: [image] } });
    const submitted = await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: tour.version });
    expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
    expect((await curator.post(`/api/v1/tours/${tour.id}/approve`, { version: submitted.body.version })).status).toBe(200);
    const url = `/api/v1/visit/tours/below-the-waterline/media/${upload.body.id}/display`;
    const anonymous = new Client(ctx.app);
    expect((await anonymous.get(url)).status).toBe(200);
    await curator.patch(`/api/v1/media/${upload.body.id}`, { publicUse: false, version: marked.body.version });
    expect((await anonymous.get(url)).status).toBe(404);
  });

  it('leaves a withdrawn photo out of the published tour’s html, and shows it again once it is public', async () => {
    const upload = await curator.agent.post(`/api/v1/media?ownerType=compartment&ownerId=${place.first}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), 'store.jpg');
    const marked = await curator.patch(`/api/v1/media/${upload.body.id}`, { altText: 'Shelves of spare gauge glasses', publicUse: true, version: upload.body.version });
    expect(marked.status, JSON.stringify(marked.body)).toBe(200);
    const image = { type: 'image', attrs: { src: `/api/v1/media/${upload.body.id}/display`, alt: 'Shelves of spare gauge glasses' } };
    const tour = await addStop((await newTour()).id, { textDoc: { type: 'doc', content: [image, { type: 'paragraph', content: [{ type: 'text', text: 'Spares.' }] }] } });
    const submitted = await docent.post(`/api/v1/tours/${tour.id}/submit`, { version: tour.version });
    expect((await curator.post(`/api/v1/tours/${tour.id}/approve`, { version: submitted.body.version })).status).toBe(200);
    const anonymous = new Client(ctx.app);
    const src = `/api/v1/visit/tours/below-the-waterline/media/${upload.body.id}/display`;
    const shown = await anonymous.get('/api/v1/visit/tours/below-the-waterline');
    expect(shown.body.stops[0].html).toBe(`<img src="${src}" alt="Shelves of spare gauge glasses" /><p>Spares.</p>`);
    const withdrawn = await curator.patch(`/api/v1/media/${upload.body.id}`, { publicUse: false, version: marked.body.version });
    expect(withdrawn.status).toBe(200);
    expect((await anonymous.get('/api/v1/visit/tours/below-the-waterline')).body.stops[0].html).toBe('<p>Spares.</p>');
    const noAlt = await curator.patch(`/api/v1/media/${upload.body.id}`, { publicUse: true, altText: '', version: withdrawn.body.version });
    expect(noAlt.status, JSON.stringify(noAlt.body)).toBe(200);
    expect((await anonymous.get('/api/v1/visit/tours/below-the-waterline')).body.stops[0].html).toBe('<p>Spares.</p>');
    await curator.patch(`/api/v1/media/${upload.body.id}`, { altText: 'Shelves of spare gauge glasses', version: noAlt.body.version });
    expect((await anonymous.get('/api/v1/visit/tours/below-the-waterline')).body.stops[0].html).toContain(`<img src="${src}"`);
  });
});
