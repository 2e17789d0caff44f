import { can, canReadMediaOf } from '../../shared/permissions.js';
import type { z } from 'zod';
import type { createTreatmentBody, UpdateTreatmentBody } from '../../shared/schemas/treatments.js';
import type { TreatmentEntity } from '../db/entities/treatment.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { NotFoundError, UnprocessableError } from '../http/errors.js';
import { presentMedia } from '../presenters/media.presenter.js';
import { presentTreatment } from '../presenters/treatment.presenter.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import { checkFindings, findingLabels } from './repair-project-links.js';
import { staleEditError } from './stale-edit.js';

const ENTITY = 'treatment';
const FIELDS: (keyof TreatmentEntity & string)[] = ['performedOn', 'performedById', 'contractorName', 'method', 'materials'];
const WHO = 'Say who did the work: a member of staff or a named contractor, not both.';

/**
 * Work done under a repair project. A treatment records which findings it addresses; the findings
 * themselves are never edited — the next condition report of the subject records the new state.
 */
export class TreatmentService {
  constructor(private readonly store: Store) {}

  private async checkPerformer(repos: Repositories, performedById: number | null, contractorName: string) {
    if ((performedById === null) === (contractorName === '')) throw new UnprocessableError(WHO, { performedById: WHO, contractorName: WHO });
    if (performedById !== null) {
      const user = await repos.users.findById(performedById);
      if (!user || user.status !== 'active') throw new UnprocessableError(`User ${performedById} is not an active member of staff.`, { performedById: 'No such active user.' });
    }
  }

  private async present(treatments: TreatmentEntity[], viewer: Express.User) {
    const repos = this.store.repos;
    const findingIds = await repos.treatments.findingIdsOf(treatments.map((t) => t.id));
    const rows = await repos.treatments.findingsWithReports([...findingIds.values()].flat());
    const labels = await findingLabels(repos, rows);
    const photos = async (ownerType: 'treatment-before' | 'treatment-after', id: number) =>
      canReadMediaOf(viewer.role, ownerType) ? (await repos.media.forOwner(ownerType, id)).map((m) => presentMedia(m, viewer)) : [];
    const out = [];
    for (const t of treatments) {
      const ids = findingIds.get(t.id) ?? [];
      // What a finding says is for the roles that read findings; the others learn how many there are.
      const findings = can(viewer.role, 'conditionReport', 'readFindings') ? ids.map((id) => ({ id, label: labels.get(id)?.label ?? `Finding ${id}` })) : [];
      out.push(presentTreatment(t, findings, ids.length, { before: await photos('treatment-before', t.id), after: await photos('treatment-after', t.id) }, viewer));
    }
    return out;
  }

  async list(projectId: number, viewer: Express.User) {
    if (!(await this.store.repos.repairProjects.findById(projectId))) throw new NotFoundError('The repair project');
    return this.present(await this.store.repos.treatments.forProject(projectId), viewer);
  }

  async get(id: number, viewer: Express.User) {
    const treatment = await this.store.repos.treatments.findById(id);
    if (!treatment) throw new NotFoundError('The treatment');
    return (await this.present([treatment], viewer))[0]!;
  }

  async create(projectId: number, body: z.output<typeof createTreatmentBody>, viewer: Express.User, actor: Actor) {
    const saved = await this.store.transaction(async (repos) => {
      const project = await repos.repairProjects.findById(projectId);
      if (!project) throw new NotFoundError('The repair project');
      if (project.status === 'cancelled') throw new UnprocessableError('This project is cancelled; record no treatments under it.');
      await this.checkPerformer(repos, body.performedById, body.contractorName);
      await checkFindings(repos, project.vesselId, body.findingIds, 'findingIds');
      const treatment = await repos.treatments.create({
        vesselId: project.vesselId,
        projectId,
        performedOn: body.performedOn,
        performedById: body.performedById,
        contractorName: body.contractorName,
        method: body.method,
        materials: body.materials,
      });
      await repos.treatments.setFindings(treatment.id, [...new Set(body.findingIds)]);
      await recordAudit(repos, actor, { action: 'create', entityType: ENTITY, entityId: treatment.id, vesselId: project.vesselId, summary: `Treatment of ${body.performedOn} recorded under ${project.title}` });
      return treatment;
    });
    return this.get(saved.id, viewer);
  }

  async update(id: number, body: UpdateTreatmentBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const treatment = await repos.treatments.findById(id);
      if (!treatment) throw new NotFoundError('The treatment');
      if (treatment.version !== body.version) throw await staleEditError(repos, ENTITY, id, 'this treatment', treatment.version, body.version);
      const { version: _v, findingIds, ...fields } = body;
      const performedById = fields.performedById !== undefined ? fields.performedById : treatment.performedById;
      const contractorName = fields.contractorName ?? treatment.contractorName;
      await this.checkPerformer(repos, performedById, contractorName);
      let changes = changesBetween(treatment, fields, FIELDS);
      if (findingIds) {
        await checkFindings(repos, treatment.vesselId, findingIds, 'findingIds');
        const from = (await repos.treatments.findingIdsOf([id])).get(id) ?? [];
        const to = [...new Set(findingIds)];
        if ([...from].sort().join() !== [...to].sort().join()) {
          await repos.treatments.setFindings(id, to);
          changes = { ...(changes ?? {}), findingIds: { from, to } };
        }
      }
      if (!changes) return;
      const before = treatment.version;
      Object.assign(treatment, fields);
      if (fields.performedById !== undefined) delete (treatment as Partial<TreatmentEntity>).performedBy; // a loaded relation would win over the new id on save
      await repos.treatments.save(treatment);
      if ((await repos.treatments.findById(id))!.version === before) await repos.treatments.bumpVersion(id);
      await recordAudit(repos, actor, { action: 'update', entityType: ENTITY, entityId: id, vesselId: treatment.vesselId, summary: `Treatment ${id} changed (${Object.keys(changes).join(', ')})`, changes });
    });
    return this.get(id, viewer);
  }
}
