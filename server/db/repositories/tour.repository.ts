import { IsNull, Not, type EntityManager } from 'typeorm';
import type { ToursQuery } from '../../../shared/schemas/tours.js';
import { TourEntity } from '../entities/tour.entity.js';
import { pageOf } from './paging.js';

export class TourRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(TourEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { submittedBy: true } });
  }

  /** Without relations, for changes (a loaded relation would override the foreign key on save). */
  findPlain(id: number) {
    return this.repo.findOneBy({ id });
  }

  findBySlug(vesselId: number, slug: string) {
    return this.repo.findOneBy({ vesselId, slug });
  }

  page(vesselId: number, query: ToursQuery) {
    const qb = this.repo.createQueryBuilder('tour').leftJoinAndSelect('tour.submittedBy', 'submittedBy').where('tour.vesselId = :vesselId', { vesselId });
    if (query.state) qb.andWhere('tour.state = :state', { state: query.state });
    return pageOf(qb, query);
  }

  /** The published tour with this slug (at most one: approval refuses a second). */
  publishedBySlug(slug: string) {
    return this.repo.findOne({ where: { slug, publishedSnapshot: Not(IsNull()), state: Not('retired') } });
  }

  /** Which published tour has this slug and when it was published, without reading its snapshot. */
  publishedHead(slug: string): Promise<{ id: number; publishedAt: Date } | null> {
    return this.repo
      .createQueryBuilder('t')
      .select(['t.id', 't.publishedAt'])
      .where('t.slug = :slug', { slug })
      .andWhere('t.publishedSnapshot IS NOT NULL')
      .andWhere("t.state != 'retired'")
      .getOne() as Promise<{ id: number; publishedAt: Date } | null>;
  }

  /** Published tours of another vessel with this slug. */
  publishedElsewhere(slug: string, tourId: number) {
    return this.repo.createQueryBuilder('t').where('t.slug = :slug', { slug }).andWhere('t.id != :tourId', { tourId }).andWhere('t.publishedSnapshot IS NOT NULL').andWhere("t.state != 'retired'").getCount();
  }

  listPublished() {
    return this.repo.find({ where: { publishedSnapshot: Not(IsNull()), state: Not('retired') }, order: { title: 'ASC', id: 'ASC' } });
  }

  create(fields: Pick<TourEntity, 'vesselId' | 'title' | 'slug' | 'summary' | 'audience' | 'mode' | 'accessibility' | 'coverMediaId' | 'language' | 'createdById'>) {
    return this.repo.save(this.repo.create({ ...fields, state: 'draft', revision: 0 }));
  }

  /** The revision counter, keeping the version as it is (giving it stops TypeORM from raising it). */
  async setRevision(id: number, revision: number, version: number) {
    await this.repo.update({ id }, { revision, version });
  }

  save(tour: TourEntity) {
    return this.repo.save(tour);
  }
}
