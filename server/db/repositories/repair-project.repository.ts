import { In, type EntityManager } from 'typeorm';
import type { RepairProjectsQuery } from '../../../shared/schemas/repair-projects.js';
import { RepairProjectArtifactEntity } from '../entities/repair-project-artifact.entity.js';
import { RepairProjectCompartmentEntity } from '../entities/repair-project-compartment.entity.js';
import { RepairProjectEstimateLineEntity } from '../entities/repair-project-estimate-line.entity.js';
import { RepairProjectFindingEntity } from '../entities/repair-project-finding.entity.js';
import { RepairProjectRiskEntity } from '../entities/repair-project-risk.entity.js';
import { RepairProjectStatusChangeEntity } from '../entities/repair-project-status-change.entity.js';
import { RepairProjectEntity } from '../entities/repair-project.entity.js';
import { pageOf } from './paging.js';

/** What a project addresses, by kind, as ids. */
export interface ProjectLinks {
  findingIds: number[];
  riskIds: number[];
  artifactIds: number[];
  compartmentIds: number[];
}
export type LinkKind = keyof ProjectLinks;

const LINKS = {
  findingIds: { entity: RepairProjectFindingEntity, column: 'findingId' },
  riskIds: { entity: RepairProjectRiskEntity, column: 'riskId' },
  artifactIds: { entity: RepairProjectArtifactEntity, column: 'artifactId' },
  compartmentIds: { entity: RepairProjectCompartmentEntity, column: 'compartmentId' },
} as const;

export type EstimateLineFields = Pick<RepairProjectEstimateLineEntity, 'description' | 'quantityMilli' | 'unit' | 'unitCostCents'>;

export class RepairProjectRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(RepairProjectEntity);
  }

  private get lineRepo() {
    return this.manager.getRepository(RepairProjectEstimateLineEntity);
  }

  private get changeRepo() {
    return this.manager.getRepository(RepairProjectStatusChangeEntity);
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  findBySlug(vesselId: number, slug: string) {
    return this.repo.findOneBy({ vesselId, slug });
  }

  page(vesselId: number, query: RepairProjectsQuery) {
    const qb = this.repo.createQueryBuilder('project').where('project.vesselId = :vesselId', { vesselId });
    if (query.status) qb.andWhere('project.status = :status', { status: query.status });
    return pageOf(qb, query, 'id', 'DESC');
  }

  create(fields: Partial<RepairProjectEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(project: RepairProjectEntity) {
    return this.repo.save(project);
  }

  /** For a change kept in another table (lines, links): the project's own version must move too. */
  async bumpVersion(id: number) {
    await this.repo.createQueryBuilder().update().set({ version: () => '"version" + 1', updatedAt: () => 'CURRENT_TIMESTAMP' }).where('id = :id', { id }).execute();
  }

  lines(projectId: number) {
    return this.lineRepo.find({ where: { projectId }, order: { position: 'ASC', id: 'ASC' } });
  }

  async setLines(projectId: number, lines: EstimateLineFields[]) {
    await this.lineRepo.delete({ projectId });
    if (lines.length) await this.lineRepo.save(lines.map((line, position) => this.lineRepo.create({ ...line, projectId, position })));
  }

  statusChanges(projectId: number) {
    return this.changeRepo.find({ where: { projectId }, relations: { byUser: true }, order: { at: 'ASC', id: 'ASC' } });
  }

  addStatusChange(fields: Omit<RepairProjectStatusChangeEntity, 'id' | 'project' | 'byUser'>) {
    return this.changeRepo.save(this.changeRepo.create(fields));
  }

  /** Sets the dates of a project's status changes, oldest first, and its creation to the first (the demo's timeline). */
  async backdate(projectId: number, dates: Date[]) {
    const changes = await this.statusChanges(projectId);
    for (const [i, change] of changes.entries()) if (dates[i]) await this.changeRepo.update({ id: change.id }, { at: dates[i] });
    if (dates[0]) await this.repo.createQueryBuilder().update().set({ createdAt: dates[0], updatedAt: dates.at(-1)! }).where('id = :id', { id: projectId }).execute();
  }

  async links(projectId: number): Promise<ProjectLinks> {
    const out = { findingIds: [], riskIds: [], artifactIds: [], compartmentIds: [] } as ProjectLinks;
    for (const [kind, { entity, column }] of Object.entries(LINKS) as [LinkKind, (typeof LINKS)[LinkKind]][]) {
      const rows = (await this.manager.getRepository(entity).find({ where: { projectId }, order: { [column]: 'ASC' } as never })) as unknown as Record<string, number>[];
      out[kind] = rows.map((row) => row[column]!);
    }
    return out;
  }

  async setLinks(projectId: number, kind: LinkKind, ids: number[]) {
    const { entity, column } = LINKS[kind];
    const repo = this.manager.getRepository(entity);
    await repo.delete({ projectId });
    if (ids.length) await repo.insert(ids.map((id) => ({ projectId, [column]: id })) as never);
  }

  /** Projects that address any of these findings (a finding's page, a treatment's check). */
  async projectIdsAddressing(findingIds: number[]): Promise<number[]> {
    if (!findingIds.length) return [];
    const rows = await this.manager.getRepository(RepairProjectFindingEntity).find({ where: { findingId: In(findingIds) } });
    return [...new Set(rows.map((r) => r.projectId))];
  }
}
