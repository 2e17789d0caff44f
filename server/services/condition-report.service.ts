import { gradeFromFindings } from '../../shared/calc/condition-grade.js';
import { can } from '../../shared/permissions.js';
import { rustGrade } from '../../shared/calc/rust-grade.js';
import { findingLocationText } from '../../shared/calc/plan-location.js';
import { AGENT_LABELS, DAMAGE_TYPES, PERCENT_FIELDS, RUST_DAMAGE_TYPES, type ConditionReportsQuery, type UpdateConditionReportBody, type UpdateFindingBody, type createConditionReportBody, type createFindingBody } from '../../shared/schemas/condition.js';
import type { z } from 'zod';
import type { ConditionFindingEntity } from '../db/entities/condition-finding.entity.js';
import type { ConditionReportEntity } from '../db/entities/condition-report.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ConflictError, NotFoundError, UnprocessableError } from '../http/errors.js';
import { presentReport, presentReportSummary, type LocateFinding } from '../presenters/condition-report.presenter.js';
import { mediaUrl } from '../presenters/media.presenter.js';
import { conditionReportDocument } from '../search/condition-report-document.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import type { FileStore } from '../storage/file-store.js';
import type { ConditionAlerts } from './condition-alerts.js';
import { conditionReportPdf, type PdfPhoto } from './condition-report-pdf.js';
import { conditionSummaryPdf } from './condition-summary-pdf.js';
import { readableMedia } from './media-access.js';
import { derivativeFile } from './media-derivatives.js';
import { staleEditError } from './stale-edit.js';

const REPORT_FIELDS: (keyof ConditionReportEntity)[] = ['inspectedOn', 'method', 'temperatureC', 'relativeHumidity', 'summary', 'gradeOverride', 'overrideReason'];
const FINDING_FIELDS: (keyof ConditionFindingEntity)[] = ['artifactId', 'agent', 'damageType', 'location', 'extentPercent', 'severity', 'percentRusted', 'rustDistribution', 'description', 'recommendedAction', 'urgency'];

interface Subject {
  vesselId: number;
  label: string;
  /** Where the subject is: the compartment itself, or the artifact's compartment. */
  compartmentId: number | null;
}

/** 422 for a percentage outside 0–100 (the schema only checks that it is a number). */
function checkPercents(values: Partial<Record<keyof typeof PERCENT_FIELDS, number | null>>) {
  for (const [field, label] of Object.entries(PERCENT_FIELDS) as [keyof typeof PERCENT_FIELDS, string][]) {
    const value = values[field];
    if (value !== undefined && value !== null && (value < 0 || value > 100)) {
      throw new UnprocessableError(`${label} must be between 0 and 100 %.`, { [field]: `${label} must be between 0 and 100.` });
    }
  }
}

const SUBMITTED = 'This report is submitted and signed, so it no longer changes. Amend it: that makes a new revision which links to this one.';

/**
 * Condition reports and their findings. A draft changes freely; submitting signs it and from then
 * on it is immutable; an amendment is a new draft revision that supersedes it once submitted.
 * Every change of a report (its findings included) is one audit event on the report, which the
 * 409 for a stale save reads to say what changed.
 */
export class ConditionReportService {
  constructor(private readonly store: Store, private readonly alerts: ConditionAlerts, private readonly files: FileStore) {}

  private async subjectOf(repos: Repositories, type: 'artifact' | 'compartment', id: number): Promise<Subject> {
    if (type === 'artifact') {
      const artifact = await repos.artifacts.findById(id);
      if (!artifact) throw new UnprocessableError('Choose an artifact of the collection.', { subjectId: 'No such artifact.' });
      return { vesselId: artifact.vesselId, label: `${artifact.objectNumber} ${artifact.name}`, compartmentId: artifact.compartmentId };
    }
    const compartment = await repos.compartments.findById(id);
    if (!compartment) throw new UnprocessableError('Choose a compartment of the ship.', { subjectId: 'No such compartment.' });
    return { vesselId: compartment.vesselId, label: `${compartment.designation} ${compartment.name}`, compartmentId: compartment.id };
  }

