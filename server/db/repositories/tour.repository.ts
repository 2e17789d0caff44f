import { Brackets, IsNull, Not, type EntityManager } from 'typeorm';
import { HIGHLIGHT_END, HIGHLIGHT_START } from '../../../shared/schemas/artifacts.js';
import type { Page } from '../../../shared/schemas/common.js';
import { matchExpression, mergeHighlights, RANK_EXPRESSION, scopedMatch, SEARCH_TABLE } from '../../search/search-index.js';
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

  /** A page of a vessel's tours; with `q`, those whose own words or whose stops' words match, each with a snippet of the best match. */
  async page(vesselId: number, query: ToursQuery): Promise<Page<{ tour: TourEntity; snippet: string | null }>> {
    const qb = this.repo.createQueryBuilder('tour').leftJoinAndSelect('tour.submittedBy', 'submittedBy').where('tour.vesselId = :vesselId', { vesselId });
    if (query.state) qb.andWhere('tour.state = :state', { state: query.state });
    const words = query.q ? matchExpression(query.q) : null;
    if (query.q && !words) return { items: [], total: 0, page: query.page, pageSize: query.pageSize };
    const tourMatch = words ? scopedMatch('tour', vesselId, words) : null;
    const stopMatch = words ? scopedMatch('tour-stop', vesselId, words) : null;
    if (tourMatch && stopMatch) {
      qb.andWhere(
        new Brackets((w) =>
          w
            .where(`tour.id IN (SELECT record_id FROM ${SEARCH_TABLE} WHERE ${SEARCH_TABLE} MATCH :tourMatch)`, { tourMatch })
            .orWhere(`tour.id IN (SELECT s."tourId" FROM tour_stops s WHERE s.id IN (SELECT record_id FROM ${SEARCH_TABLE} WHERE ${SEARCH_TABLE} MATCH :stopMatch))`, { stopMatch }),
        ),
      );
    }
    const page = await pageOf(qb, query);
    const snippets = new Map<number, string>();
    if (tourMatch && stopMatch && page.items.length) {
      const ids = page.items.map((t) => BigInt(t.id));
      const marks = `'${HIGHLIGHT_START}', '${HIGHLIGHT_END}', '…', 16`;
      // The tour's own marked words first, then its best-ranked stop (marks for this page's rows only).
      const own = (await this.manager.query(
        `SELECT record_id AS id, snippet(${SEARCH_TABLE}, 6, ${marks}) AS snippet FROM ${SEARCH_TABLE} WHERE ${SEARCH_TABLE} MATCH ? AND record_id IN (${ids.map(() => '?').join(', ')})`,
        [tourMatch, ...ids],
      )) as { id: number; snippet: string }[];
      // A match in the title alone leaves the summary unmarked: a stop's marked words say more.
      const unmarked = new Map<number, string>();
      for (const row of own) (row.snippet.includes(HIGHLIGHT_START) ? snippets : unmarked).set(Number(row.id), mergeHighlights(row.snippet));
      const stops = (await this.manager.query(
        `SELECT s."tourId" AS id, s.title AS title, snippet(${SEARCH_TABLE}, 6, ${marks}) AS snippet FROM ${SEARCH_TABLE} JOIN tour_stops s ON s.id = ${SEARCH_TABLE}.record_id WHERE ${SEARCH_TABLE} MATCH ? AND s."tourId" IN (${ids.map(() => '?').join(', ')}) ORDER BY ${RANK_EXPRESSION}`,
        [stopMatch, ...ids],
      )) as { id: number; title: string; snippet: string }[];
      for (const row of stops) if (!snippets.has(Number(row.id))) snippets.set(Number(row.id), `${row.title}: ${mergeHighlights(row.snippet)}`);
      for (const [id, text] of unmarked) if (!snippets.has(id) && text) snippets.set(id, text);
    }
    return { ...page, items: page.items.map((tour) => ({ tour, snippet: snippets.get(tour.id) ?? null })) };
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
