import type { EntityManager } from 'typeorm';
import type { LedgerShare } from '../../../shared/calc/giving-ledger.js';
import { AppealMonthTotalEntity } from '../entities/appeal-month-total.entity.js';
import { AppealEntity } from '../entities/appeal.entity.js';

/** The repair project an appeal belongs to, as giving needs it (table `repair_project`). */
export interface ProjectOfAppeal {
  id: number;
  vesselId: number;
  slug: string;
  title: string;
  status: string;
}

export interface AppealWithProject {
  appeal: AppealEntity;
  project: ProjectOfAppeal;
}

const PROJECT_COLUMNS = ['p.id AS p_id', 'p.vesselId AS p_vesselId', 'p.slug AS p_slug', 'p.title AS p_title', 'p.status AS p_status'];

function projectOf(raw: Record<string, unknown>): ProjectOfAppeal {
  return { id: Number(raw.p_id), vesselId: Number(raw.p_vesselId), slug: String(raw.p_slug), title: String(raw.p_title), status: String(raw.p_status) };
}

export class AppealRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(AppealEntity);
  }

  private get months() {
    return this.manager.getRepository(AppealMonthTotalEntity);
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  findByProject(repairProjectId: number) {
    return this.repo.findOneBy({ repairProjectId });
  }

  async project(repairProjectId: number): Promise<ProjectOfAppeal | null> {
    const raw = await this.manager.createQueryBuilder().select(PROJECT_COLUMNS).from('repair_project', 'p').where('p.id = :id', { id: repairProjectId }).getRawOne();
    return raw ? projectOf(raw) : null;
  }

  private async joined(where: (qb: ReturnType<AppealRepository['base']>) => void, one: true): Promise<AppealWithProject | null>;
  private async joined(where: (qb: ReturnType<AppealRepository['base']>) => void, one: false): Promise<AppealWithProject[]>;
  private async joined(where: (qb: ReturnType<AppealRepository['base']>) => void, one: boolean) {
    const qb = this.base();
    where(qb);
    const { entities, raw } = await qb.getRawAndEntities();
    const rows = entities.map((appeal, i) => ({ appeal, project: projectOf(raw[i] as Record<string, unknown>) }));
    return one ? (rows[0] ?? null) : rows;
  }

  private base() {
    return this.repo.createQueryBuilder('appeal').innerJoin('repair_project', 'p', 'p.id = appeal.repairProjectId').addSelect(PROJECT_COLUMNS);
  }

  /** Published appeals of projects that are fundraising: all the public may see. */
  publicList() {
    return this.joined((qb) => qb.where('appeal.publishedAt IS NOT NULL').andWhere("p.status = 'fundraising'").orderBy('appeal.publishedAt', 'DESC').addOrderBy('appeal.id', 'DESC'), false);
  }

  publicBySlug(slug: string) {
    return this.joined((qb) => qb.where('p.slug = :slug', { slug }).andWhere('appeal.publishedAt IS NOT NULL').andWhere("p.status = 'fundraising'"), true);
  }

  withProject(appealId: number) {
    return this.joined((qb) => qb.where('appeal.id = :id', { id: appealId }), true);
  }

  ofVessel(vesselId: number) {
    return this.joined((qb) => qb.where('appeal.vesselId = :vesselId', { vesselId }).orderBy('p.title', 'ASC'), false);
  }

  /** Every repair project of a vessel (those without an appeal too), by title. */
  async projectsOfVessel(vesselId: number): Promise<ProjectOfAppeal[]> {
    const raw = await this.manager.createQueryBuilder().select(PROJECT_COLUMNS).from('repair_project', 'p').where('p.vesselId = :vesselId', { vesselId }).orderBy('p.title', 'ASC').getRawMany();
    return raw.map(projectOf);
  }

  create(fields: Partial<AppealEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(appeal: AppealEntity) {
    return this.repo.save(appeal);
  }

  /** Moves the kept totals by `delta`, in the caller's transaction; `month` is the gift's (YYYY-MM). */
  async addToTotals(appealId: number, month: string, delta: LedgerShare): Promise<void> {
    if (!delta.raisedCents && !delta.refundedCents && !delta.giftCount) return;
    await this.repo
      .createQueryBuilder()
      .update(AppealEntity)
      .set({
        raisedCents: () => `raisedCents + ${Math.trunc(delta.raisedCents)}`,
        refundedCents: () => `refundedCents + ${Math.trunc(delta.refundedCents)}`,
        giftCount: () => `giftCount + ${Math.trunc(delta.giftCount)}`,
        // the row's version and updatedAt are the editor's; the ledger does not make an edit stale
        version: () => 'version',
        updatedAt: () => 'updatedAt',
      })
      .where('id = :appealId', { appealId })
      .execute();
    await this.months.createQueryBuilder().insert().values({ appealId, month, raisedCents: 0, refundedCents: 0, giftCount: 0 }).orIgnore().execute();
    await this.months
      .createQueryBuilder()
      .update(AppealMonthTotalEntity)
      .set({
        raisedCents: () => `raisedCents + ${Math.trunc(delta.raisedCents)}`,
        refundedCents: () => `refundedCents + ${Math.trunc(delta.refundedCents)}`,
        giftCount: () => `giftCount + ${Math.trunc(delta.giftCount)}`,
      })
      .where('appealId = :appealId AND month = :month', { appealId, month })
      .execute();
  }

  /** Monthly totals of a vessel's appeals, oldest month first. */
  monthsOfVessel(vesselId: number) {
    return this.months
      .createQueryBuilder('m')
      .innerJoin(AppealEntity, 'appeal', 'appeal.id = m.appealId')
      .select('m.month', 'month')
      .addSelect('SUM(m.raisedCents)', 'raisedCents')
      .addSelect('SUM(m.refundedCents)', 'refundedCents')
      .addSelect('SUM(m.giftCount)', 'giftCount')
      .where('appeal.vesselId = :vesselId', { vesselId })
      .groupBy('m.month')
      .orderBy('m.month', 'ASC')
      .getRawMany<{ month: string; raisedCents: number; refundedCents: number; giftCount: number }>();
  }
}