  /** Says where each finding is: plan points on the deck of the subject's compartment, in the organisation's units. */
  private async locator(repos: Repositories, compartmentId: number | null, findings: ConditionFindingEntity[]): Promise<LocateFinding> {
    const compartment = compartmentId === null ? null : await repos.compartments.findById(compartmentId);
    const deck = compartment ? await repos.decks.findById(compartment.deckId) : null;
    const { unitSystem } = await repos.settings.get();
    const names = new Map<number, string | null>();
    for (const f of findings) {
      if (f.location?.on !== 'photo' || names.has(f.location.mediaId)) continue;
      const media = await repos.media.findById(f.location.mediaId);
      names.set(f.location.mediaId, media?.caption || media?.altText || null);
    }
    return (f) => findingLocationText(f.location, deck, unitSystem, (id) => names.get(id) ?? null);
  }

  private async supersededBy(repos: Repositories, id: number): Promise<number | null> {
    const next = await repos.conditionReports.amendmentOf(id);
    return next?.status === 'submitted' ? next.id : null;
  }

  private async present(id: number, viewer: Express.User) {
    const repos = this.store.repos;
    const report = await repos.conditionReports.findById(id);
    if (!report) throw new NotFoundError('The condition report');
    const [subject, findings, amendment] = [await this.subjectOf(repos, report.subjectType, report.subjectId), await repos.conditionReports.findings(id), await repos.conditionReports.amendmentOf(id)];
    const hazards = subject.compartmentId === null ? [] : ((await repos.hazards.kindsFor([subject.compartmentId])).get(subject.compartmentId) ?? []);
    const opener = (await repos.incidents.forSubject(report.subjectType, report.subjectId)).find((i) => i.reportIds.includes(report.id));
    const locate = await this.locator(repos, subject.compartmentId, findings);
    return presentReport(report, subject.label, amendment?.status === 'submitted' ? amendment.id : null, findings, amendment?.id ?? null, viewer, hazards, opener?.id ?? null, locate);
  }

  /** Recomputes the grade and counts from the findings, saves the report and its search document. */
  private async refresh(repos: Repositories, report: ConditionReportEntity) {
    const findings = await repos.conditionReports.findings(report.id);
    report.computedGrade = gradeFromFindings(findings).grade;
    report.grade = report.gradeOverride ?? report.computedGrade;
    report.findingCount = findings.length;
    const saved = await repos.conditionReports.save(report);
    await repos.search.put(conditionReportDocument(saved, (await this.subjectOf(repos, saved.subjectType, saved.subjectId)).label, findings));
    return saved;
  }

  private async draftForChange(repos: Repositories, id: number, version: number | null) {
    const report = await repos.conditionReports.findById(id);
    if (!report) throw new NotFoundError('The condition report');
    if (report.status !== 'draft') throw new ConflictError(SUBMITTED, { status: 'submitted' });
    if (version !== null && report.version !== version) throw await staleEditError(repos, 'condition-report', id, 'this report', report.version, version);
    return report;
  }

