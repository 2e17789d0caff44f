import request from 'supertest';
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
let gaugeId: number;

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  place = await deckWithCompartments(ctx.store, curator, vesselId);
  gaugeId = (await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', name: 'Steam gauge', compartmentId: place.first, point: [200, 200] })).id;
});
afterEach(() => ctx.close());

async function draft(subjectType: 'artifact' | 'compartment' = 'compartment', subjectId = place.first) {
  const res = await conservator.post('/api/v1/condition-reports', { subjectType, subjectId, inspectedOn: '2026-11-20', method: 'close-visual', temperatureC: 8.5, relativeHumidity: 82, summary: 'Winter survey of the store room.' });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

const coating = { agent: 'incorrect-relative-humidity', damageType: 'coating-failure', severity: 'moderate', percentRusted: 2, rustDistribution: 'G', extentPercent: 15, recommendedAction: 'Spot-prime and overcoat', urgency: 'within-a-year' };

describe('condition reports', () => {
  it('starts a draft, grades it from its findings by the written rule, and shows the ASTM D610 rust grade', async () => {
    const report = await draft();
    expect(report).toMatchObject({ status: 'draft', revision: 1, grade: 'good', findingCount: 0, subjectLabel: '1-10-1-Q Store room', abilities: { update: true, submit: true, amend: false, delete: true } });
    const withCoating = (await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, coating)).body;
    expect(withCoating).toMatchObject({ grade: 'fair', computedGrade: 'fair', gradeBecause: '1 moderate finding.', findingCount: 1 });
    expect(withCoating.findings[0]).toMatchObject({ rustGrade: '5-G', percentRusted: 2, artifactId: null });
    const withGauge = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { artifactId: gaugeId, agent: 'thieves-and-vandals', damageType: 'broken-glass-or-dial', severity: 'severe' });
    expect(withGauge.body).toMatchObject({ grade: 'poor', findingCount: 2 });
    expect(withGauge.body.findings[1]).toMatchObject({ artifactLabel: '2019.4.12 Steam gauge' });
  });

  it('keeps the surveyor’s override of the grade only with a reason', async () => {
    const report = await draft();
    const noReason = await conservator.patch(`/api/v1/condition-reports/${report.id}`, { gradeOverride: 'poor', version: report.version });
    expect(noReason.status).toBe(422);
    expect(noReason.body.error.fields.overrideReason).toBeDefined();
    const ok = await conservator.patch(`/api/v1/condition-reports/${report.id}`, { gradeOverride: 'poor', overrideReason: 'Hidden corrosion behind the lagging', version: report.version });
    expect(ok.body).toMatchObject({ grade: 'poor', computedGrade: 'good', gradeOverride: 'poor', overrideReason: 'Hidden corrosion behind the lagging' });
  });

  it('refuses findings out of scope, damage not of the agent, rust inputs off coatings and percents outside 0–100', async () => {
    const report = await draft('artifact', gaugeId);
    const other = (await addArtifact(curator, vesselId, { objectNumber: '2019.4.13', compartmentId: place.second })).id;
    const outOfScope = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { artifactId: other, agent: 'water', damageType: 'water-staining', severity: 'slight' });
    expect(outOfScope.status).toBe(422);
    expect(outOfScope.body.error.fields.artifactId).toBe('Not in the scope of this report.');
    const roomReport = await draft('compartment', place.second);
    expect((await conservator.post(`/api/v1/condition-reports/${roomReport.id}/findings`, { artifactId: gaugeId, agent: 'water', damageType: 'water-staining', severity: 'slight' })).status).toBe(422);
    expect((await conservator.post(`/api/v1/condition-reports/${roomReport.id}/findings`, { artifactId: other, agent: 'water', damageType: 'water-staining', severity: 'slight' })).status).toBe(201);
    const wrongAgent = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'fire', damageType: 'graffiti', severity: 'slight' });
    expect(wrongAgent.body.error.fields.damageType).toBe('Not a damage of this agent.');
    const rustOnGlass = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'physical-forces', damageType: 'broken-glass-or-dial', severity: 'slight', percentRusted: 3 });
    expect(rustOnGlass.status).toBe(422);
    const tooMuch = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { ...coating, extentPercent: 140 });
    expect(tooMuch.status).toBe(422);
    expect(tooMuch.body.error.fields.extentPercent).toBe('Extent must be between 0 and 100.');
    const rusted = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { ...coating, percentRusted: -1 });
    expect(rusted.status).toBe(422);
    expect(rusted.body.error.fields.percentRusted).toBe('Percent rusted must be between 0 and 100.');
    const humid = await conservator.patch(`/api/v1/condition-reports/${report.id}`, { relativeHumidity: -3, version: report.version });
    expect(humid.status).toBe(422);
    expect(humid.body.error.fields.relativeHumidity).toBe('Relative humidity must be between 0 and 100.');
    // A finding on an artifact report concerns that artifact unless said otherwise.
    const own = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'water', damageType: 'water-staining', severity: 'slight' });
    expect(own.body.findings[0].artifactId).toBe(gaugeId);
  });

  it('signs on submission and then never changes: edits answer 409 pointing to amend, deletion is refused', async () => {
    const report = await draft();
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, coating);
    const current = (await conservator.get(`/api/v1/condition-reports/${report.id}`)).body;
    const submitted = await curator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: current.version });
    expect(submitted.status).toBe(200);
    expect(submitted.body).toMatchObject({ status: 'submitted', signedBy: expect.stringMatching(/curator/), submittedAt: expect.any(String) });
    const edit = await conservator.patch(`/api/v1/condition-reports/${report.id}`, { summary: 'Changed my mind', version: submitted.body.version });
    expect(edit.status).toBe(409);
    expect(edit.body.error.message).toMatch(/Amend it/);
    expect((await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, coating)).status).toBe(409);
    expect((await conservator.patch(`/api/v1/condition-reports/${report.id}/findings/${current.findings[0].id}`, { severity: 'slight', version: 1 })).status).toBe(409);
    expect((await conservator.send('delete', `/api/v1/condition-reports/${report.id}`)).status).toBe(409);
    expect((await curator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: submitted.body.version })).status).toBe(409);
    const after = (await conservator.get(`/api/v1/condition-reports/${report.id}`)).body;
    expect(after).toMatchObject({ summary: 'Winter survey of the store room.', findingCount: 1, status: 'submitted' });
  });

  it('amends by a new linked revision with the findings copied; both stay readable', async () => {
    const report = await draft();
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, coating);
    const v = (await conservator.get(`/api/v1/condition-reports/${report.id}`)).body.version;
    await conservator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: v });
    const amendment = await conservator.post(`/api/v1/condition-reports/${report.id}/amend`);
    expect(amendment.status).toBe(201);
    expect(amendment.body).toMatchObject({ status: 'draft', revision: 2, supersedesId: report.id, findingCount: 1, grade: 'fair' });
    expect((await conservator.get(`/api/v1/condition-reports/${report.id}`)).body).toMatchObject({ amendmentId: amendment.body.id, supersededById: null });
    expect(amendment.body.findings[0]).toMatchObject({ rustGrade: '5-G', damageType: 'coating-failure' });
    expect((await conservator.post(`/api/v1/condition-reports/${report.id}/amend`)).status).toBe(409);
    // The original is unchanged and not yet superseded while the amendment is a draft.
    expect((await conservator.get(`/api/v1/condition-reports/${report.id}`)).body).toMatchObject({ supersededById: null, abilities: { amend: false } });
    const fixed = await conservator.patch(`/api/v1/condition-reports/${amendment.body.id}/findings/${amendment.body.findings[0].id}`, { severity: 'severe', version: amendment.body.findings[0].version });
    expect(fixed.body.grade).toBe('poor');
    await conservator.post(`/api/v1/condition-reports/${amendment.body.id}/submit`, { version: fixed.body.version });
    const original = (await conservator.get(`/api/v1/condition-reports/${report.id}`)).body;
    expect(original).toMatchObject({ supersededById: amendment.body.id, grade: 'fair', status: 'submitted' });
    expect(original.findings[0].severity).toBe('moderate');
    const list = (await curator.get(`/api/v1/condition-reports?subjectType=compartment&subjectId=${place.first}`)).body;
    expect(list.items.map((r: { revision: number; supersededById: number | null }) => [r.revision, r.supersededById])).toEqual([
      [2, null],
      [1, amendment.body.id],
    ]);
  });

  it('answers a stale report edit with 409 naming what changed', async () => {
    const report = await draft();
    const first = await conservator.patch(`/api/v1/condition-reports/${report.id}`, { summary: 'Rust streaks on the deckhead.', version: report.version });
    expect(first.status).toBe(200);
    const second = await conservator.patch(`/api/v1/condition-reports/${report.id}`, { method: 'visual', version: report.version });
    expect(second.status).toBe(409);
    expect(second.body.error.fields.summary).toMatch(/Rust streaks/);
  });

  it('lets docents and fundraisers read summaries only, and only conservators write', async () => {
    const report = await draft();
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, coating);
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    const seen = (await docent.get(`/api/v1/condition-reports/${report.id}`)).body;
    expect(seen).toMatchObject({ grade: 'fair', findingCount: 1, findings: null, abilities: { readFindings: false, update: false } });
    expect((await docent.get(`/api/v1/condition-reports?vesselId=${vesselId}`)).body.total).toBe(1);
    expect((await curator.post('/api/v1/condition-reports', { subjectType: 'compartment', subjectId: place.first, inspectedOn: '2026-11-20' })).status).toBe(403);
    expect((await curator.post(`/api/v1/condition-reports/${report.id}/findings`, coating)).status).toBe(403);
  });

  it('finds reports by the words of their findings', async () => {
    const report = await draft();
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'thieves-and-vandals', damageType: 'graffiti', severity: 'moderate', description: 'Tagged with marker pen on the bulkhead' });
    const hit = await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=marker`);
    expect(hit.body.items.map((r: { id: number }) => r.id)).toEqual([report.id]);
    expect((await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=whistle`)).body.total).toBe(0);
    // Word forms and a prefix as typed (porter stemmer over unicode61).
    for (const q of ['markers', 'tagging', 'bulkheads', 'bulkh']) expect((await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=${q}`)).body.total, q).toBe(1);
    // The draft can go; its search document goes with it.
    expect((await conservator.send('delete', `/api/v1/condition-reports/${report.id}`)).status).toBe(204);
    expect((await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=marker`)).body.total).toBe(0);
  });
});

