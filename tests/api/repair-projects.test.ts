import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { cameraJpeg } from '../support/images.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let conservator: Client;
let fundraiser: Client;
let docent: Client;
let vesselId: number;
let place: Awaited<ReturnType<typeof deckWithCompartments>>;

const scope = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
const LINES = [
  // 12.5 m² at 84.37 = 1,054.625 → 1,054.63; 3 h at 65.00 = 195.00; subtotal 1,249.63; 10 % = 124.963 → 124.96; total 1,374.59 (by hand)
  { description: 'Deckhead plate renewal', quantityMilli: 12_500, unit: 'm²', unitCostCents: 8_437 },
  { description: 'Rigger', quantityMilli: 3_000, unit: 'h', unitCostCents: 6_500 },
];

beforeEach(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
  fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
  docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  place = await deckWithCompartments(ctx.store, curator, vesselId);
});
afterEach(() => ctx.close());

async function propose(fields: Record<string, unknown> = {}) {
  const res = await conservator.post(`/api/v1/vessels/${vesselId}/repair-projects`, { title: 'Store room deckhead', slug: 'store-room-deckhead', scope: scope('Renew the wasted plate.'), lines: LINES, ...fields });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

/** A submitted report on the store room with one finding, inspected on `on`. */
async function submittedFinding(on: string, description: string) {
  const report = (await conservator.post('/api/v1/condition-reports', { subjectType: 'compartment', subjectId: place.first, inspectedOn: on, summary: `Survey of ${on}.` })).body;
  const finding = await conservator.post(`/api/v1/condition-reports/${report.id}/findings`, { agent: 'water', damageType: 'section-loss', severity: 'severe', description });
  expect(finding.status, JSON.stringify(finding.body)).toBe(201);
  const current = (await conservator.get(`/api/v1/condition-reports/${report.id}`)).body;
  const submitted = await conservator.post(`/api/v1/condition-reports/${report.id}/submit`, { version: current.version });
  expect(submitted.status, JSON.stringify(submitted.body)).toBe(200);
  return { reportId: report.id as number, findingId: finding.body.id as number };
}

describe('repair projects', () => {
  it('stores the estimate total with contingency, the scope rendered at save, and the first status change', async () => {
    const project = await propose();
    expect(project).toMatchObject({
      status: 'proposed',
      subtotalCents: 124_963,
      contingencyBasisPoints: 1000,
      contingencyCents: 12_496,
      estimateCents: 137_459,
      lines: [{ totalCents: 105_463, position: 0 }, { totalCents: 19_500, position: 1 }],
      scopeHtml: '<p>Renew the wasted plate.</p>',
      scopeText: 'Renew the wasted plate.',
      nextStatuses: ['cancelled'],
      abilities: { update: true, changeStatus: true, addTreatment: true },
    });
    expect(project.statusChanges).toMatchObject([{ fromStatus: null, toStatus: 'proposed', by: { name: expect.any(String) } }]);
    const list = (await fundraiser.get(`/api/v1/vessels/${vesselId}/repair-projects?status=proposed`)).body;
    expect(list).toMatchObject({ total: 1, items: [{ slug: 'store-room-deckhead', estimateCents: 137_459 }] });
    expect((await fundraiser.get(`/api/v1/vessels/${vesselId}/repair-projects?status=approved`)).body.total).toBe(0);
    const row = (await ctx.store.repos.repairProjects.findById(project.id))!;
    expect(row.estimateCents).toBe(137_459);
  });

  it('answers 400 with the exact message for bad fields and writes nothing on a bad estimate line', async () => {
    const audits = (await ctx.store.repos.auditEvents.page({ page: 1, pageSize: 100, sort: '-at' } as never)).total;
    const badLine = await conservator.post(`/api/v1/vessels/${vesselId}/repair-projects`, {
      title: 'Gauge board',
      slug: 'gauge-board',
      scope: scope('Glass.'),
      lines: [LINES[0], { description: 'Glass', quantityMilli: 1.5, unit: 'each', unitCostCents: 1200 }],
    });
    expect(badLine.status).toBe(400);
    expect(badLine.body.error.fields['lines.1.quantityMilli']).toBe('Quantity must be whole thousandths of a unit.');
    const badSlug = await conservator.post(`/api/v1/vessels/${vesselId}/repair-projects`, { title: 'x', slug: 'Gauge Board', scope: scope('x') });
    expect(badSlug.body.error.fields.slug).toBe('Slug may hold only lowercase letters, digits and single hyphens between them.');
    const noTitle = await conservator.post(`/api/v1/vessels/${vesselId}/repair-projects`, { title: ' ', slug: 'x', scope: scope('x') });
    expect(noTitle.body.error.fields.title).toBe('Title is required.');
    const cost = await conservator.post(`/api/v1/vessels/${vesselId}/repair-projects`, { title: 'x', slug: 'x', scope: scope('x'), lines: [{ ...LINES[0], unitCostCents: 12.5 }] });
    expect(cost.body.error.fields['lines.0.unitCostCents']).toBe('Unit cost must be a whole number of cents.');
    // A line past the limits of the service (a linked record of another vessel) is refused whole, in one transaction.
    const other = (await buildVessel(ctx.store, { name: 'Other ship' })).id;
    const elsewhere = await conservator.post(`/api/v1/vessels/${other}/repair-projects`, { title: 'x', slug: 'x', scope: scope('x'), lines: LINES, compartmentIds: [place.first] });
    expect(elsewhere.status).toBe(422);
    expect((await fundraiser.get(`/api/v1/vessels/${vesselId}/repair-projects`)).body.total).toBe(0);
    expect((await fundraiser.get(`/api/v1/vessels/${other}/repair-projects`)).body.total).toBe(0);
    expect(await ctx.store.dataSource.query('SELECT COUNT(*) AS n FROM repair_project_estimate_line')).toEqual([{ n: 0 }]);
    expect((await ctx.store.repos.auditEvents.page({ page: 1, pageSize: 100, sort: '-at' } as never)).total).toBe(audits);

    // An update whose new lines are refused keeps the old ones.
    const project = await propose();
    const bad = await conservator.patch(`/api/v1/repair-projects/${project.id}`, { lines: [{ description: 'x', quantityMilli: 1000, unit: 'h', unitCostCents: 100 }], riskIds: [999], version: project.version });
    expect(bad.status).toBe(422);
    const after = (await conservator.get(`/api/v1/repair-projects/${project.id}`)).body;
    expect(after).toMatchObject({ estimateCents: 137_459, version: project.version, lines: [{ description: 'Deckhead plate renewal' }, { description: 'Rigger' }] });
  });

  it('edits the estimate by line, keeps slugs unique per vessel, and answers 409 to a stale version', async () => {
    const project = await propose();
    const changed = await conservator.patch(`/api/v1/repair-projects/${project.id}`, { lines: [LINES[1]], contingencyBasisPoints: 1250, version: project.version });
    expect(changed.status, JSON.stringify(changed.body)).toBe(200);
    // 3 h at 65.00 = 195.00; 12.5 % = 24.375 → 24.38; total 219.38
    expect(changed.body).toMatchObject({ subtotalCents: 19_500, contingencyCents: 2_438, estimateCents: 21_938, version: project.version + 1 });
    const stale = await curator.patch(`/api/v1/repair-projects/${project.id}`, { title: 'Another title', version: project.version });
    expect(stale.status).toBe(409);
    expect(stale.body.error.fields.lines).toMatch(/^Changed by /);
    const twin = await conservator.post(`/api/v1/vessels/${vesselId}/repair-projects`, { title: 'Twin', slug: 'store-room-deckhead', scope: scope('x') });
    expect(twin.status).toBe(409);
    expect(twin.body.error.message).toBe('Another project of this vessel already uses the slug “store-room-deckhead”.');
    const otherVessel = (await buildVessel(ctx.store, { name: 'Second ship' })).id;
    expect((await conservator.post(`/api/v1/vessels/${otherVessel}/repair-projects`, { title: 'Twin', slug: 'store-room-deckhead', scope: scope('x') })).status).toBe(201);
  });

  it('moves only along the road; approving is for a curator; every change dated, by whom, audited', async () => {
    let project = await propose();
    const skip = await curator.post(`/api/v1/repair-projects/${project.id}/status`, { status: 'fundraising', version: project.version });
    expect(skip.status).toBe(422);
    expect(skip.body.error.message).toBe('A proposed project cannot become fundraising: it can move to approved or cancelled.');
    const byConservator = await conservator.post(`/api/v1/repair-projects/${project.id}/status`, { status: 'approved', version: project.version });
    expect(byConservator.status).toBe(422);
    expect(byConservator.body.error.message).toBe('Approving a repair project is for a curator.');
    expect((await docent.post(`/api/v1/repair-projects/${project.id}/status`, { status: 'approved', version: project.version })).status).toBe(403);
    expect((await conservator.get(`/api/v1/repair-projects/${project.id}`)).body.nextStatuses).toEqual(['cancelled']);
    expect((await curator.get(`/api/v1/repair-projects/${project.id}`)).body.nextStatuses).toEqual(['approved', 'cancelled']);

    const step = async (client: Client, status: string, note = '') => {
      const res = await client.post(`/api/v1/repair-projects/${project.id}/status`, { status, note, version: project.version });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      project = res.body;
    };
    await step(curator, 'approved', 'Board meeting of November');
    const stale = await conservator.post(`/api/v1/repair-projects/${project.id}/status`, { status: 'fundraising', version: project.version - 1 });
    expect(stale.status).toBe(409);
    await step(conservator, 'fundraising');
    await step(conservator, 'funded');
    await step(conservator, 'underway');
    await step(conservator, 'complete');
    expect(project.statusChanges.map((c: { toStatus: string }) => c.toStatus)).toEqual(['proposed', 'approved', 'fundraising', 'funded', 'underway', 'complete']);
    expect(project.statusChanges[1]).toMatchObject({ fromStatus: 'proposed', note: 'Board meeting of November', by: { name: expect.any(String) }, at: expect.any(String) });
    expect(project).toMatchObject({ nextStatuses: [], abilities: { update: false } });
    const cancelDone = await curator.post(`/api/v1/repair-projects/${project.id}/status`, { status: 'cancelled', version: project.version });
    expect(cancelDone.body.error.message).toBe('A complete project cannot become cancelled: its status no longer changes.');
    const edit = await conservator.patch(`/api/v1/repair-projects/${project.id}`, { title: 'Late', version: project.version });
    expect(edit.status).toBe(422);

    const audit = await ctx.store.dataSource.query(`SELECT summary FROM audit_events WHERE entityType = 'repair-project' ORDER BY id`);
    expect(audit.map((a: { summary: string }) => a.summary).slice(1, 3)).toEqual(['Repair project Store room deckhead: proposed → approved (Board meeting of November)', 'Repair project Store room deckhead: approved → fundraising']);

    const second = await propose({ slug: 'second' });
    const cancel = await conservator.post(`/api/v1/repair-projects/${second.id}/status`, { status: 'cancelled', note: 'Covered by the dry-dock contract', version: second.version });
    expect(cancel.body).toMatchObject({ status: 'cancelled', nextStatuses: [] });
    const bad = await conservator.post(`/api/v1/repair-projects/${second.id}/status`, { status: 'done', version: 1 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.status).toBe('Status must be one of proposed, approved, fundraising, funded, underway, complete, cancelled.');
  });

  it('shows the cautions of the work and of the spaces it touches', async () => {
    await conservator.post(`/api/v1/compartments/${place.second}/hazards`, { kind: 'lead-paint', notes: 'Bulkheads tested positive' });
    await conservator.post(`/api/v1/compartments/${place.first}/hazards`, { kind: 'confined-space', notes: 'Low, one hatch' });
    const gauge = await addArtifact(curator, vesselId, { objectNumber: '2020.1.1', name: 'Gauge board', compartmentId: place.second, point: [1200, 200] });
    const project = await propose({ hotWork: true, artifactIds: [gauge.id] });
    expect(project.workCautions.map((c: { kind: string }) => c.kind)).toEqual(['hotWork']);
    expect(project.workCautions[0].caution).toMatch(/hot-work permit.*licensed contractors.*site safety plan and local codes/);
    expect(project.spaceCautions.map((c: { kind: string }) => c.kind)).toEqual(['lead-paint']);
    const both = await conservator.patch(`/api/v1/repair-projects/${project.id}`, { compartmentIds: [place.first], leadPaint: true, version: project.version });
    expect(both.body.spaceCautions.map((c: { kind: string }) => c.kind)).toEqual(['lead-paint', 'confined-space']);
    expect(both.body.workCautions.map((c: { kind: string }) => c.kind)).toEqual(['hotWork', 'leadPaint']);
    expect(both.body.compartments).toEqual([{ id: place.first, label: '1-10-1-Q Store room', deckId: place.deckId }]);
  });
});

describe('treatments', () => {
  it('records the work with before and after photos; the finding stays as reported beside the next survey', async () => {
    const { findingId, reportId } = await submittedFinding('2026-03-10', 'Deckhead plate wasted through at frame 12');
    const project = await propose({ findingIds: [findingId] });
    expect(project.findings).toEqual([{ id: findingId, reportId, label: 'Section loss (water), 1-10-1-Q Store room, 2026-03-10' }]);
    expect(project.findingOutcomes).toMatchObject([{ finding: { id: findingId, severityLabel: 'Severe' }, treatedOn: null, next: null }]);

    const noOne = await conservator.post(`/api/v1/repair-projects/${project.id}/treatments`, { performedOn: '2026-05-02', method: 'Cropped and renewed.' });
    expect(noOne.status).toBe(422);
    expect(noOne.body.error.message).toBe('Say who did the work: a member of staff or a named contractor, not both.');
    const badDate = await conservator.post(`/api/v1/repair-projects/${project.id}/treatments`, { performedOn: '2 May', contractorName: 'x', method: 'x' });
    expect(badDate.body.error.fields.performedOn).toBe('Enter the date as YYYY-MM-DD.');
    const treatment = await conservator.post(`/api/v1/repair-projects/${project.id}/treatments`, {
      performedOn: '2026-05-02',
      contractorName: 'Quayside Steel Repairs',
      method: 'Cropped the wasted plate and welded in an insert.',
      materials: '6 mm steel plate; zinc primer',
      findingIds: [findingId],
    });
    expect(treatment.status, JSON.stringify(treatment.body)).toBe(201);
    expect(treatment.body).toMatchObject({ performerLabel: 'Quayside Steel Repairs', findings: [{ id: findingId }], beforePhotos: [], afterPhotos: [] });
    for (const [ownerType, name] of [['treatment-before', 'before.jpg'], ['treatment-after', 'after.jpg']]) {
      const res = await conservator.agent.post(`/api/v1/media?ownerType=${ownerType}&ownerId=${treatment.body.id}`).set('x-csrf-token', conservator.csrf).attach('file', await cameraJpeg(), name);
      expect(res.status, JSON.stringify(res.body)).toBe(201);
    }
    expect((await fundraiser.agent.post(`/api/v1/media?ownerType=treatment-after&ownerId=${treatment.body.id}`).set('x-csrf-token', fundraiser.csrf).attach('file', await cameraJpeg(), 'x.jpg')).status).toBe(403);
    const listed = (await fundraiser.get(`/api/v1/repair-projects/${project.id}/treatments`)).body;
    expect(listed).toMatchObject([{ beforePhotos: [{ fileName: 'before.jpg' }], afterPhotos: [{ fileName: 'after.jpg' }], findings: [], findingCount: 1, abilities: { update: false, addPhotos: false } }]);

    const stale = await curator.patch(`/api/v1/treatments/${treatment.body.id}`, { materials: 'x', version: treatment.body.version + 1 });
    expect(stale.status).toBe(409);

    // The next survey records the state after the work; the finding itself is not edited.
    const later = await submittedFinding('2026-09-14', 'Insert sound; slight weeping at one weld');
    const page = (await conservator.get(`/api/v1/repair-projects/${project.id}`)).body;
    expect(page.findingOutcomes).toMatchObject([
      {
        finding: { id: findingId, description: 'Deckhead plate wasted through at frame 12', inspectedOn: '2026-03-10' },
        treatedOn: '2026-05-02',
        next: { reportId: later.reportId, inspectedOn: '2026-09-14', findings: [{ id: later.findingId, description: 'Insert sound; slight weeping at one weld' }] },
      },
    ]);
    const original = (await conservator.get(`/api/v1/condition-reports/${reportId}`)).body;
    expect(original.findings[0]).toMatchObject({ id: findingId, description: 'Deckhead plate wasted through at frame 12', severity: 'severe' });
    // Those who do not read findings see that there are some, not what they say.
    expect((await fundraiser.get(`/api/v1/repair-projects/${project.id}`)).body).toMatchObject({ findingsVisible: false, findingCount: 1, findings: [], findingOutcomes: [] });
  });
});