  /** The report as a PDF with its findings and photos (its own, and those its findings are marked on). */
  async pdf(id: number): Promise<{ pdf: Buffer; fileName: string }> {
    const repos = this.store.repos;
    const report = await repos.conditionReports.findById(id);
    if (!report) throw new NotFoundError('The condition report');
    const [subject, findings, vessel, settings] = [
      await this.subjectOf(repos, report.subjectType, report.subjectId),
      await repos.conditionReports.findings(id),
      await repos.vessels.findById(report.vesselId),
      await repos.settings.get(),
    ];
    const mediaIds = new Set((await repos.media.forOwner('condition-report', id)).filter((m) => m.kind === 'photo').map((m) => m.id));
    for (const f of findings) if (f.location?.on === 'photo') mediaIds.add(f.location.mediaId);
    // the photos of the incident that opened the report are its evidence too
    const opener = (await repos.incidents.forSubject(report.subjectType, report.subjectId)).find((i) => i.reportIds.includes(report.id));
    if (opener) for (const m of await repos.media.forOwner('incident', opener.id)) if (m.kind === 'photo') mediaIds.add(m.id);
    const photos: PdfPhoto[] = [];
    for (const mediaId of mediaIds) {
      const media = await repos.media.findById(mediaId);
      if (!media || media.kind !== 'photo') continue;
      const marked = findings.map((f, i) => (f.location?.on === 'photo' && f.location.mediaId === mediaId ? i + 1 : null)).filter((n) => n !== null);
      // A file name is a camera's counter, not a description: an uncaptioned photo is named by its place and date.
      const date = media.takenAt ? `taken ${media.takenAt.replace('T', ' ')}` : media.caption ? null : `added ${media.createdAt.toISOString().slice(0, 10)}`;
      const caption = [media.caption || `Photo ${photos.length + 1}`, media.credit && `Photo: ${media.credit}`, date, marked.length ? `finding ${marked.join(', ')}` : null].filter(Boolean).join(' · ');
      photos.push({ file: derivativeFile(this.files.path(media.storageKey), 'display'), caption });
    }
    const pdf = await conditionReportPdf({
      organisationName: settings.organisationName,
      vesselName: vessel?.name ?? '',
      subjectLabel: subject.label,
      report,
      surveyorName: report.surveyor?.name ?? null,
      supersededById: await this.supersededBy(repos, id),
      findings,
      locate: await this.locator(repos, subject.compartmentId, findings),
      photos,
      hazards: subject.compartmentId === null ? [] : ((await repos.hazards.kindsFor([subject.compartmentId])).get(subject.compartmentId) ?? []),
    });
    return { pdf, fileName: `condition-report-${id}-rev${report.revision}.pdf` };
  }

  /**
   * The summary PDF for every role that reads the report: no findings, and only the photos a person
   * marked for public use and described (publishable), the report's own and then its subject's.
   */
  async summaryPdf(id: number): Promise<{ pdf: Buffer; fileName: string }> {
    const repos = this.store.repos;
    const report = await repos.conditionReports.findById(id);
    if (!report) throw new NotFoundError('The condition report');
    const subject = await this.subjectOf(repos, report.subjectType, report.subjectId);
    const { grade, ruleLine } = gradeFromFindings(await repos.conditionReports.findings(id));
    const candidates = [...(await repos.media.forOwner('condition-report', id)), ...(await repos.media.forOwner(report.subjectType, report.subjectId))];
    const photos: PdfPhoto[] = candidates
      .filter((m) => m.kind === 'photo' && m.publicUse && m.altText.trim().length > 0)
      .map((m) => ({ file: derivativeFile(this.files.path(m.storageKey), 'display'), caption: [m.caption, m.altText, m.credit && `Photo: ${m.credit}`].filter(Boolean).join(' · ') }));
    const pdf = await conditionSummaryPdf({
      organisationName: (await repos.settings.get()).organisationName,
      vesselName: (await repos.vessels.findById(report.vesselId))?.name ?? '',
      subjectLabel: subject.label,
      report,
      supersededById: await this.supersededBy(repos, id),
      rule: { grade, ruleLine },
      photos,
      hazards: subject.compartmentId === null ? [] : ((await repos.hazards.kindsFor([subject.compartmentId])).get(subject.compartmentId) ?? []),
    });
    return { pdf, fileName: `condition-summary-${id}-rev${report.revision}.pdf` };
  }

