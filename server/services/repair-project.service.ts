import type { z } from 'zod';
import { estimateTotals } from '../../shared/calc/estimate.js';
import { can } from '../../shared/permissions.js';
import { cautionsFor } from '../../shared/schemas/hazard-cautions.js';
import { HAZARD_KINDS, type HazardKind } from '../../shared/schemas/hazards.js';
import {
  ESTIMATE_TOTAL_CENTS_MAX,
  REPAIR_PROJECT_STATUS_LABELS,
  statusesAfter,
  type changeRepairProjectStatusBody,
  type createRepairProjectBody,
  type EstimateLineBody,
  type RepairProjectsQuery,
  type UpdateRepairProjectBody,
} from '../../shared/schemas/repair-projects.js';
import type { RepairProjectEntity } from '../db/entities/repair-project.entity.js';
import type { LinkKind, ProjectLinks } from '../db/repositories/repair-project.repository.js';
import type { Repositories, Store } from '../db/store.js';
import { ConflictError, NotFoundError, UnprocessableError } from '../http/errors.js';
import { mayMoveTo, presentRepairProject, presentRepairProjectSummary, type RepairProjectDetails } from '../presenters/repair-project.presenter.js';
import { renderRichText } from '../richtext/render.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import { checkLinks, findingLabels, findingOutcomes } from './repair-project-links.js';
import { staleEditError } from './stale-edit.js';

const ENTITY = 'repair-project';
const FIELDS: (keyof RepairProjectEntity & string)[] = ['title', 'slug', 'scopeText', 'contingencyBasisPoints', 'estimateCents', 'contractorNotes', 'permitNotes', 'hotWork', 'asbestos', 'leadPaint'];
const LINK_KINDS: LinkKind[] = ['findingIds', 'riskIds', 'artifactIds', 'compartmentIds'];

/** The stored total (with contingency) of the lines; 422 when it is past what we keep. */
function totalOf(lines: EstimateLineBody[], contingencyBasisPoints: number): number {
  const { totalCents } = estimateTotals(lines, contingencyBasisPoints);
  if (totalCents > ESTIMATE_TOTAL_CENTS_MAX) throw new UnprocessableError('The estimate total may be at most 1,000,000,000.00; split the work into several projects.', { lines: 'Total too large.' });
  return totalCents;
}

const lineWords = (lines: EstimateLineBody[]) => lines.map((l) => `${l.description}: ${l.quantityMilli / 1000} ${l.unit} × ${l.unitCostCents}¢`);

/** Repair projects: their scope, estimate, links and status, each change dated, by whom, audited. */
export class RepairProjectService {
  constructor(private readonly store: Store) {}

  private async load(repos: Repositories, id: number) {
    const project = await repos.repairProjects.findById(id);
    if (!project) throw new NotFoundError('The repair project');
    return project;
  }

  private async slugFree(repos: Repositories, vesselId: number, slug: string, exceptId?: number) {
    const other = await repos.repairProjects.findBySlug(vesselId, slug);
    if (other && other.id !== exceptId) throw new ConflictError(`Another project of this vessel already uses the slug “${slug}”.`, { slug: 'Already used on this vessel.' });
  }

