import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../shared/roles.js';
import type { MediaOwnerType } from '../../shared/schemas/media.js';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs } from '../support/http.js';
import { cameraJpeg, tinyPdf } from '../support/images.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

/**
 * Files inherit the read rule of their owner, everywhere they are listed, described or served.
 * One photo (and, on the report, one PDF) per owner type, each with a caption that must not reach
 * a role that may not read the owner's evidence. The expected answers are written out here, not
 * derived from the permission table, so a change of the table shows up as a failure.
 */
type Who = Role | 'anonymous';
const WHO: Who[] = [...ROLES, 'anonymous'];
const OWNER_TYPES: MediaOwnerType[] = ['artifact', 'compartment', 'incident', 'condition-report', 'treatment-before', 'treatment-after'];

const ALL_STAFF: Record<Who, 200 | 401 | 403> = { admin: 200, curator: 200, conservator: 200, docent: 200, fundraiser: 200, anonymous: 401 };
/** Condition evidence: for the roles that read findings (the screen tells the others it is reserved). */
const FINDINGS_READERS: Record<Who, 200 | 401 | 403> = { admin: 200, curator: 200, conservator: 200, docent: 403, fundraiser: 403, anonymous: 401 };
const EXPECTED: Record<MediaOwnerType, Record<Who, 200 | 401 | 403>> = {
  artifact: ALL_STAFF,
  compartment: ALL_STAFF,
  incident: ALL_STAFF,
  'condition-report': FINDINGS_READERS,
  tour: ALL_STAFF,
  // A treatment's photos show the work done, for every staff role (the fundraiser tells its story).
  'treatment-before': ALL_STAFF,
  'treatment-after': ALL_STAFF,
};

const FINDING_TEXT = 'Pitting under the flaking lagging near the flange';
const captionOf = (ownerType: MediaOwnerType) => `Caption of the ${ownerType} photo: corrosion bloom under the paint`;

let ctx: TestApp;
const clients = new Map<Who, Client>();
const owners = {} as Record<MediaOwnerType, { ownerId: number; photoId: number; documentId?: number }>;
let artifactId: number;
let reportId: number;