  /** A subject's reports and incidents over time, and its photos (its own and its reports', as the viewer may read them) by date. */
  async history(subjectType: 'artifact' | 'compartment', subjectId: number, viewer: Express.User) {
    const repos = this.store.repos;
    const subject = await this.subjectOf(repos, subjectType, subjectId).catch(() => {
      throw new NotFoundError(subjectType === 'artifact' ? 'The artifact' : 'The compartment');
    });
    const reports = await repos.conditionReports.forSubject(subjectType, subjectId);
    const incidents = await repos.incidents.forSubject(subjectType, subjectId);
    const supersededBy = new Map(reports.filter((r) => r.supersedesId && r.status === 'submitted').map((r) => [r.supersedesId!, r.id]));
    const entries = [
      ...reports.map((r) => ({ kind: 'report' as const, id: r.id, date: r.inspectedOn, grade: r.grade, status: r.status, revision: r.revision, supersededById: supersededBy.get(r.id) ?? null, summary: r.summary, findingCount: r.findingCount })),
      ...incidents.map((i) => ({ kind: 'incident' as const, id: i.id, date: i.foundOn, title: i.title, incidentKind: i.kind })),
    ].sort((a, b) => b.date.localeCompare(a.date) || b.id - a.id);
    const photos = [];
    const owned = readableMedia(viewer, [{ ownerType: subjectType, ownerId: subjectId, report: null as (typeof reports)[number] | null }, ...reports.map((r) => ({ ownerType: 'condition-report' as const, ownerId: r.id, report: r }))]);
    for (const owner of owned) {
      for (const media of await repos.media.forOwner(owner.ownerType, owner.ownerId)) {
        if (media.kind !== 'photo') continue;
        const date = media.takenAt?.slice(0, 10) ?? owner.report?.inspectedOn ?? media.createdAt.toISOString().slice(0, 10);
        photos.push({ mediaId: media.id, date, thumbUrl: mediaUrl(media.id, 'thumb'), displayUrl: mediaUrl(media.id, 'display'), caption: media.caption, altText: media.altText, reportId: owner.report?.id ?? null });
      }
    }
    photos.sort((a, b) => b.date.localeCompare(a.date) || b.mediaId - a.mediaId);
    return { subjectLabel: subject.label, entries, photos };
  }

  async list(query: ConditionReportsQuery, viewer: Express.User) {
    const repos = this.store.repos;
    const page = await repos.conditionReports.page(query, can(viewer.role, 'conditionReport', 'readFindings'));
    // One query each for the page's amendments and subject labels, not a few per row.
    const amendments = await repos.conditionReports.amendmentsOf(page.items.map((r) => r.id));
    const ofType = (type: 'artifact' | 'compartment') => page.items.filter((r) => r.subjectType === type).map((r) => r.subjectId);
    const artifactLabels = await repos.artifacts.labels(ofType('artifact'));
    const compartmentLabels = await repos.compartments.labels(ofType('compartment'));
    const items = page.items.map((report) => {
      const amendment = amendments.get(report.id);
      const label = (report.subjectType === 'artifact' ? artifactLabels.get(report.subjectId) : compartmentLabels.get(report.subjectId)?.label) ?? `${report.subjectType} ${report.subjectId}`;
      return presentReportSummary(report, label, amendment?.status === 'submitted' ? amendment.id : null, amendment?.id ?? null);
    });
    return { ...page, items };
  }

  get(id: number, viewer: Express.User) {
    return this.present(id, viewer);
  }

  async create(body: z.output<typeof createConditionReportBody>, viewer: Express.User, actor: Actor) {
    checkPercents(body);
    const report = await this.store.transaction(async (repos) => {
      const subject = await this.subjectOf(repos, body.subjectType, body.subjectId);
      const created = await repos.conditionReports.create({ ...body, vesselId: subject.vesselId, surveyorId: viewer.id, status: 'draft', revision: 1 });
      const saved = await this.refresh(repos, created);
      await recordAudit(repos, actor, { action: 'create', entityType: 'condition-report', entityId: saved.id, vesselId: saved.vesselId, summary: `Condition report on ${subject.label} started (${body.inspectedOn})` });
      return saved;
    });
    return this.present(report.id, viewer);
  }