describe('photos of a report', () => {
  it('takes photos while a draft, marks findings on them, and keeps them fixed once submitted', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const report = await draft();
    const photo = await conservator.agent.post(`/api/v1/media?ownerType=condition-report&ownerId=${report.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), 'bulkhead.jpg');
    expect(photo.status, JSON.stringify(photo.body)).toBe(201);
    const marked = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { ...coating, location: { on: 'photo', mediaId: photo.body.id, area: [0.1, 0.2, 0.3, 0.25] } });
    expect(marked.status).toBe(201);
    expect(marked.body.findings[0].location).toEqual({ on: 'photo', mediaId: photo.body.id, area: [0.1, 0.2, 0.3, 0.25] });
    const curatorPhoto = await curator.agent.post(`/api/v1/media?ownerType=condition-report&ownerId=${report.id}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), 'x.jpg');
    expect(curatorPhoto.status).toBe(403);
    await curator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: marked.body.version });
    const late = await conservator.agent.post(`/api/v1/media?ownerType=condition-report&ownerId=${report.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), 'late.jpg');
    expect(late.status).toBe(409);
    expect((await conservator.send('delete', `/api/v1/media/${photo.body.id}`)).status).toBe(409);
    const listed = (await conservator.get(`/api/v1/media?ownerType=condition-report&ownerId=${report.id}`)).body;
    expect(listed[0].abilities).toEqual({ update: false, delete: false });
    // The amendment keeps pointing at the original's photo.
    const amendment = (await conservator.post(`/api/v1/condition-reports/${report.id}/amend`)).body;
    const moved = await conservator.patch(`/api/v1/condition-reports/${amendment.id}/findings/${amendment.findings[0].id}`, { location: { on: 'photo', mediaId: photo.body.id, area: [0.5, 0.5, 0.1, 0.1] }, version: amendment.findings[0].version });
    expect(moved.status).toBe(200);
  });
});

describe('the report as a PDF', () => {
  it('holds the record, the grade, every finding with its rust grade, and the photos', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const { extractText, getDocumentProxy } = await import('unpdf');
    const report = await draft();
    const photo = (await conservator.agent.post(`/api/v1/media?ownerType=condition-report&ownerId=${report.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), 'deckhead.jpg')).body;
    await conservator.patch(`/api/v1/media/${photo.id}`, { caption: 'Deckhead over the store', version: photo.version });
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { ...coating, location: { on: 'photo', mediaId: photo.id, area: [0.1, 0.1, 0.2, 0.2] } });
    const last = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { artifactId: gaugeId, agent: 'thieves-and-vandals', damageType: 'graffiti', severity: 'slight', description: 'Initials scratched in the paint', location: { on: 'plan', point: [360, 458] } });
    expect(last.body.findings.map((f: { locationText: string | null }) => f.locationText)).toEqual([
      'Marked on the photo “Deckhead over the store”: upper left',
      'Marked on the plan; the deck is not calibrated, so no frame or offset can be given.',
    ]);
    // Calibrated at 0.05 m a unit, frame 0 at x 1000 and 0.5 m between frames (10 units), numbered leftward (bow right):
    // x 360 is frame (1000 − 360) / 10 = 64; y 458 is 42 units × 0.05 = 2.1 m above the centerline at 500, to port.
    const deck = (await ctx.store.repos.decks.findById(place.deckId))!;
    Object.assign(deck, { metresPerUnit: 0.05, centerlineY: 500, bowTo: 'right', frames: { referenceFrame: 0, referenceX: 1000, spacingMetres: 0.5, lastFrame: 90 } });
    await ctx.store.repos.decks.save(deck);
    // In the organisation's units: US customary by default (2.1 m = 82.7 in, to the nearest inch 6 ft 11 in), then metric.
    expect((await curator.get(`/api/v1/condition-reports/${report.id}`)).body.findings[1].locationText).toBe('Frame 64, 6′ 11″ to port');
    const settings = await ctx.store.repos.settings.get();
    await ctx.store.repos.settings.save(Object.assign(settings, { unitSystem: 'metric' }));
    expect((await curator.get(`/api/v1/condition-reports/${report.id}`)).body.findings[1].locationText).toBe('Frame 64, 2.1 m to port');
    await curator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: last.body.version });

    const res = await curator.getBytes(`/api/v1/condition-reports/${report.id}/pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toBe(`attachment; filename="condition-report-${report.id}-rev1.pdf"`);
    const pdf = await getDocumentProxy(new Uint8Array(res.body as Buffer));
    expect(pdf.numPages).toBe(2);
    const { text } = await extractText(pdf, { mergePages: true });
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain('Condition report: 1-10-1-Q Store room');
    expect(flat).toContain('Overall condition: Fair');
    expect(flat).toContain('1. Coating failure: Moderate');
    expect(flat).toContain('Rust grade (ASTM D610): 5-G: 2 % rusted (more than 1 % up to 3 %), general rusting');
    expect(flat).toContain('Recommended action: Spot-prime and overcoat');
    expect(flat).toContain('2. Graffiti: Slight');
    expect(flat).toContain('Artifact: 2019.4.12 Steam gauge');
    expect(flat).toContain('Location: Frame 64, 2.1 m to port');
    expect(flat).toContain('Location: Marked on the photo “Deckhead over the store”: upper left');
    expect(flat).toContain('Deckhead over the store');
    expect(flat).toMatch(/Submitted and signed by Test curator \d+/);

    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    expect((await docent.get(`/api/v1/condition-reports/${report.id}/pdf`)).status).toBe(403);
  });
});

describe('the summary PDF for those who may not read findings', () => {
  it('gives docents and fundraisers the grade, the rule line, the summary, the hazards and the publishable photos, and nothing of the findings', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const { extractText, getDocumentProxy } = await import('unpdf');
    const report = await draft();
    const upload = async (ownerType: string, ownerId: number, name: string, by = conservator) => {
      const res = await by.agent.post(`/api/v1/media?ownerType=${ownerType}&ownerId=${ownerId}`).set('x-csrf-token', by.csrf).attach('file', await cameraJpeg(), name);
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body;
    };
    const shown = await upload('condition-report', report.id, 'shown.jpg');
    expect((await conservator.patch(`/api/v1/media/${shown.id}`, { caption: 'Deckhead after the winter', altText: 'Rust streaks on a white-painted steel deckhead', publicUse: true, version: shown.version })).status).toBe(200);
    const internal = await upload('condition-report', report.id, 'internal.jpg');
    await conservator.patch(`/api/v1/media/${internal.id}`, { caption: 'Behind the locker, staff only', altText: 'Flaking paint behind a locker', publicUse: false, version: internal.version });
    const room = await upload('compartment', place.first, 'room.jpg', curator);
    await curator.patch(`/api/v1/media/${room.id}`, { caption: 'The store room from the hatch', altText: 'A narrow store room with shelves on both sides', publicUse: true, version: room.version });
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { ...coating, description: 'Blistered paint along the frame', recommendedAction: 'Spot-prime and overcoat the blisters' });
    const found = (await conservator.get(`/api/v1/condition-reports/${report.id}`)).body;
    const overridden = await conservator.patch(`/api/v1/condition-reports/${report.id}`, { gradeOverride: 'poor', overrideReason: 'Hidden corrosion behind the lagging', version: found.version });
    expect(overridden.status).toBe(200);
    expect((await conservator.post(`/api/v1/compartments/${place.first}/hazards`, { kind: 'lead-paint', notes: 'Tested positive on the casings' })).status).toBe(201);

    for (const role of ['docent', 'fundraiser'] as const) {
      const client = (await signedInAs(ctx.app, ctx.store, role)).client;
      const res = await client.getBytes(`/api/v1/condition-reports/${report.id}/summary.pdf`);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      const { text } = await extractText(await getDocumentProxy(new Uint8Array(res.body as Buffer)), { mergePages: true });
      const flat = text.replace(/\s+/g, ' ');
      expect(flat).toContain('Condition summary: 1-10-1-Q Store room');
      expect(flat).toContain('Overall condition: Poor');
      expect(flat).toContain('Otherwise fair if any finding is moderate');
      expect(flat).toContain('Winter survey of the store room.');
      expect(flat).toContain('Lead-based paint');
      expect(flat).toContain('Rust streaks on a white-painted steel deckhead');
      expect(flat).toContain('Deckhead after the winter');
      expect(flat).toContain('A narrow store room with shelves on both sides');
      for (const secret of ['Blistered paint along the frame', 'Spot-prime and overcoat', '1 moderate finding', 'Hidden corrosion', 'Behind the locker', 'Flaking paint behind a locker', 'Coating failure']) expect(flat).not.toContain(secret);
      expect((await client.get(`/api/v1/condition-reports/${report.id}/pdf`)).status).toBe(403);
    }
    const anonymous = await request(ctx.app).get(`/api/v1/condition-reports/${report.id}/summary.pdf`);
    expect(anonymous.status).toBe(401);
  });
});

describe('the PDF in embedded fonts', () => {
  const text = 'Müller’s gauge • 5 °C ± 0.5, 20 µm, Žilina, Łódź, → done';

  it('prints accents, bullets and signs as written, and names a photo without a caption by its place and date', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const { extractText, getDocumentProxy } = await import('unpdf');
    const accented = (await addArtifact(curator, vesselId, { objectNumber: '2019.4.14', name: 'Jauge à vapeur, Łódź série', compartmentId: place.first, point: [210, 210] })).id;
    const report = (await conservator.post('/api/v1/condition-reports', { subjectType: 'artifact', subjectId: accented, inspectedOn: '2026-11-20', method: 'close-visual', summary: text })).body;
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'water', damageType: 'water-staining', severity: 'slight', description: text, artifactId: accented });
    const upload = async (name: string) => (await conservator.agent.post(`/api/v1/media?ownerType=condition-report&ownerId=${report.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), name)).body;
    const captioned = await upload('IMG_0001.jpg');
    await conservator.patch(`/api/v1/media/${captioned.id}`, { caption: 'Dial face, Žilina side', version: captioned.version });
    await upload('IMG_0002.jpg');

    const res = await curator.getBytes(`/api/v1/condition-reports/${report.id}/pdf`);
    expect(res.status).toBe(200);
    const bytes = res.body as Buffer;
    const { text: extracted } = await extractText(await getDocumentProxy(new Uint8Array(bytes)), { mergePages: true });
    // pdf.js hands text back in compatibility form (NFKC), so the micro sign µ reads back as the Greek μ.
    const flat = extracted.replace(/\s+/g, ' ');
    const written = text.normalize('NFKC');
    expect(written).not.toBe(text);
    expect(flat).toContain('Condition report: 2019.4.14 Jauge à vapeur, Łódź série');
    expect(flat).toContain(`Summary ${written}`);
    expect(flat).toContain(`Observed: ${written}`);
    expect(flat).toContain('Artifact: 2019.4.14 Jauge à vapeur, Łódź série');
    expect(flat).not.toContain('?');
    expect(flat).toContain('Dial face, Žilina side');
    expect(flat).toContain('Photo 2 · taken 2024-05-17 14:03:22');
    expect(flat).not.toContain('IMG_000');
    // Fonts are embedded (a TrueType font file each), not the standard ones.
    const raw = bytes.toString('latin1');
    expect(raw).toContain('/FontFile2');
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+DejaVuSans\b/);
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+DejaVuSans-Bold/);
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+Merriweather/);
    expect(raw).not.toContain('/Helvetica');
  });
});

