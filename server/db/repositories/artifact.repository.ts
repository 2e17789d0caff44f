import type { EntityManager, SelectQueryBuilder } from 'typeorm';
import type { ARTIFACT_SORTS, ArtifactFilters, ArtifactsQuery } from '../../../shared/schemas/artifacts.js';
import type { Page } from '../../../shared/schemas/common.js';
import { RANK_EXPRESSION, SEARCH_TABLE, highlightExpression, matchExpression, snippetExpression } from '../../search/search-index.js';
import type { Point } from '../../../shared/calc/geometry.js';
import { ArtifactEntity } from '../entities/artifact.entity.js';

export interface ArtifactHit {
  artifact: ArtifactEntity;
  highlight: { name: string; snippet: string } | null;
}

const SORT_COLUMNS: Record<(typeof ARTIFACT_SORTS)[number], string> = {
  objectNumber: 'artifact.objectNumberSort',
  name: 'artifact.name',
  category: 'artifact.category',
  status: 'artifact.status',
  updatedAt: 'artifact.updatedAt',
  relevance: 'rank',
};

export class ArtifactRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(ArtifactEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { compartment: { deck: true } } });
  }

  findByNumber(vesselId: number, objectNumber: string) {
    return this.repo.findOneBy({ vesselId, objectNumber });
  }

  /** Object numbers of a vessel already taken, among the given ones. */
  async numbersTaken(vesselId: number, numbers: string[]): Promise<Set<string>> {
    const taken = new Set<string>();
    for (let i = 0; i < numbers.length; i += 500) {
      const rows = await this.repo
        .createQueryBuilder('a')
        .select('a.objectNumber', 'objectNumber')
        .where('a.vesselId = :vesselId', { vesselId })
        .andWhere('a.objectNumber IN (:...numbers)', { numbers: numbers.slice(i, i + 500) })
        .getRawMany<{ objectNumber: string }>();
      for (const row of rows) taken.add(row.objectNumber);
    }
    return taken;
  }

  countInCompartment(compartmentId: number) {
    return this.repo.countBy({ compartmentId });
  }

  /** Artifacts placed on a deck's plan (markers). */
  placedOnDeck(deckId: number) {
    return this.repo
      .createQueryBuilder('artifact')
      .innerJoin('artifact.compartment', 'compartment')
      .where('compartment.deckId = :deckId', { deckId })
      .andWhere('artifact.point IS NOT NULL')
      .orderBy('artifact.objectNumberSort')
      .getMany();
  }

  private filtered(vesselId: number, filters: ArtifactFilters): { qb: SelectQueryBuilder<ArtifactEntity>; match: string | null } {
    const qb = this.repo
      .createQueryBuilder('artifact')
      .leftJoinAndSelect('artifact.compartment', 'compartment')
      .leftJoinAndSelect('compartment.deck', 'deck')
      .where('artifact.vesselId = :vesselId', { vesselId });
    if (filters.category) qb.andWhere('artifact.category = :category', { category: filters.category });
    if (filters.status) qb.andWhere('artifact.status = :status', { status: filters.status });
    if (filters.compartmentId) qb.andWhere('artifact.compartmentId = :compartmentId', { compartmentId: filters.compartmentId });
    if (filters.deckId) qb.andWhere('compartment.deckId = :deckId', { deckId: filters.deckId });
    const match = filters.q ? matchExpression(filters.q) : null;
    if (match) {
      // FTS5 functions take the table's own name, so the join uses it as its alias.
      qb.innerJoin(SEARCH_TABLE, SEARCH_TABLE, `${SEARCH_TABLE}.record_id = artifact.id AND ${SEARCH_TABLE}.kind = 'artifact'`).andWhere(`${SEARCH_TABLE} MATCH :match`, { match });
    }
    return { qb, match };
  }

  /** A page of a vessel's artifacts; with `q`, only matches, ranked and highlighted. */
  async page(vesselId: number, query: ArtifactsQuery): Promise<Page<ArtifactHit>> {
    const { qb, match } = this.filtered(vesselId, query);
    if (query.q && !match) return { items: [], total: 0, page: query.page, pageSize: query.pageSize };
    const total = await qb.clone().getCount();
    const descending = query.sort.startsWith('-');
    let sort = (descending ? query.sort.slice(1) : query.sort) as keyof typeof SORT_COLUMNS;
    if (sort === 'relevance' && !match) sort = 'objectNumber';
    if (match) {
      qb.addSelect(RANK_EXPRESSION, 'rank')
        .addSelect(highlightExpression('title'), 'hl_name')
        .addSelect(snippetExpression(), 'hl_snippet')
        .addSelect('CASE WHEN artifact.objectNumber = :exact THEN 0 ELSE 1 END', 'exact')
        .setParameter('exact', query.q!.trim().toUpperCase());
    }
    // An exact object number comes first whatever the order asked for.
    if (match) qb.orderBy('exact', 'ASC').addOrderBy(SORT_COLUMNS[sort], descending ? 'DESC' : 'ASC');
    else qb.orderBy(SORT_COLUMNS[sort], descending ? 'DESC' : 'ASC');
    qb.addOrderBy('artifact.id', 'ASC')
      .offset((query.page - 1) * query.pageSize)
      .limit(query.pageSize);
    const { entities, raw } = await qb.getRawAndEntities<{ artifact_id: number; hl_name?: string; hl_snippet?: string }>();
    const rawById = new Map<number, { hl_name?: string; hl_snippet?: string }>(raw.map((row) => [Number(row.artifact_id), row]));
    const items = entities.map((artifact) => {
      const row = rawById.get(artifact.id);
      return { artifact, highlight: match && row ? { name: row.hl_name ?? artifact.name, snippet: row.hl_snippet ?? '' } : null };
    });
    return { items, total, page: query.page, pageSize: query.pageSize };
  }

  /** Every artifact the filters select, in object-number order (CSV export). */
  async *all(vesselId: number, filters: ArtifactFilters, batch = 500): AsyncGenerator<ArtifactEntity[]> {
    const { qb, match } = this.filtered(vesselId, filters);
    if (filters.q && !match) return;
    qb.orderBy('artifact.objectNumberSort', 'ASC').addOrderBy('artifact.id', 'ASC');
    for (let offset = 0; ; offset += batch) {
      const rows = await qb.clone().offset(offset).limit(batch).getMany();
      if (rows.length) yield rows;
      if (rows.length < batch) return;
    }
  }

  create(fields: Omit<ArtifactEntity, 'id' | 'vessel' | 'compartment' | 'createdAt' | 'updatedAt' | 'version'>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(artifact: ArtifactEntity) {
    return this.repo.save(artifact);
  }

  /** Carries a point to a replaced plan's pixels; not a move, so version and history stay. */
  async setPoint(id: number, point: Point) {
    await this.repo.createQueryBuilder().update().set({ point: () => ':point', updatedAt: () => '"updatedAt"', version: () => '"version"' }).setParameter('point', JSON.stringify(point)).where('id = :id', { id }).execute();
  }

  /** Sets the cover without touching version or updatedAt (adding a photo is not an edit of the record). */
  async setCover(id: number, mediaId: number | null) {
    await this.repo.createQueryBuilder().update().set({ coverMediaId: mediaId, updatedAt: () => '"updatedAt"', version: () => '"version"' }).where('id = :id', { id }).execute();
  }
}