  async update(id: number, body: UpdateConditionReportBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const report = await this.draftForChange(repos, id, body.version);
      const { version: _version, ...fields } = body;
      checkPercents(fields);
      const next = { ...report, ...fields };
      if (next.gradeOverride && !next.overrideReason?.trim()) {
        throw new UnprocessableError('Say why the grade differs from the one the rule gives.', { overrideReason: 'A reason is needed to override the grade.' });
      }
      if (!next.gradeOverride) fields.overrideReason = null;
      const changes = changesBetween(report, fields, REPORT_FIELDS);
      if (!changes) return;
      Object.assign(report, fields);
      await this.refresh(repos, report);
      await recordAudit(repos, actor, { action: 'update', entityType: 'condition-report', entityId: id, vesselId: report.vesselId, summary: `Condition report ${id} changed (${Object.keys(changes).join(', ')})`, changes });
    });
    return this.present(id, viewer);
  }

  async remove(id: number, actor: Actor) {
    const keys = await this.store.transaction(async (repos) => {
      const report = await this.draftForChange(repos, id, null);
      const photos = await repos.media.forOwner('condition-report', id);
      for (const photo of photos) await repos.media.remove(photo.id);
      await repos.search.remove('condition-report', id);
      await repos.conditionReports.remove(id);
      await recordAudit(repos, actor, { action: 'delete', entityType: 'condition-report', entityId: id, vesselId: report.vesselId, summary: `Draft condition report ${id} deleted${photos.length ? ` with its ${photos.length} photo${photos.length > 1 ? 's' : ''}` : ''}` });
      return photos.map((p) => p.storageKey);
    });
    // The files go once the rows are gone for good.
    for (const key of keys) await this.files.remove(key);
  }

  async submit(id: number, version: number, viewer: Express.User, actor: Actor) {
    const critical = await this.store.transaction(async (repos) => {
      const report = await this.draftForChange(repos, id, version);
      if (report.supersedesId) {
        const previous = await repos.conditionReports.findById(report.supersedesId);
        if (previous?.status !== 'submitted') throw new ConflictError('The report this one amends is not submitted.');
      }
      report.status = 'submitted';
      report.submittedAt = new Date();
      report.signedBy = viewer.name;
      await this.refresh(repos, report);
      await recordAudit(repos, actor, {
        action: 'submit',
        entityType: 'condition-report',
        entityId: id,
        vesselId: report.vesselId,
        summary: `Condition report ${id} submitted and signed by ${viewer.name}${report.supersedesId ? `, superseding report ${report.supersedesId}` : ''}`,
        changes: { status: { from: 'draft', to: 'submitted' } },
      });
      const findings = await repos.conditionReports.findings(id);
      const subject = await this.subjectOf(repos, report.subjectType, report.subjectId);
      return { subject, findings: findings.filter((f) => f.severity === 'critical') };
    });
    if (critical.findings.length) {
      const n = critical.findings.length;
      await this.alerts.tellKeepers(
        `Critical finding${n > 1 ? 's' : ''} on ${critical.subject.label}`,
        [
          `Condition report ${id} on ${critical.subject.label}, submitted by ${viewer.name}, records ${n === 1 ? 'a critical finding' : `${n} critical findings`}:`,
          ...critical.findings.map((f) => `${DAMAGE_TYPES[f.damageType].label} (${AGENT_LABELS[f.agent].toLowerCase()})${f.artifact ? ` on ${f.artifact.objectNumber} ${f.artifact.name}` : ''}: ${f.recommendedAction || 'no action recommended yet'}.`),
        ],
        `/app/condition/${id}`,
        viewer.id,
      );
    }
    return this.present(id, viewer);
  }

  /** Opens a draft report on an item with one finding, inside the caller's transaction (incidents). */
  async openDraftWithFinding(
    repos: Repositories,
    subject: { type: 'artifact' | 'compartment'; id: number },
    report: Pick<ConditionReportEntity, 'inspectedOn' | 'summary'>,
    finding: Pick<ConditionFindingEntity, 'agent' | 'damageType' | 'severity' | 'description'>,
    surveyorId: number | null,
  ): Promise<ConditionReportEntity> {
    const vessel = await this.subjectOf(repos, subject.type, subject.id);
    const created = await repos.conditionReports.create({ ...report, subjectType: subject.type, subjectId: subject.id, vesselId: vessel.vesselId, surveyorId, status: 'draft', revision: 1, method: 'visual' });
    await repos.conditionReports.createFinding({
      ...finding,
      reportId: created.id,
      artifactId: subject.type === 'artifact' ? subject.id : null,
      location: null,
      extentPercent: null,
      percentRusted: null,
      rustDistribution: null,
      rustGrade: null,
      recommendedAction: '',
      urgency: finding.severity === 'critical' ? 'immediate' : 'within-a-month',
      position: 0,
    });
    return this.refresh(repos, created);
  }

  /** A new draft revision with the same fields and findings, linked to the submitted report it will supersede. */
  async amend(id: number, viewer: Express.User, actor: Actor) {
    const created = await this.store.transaction(async (repos) => {
      const report = await repos.conditionReports.findById(id);
      if (!report) throw new NotFoundError('The condition report');
      if (report.status !== 'submitted') throw new ConflictError('A draft is changed directly; only a submitted report is amended.');
      const existing = await repos.conditionReports.amendmentOf(id);
      if (existing) throw new ConflictError(`This report is already amended by report ${existing.id}${existing.status === 'draft' ? ' (a draft)' : ''}.`, { amendment: String(existing.id) });
      const copy = await repos.conditionReports.create({
        vesselId: report.vesselId,
        subjectType: report.subjectType,
        subjectId: report.subjectId,
        revision: report.revision + 1,
        supersedesId: report.id,
        status: 'draft',
        inspectedOn: report.inspectedOn,
        surveyorId: viewer.id,
        method: report.method,
        temperatureC: report.temperatureC,
        relativeHumidity: report.relativeHumidity,
        summary: report.summary,
        gradeOverride: report.gradeOverride,
        overrideReason: report.overrideReason,
      });
      for (const finding of await repos.conditionReports.findings(id)) {
        const { id: _id, report: _r, artifact: _a, createdAt: _c, updatedAt: _u, version: _v, ...fields } = finding;
        await repos.conditionReports.createFinding({ ...fields, reportId: copy.id });
      }
      const saved = await this.refresh(repos, copy);
      await recordAudit(repos, actor, { action: 'amend', entityType: 'condition-report', entityId: saved.id, vesselId: saved.vesselId, summary: `Condition report ${id} amended: revision ${saved.revision} is report ${saved.id} (a draft)` });
      return saved;
    });
    return this.present(created.id, viewer);
  }

  /** Checks a finding against its report: scope, agent and damage type, rust inputs, location. */
  private async checkFinding(repos: Repositories, report: ConditionReportEntity, f: Pick<ConditionFindingEntity, 'artifactId' | 'agent' | 'damageType' | 'percentRusted' | 'rustDistribution' | 'location' | 'extentPercent'>) {
    checkPercents(f);
    if (f.artifactId !== null) {
      const artifact = await repos.artifacts.findById(f.artifactId);
      const inScope = artifact && (report.subjectType === 'artifact' ? artifact.id === report.subjectId : artifact.compartmentId === report.subjectId);
      if (!inScope) {
        const scope = report.subjectType === 'artifact' ? 'the artifact this report is on' : 'an artifact in the surveyed compartment';
        throw new UnprocessableError(`A finding may concern only ${scope}.`, { artifactId: 'Not in the scope of this report.' });
      }
    }
    if (!(DAMAGE_TYPES[f.damageType].agents as readonly string[]).includes(f.agent)) {
      throw new UnprocessableError(`${DAMAGE_TYPES[f.damageType].label} does not come from ${AGENT_LABELS[f.agent].toLowerCase()} in our list.`, { damageType: 'Not a damage of this agent.' });
    }
    const rusty = RUST_DAMAGE_TYPES.includes(f.damageType);
    if (!rusty && (f.percentRusted !== null || f.rustDistribution !== null)) {
      throw new UnprocessableError('Percent rusted and its distribution are given for coating failure only.', { percentRusted: 'Only for coating failure.' });
    }
    if (f.location?.on === 'photo') {
      const media = await repos.media.findById(f.location.mediaId);
      const ofSubject = media?.ownerType === report.subjectType && media.ownerId === report.subjectId;
      // An amendment may point at the photos of the revisions it supersedes.
      const lineage: number[] = [];
      for (let r: ConditionReportEntity | null = report; r; r = r.supersedesId ? await repos.conditionReports.findById(r.supersedesId) : null) lineage.push(r.id);
      const ofReport = media?.ownerType === 'condition-report' && lineage.includes(media.ownerId);
      if (!media || media.kind !== 'photo' || !(ofSubject || ofReport)) {
        throw new UnprocessableError('Mark the finding on a photo of this report or of what it surveys.', { location: 'Not a photo of this report or its subject.' });
      }
    }
    if (f.location?.on === 'plan') {
      const compartmentId = report.subjectType === 'compartment' ? report.subjectId : (await repos.artifacts.findById(report.subjectId))?.compartmentId;
      const deck = compartmentId ? (await repos.compartments.findById(compartmentId))?.deck : null;
      const [x, y] = f.location.point;
      if (!deck?.planWidth || !deck.planHeight || x < 0 || y < 0 || x > deck.planWidth || y > deck.planHeight) {
        throw new UnprocessableError('The point is not on the deck plan of what this report surveys.', { location: 'Off the plan.' });
      }
    }
  }

  private static withRust<T extends Pick<ConditionFindingEntity, 'percentRusted' | 'rustDistribution'>>(f: T): T & { rustGrade: string | null } {
    return { ...f, rustGrade: f.percentRusted === null ? null : rustGrade(f.percentRusted, f.rustDistribution).label };
  }

  async addFinding(reportId: number, body: z.output<typeof createFindingBody>, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const report = await this.draftForChange(repos, reportId, null);
      const fields = { ...body, artifactId: body.artifactId ?? (report.subjectType === 'artifact' ? report.subjectId : null) };
      await this.checkFinding(repos, report, fields);
      const position = (await repos.conditionReports.findings(reportId)).length;
      await repos.conditionReports.createFinding({ ...ConditionReportService.withRust(fields), reportId, position });
      await this.refresh(repos, report);
      await recordAudit(repos, actor, { action: 'update', entityType: 'condition-report', entityId: reportId, vesselId: report.vesselId, summary: `Finding added to condition report ${reportId}: ${DAMAGE_TYPES[body.damageType].label}, ${body.severity}`, changes: { findings: { from: position, to: position + 1 } } });
    });
    return this.present(reportId, viewer);
  }

  async updateFinding(reportId: number, findingId: number, body: UpdateFindingBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const report = await this.draftForChange(repos, reportId, null);
      const finding = await repos.conditionReports.findFinding(findingId);
      if (!finding || finding.reportId !== reportId) throw new NotFoundError('The finding');
      if (finding.version !== body.version) throw new ConflictError('Someone else changed this finding since you opened it. Reload to see their changes; yours are not saved.', { version: `current version is ${finding.version}` });
      const { version: _version, ...fields } = body;
      const next = ConditionReportService.withRust({ ...finding, ...fields });
      await this.checkFinding(repos, report, next);
      const changes = changesBetween(finding, next, [...FINDING_FIELDS, 'rustGrade']);
      if (!changes) return;
      Object.assign(finding, next);
      finding.artifact = undefined as never;
      await repos.conditionReports.saveFinding(finding);
      await this.refresh(repos, report);
      await recordAudit(repos, actor, { action: 'update', entityType: 'condition-report', entityId: reportId, vesselId: report.vesselId, summary: `Finding ${findingId} of condition report ${reportId} changed (${Object.keys(changes).join(', ')})`, changes });
    });
    return this.present(reportId, viewer);
  }

  async removeFinding(reportId: number, findingId: number, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const report = await this.draftForChange(repos, reportId, null);
      const finding = await repos.conditionReports.findFinding(findingId);
      if (!finding || finding.reportId !== reportId) throw new NotFoundError('The finding');
      await repos.conditionReports.removeFinding(findingId);
      await this.refresh(repos, report);
      await recordAudit(repos, actor, { action: 'update', entityType: 'condition-report', entityId: reportId, vesselId: report.vesselId, summary: `Finding ${findingId} removed from condition report ${reportId}`, changes: { findings: { from: 'present', to: 'removed' } } });
    });
    return this.present(reportId, viewer);
  }
}