  private async details(project: RepairProjectEntity, viewer: Express.User): Promise<RepairProjectDetails> {
    const repos = this.store.repos;
    const links = await repos.repairProjects.links(project.id);
    const findingsVisible = can(viewer.role, 'conditionReport', 'readFindings');
    let findings: RepairProjectDetails['findings'] = [];
    let outcomes: RepairProjectDetails['findingOutcomes'] = [];
    if (findingsVisible) {
      const rows = await repos.treatments.findingsWithReports(links.findingIds);
      const labels = await findingLabels(repos, rows);
      findings = links.findingIds.filter((id) => labels.has(id)).map((id) => ({ id, reportId: rows.find((f) => f.id === id)!.reportId, label: labels.get(id)!.label }));
      const treatments = await repos.treatments.forProject(project.id);
      const treatedFindings = await repos.treatments.findingIdsOf(treatments.map((t) => t.id));
      const treatedOn = new Map<number, string>();
      for (const t of treatments) {
        for (const findingId of treatedFindings.get(t.id) ?? []) {
          if ((treatedOn.get(findingId) ?? '') < t.performedOn) treatedOn.set(findingId, t.performedOn);
        }
      }
      outcomes = await findingOutcomes(repos, [...new Set([...links.findingIds, ...treatedOn.keys()])], treatedOn);
    }
    const risks = [];
    for (const id of links.riskIds) {
      const risk = await repos.risks.findById(id);
      if (risk) risks.push({ id, label: risk.statement });
    }
    const artifactLabels = await repos.artifacts.labels(links.artifactIds);
    const compartmentLabels = await repos.compartments.labels(links.compartmentIds);
    const spaces = new Set(links.compartmentIds);
    for (const id of links.artifactIds) {
      const artifact = await repos.artifacts.findById(id);
      if (artifact?.compartmentId) spaces.add(artifact.compartmentId);
    }
    const kinds = new Set<HazardKind>([...(await repos.hazards.kindsFor([...spaces])).values()].flat());
    return {
      lines: await repos.repairProjects.lines(project.id),
      changes: await repos.repairProjects.statusChanges(project.id),
      findings,
      findingCount: links.findingIds.length,
      findingsVisible,
      findingOutcomes: outcomes,
      risks,
      artifacts: links.artifactIds.map((id) => ({ id, label: artifactLabels.get(id) ?? `Artifact ${id}` })),
      compartments: links.compartmentIds.map((id) => ({ id, label: compartmentLabels.get(id)?.label ?? `Compartment ${id}`, deckId: compartmentLabels.get(id)?.deckId ?? 0 })),
      spaceCautions: cautionsFor(HAZARD_KINDS.filter((k) => kinds.has(k))),
    };
  }

  async list(vesselId: number, query: RepairProjectsQuery) {
    if (!(await this.store.repos.vessels.findById(vesselId))) throw new NotFoundError('The vessel');
    const page = await this.store.repos.repairProjects.page(vesselId, query);
    return { ...page, items: page.items.map(presentRepairProjectSummary) };
  }

  async get(id: number, viewer: Express.User) {
    const project = await this.load(this.store.repos, id);
    return presentRepairProject(project, await this.details(project, viewer), viewer);
  }

  async create(vesselId: number, body: z.output<typeof createRepairProjectBody>, viewer: Express.User, actor: Actor) {
    const scope = renderRichText(body.scope, 'scope');
    const estimateCents = totalOf(body.lines, body.contingencyBasisPoints);
    const saved = await this.store.transaction(async (repos) => {
      if (!(await repos.vessels.findById(vesselId))) throw new NotFoundError('The vessel');
      await this.slugFree(repos, vesselId, body.slug);
      await checkLinks(repos, vesselId, body);
      const project = await repos.repairProjects.create({
        vesselId,
        title: body.title,
        slug: body.slug,
        status: 'proposed',
        scope: body.scope,
        scopeHtml: scope.html,
        scopeText: scope.text,
        estimateCents,
        contingencyBasisPoints: body.contingencyBasisPoints,
        contractorNotes: body.contractorNotes,
        permitNotes: body.permitNotes,
        hotWork: body.hotWork,
        asbestos: body.asbestos,
        leadPaint: body.leadPaint,
        createdById: actor.id,
      });
      await repos.repairProjects.setLines(project.id, body.lines);
      for (const kind of LINK_KINDS) await repos.repairProjects.setLinks(project.id, kind, [...new Set(body[kind])]);
      await repos.repairProjects.addStatusChange({ projectId: project.id, fromStatus: null, toStatus: 'proposed', at: new Date(), byUserId: actor.id, note: '' });
      await recordAudit(repos, actor, { action: 'create', entityType: ENTITY, entityId: project.id, vesselId, summary: `Repair project proposed: ${project.title} (estimate ${estimateCents}¢)` });
      return project;
    });
    return this.get(saved.id, viewer);
  }

