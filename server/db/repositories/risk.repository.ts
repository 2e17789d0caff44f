import { In, IsNull, Not, type EntityManager } from 'typeorm';
import { PRIORITY_BANDS, type RiskScale } from '../../../shared/calc/abc-risk.js';
import type { RisksQuery } from '../../../shared/schemas/risks.js';
import { RiskSubjectEntity } from '../entities/risk-subject.entity.js';
import { RiskEntity } from '../entities/risk.entity.js';
import { pageOf } from './paging.js';

export class RiskRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(RiskEntity);
  }

  private get subjects() {
    return this.manager.getRepository(RiskSubjectEntity);
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  page(query: RisksQuery) {
    const qb = this.repo.createQueryBuilder('risk').where('risk.vesselId = :vesselId', { vesselId: query.vesselId });
    if (query.agent) qb.andWhere('risk.agent = :agent', { agent: query.agent });
    if (query.status) qb.andWhere('risk.status = :status', { status: query.status });
    if (query.band) qb.andWhere('risk.band = :band', { band: query.band });
    // IN (subquery) runs the subquery once; a correlated EXISTS would scan a deck's links for every risk.
    if (query.compartmentId) qb.andWhere("risk.id IN (SELECT s.riskId FROM risk_subjects s WHERE s.subjectType = 'compartment' AND s.subjectId = :compartmentId)", { compartmentId: query.compartmentId });
    if (query.deckId) qb.andWhere('risk.id IN (SELECT s.riskId FROM risk_subjects s WHERE s.deckId = :deckId)', { deckId: query.deckId });
    return pageOf(qb, query, 'id', 'ASC');
  }

  subjectsOf(riskIds: number[]) {
    return riskIds.length ? this.subjects.find({ where: { riskId: In(riskIds) } }) : Promise.resolve([]);
  }

  create(fields: Partial<RiskEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(risk: RiskEntity) {
    return this.repo.save(risk);
  }

  /** Risks scored from a plain input (years, percent): their scores follow the scale's anchors. */
  withPlainInputs() {
    return this.repo.find({ where: [{ yearsBetween: Not(IsNull()) }, { lossPerItemPercent: Not(IsNull()) }, { assetFractionPercent: Not(IsNull()) }] });
  }

  async setScores(id: number, scores: Pick<RiskEntity, 'a' | 'b' | 'c' | 'magnitude'>) {
    await this.repo.update({ id }, scores);
  }

  /** Every risk's band from its MR under the scale's floors: one statement per band. */
  async rebandAll(scale: RiskScale) {
    for (const [i, band] of PRIORITY_BANDS.entries()) {
      const qb = this.repo.createQueryBuilder().update().set({ band }).where('magnitude >= :floor', { floor: scale.bandFloors[band] });
      if (i > 0) qb.andWhere('magnitude < :ceiling', { ceiling: scale.bandFloors[PRIORITY_BANDS[i - 1]!] });
      await qb.execute();
    }
  }

  async setDeckOf(subjectType: 'artifact' | 'compartment', subjectId: number, deckId: number | null) {
    await this.subjects.update({ subjectType, subjectId }, { deckId });
  }

  countLinkedTo(subjectType: 'artifact' | 'compartment', subjectId: number) {
    return this.subjects.countBy({ subjectType, subjectId });
  }

  async bumpVersion(id: number) {
    await this.repo.createQueryBuilder().update().set({ version: () => '"version" + 1' }).where('id = :id', { id }).execute();
  }

  async setSubjects(riskId: number, subjects: Omit<RiskSubjectEntity, 'riskId' | 'risk'>[]) {
    await this.subjects.delete({ riskId });
    if (subjects.length) await this.subjects.save(subjects.map((s) => this.subjects.create({ ...s, riskId })));
  }

  async remove(id: number) {
    await this.subjects.delete({ riskId: id });
    await this.repo.delete({ id });
  }

  /** Per compartment of a deck: its open risks and the largest MR among them. */
  async openRisksOnDeck(deckId: number): Promise<Map<number, { count: number; maxMagnitude: number }>> {
    const rows = (await this.manager.query(
      `SELECT s.subjectId AS compartmentId, COUNT(*) AS n, MAX(r.magnitude) AS mr FROM risk_subjects s JOIN risks r ON r.id = s.riskId WHERE s.subjectType = 'compartment' AND s.deckId = ? AND r.status = 'open' GROUP BY s.subjectId`,
      [deckId],
    )) as { compartmentId: number; n: number; mr: number }[];
    return new Map(rows.map((row) => [Number(row.compartmentId), { count: Number(row.n), maxMagnitude: Number(row.mr) }]));
  }
}
