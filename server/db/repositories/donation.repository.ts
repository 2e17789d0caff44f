import type { EntityManager } from 'typeorm';
import type { DonationsExportQuery, DonationsQuery } from '../../../shared/schemas/donations.js';
import { AppealEntity } from '../entities/appeal.entity.js';
import { DonationEntity } from '../entities/donation.entity.js';
import { StripeEventEntity } from '../entities/stripe-event.entity.js';
import { likePattern, pageOf } from './paging.js';

export class DonationRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(DonationEntity);
  }

  private get events() {
    return this.manager.getRepository(StripeEventEntity);
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  findBySession(checkoutSessionId: string) {
    return this.repo.findOneBy({ checkoutSessionId });
  }

  findByReference(reference: string) {
    return this.repo.findOneBy({ reference });
  }

  findByPaymentIntent(paymentIntentId: string) {
    return this.repo.findOneBy({ paymentIntentId });
  }

  create(fields: Partial<DonationEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(donation: DonationEntity) {
    return this.repo.save(donation);
  }

  private filtered(query: DonationsExportQuery) {
    const qb = this.repo.createQueryBuilder('donation').where('donation.vesselId = :vesselId', { vesselId: query.vesselId });
    if (query.status) qb.andWhere('donation.status = :status', { status: query.status });
    if (query.repairProjectId) qb.andWhere('donation.appealId IN (SELECT a.id FROM appeals a WHERE a.repairProjectId = :projectId)', { projectId: query.repairProjectId });
    if (query.from) qb.andWhere('donation.createdAt >= :from', { from: `${query.from} 00:00:00` });
    if (query.to) {
      const next = new Date(`${query.to}T00:00:00Z`);
      next.setUTCDate(next.getUTCDate() + 1);
      qb.andWhere('donation.createdAt < :to', { to: next.toISOString().slice(0, 10) + ' 00:00:00' });
    }
    if (query.q) {
      qb.andWhere("(LOWER(donation.donorName) LIKE :q ESCAPE '\\' OR LOWER(donation.donorEmail) LIKE :q ESCAPE '\\' OR LOWER(donation.dedicationName) LIKE :q ESCAPE '\\')", { q: likePattern(query.q) });
    }
    return qb;
  }

  page(query: DonationsQuery) {
    return pageOf(this.filtered(query), query, 'id', 'DESC');
  }

  /** A slice of the export, by id after `afterId`, for reading in short steps. */
  exportSlice(query: DonationsExportQuery, afterId: number, limit: number) {
    return this.filtered(query).andWhere('donation.id > :afterId', { afterId }).orderBy('donation.id', 'ASC').take(limit).getMany();
  }

  /** The latest gifts of an appeal that have been received, newest first. */
  recentReceived(appealId: number, limit: number) {
    return this.repo
      .createQueryBuilder('donation')
      .where('donation.appealId = :appealId', { appealId })
      .andWhere("donation.status IN ('succeeded', 'partially_refunded')")
      .orderBy('donation.succeededAt', 'DESC')
      .addOrderBy('donation.id', 'DESC')
      .take(limit)
      .getMany();
  }

  /** The totals summed from every gift (what the kept totals save; for checks and the bench). */
  sumByAppeal(vesselId: number) {
    return this.repo
      .createQueryBuilder('donation')
      .innerJoin(AppealEntity, 'appeal', 'appeal.id = donation.appealId')
      .select('donation.appealId', 'appealId')
      .addSelect("SUM(CASE WHEN donation.status IN ('succeeded', 'partially_refunded', 'refunded') THEN donation.amountCents ELSE 0 END)", 'raisedCents')
      .addSelect("SUM(CASE WHEN donation.status IN ('succeeded', 'partially_refunded', 'refunded') THEN donation.refundedCents ELSE 0 END)", 'refundedCents')
      .addSelect("SUM(CASE WHEN donation.status IN ('succeeded', 'partially_refunded') THEN 1 ELSE 0 END)", 'giftCount')
      .where('appeal.vesselId = :vesselId', { vesselId })
      .groupBy('donation.appealId')
      .getRawMany<{ appealId: number; raisedCents: number; refundedCents: number; giftCount: number }>();
  }

  eventProcessed(id: string) {
    return this.events.existsBy({ id });
  }

  recordEvent(event: { id: string; type: string; donationId: number | null }) {
    return this.events.insert({ ...event, processedAt: new Date() });
  }
}