  async update(id: number, body: UpdateRepairProjectBody, viewer: Express.User, actor: Actor) {
    const scope = body.scope ? renderRichText(body.scope, 'scope') : null;
    await this.store.transaction(async (repos) => {
      const project = await this.load(repos, id);
      if (project.version !== body.version) throw await staleEditError(repos, ENTITY, id, 'this project', project.version, body.version);
      if (project.status === 'complete' || project.status === 'cancelled') throw new UnprocessableError(`This project is ${project.status}; it no longer changes.`);
      if (body.slug !== undefined) await this.slugFree(repos, project.vesselId, body.slug, id);
      const links: Partial<ProjectLinks> = {};
      for (const kind of LINK_KINDS) if (body[kind]) links[kind] = [...new Set(body[kind])];
      await checkLinks(repos, project.vesselId, links);
      const currentLines = await repos.repairProjects.lines(id);
      const lines = body.lines ?? currentLines;
      const contingency = body.contingencyBasisPoints ?? project.contingencyBasisPoints;
      const next: Partial<RepairProjectEntity> = {
        ...(body.title !== undefined && { title: body.title }),
        ...(body.slug !== undefined && { slug: body.slug }),
        ...(scope && { scope: body.scope!, scopeHtml: scope.html, scopeText: scope.text }),
        ...(body.contingencyBasisPoints !== undefined && { contingencyBasisPoints: body.contingencyBasisPoints }),
        ...(body.contractorNotes !== undefined && { contractorNotes: body.contractorNotes }),
        ...(body.permitNotes !== undefined && { permitNotes: body.permitNotes }),
        ...(body.hotWork !== undefined && { hotWork: body.hotWork }),
        ...(body.asbestos !== undefined && { asbestos: body.asbestos }),
        ...(body.leadPaint !== undefined && { leadPaint: body.leadPaint }),
        estimateCents: totalOf(lines, contingency),
      };
      let changes = changesBetween(project, next, FIELDS);
      if (body.lines) {
        const from = lineWords(currentLines);
        const to = lineWords(body.lines);
        if (from.join('\n') !== to.join('\n')) {
          await repos.repairProjects.setLines(id, body.lines);
          changes = { ...(changes ?? {}), lines: { from, to } };
        }
      }
      const current = await repos.repairProjects.links(id);
      for (const kind of LINK_KINDS) {
        const to = links[kind];
        if (!to) continue;
        const from = current[kind];
        if ([...from].sort().join() === [...to].sort().join()) continue;
        await repos.repairProjects.setLinks(id, kind, to);
        changes = { ...(changes ?? {}), [kind]: { from, to } };
      }
      if (!changes) return;
      const before = project.version;
      Object.assign(project, next);
      await repos.repairProjects.save(project);
      if ((await repos.repairProjects.findById(id))!.version === before) await repos.repairProjects.bumpVersion(id);
      await recordAudit(repos, actor, { action: 'update', entityType: ENTITY, entityId: id, vesselId: project.vesselId, summary: `Repair project ${project.title} changed (${Object.keys(changes).join(', ')})`, changes });
    });
    return this.get(id, viewer);
  }

  /** One step along proposed → approved → fundraising → funded → underway → complete, or cancelled before complete. */
  async changeStatus(id: number, body: z.output<typeof changeRepairProjectStatusBody>, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const project = await this.load(repos, id);
      if (project.version !== body.version) throw await staleEditError(repos, ENTITY, id, 'this project', project.version, body.version);
      const from = project.status;
      const allowed = statusesAfter(from);
      const label = (s: keyof typeof REPAIR_PROJECT_STATUS_LABELS) => REPAIR_PROJECT_STATUS_LABELS[s].toLowerCase();
      if (!allowed.includes(body.status)) {
        const options = allowed.length ? `it can move to ${allowed.map(label).join(' or ')}` : 'its status no longer changes';
        throw new UnprocessableError(`A ${label(from)} project cannot become ${label(body.status)}: ${options}.`, { status: `Not allowed from ${label(from)}.` });
      }
      if (!mayMoveTo(viewer.role, body.status)) throw new UnprocessableError('Approving a repair project is for a curator.', { status: 'Only a curator approves.' });
      project.status = body.status;
      await repos.repairProjects.save(project);
      await repos.repairProjects.addStatusChange({ projectId: id, fromStatus: from, toStatus: body.status, at: new Date(), byUserId: actor.id, note: body.note });
      await recordAudit(repos, actor, {
        action: 'update',
        entityType: ENTITY,
        entityId: id,
        vesselId: project.vesselId,
        summary: `Repair project ${project.title}: ${label(from)} → ${label(body.status)}${body.note ? ` (${body.note})` : ''}`,
        changes: { status: { from, to: body.status } },
      });
    });
    return this.get(id, viewer);
  }
}