beforeAll(async () => {
  ctx = await createTestApp({}, { mail: false });
  for (const role of ROLES) clients.set(role, (await signedInAs(ctx.app, ctx.store, role)).client);
  const anonymous = new Client(ctx.app);
  await anonymous.fetchCsrf();
  clients.set('anonymous', anonymous);
  const curator = clients.get('curator')!;
  const conservator = clients.get('conservator')!;

  const vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  const place = await deckWithCompartments(ctx.store, curator, vesselId);
  artifactId = (await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', name: 'Steam gauge', compartmentId: place.first, point: [200, 200] })).id;
  const incident = await conservator.post('/api/v1/incidents', { vesselId, kind: 'water-ingress', title: 'Leak over the store', foundOn: '2026-11-29', compartmentIds: [place.second], severity: 'slight' });
  expect(incident.status, JSON.stringify(incident.body)).toBe(201);
  const report = await conservator.post('/api/v1/condition-reports', { subjectType: 'artifact', subjectId: artifactId, inspectedOn: '2026-11-20', summary: 'Winter survey.' });
  expect(report.status, JSON.stringify(report.body)).toBe(201);
  reportId = report.body.id;

  const upload = async (client: Client, ownerType: MediaOwnerType, ownerId: number, content: Buffer, name: string) => {
    const res = await client.agent.post(`/api/v1/media?ownerType=${ownerType}&ownerId=${ownerId}`).set('x-csrf-token', client.csrf).attach('file', content, name);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const edited = await client.patch(`/api/v1/media/${res.body.id}`, { caption: captionOf(ownerType), version: res.body.version });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    return res.body.id as number;
  };
  const jpeg = await cameraJpeg();
  owners.artifact = { ownerId: artifactId, photoId: await upload(curator, 'artifact', artifactId, jpeg, 'gauge.jpg') };
  owners.compartment = { ownerId: place.first, photoId: await upload(curator, 'compartment', place.first, jpeg, 'store.jpg') };
  owners.incident = { ownerId: incident.body.id, photoId: await upload(conservator, 'incident', incident.body.id, jpeg, 'leak.jpg') };
  owners['condition-report'] = {
    ownerId: reportId,
    photoId: await upload(conservator, 'condition-report', reportId, jpeg, 'flange.jpg'),
    documentId: await upload(conservator, 'condition-report', reportId, tinyPdf(), 'lab.pdf'),
  };
  const project = await conservator.post(`/api/v1/vessels/${vesselId}/repair-projects`, { title: 'Gauge glass', slug: 'gauge-glass', scope: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'Replace the glass.' }] }] } });
  expect(project.status, JSON.stringify(project.body)).toBe(201);
  const treatment = await conservator.post(`/api/v1/repair-projects/${project.body.id}/treatments`, { performedOn: '2026-11-25', contractorName: 'Harbour Glaziers', method: 'New glass bedded in putty.' });
  expect(treatment.status, JSON.stringify(treatment.body)).toBe(201);
  owners['treatment-before'] = { ownerId: treatment.body.id, photoId: await upload(conservator, 'treatment-before', treatment.body.id, jpeg, 'before.jpg') };
  owners['treatment-after'] = { ownerId: treatment.body.id, photoId: await upload(conservator, 'treatment-after', treatment.body.id, jpeg, 'after.jpg') };

  const finding = await conservator.post(`/api/v1/condition-reports/${reportId}/findings`, {
    agent: 'incorrect-relative-humidity',
    damageType: 'coating-failure',
    severity: 'severe',
    description: FINDING_TEXT,
    location: { on: 'photo', mediaId: owners['condition-report'].photoId, area: [0.1, 0.1, 0.3, 0.3] },
  });
  expect(finding.status, JSON.stringify(finding.body)).toBe(201);
  const overridden = await conservator.patch(`/api/v1/condition-reports/${reportId}`, { gradeOverride: 'critical', overrideReason: 'Flange may fail under pressure', version: finding.body.version });
  expect(overridden.status, JSON.stringify(overridden.body)).toBe(200);
  const submitted = await conservator.post(`/api/v1/condition-reports/${reportId}/submit`, { version: overridden.body.version });
  expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
}, 60_000);
afterAll(() => ctx.close());

const text = (res: { text?: string; body: unknown }) => res.text ?? JSON.stringify(res.body ?? '');

describe('files follow the read rule of their owner', () => {
  const cells = OWNER_TYPES.flatMap((ownerType) => WHO.map((who) => [ownerType, who] as const));

  it.each(cells)('%s files as %s: list, metadata, original and previews', async (ownerType, who) => {
    const client = clients.get(who)!;
    const { ownerId, photoId, documentId } = owners[ownerType];
    const expected = EXPECTED[ownerType][who];
    const responses = {
      list: await client.get(`/api/v1/media?ownerType=${ownerType}&ownerId=${ownerId}`),
      metadata: await client.get(`/api/v1/media/${photoId}`),
      original: await client.get(`/api/v1/media/${photoId}/original`),
      thumb: await client.get(`/api/v1/media/${photoId}/thumb`),
      display: await client.get(`/api/v1/media/${photoId}/display`),
      ...(documentId ? { documentMetadata: await client.get(`/api/v1/media/${documentId}`), documentOriginal: await client.get(`/api/v1/media/${documentId}/original`) } : {}),
    };
    const statuses = Object.fromEntries(Object.entries(responses).map(([k, res]) => [k, res.status]));
    expect(statuses).toEqual(Object.fromEntries(Object.keys(responses).map((k) => [k, expected])));
    const captionSeen = Object.values(responses).some((res) => text(res).includes(captionOf(ownerType)));
    expect(captionSeen, 'the caption reaches the caller').toBe(expected === 200);
    if (expected === 200) {
      expect(responses.list.body.map((m: { id: number }) => m.id)).toContain(photoId);
      expect(responses.original.headers['content-type']).toBe('image/jpeg');
      expect(responses.thumb.headers['content-type']).toBe('image/webp');
    } else {
      for (const res of Object.values(responses)) expect(res.body.error.code).toBe(expected === 401 ? 'unauthenticated' : 'forbidden');
    }
  });

  it('answers 404 for a file that does not exist, whoever asks (so a refusal is not a guess at ids)', async () => {
    for (const who of ROLES) expect((await clients.get(who)!.get('/api/v1/media/999999/original')).status).toBe(404);
  });

  it.each(WHO)('the artifact served to %s embeds a cover that the same caller may open', async (who) => {
    const client = clients.get(who)!;
    const artifact = await client.get(`/api/v1/artifacts/${artifactId}`);
    if (who === 'anonymous') return expect(artifact.status).toBe(401);
    expect(artifact.body.cover).toMatchObject({ mediaId: owners.artifact.photoId });
    expect((await client.get(artifact.body.cover.url)).status).toBe(200);
  });
});

