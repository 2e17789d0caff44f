import { In, type EntityManager } from 'typeorm';
import type { ConditionReportsQuery } from '../../../shared/schemas/condition.js';
import { SEARCH_TABLE, matchExpression, scopedMatch } from '../../search/search-index.js';
import { ConditionFindingEntity } from '../entities/condition-finding.entity.js';
import { ConditionReportEntity } from '../entities/condition-report.entity.js';
import { pageOf } from './paging.js';

export class ConditionReportRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(ConditionReportEntity);
  }

  private get findingsRepo() {
    return this.manager.getRepository(ConditionFindingEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { surveyor: true } });
  }

  /** Findings of submitted reports marked on a photo (which must then stay). SQLite's json_extract. */
  async submittedFindingsOnPhoto(mediaId: number): Promise<number> {
    const [row] = (await this.manager.query(
      `SELECT COUNT(*) AS n FROM condition_findings f JOIN condition_reports r ON r.id = f.reportId WHERE r.status = 'submitted' AND json_extract(f.location, '$.mediaId') = ?`,
      [mediaId],
    )) as { n: number }[];
    return Number(row?.n ?? 0);
  }

  /** Every report on a subject, newest inspection first. */
  forSubject(subjectType: 'artifact' | 'compartment', subjectId: number) {
    return this.repo.find({ where: { subjectType, subjectId }, order: { inspectedOn: 'DESC', id: 'DESC' } });
  }

  /** The draft that amends a report, if one is open. */
  /** The amendments of the given reports, in one query. */
  async amendmentsOf(ids: number[]): Promise<Map<number, ConditionReportEntity>> {
    if (ids.length === 0) return new Map();
    const rows = await this.repo.findBy({ supersedesId: In(ids) });
    return new Map(rows.map((r) => [r.supersedesId!, r]));
  }

  amendmentOf(id: number) {
    return this.repo.findOneBy({ supersedesId: id });
  }

  /** The latest submitted report of each compartment of a deck (its current condition). */
  async currentOfCompartments(compartmentIds: number[]): Promise<Map<number, Pick<ConditionReportEntity, 'id' | 'grade' | 'inspectedOn'>>> {
    const current = new Map<number, Pick<ConditionReportEntity, 'id' | 'grade' | 'inspectedOn'>>();
    if (compartmentIds.length === 0) return current;
    const rows = (await this.manager.query(
      `SELECT r.subjectId AS subjectId, r.id AS id, r.grade AS grade, r.inspectedOn AS inspectedOn FROM condition_reports r
       WHERE r.subjectType = 'compartment' AND r.status = 'submitted' AND r.subjectId IN (${compartmentIds.map(() => '?').join(', ')})
       AND r.id = (SELECT r2.id FROM condition_reports r2 WHERE r2.subjectType = 'compartment' AND r2.subjectId = r.subjectId AND r2.status = 'submitted' ORDER BY r2.inspectedOn DESC, r2.id DESC LIMIT 1)`,
      compartmentIds,
    )) as { subjectId: number; id: number; grade: ConditionReportEntity['grade']; inspectedOn: string }[];
    for (const row of rows) current.set(Number(row.subjectId), { id: Number(row.id), grade: row.grade, inspectedOn: row.inspectedOn });
    return current;
  }

  /** `findingsVisible`: whether the reader may see findings; if not, a search looks at numbers and titles only. */
  async page(query: ConditionReportsQuery, findingsVisible = true) {
    const qb = this.repo.createQueryBuilder('report').leftJoinAndSelect('report.surveyor', 'surveyor');
    if (query.vesselId) qb.andWhere('report.vesselId = :vesselId', { vesselId: query.vesselId });
    if (query.subjectType) qb.andWhere('report.subjectType = :subjectType', { subjectType: query.subjectType });
    if (query.subjectId) qb.andWhere('report.subjectId = :subjectId', { subjectId: query.subjectId });
    if (query.status) qb.andWhere('report.status = :status', { status: query.status });
    if (query.grade) qb.andWhere('report.grade = :grade', { grade: query.grade });
    const words = query.q ? matchExpression(query.q) : null;
    if (query.q && !words) qb.andWhere('1 = 0');
    if (words) {
      if (!query.vesselId) qb.andWhere('1 = 0'); // searching is per vessel, as its index is
      else qb.innerJoin(SEARCH_TABLE, SEARCH_TABLE, `${SEARCH_TABLE}.record_id = report.id AND ${SEARCH_TABLE}.kind = 'condition-report'`).andWhere(`${SEARCH_TABLE} MATCH :match`, { match: scopedMatch('condition-report', query.vesselId, words, findingsVisible ? undefined : ['number', 'title']) });
    }
    // On the same date, the latest revision first.
    return pageOf(qb, query, 'id', 'DESC');
  }

  create(fields: Partial<ConditionReportEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(report: ConditionReportEntity) {
    return this.repo.save(report);
  }

  async remove(id: number) {
    await this.findingsRepo.delete({ reportId: id });
    await this.repo.delete({ id });
  }

  findings(reportId: number) {
    return this.findingsRepo.find({ where: { reportId }, relations: { artifact: true }, order: { position: 'ASC', id: 'ASC' } });
  }

  findingsOf(reportIds: number[]) {
    return reportIds.length ? this.findingsRepo.find({ where: { reportId: In(reportIds) }, order: { position: 'ASC', id: 'ASC' } }) : Promise.resolve([]);
  }

  findFinding(id: number) {
    return this.findingsRepo.findOne({ where: { id }, relations: { artifact: true } });
  }

  createFinding(fields: Partial<ConditionFindingEntity>) {
    return this.findingsRepo.save(this.findingsRepo.create(fields));
  }

  saveFinding(finding: ConditionFindingEntity) {
    return this.findingsRepo.save(finding);
  }

  async removeFinding(id: number) {
    await this.findingsRepo.delete({ id });
  }
}