describe('deleting a draft', () => {
  it('takes its photos and their files with it', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const { readdirSync } = await import('node:fs');
    const report = await draft();
    await conservator.agent.post(`/api/v1/media?ownerType=condition-report&ownerId=${report.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), 'a.jpg');
    const files = () => readdirSync(ctx.config.uploadsDir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile()).length;
    expect(files()).toBe(3);
    // An empty body (as a proxy may send with DELETE) is no body.
    const res = await conservator.agent.delete(`/api/v1/condition-reports/${report.id}`).set('x-csrf-token', conservator.csrf).set('content-length', '0');
    expect(res.status).toBe(204);
    expect(files()).toBe(0);
    expect(await ctx.store.repos.media.countForOwner('condition-report', report.id)).toBe(0);
  });
});

describe('what a condition record keeps in place', () => {
  it('keeps a compartment named by a report, and a photo a submitted finding is marked on', async () => {
    const { cameraJpeg } = await import('../support/images.js');
    const report = await draft('compartment', place.second);
    const refused = await curator.send('delete', `/api/v1/compartments/${place.second}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/named in 1 condition report/);
    const photo = (await curator.agent.post(`/api/v1/media?ownerType=compartment&ownerId=${place.second}`).set('x-csrf-token', curator.csrf).attach('file', await cameraJpeg(), 'room.jpg')).body;
    const marked = (await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { ...coating, location: { on: 'photo', mediaId: photo.id, area: [0, 0, 0.5, 0.5] } })).body;
    await conservator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: marked.version });
    const kept = await curator.send('delete', `/api/v1/media/${photo.id}`);
    expect(kept.status).toBe(409);
    expect(kept.body.error.message).toMatch(/submitted condition report marks a finding on this photo/);
  });

  it('follows a renamed subject in search, and searches only titles for roles that do not read findings', async () => {
    const report = await draft('artifact', gaugeId);
    await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'water', damageType: 'water-staining', severity: 'slight', description: 'Tide marks on the dial' });
    const gauge = (await curator.get(`/api/v1/artifacts/${gaugeId}`)).body;
    await curator.patch(`/api/v1/artifacts/${gaugeId}`, { name: 'Boiler pressure gauge', version: gauge.version });
    expect((await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=boiler`)).body.total).toBe(1);
    expect((await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=steam`)).body.total).toBe(0);
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    expect((await docent.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=tide`)).body.total).toBe(0);
    expect((await docent.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=boiler`)).body.total).toBe(1);
    expect((await curator.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=tide`)).body.total).toBe(1);
  });
});

describe('hazards where the work is written', () => {
  it('the report, an artifact’s report and the PDF carry the hazards of the space and caution work that would disturb them', async () => {
    const { extractText, getDocumentProxy } = await import('unpdf');
    await conservator.post(`/api/v1/compartments/${place.first}/hazards`, { kind: 'lead-paint', notes: 'Tested positive on the casings' });
    await conservator.post(`/api/v1/compartments/${place.first}/hazards`, { kind: 'asbestos', notes: 'Lagging on the steam line' });
    const room = await draft();
    expect(room.subjectHazards.map((h: { kind: string }) => h.kind).sort()).toEqual(['asbestos', 'lead-paint']);
    expect(room.subjectHazards.find((h: { kind: string }) => h.kind === 'lead-paint').caution).toMatch(/No dry sanding, scraping, wire-brushing/);
    // an artifact's report takes the hazards of its compartment; a space without any has none
    expect((await draft('artifact', gaugeId)).subjectHazards).toHaveLength(2);
    expect((await draft('compartment', place.second)).subjectHazards).toEqual([]);

    const last = await conservator.post(`/api/v1/condition-reports/${room.id}/findings`, { ...coating, recommendedAction: 'Wire-brush, prime and topcoat' });
    const res = await curator.getBytes(`/api/v1/condition-reports/${room.id}/pdf`);
    expect(last.status).toBe(201);
    const { text } = await extractText(await getDocumentProxy(new Uint8Array(res.body as Buffer)), { mergePages: true });
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).toContain('Hazards recorded here');
    expect(flat).toContain('Lead-based paint: No dry sanding, scraping, wire-brushing');
    expect(flat).toContain('Asbestos-containing material: Do not disturb, cut, drill, sand or remove it');
    expect(flat).toContain('Caution: This action would disturb the lead-based paint recorded here.');
  });
});

describe('survey methods', () => {
  it('include raking light, UV fluorescence and magnification', async () => {
    for (const method of ['raking-light', 'uv-fluorescence', 'magnification']) {
      const res = await conservator.post('/api/v1/condition-reports', { subjectType: 'compartment', subjectId: place.first, inspectedOn: '2026-11-20', method });
      expect(res.status, method).toBe(201);
      expect(res.body.method).toBe(method);
    }
    expect((await conservator.post('/api/v1/condition-reports', { subjectType: 'compartment', subjectId: place.first, inspectedOn: '2026-11-20', method: 'x-ray' })).status).toBe(400);
  });
});
