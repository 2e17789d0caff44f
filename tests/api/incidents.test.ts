import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildUser, buildVessel } from '../support/factories.js';
import { signedInAs, waitForMail, type Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let conservator: Client;
let vesselId: number;
let place: Awaited<ReturnType<typeof deckWithCompartments>>;
let gaugeId: number;

beforeEach(async () => {
  ctx = await createTestApp();
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  place = await deckWithCompartments(ctx.store, curator, vesselId);
  const room = (await curator.get(`/api/v1/compartments/${place.second}`)).body;
  await curator.patch(`/api/v1/compartments/${place.second}`, { accessStatus: 'open', version: room.version });
  gaugeId = (await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', name: 'Steam gauge', compartmentId: place.second })).id;
});
afterEach(() => ctx.close());

describe('incidents', () => {
  it('closes the space, opens a report with a finding on each affected item, and e-mails every curator', async () => {
    await buildUser(ctx.store, { role: 'curator', email: 'second-curator@example.test' });
    await buildUser(ctx.store, { role: 'curator', email: 'gone-curator@example.test', status: 'deactivated' });
    const res = await conservator.post('/api/v1/incidents', {
      vesselId,
      kind: 'vandalism',
      title: 'Gauge glass smashed in the magazine',
      foundOn: '2026-11-29',
      occurredOn: '2026-11-28',
      description: 'Glass of the steam gauge broken, bezel bent.',
      reportedTo: 'Harbour security; police',
      policeReference: 'PR-2026-1187',
      artifactIds: [gaugeId],
      compartmentIds: [place.second],
      closeCompartmentIds: [place.second],
      severity: 'severe',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ kind: 'vandalism', closedCompartmentIds: [place.second], artifacts: [{ id: gaugeId, label: '2019.4.12 Steam gauge' }], compartments: [{ id: place.second }] });
    expect(res.body.reportIds).toHaveLength(2);

    const room = (await curator.get(`/api/v1/compartments/${place.second}`)).body;
    expect(room.accessStatus).toBe('staff-only');
    const closedEvent = (await ctx.store.repos.auditEvents.latestFor('compartment', place.second, 1))[0]!;
    expect(closedEvent.summary).toBe(`Compartment 1-40-2-M closed to visitors after incident ${res.body.id}`);

    const report = (await conservator.get(`/api/v1/condition-reports/${res.body.reportIds[0]}`)).body;
    expect(report).toMatchObject({ status: 'draft', subjectType: 'artifact', subjectId: gaugeId, grade: 'poor', inspectedOn: '2026-11-29' });
    expect(report.findings[0]).toMatchObject({ agent: 'thieves-and-vandals', severity: 'severe', artifactId: gaugeId });

    const curators = (await ctx.store.repos.users.activeWithRole('curator')).map((u) => u.email);
    expect(curators).toHaveLength(2);
    for (const to of curators) {
      const mail = await waitForMail(ctx.fakeMail, to);
      expect(mail.subject).toBe('Vandalism: Gauge glass smashed in the magazine');
      expect(mail.text).toContain('Closed to visitors: 1-40-2-M Magazine.');
      expect(mail.text).toContain('Police reference: PR-2026-1187.');
      expect(mail.text).toContain('found on Sunday 29 November 2026 (it happened on Saturday 28 November 2026)');
    }
    expect(ctx.fakeMail.list().some((m) => m.to.includes('gone-curator@example.test'))).toBe(false);
    const byArtifact = (await curator.get(`/api/v1/incidents?vesselId=${vesselId}&artifactId=${gaugeId}`)).body;
    expect(byArtifact.items.map((i: { id: number }) => i.id)).toEqual([res.body.id]);
    expect((await curator.get(`/api/v1/incidents?vesselId=${vesselId}&compartmentId=${place.first}`)).body.total).toBe(0);
  });

  it('refuses to close a compartment it does not name, or items of another vessel, and keeps nothing', async () => {
    const notNamed = await conservator.post('/api/v1/incidents', { vesselId, kind: 'water-ingress', title: 'Leak', foundOn: '2026-11-29', compartmentIds: [place.first], closeCompartmentIds: [place.second] });
    expect(notNamed.status).toBe(422);
    expect(notNamed.body.error.fields.closeCompartmentIds).toBeDefined();
    const otherVessel = (await buildVessel(ctx.store)).id;
    const foreign = await conservator.post('/api/v1/incidents', { vesselId: otherVessel, kind: 'theft', title: 'Gone', foundOn: '2026-11-29', artifactIds: [gaugeId] });
    expect(foreign.status).toBe(422);
    expect((await curator.get(`/api/v1/incidents?vesselId=${vesselId}`)).body.total).toBe(0);
    expect((await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}`)).body.total).toBe(0);
    expect(ctx.fakeMail.list()).toHaveLength(0);
  });

  it('is logged by docents too, with photos; a conservator completes the drafts, and curators and conservators are told', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const { client: docent, user: docentUser } = await signedInAs(ctx.app, ctx.store, 'docent');
    const conservatorEmail = (await ctx.store.repos.users.activeWithRole('conservator'))[0]!.email;
    const curatorEmail = (await ctx.store.repos.users.activeWithRole('curator'))[0]!.email;
    const logged = await docent.post('/api/v1/incidents', { vesselId, kind: 'vandalism', title: 'Graffiti on the gauge board', foundOn: '2026-11-29', artifactIds: [gaugeId] });
    expect(logged.status, JSON.stringify(logged.body)).toBe(201);
    for (const to of [curatorEmail, conservatorEmail]) expect((await waitForMail(ctx.fakeMail, to)).subject).toBe('Vandalism: Graffiti on the gauge board');
    expect(ctx.fakeMail.list().some((m) => m.to.includes(docentUser.email))).toBe(false);
    const draft = (await conservator.get(`/api/v1/condition-reports/${logged.body.reportIds[0]}`)).body;
    expect(draft).toMatchObject({ status: 'draft', surveyor: null });
    // the docent adds the photos of what was found, but changes nothing else
    const photo = await docent.agent.post(`/api/v1/media?ownerType=incident&ownerId=${logged.body.id}`).set('x-csrf-token', docent.csrf).attach('file', await cameraJpeg(), 'found.jpg');
    expect(photo.status, JSON.stringify(photo.body)).toBe(201);
    expect((await docent.patch(`/api/v1/media/${photo.body.id}`, { caption: 'x', version: photo.body.version })).status).toBe(403);
    const onArtifact = await docent.agent.post(`/api/v1/media?ownerType=artifact&ownerId=${gaugeId}`).set('x-csrf-token', docent.csrf).attach('file', await cameraJpeg(), 'a.jpg');
    expect(onArtifact.status).toBe(403);
    expect((await docent.patch(`/api/v1/incidents/${logged.body.id}`, { actionsTaken: 'x', version: logged.body.version })).status).toBe(403);
    expect((await conservator.patch(`/api/v1/incidents/${logged.body.id}`, { actionsTaken: 'Board cleaned', version: logged.body.version })).status).toBe(200);
    const fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
    expect((await fundraiser.post('/api/v1/incidents', { vesselId, kind: 'other', title: 'X', foundOn: '2026-11-29' })).status).toBe(403);
    expect((await fundraiser.get(`/api/v1/incidents/${logged.body.id}`)).body.title).toBe('Graffiti on the gauge board');
  });
});

describe('critical findings', () => {
  it('e-mail the curators when the report is submitted', async () => {
    const report = (await conservator.post('/api/v1/condition-reports', { subjectType: 'artifact', subjectId: gaugeId, inspectedOn: '2026-11-20' })).body;
    const withFinding = (await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'physical-forces', damageType: 'loose-or-detached', severity: 'critical', recommendedAction: 'Take it down before it falls' })).body;
    expect(ctx.fakeMail.list()).toHaveLength(0);
    await conservator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: withFinding.version });
    const curatorEmail = (await ctx.store.repos.users.activeWithRole('curator'))[0]!.email;
    const mail = await waitForMail(ctx.fakeMail, curatorEmail);
    expect(mail.subject).toBe('Critical finding on 2019.4.12 Steam gauge');
    expect(mail.text).toContain('Loose or detached (physical forces) on 2019.4.12 Steam gauge: Take it down before it falls.');
  });
});

describe('condition history', () => {
  it('lists a subject’s reports and incidents newest first, and its photos by the day they show', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const old = (await conservator.post('/api/v1/condition-reports', { subjectType: 'artifact', subjectId: gaugeId, inspectedOn: '2024-03-01' })).body;
    await conservator.post(`/api/v1/condition-reports/${old.id}/submit`, { version: old.version });
    const photo = await conservator.agent.post(`/api/v1/media?ownerType=condition-report&ownerId=${(await conservator.post('/api/v1/condition-reports', { subjectType: 'artifact', subjectId: gaugeId, inspectedOn: '2026-10-01' })).body.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), 'now.jpg');
    expect(photo.status).toBe(201);
    await curator.agent.post(`/api/v1/media?ownerType=artifact&ownerId=${gaugeId}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), 'record.jpg');
    await conservator.post('/api/v1/incidents', { vesselId, kind: 'theft', title: 'Bezel screws taken', foundOn: '2025-08-15', artifactIds: [gaugeId] });
    const history = (await curator.get(`/api/v1/condition-history?subjectType=artifact&subjectId=${gaugeId}`)).body;
    expect(history.subjectLabel).toBe('2019.4.12 Steam gauge');
    expect(history.entries.map((e: { kind: string; date: string }) => `${e.kind} ${e.date}`)).toEqual(['report 2026-10-01', 'report 2025-08-15', 'incident 2025-08-15', 'report 2024-03-01']);
    expect(history.entries[3]).toMatchObject({ grade: 'good', status: 'submitted' });
    // Both photos carry the camera's date (2024-05-17); the one of the report says which report.
    expect(history.photos).toHaveLength(2);
    expect(history.photos.map((p: { reportId: number | null }) => p.reportId === null).sort()).toEqual([false, true]);
    expect(history.photos[0].date).toBe('2024-05-17');
    expect((await curator.get('/api/v1/condition-history?subjectType=artifact&subjectId=99999')).status).toBe(404);
  });
});

describe('photos of an incident', () => {
  it('are taken by those who log incidents', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const incident = (await curator.post('/api/v1/incidents', { vesselId, kind: 'vandalism', title: 'Paint thrown', foundOn: '2026-11-29' })).body;
    const res = await conservator.agent.post(`/api/v1/media?ownerType=incident&ownerId=${incident.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), 'scene.jpg');
    expect(res.status).toBe(201);
    // incident photos are staff evidence: alt text never makes them publishable
    const described = await conservator.patch(`/api/v1/media/${res.body.id}`, { altText: 'Paint on the bulkhead', version: res.body.version });
    expect(described.body.publishable).toBe(false);
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    expect((await docent.agent.post(`/api/v1/media?ownerType=incident&ownerId=${incident.id}`).set('x-csrf-token', docent.csrf).attach('file', await cameraJpeg(), 'x.jpg')).status).toBe(201);
    const fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
    expect((await fundraiser.agent.post(`/api/v1/media?ownerType=incident&ownerId=${incident.id}`).set('x-csrf-token', fundraiser.csrf).attach('file', await cameraJpeg(), 'x.jpg')).status).toBe(403);
    expect((await fundraiser.get(`/api/v1/media?ownerType=incident&ownerId=${incident.id}`)).body).toHaveLength(2);
  });
});

describe('incident dates', () => {
  it('refuses one found in the future, or that happened after it was found', async () => {
    const future = await conservator.post('/api/v1/incidents', { vesselId, kind: 'other', title: 'x', foundOn: '2999-01-01' });
    expect(future.status).toBe(422);
    expect(future.body.error.fields.foundOn).toBe('This date is in the future.');
    const backwards = await conservator.post('/api/v1/incidents', { vesselId, kind: 'other', title: 'x', foundOn: '2026-11-01', occurredOn: '2026-11-05' });
    expect(backwards.body.error.fields.occurredOn).toBe('After the day it was found.');
    const ok = (await conservator.post('/api/v1/incidents', { vesselId, kind: 'other', title: 'x', foundOn: '2026-11-01' })).body;
    expect(ok.abilities).toEqual({ update: true });
    expect((await conservator.patch(`/api/v1/incidents/${ok.id}`, { occurredOn: '2026-11-02', version: ok.version })).status).toBe(422);
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    expect((await docent.get(`/api/v1/incidents/${ok.id}`)).body.abilities).toEqual({ update: false });
  });
});

describe("today's closures", () => {
  it('lists spaces an incident closed until they open again; the public sees the space, the date and the public line only', async () => {
    const logged = await conservator.post('/api/v1/incidents', {
      vesselId,
      kind: 'vandalism',
      title: 'Paint thrown in the magazine',
      foundOn: '2026-11-29',
      description: 'Internal: suspect seen on camera 3',
      policeReference: 'PR-SECRET-77',
      compartmentIds: [place.second],
      closeCompartmentIds: [place.second],
      publicNote: 'Closed while the paintwork is cleaned.',
    });
    expect(logged.status).toBe(201);
    const staff = await curator.get(`/api/v1/vessels/${vesselId}/closures`);
    expect(staff.body).toEqual([{ compartmentId: place.second, label: '1-40-2-M Magazine', since: '2026-11-29', reason: 'Closed while the paintwork is cleaned.', incidentId: logged.body.id }]);
    const { Client } = await import('../support/http.js');
    const site = await new Client(ctx.app).get('/api/v1/visit/site');
    const vessel = site.body.vessels.find((v: { id: number }) => v.id === vesselId);
    expect(vessel.closures).toEqual([{ space: 'Magazine', since: '2026-11-29', reason: 'Closed while the paintwork is cleaned.' }]);
    expect(JSON.stringify(site.body)).not.toMatch(/camera 3|PR-SECRET-77|Paint thrown/);
    expect((await new Client(ctx.app).get(`/api/v1/vessels/${vesselId}/closures`)).status).toBe(401);

    // a closure without a public line gets a plain one; opening the space ends its closure
    const room = (await curator.get(`/api/v1/compartments/${place.second}`)).body;
    await curator.patch(`/api/v1/compartments/${place.second}`, { accessStatus: 'open', version: room.version });
    expect((await curator.get(`/api/v1/vessels/${vesselId}/closures`)).body).toEqual([]);
    const again = await conservator.post('/api/v1/incidents', { vesselId, kind: 'accident', title: 'Ladder rung loose', foundOn: '2026-11-30', compartmentIds: [place.second], closeCompartmentIds: [place.second] });
    expect(again.body.publicNote).toBe('Closed for now while the crew deal with damage found here.');
    expect((await curator.get(`/api/v1/vessels/${vesselId}/closures`)).body).toMatchObject([{ since: '2026-11-30', incidentId: again.body.id }]);
  });
});

describe('the findings an incident opens', () => {
  it('give each affected item its own line of the text and the damage it implies', async () => {
    const res = await conservator.post('/api/v1/incidents', {
      vesselId,
      kind: 'vandalism',
      title: 'Damage in the magazine',
      foundOn: '2026-11-29',
      description: 'The steam gauge glass was smashed. Graffiti sprayed on the magazine bulkhead.',
      artifactIds: [gaugeId],
      compartmentIds: [place.second],
    });
    expect(res.status).toBe(201);
    const [onGauge, onRoom] = await Promise.all(res.body.reportIds.map(async (id: number) => (await conservator.get(`/api/v1/condition-reports/${id}`)).body.findings[0]));
    expect(onGauge).toMatchObject({ agent: 'thieves-and-vandals', damageType: 'broken-glass-or-dial', description: expect.stringMatching(/The steam gauge glass was smashed\.$/) });
    expect(onRoom).toMatchObject({ agent: 'thieves-and-vandals', damageType: 'graffiti', description: expect.stringMatching(/Graffiti sprayed on the magazine bulkhead\.$/) });
  });
});

describe('an incident’s photos', () => {
  it('show on the draft reports it opened and print in their PDF', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const { extractText, getDocumentProxy } = await import('unpdf');
    const logged = (await conservator.post('/api/v1/incidents', { vesselId, kind: 'vandalism', title: 'Gauge glass smashed', foundOn: '2026-11-29', artifactIds: [gaugeId] })).body;
    const photo = (await conservator.agent.post(`/api/v1/media?ownerType=incident&ownerId=${logged.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), 'scene.jpg')).body;
    await conservator.patch(`/api/v1/media/${photo.id}`, { caption: 'Broken glass on the deck plates below the gauge', version: photo.version });
    const report = (await conservator.get(`/api/v1/condition-reports/${logged.reportIds[0]}`)).body;
    expect(report.openedByIncidentId).toBe(logged.id);
    const other = (await conservator.post('/api/v1/condition-reports', { subjectType: 'artifact', subjectId: gaugeId, inspectedOn: '2026-11-30' })).body;
    expect(other.openedByIncidentId).toBeNull();
    const res = await conservator.getBytes(`/api/v1/condition-reports/${report.id}/pdf`);
    const { text } = await extractText(await getDocumentProxy(new Uint8Array(res.body as Buffer)), { mergePages: true });
    expect(text.replace(/\s+/g, ' ')).toContain('Broken glass on the deck plates below the gauge');
  });
});
