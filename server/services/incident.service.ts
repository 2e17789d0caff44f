import { impliedFinding, linesAbout } from '../../shared/calc/incident-finding.js';
import { DEFAULT_CLOSURE_NOTE, INCIDENT_KIND_LABELS, type IncidentsQuery, type UpdateIncidentBody, type createIncidentBody } from '../../shared/schemas/incidents.js';
import type { Incident } from '../../shared/schemas/incidents.js';
import type { z } from 'zod';
import type { IncidentSubjectEntity } from '../db/entities/incident-subject.entity.js';
import type { IncidentEntity } from '../db/entities/incident.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { latestPastDay } from '../../shared/calc/days.js';
import { can } from '../../shared/permissions.js';
import { NotFoundError, UnprocessableError } from '../http/errors.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import type { ConditionAlerts } from './condition-alerts.js';
import type { ConditionReportService } from './condition-report.service.js';
import { staleEditError } from './stale-edit.js';
import { mailDate } from '../mail/dates.js';

/** The finding an incident writes on each item it affected. */

/** Found on: not after tomorrow (UTC, whatever the time zone); it happened on or before it was found. */
function checkDates(foundOn: string, occurredOn: string | null) {
  if (foundOn > latestPastDay()) throw new UnprocessableError('An incident cannot be found in the future.', { foundOn: 'This date is in the future.' });
  if (occurredOn && occurredOn > foundOn) throw new UnprocessableError('It cannot have happened after it was found.', { occurredOn: 'After the day it was found.' });
}

/**
 * Incidents: what happened, what it affected and what was done. Logging one can close affected
 * compartments to visitors, opens a draft condition report with a finding on every affected item,
 * and tells the curators and the conservators by e-mail.
 */
export class IncidentService {
  constructor(private readonly store: Store, private readonly reports: ConditionReportService, private readonly alerts: ConditionAlerts) {}

  /** Incidents with what they affected; the labels of all of them come in two queries. */
  private async present(incidents: IncidentEntity[], viewer: Express.User): Promise<Incident[]> {
    const repos = this.store.repos;
    const subjects = await repos.incidents.subjectsOf(incidents.map((i) => i.id));
    const artifactLabels = await repos.artifacts.labels(subjects.filter((s) => s.subjectType === 'artifact').map((s) => s.subjectId));
    const compartmentLabels = await repos.compartments.labels(subjects.filter((s) => s.subjectType === 'compartment').map((s) => s.subjectId));
    return incidents.map((incident) => this.presentOne(incident, subjects, artifactLabels, compartmentLabels, viewer));
  }

  private presentOne(incident: IncidentEntity, subjects: IncidentSubjectEntity[], artifactLabels: Map<number, string>, compartmentLabels: Map<number, { label: string }>, viewer: Express.User): Incident {
    const mine = subjects.filter((x) => x.incidentId === incident.id);
    const artifacts = mine.filter((s) => s.subjectType === 'artifact').map((s) => ({ id: s.subjectId, label: artifactLabels.get(s.subjectId) ?? `Artifact ${s.subjectId}` }));
    const compartments = mine.filter((s) => s.subjectType === 'compartment').map((s) => ({ id: s.subjectId, label: compartmentLabels.get(s.subjectId)?.label ?? `Compartment ${s.subjectId}` }));
    return {
      id: incident.id,
      vesselId: incident.vesselId,
      kind: incident.kind,
      title: incident.title,
      foundOn: incident.foundOn,
      occurredOn: incident.occurredOn,
      description: incident.description,
      reportedTo: incident.reportedTo,
      policeReference: incident.policeReference,
      actionsTaken: incident.actionsTaken,
      artifacts,
      compartments,
      closedCompartmentIds: incident.closedCompartmentIds,
      publicNote: incident.publicNote,
      reportIds: incident.reportIds,
      loggedBy: incident.loggedBy ? { id: incident.loggedBy.id, name: incident.loggedBy.name } : null,
      createdAt: incident.createdAt.toISOString(),
      version: incident.version,
      abilities: { update: can(viewer.role, 'incident', 'update') },
    };
  }

  async list(query: IncidentsQuery, viewer: Express.User) {
    const page = await this.store.repos.incidents.page(query);
    return { ...page, items: await this.present(page.items, viewer) };
  }

  async get(id: number, viewer: Express.User) {
    const incident = await this.store.repos.incidents.findById(id);
    if (!incident) throw new NotFoundError('The incident');
    return (await this.present([incident], viewer))[0]!;
  }

  private async checkSubjects(repos: Repositories, vesselId: number, artifactIds: number[], compartmentIds: number[]) {
    for (const id of artifactIds) {
      const artifact = await repos.artifacts.findById(id);
      if (!artifact || artifact.vesselId !== vesselId) throw new UnprocessableError(`Artifact ${id} is not in the collection of this vessel.`, { artifactIds: `Not an artifact of this vessel: ${id}.` });
    }
    for (const id of compartmentIds) {
      const compartment = await repos.compartments.findById(id);
      if (!compartment || compartment.vesselId !== vesselId) throw new UnprocessableError(`Compartment ${id} is not on this vessel.`, { compartmentIds: `Not a compartment of this vessel: ${id}.` });
    }
  }

  private async artifactNames(repos: Repositories, id: number): Promise<string[]> {
    const artifact = await repos.artifacts.findById(id);
    return artifact ? [artifact.objectNumber, artifact.name] : [];
  }

  private async compartmentNames(repos: Repositories, id: number): Promise<string[]> {
    const compartment = await repos.compartments.findById(id);
    return compartment ? [compartment.designation, compartment.name] : [];
  }