describe('condition evidence for summary-only roles', () => {
  it.each(WHO)('condition history as %s lists the report’s photos only for the roles that read findings', async (who) => {
    const res = await clients.get(who)!.get(`/api/v1/condition-history?subjectType=artifact&subjectId=${artifactId}`);
    if (who === 'anonymous') return expect(res.status).toBe(401);
    expect(res.status).toBe(200);
    // The report itself stays in the timeline for everyone: its grade and summary are for all staff.
    expect(res.body.entries).toContainEqual(expect.objectContaining({ kind: 'report', id: reportId, grade: 'critical' }));
    const ids = res.body.photos.map((p: { mediaId: number }) => p.mediaId).sort();
    const reads = FINDINGS_READERS[who] === 200;
    expect(ids).toEqual(reads ? [owners.artifact.photoId, owners['condition-report'].photoId].sort() : [owners.artifact.photoId]);
    expect(res.text.includes(captionOf('condition-report'))).toBe(reads);
  });

  it.each(WHO)('the report as %s carries its findings and the grade’s reasoning only for the roles that read findings', async (who) => {
    const res = await clients.get(who)!.get(`/api/v1/condition-reports/${reportId}`);
    if (who === 'anonymous') return expect(res.status).toBe(401);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ grade: 'critical', findingCount: 1, summary: 'Winter survey.' });
    if (FINDINGS_READERS[who] === 200) {
      // The grade rule of shared/calc/condition-grade.ts: one severe finding gives "poor".
      expect(res.body).toMatchObject({ computedGrade: 'poor', gradeBecause: '1 severe finding.', overrideReason: 'Flange may fail under pressure', abilities: { readFindings: true } });
      expect(res.body.findings).toHaveLength(1);
    } else {
      expect(res.body).toMatchObject({ gradeBecause: null, overrideReason: null, findings: null, abilities: { readFindings: false } });
      for (const secret of [FINDING_TEXT, 'severe finding', 'Flange may fail', captionOf('condition-report')]) expect(res.text).not.toContain(secret);
    }
  });

  it.each(WHO)('searching the reports as %s finds a report by its findings only for the roles that read them', async (who) => {
    const vesselId = (await ctx.store.repos.conditionReports.findById(reportId))!.vesselId;
    const res = await clients.get(who)!.get(`/api/v1/condition-reports?vesselId=${vesselId}&q=lagging`);
    if (who === 'anonymous') return expect(res.status).toBe(401);
    expect(res.body.total).toBe(FINDINGS_READERS[who] === 200 ? 1 : 0);
  });

  it.each(WHO)('the report PDF (findings and photos) as %s', async (who) => {
    const res = await clients.get(who)!.get(`/api/v1/condition-reports/${reportId}/pdf`);
    expect(res.status).toBe(FINDINGS_READERS[who]);
  });
});
