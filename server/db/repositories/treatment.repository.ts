import { In, type EntityManager } from 'typeorm';
import type { ReportSubject } from '../../../shared/schemas/condition.js';
import { ConditionFindingEntity } from '../entities/condition-finding.entity.js';
import { ConditionReportEntity } from '../entities/condition-report.entity.js';
import { TreatmentFindingEntity } from '../entities/treatment-finding.entity.js';
import { TreatmentEntity } from '../entities/treatment.entity.js';

export class TreatmentRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(TreatmentEntity);
  }

  private get findingLinks() {
    return this.manager.getRepository(TreatmentFindingEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { performedBy: true } });
  }

  forProject(projectId: number) {
    return this.repo.find({ where: { projectId }, relations: { performedBy: true }, order: { performedOn: 'ASC', id: 'ASC' } });
  }

  create(fields: Partial<TreatmentEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(treatment: TreatmentEntity) {
    return this.repo.save(treatment);
  }

  async bumpVersion(id: number) {
    await this.repo.createQueryBuilder().update().set({ version: () => '"version" + 1', updatedAt: () => 'CURRENT_TIMESTAMP' }).where('id = :id', { id }).execute();
  }

  /** The findings each treatment addresses. */
  async findingIdsOf(treatmentIds: number[]): Promise<Map<number, number[]>> {
    const map = new Map<number, number[]>();
    if (!treatmentIds.length) return map;
    for (const row of await this.findingLinks.find({ where: { treatmentId: In(treatmentIds) }, order: { findingId: 'ASC' } })) {
      map.set(row.treatmentId, [...(map.get(row.treatmentId) ?? []), row.findingId]);
    }
    return map;
  }

  async setFindings(treatmentId: number, findingIds: number[]) {
    await this.findingLinks.delete({ treatmentId });
    if (findingIds.length) await this.findingLinks.insert(findingIds.map((findingId) => ({ treatmentId, findingId })));
  }

  /** Findings with their reports, for labels and for finding the subject's next report. */
  findingsWithReports(ids: number[]) {
    if (!ids.length) return Promise.resolve([]);
    return this.manager.getRepository(ConditionFindingEntity).find({ where: { id: In([...new Set(ids)]) }, relations: { report: true, artifact: true } });
  }

  /**
   * The first submitted report of a subject inspected after `afterDate` (the next survey, which
   * records the state after the work), not counting `excludeIds` (the finding's own report line).
   */
  nextSubmittedReport(subjectType: ReportSubject, subjectId: number, afterDate: string, excludeIds: number[]) {
    const qb = this.manager
      .getRepository(ConditionReportEntity)
      .createQueryBuilder('r')
      .where('r.subjectType = :subjectType AND r.subjectId = :subjectId', { subjectType, subjectId })
      .andWhere("r.status = 'submitted'")
      .andWhere('r.inspectedOn > :afterDate', { afterDate });
    if (excludeIds.length) qb.andWhere('r.id NOT IN (:...excludeIds)', { excludeIds });
    // The latest revision of the earliest later survey.
    return qb.orderBy('r.inspectedOn', 'ASC').addOrderBy('r.revision', 'DESC').addOrderBy('r.id', 'DESC').getOne();
  }

  findingsOfReport(reportId: number) {
    return this.manager.getRepository(ConditionFindingEntity).find({ where: { reportId }, order: { position: 'ASC', id: 'ASC' } });
  }
}