  async create(body: z.output<typeof createIncidentBody>, viewer: Express.User, actor: Actor) {
    const artifactIds = [...new Set(body.artifactIds)];
    const compartmentIds = [...new Set(body.compartmentIds)];
    const closing = [...new Set(body.closeCompartmentIds)];
    checkDates(body.foundOn, body.occurredOn);
    const stray = closing.filter((id) => !compartmentIds.includes(id));
    if (stray.length) throw new UnprocessableError('Only an affected compartment can be closed: add it to the affected compartments first.', { closeCompartmentIds: 'Not among the affected compartments.' });
    const saved = await this.store.transaction(async (repos) => {
      const vessel = await repos.vessels.findById(body.vesselId);
      if (!vessel) throw new UnprocessableError('Choose a vessel.', { vesselId: 'No such vessel.' });
      await this.checkSubjects(repos, vessel.id, artifactIds, compartmentIds);
      const { artifactIds: _a, compartmentIds: _c, closeCompartmentIds: _x, severity, ...fields } = body;
      const publicNote = fields.publicNote || (closing.length ? DEFAULT_CLOSURE_NOTE : '');
      const incident = await repos.incidents.create({ ...fields, publicNote, closedCompartmentIds: [], reportIds: [], loggedById: viewer.id });
      const reportIds: number[] = [];
      for (const [type, ids] of [['artifact', artifactIds], ['compartment', compartmentIds]] as const) {
        for (const id of ids) {
          // each item's finding takes the lines of the text that name it, and the damage they imply
          const names = type === 'artifact' ? await this.artifactNames(repos, id) : await this.compartmentNames(repos, id);
          const lines = linesAbout(body.description, names);
          const about = lines ?? body.description;
          // the item's own lines decide its damage; without any, the title and the whole text
          const implied = lines ? impliedFinding(body.kind, lines) : impliedFinding(body.kind, `${body.title}. ${body.description}`);
          const finding = { ...implied, severity, description: `${INCIDENT_KIND_LABELS[body.kind]} (incident ${incident.id}): ${body.title}. ${about}`.trim() };
          await repos.incidents.link(incident.id, type, id);
          // a docent's incident opens drafts with no surveyor: a conservator completes them
          const surveyorId = can(viewer.role, 'conditionReport', 'create') ? viewer.id : null;
          const report = await this.reports.openDraftWithFinding(repos, { type, id }, { inspectedOn: body.foundOn, summary: `Opened by incident ${incident.id}: ${body.title}` }, finding, surveyorId);
          reportIds.push(report.id);
        }
      }
      for (const id of closing) {
        const compartment = (await repos.compartments.findById(id))!;
        if (compartment.accessStatus === 'staff-only' || compartment.accessStatus === 'sealed') continue;
        const from = compartment.accessStatus;
        compartment.accessStatus = 'staff-only';
        await repos.compartments.save(compartment);
        incident.closedCompartmentIds.push(id);
        await recordAudit(repos, actor, {
          action: 'update',
          entityType: 'compartment',
          entityId: id,
          vesselId: vessel.id,
          summary: `Compartment ${compartment.designation} closed to visitors after incident ${incident.id}`,
          changes: { accessStatus: { from, to: 'staff-only' } },
        });
      }
      incident.reportIds = reportIds;
      const result = await repos.incidents.save(incident);
      await recordAudit(repos, actor, {
        action: 'create',
        entityType: 'incident',
        entityId: incident.id,
        vesselId: vessel.id,
        summary: `${INCIDENT_KIND_LABELS[body.kind]} logged: ${body.title}`,
      });
      return result;
    });
    const presented = await this.get(saved.id, viewer);
    const affected = [...presented.artifacts, ...presented.compartments].map((s) => s.label);
    await this.alerts.tellKeepers(
      `${INCIDENT_KIND_LABELS[presented.kind]}: ${presented.title}`,
      [
        `${viewer.name} logged an incident found on ${mailDate(presented.foundOn)}${presented.occurredOn ? ` (it happened on ${mailDate(presented.occurredOn)})` : ''}: ${presented.title}.`,
        affected.length ? `Affected: ${affected.join('; ')}.` : 'No artifact or compartment is named yet.',
        ...(presented.closedCompartmentIds.length ? [`Closed to visitors: ${presented.compartments.filter((c) => presented.closedCompartmentIds.includes(c.id)).map((c) => c.label).join('; ')}.`] : []),
        ...(body.severity === 'critical' ? ['The damage is recorded as critical.'] : []),
        ...(presented.policeReference ? [`Police reference: ${presented.policeReference}.`] : []),
      ],
      `/app/incidents/${presented.id}`,
      viewer.id,
    );
    return presented;
  }

  async update(id: number, body: UpdateIncidentBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const incident = await repos.incidents.findById(id);
      if (!incident) throw new NotFoundError('The incident');
      if (incident.version !== body.version) throw await staleEditError(repos, 'incident', id, 'this incident', incident.version, body.version);
      const { version: _v, ...fields } = body;
      if (fields.occurredOn !== undefined) checkDates(incident.foundOn, fields.occurredOn);
      const changes = changesBetween(incident, fields, ['title', 'occurredOn', 'description', 'reportedTo', 'policeReference', 'actionsTaken', 'publicNote']);
      if (!changes) return;
      Object.assign(incident, fields);
      await repos.incidents.save(incident);
      await recordAudit(repos, actor, { action: 'update', entityType: 'incident', entityId: id, vesselId: incident.vesselId, summary: `Incident ${id} changed (${Object.keys(changes).join(', ')})`, changes });
    });
    return this.get(id, viewer);
  }
}
