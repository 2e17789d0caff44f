import { In, type EntityManager, type SelectQueryBuilder } from 'typeorm';
import type { ARTIFACT_SORTS, ArtifactFilters, ArtifactsQuery } from '../../../shared/schemas/artifacts.js';
import type { Page } from '../../../shared/schemas/common.js';
import { HIGHLIGHT_COLUMNS, RANK_EXPRESSION, SEARCH_TABLE, SearchIndex, hitOf, matchExpression, scopedMatch, type RawHit, type SearchHit } from '../../search/search-index.js';
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
  relevance: RANK_EXPRESSION,
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

  /** Object number and name of the given artifacts, in one query (labels in lists). */
  async labels(ids: number[]): Promise<Map<number, string>> {
    if (ids.length === 0) return new Map();
    const rows = await this.repo.createQueryBuilder('a').select(['a.id', 'a.objectNumber', 'a.name']).where('a.id IN (:...ids)', { ids: [...new Set(ids)] }).getMany();
    return new Map(rows.map((a) => [a.id, `${a.objectNumber} ${a.name}`]));
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

  /** The filtered list as a lean query (no columns chosen yet): only what a filter needs is joined. */
  private filtered(vesselId: number, filters: ArtifactFilters): { qb: SelectQueryBuilder<ArtifactEntity>; match: string | null } {
    const qb = this.repo.createQueryBuilder('artifact').where('artifact.vesselId = :vesselId', { vesselId });
    if (filters.category) qb.andWhere('artifact.category = :category', { category: filters.category });
    if (filters.status) qb.andWhere('artifact.status = :status', { status: filters.status });
    if (filters.compartmentId) qb.andWhere('artifact.compartmentId = :compartmentId', { compartmentId: filters.compartmentId });
    if (filters.deckId) qb.innerJoin('artifact.compartment', 'compartment').andWhere('compartment.deckId = :deckId', { deckId: filters.deckId });
    const words = filters.q ? matchExpression(filters.q) : null;
    const match = words ? scopedMatch('artifact', vesselId, words) : null;
    if (match) {
      // FTS5 functions take the table's own name, so the join uses it as its alias.
      qb.innerJoin(SEARCH_TABLE, SEARCH_TABLE, `${SEARCH_TABLE}.record_id = artifact.id AND ${SEARCH_TABLE}.kind = 'artifact'`).andWhere(`${SEARCH_TABLE} MATCH :match`, { match });
    }
    return { qb, match };
  }

  /** Ids in order, then the rows with their places: sorting narrow rows is what keeps a page fast. */
  private async loadInOrder(ids: number[]): Promise<ArtifactEntity[]> {
    if (ids.length === 0) return [];
    const rows = await this.repo.find({ where: { id: In(ids) }, relations: { compartment: { deck: true } } });
    const byId = new Map(rows.map((row) => [row.id, row]));
    return ids.flatMap((id) => byId.get(id) ?? []);
  }

  private static idsOf(rows: { id: number }[]): number[] {
    return rows.map((row) => Number(row.id));
  }

  /** A page of a vessel's artifacts; with `q`, only matches, ranked and highlighted. */
  async page(vesselId: number, query: ArtifactsQuery): Promise<Page<ArtifactHit>> {
    const { qb, match } = this.filtered(vesselId, query);
    const empty = { items: [], total: 0, page: query.page, pageSize: query.pageSize };
    if (query.q && !match) return empty;
    const requested = query.sort ?? (match ? 'relevance' : 'objectNumber');
    const descending = requested.startsWith('-');
    let sort = (descending ? requested.slice(1) : requested) as keyof typeof SORT_COLUMNS;
    if (sort === 'relevance' && !match) sort = 'objectNumber';
    const direction = descending ? 'DESC' : 'ASC';
    const offset = (query.page - 1) * query.pageSize;
    const search = new SearchIndex(this.manager);
    const exact = (query.q ?? '').trim().toUpperCase();
    let hits: SearchHit[];
    let total: number;
    if (match && sort === 'relevance' && !descending && !query.category && !query.status && !query.deckId && !query.compartmentId) {
      // Only the text narrows the list: the full-text index alone answers, without joining every match.
      total = await search.count(match);
      const exactHit = await this.findByNumber(vesselId, exact);
      hits = await search.ranked('artifact', match, exactHit?.id ?? null, offset, query.pageSize);
    } else {
      total = await qb.clone().getCount();
      qb.select('artifact.id', 'id');
      // An exact object number comes first whatever the order asked for.
      if (match) qb.addSelect(HIGHLIGHT_COLUMNS).addSelect('CASE WHEN artifact.objectNumber = :exact THEN 0 ELSE 1 END', 'exact').setParameter('exact', exact).orderBy('exact', 'ASC');
      const rows = await qb
        .addOrderBy(SORT_COLUMNS[sort], direction)
        .addOrderBy('artifact.id', 'ASC')
        .offset(offset)
        .limit(query.pageSize)
        .getRawMany<RawHit>();
      hits = match ? rows.map(hitOf) : rows.map((row) => ({ id: Number(row.id), title: '', snippet: '' }));
    }
    const artifacts = await this.loadInOrder(hits.map((hit) => hit.id));
    const marks = new Map(hits.map((hit) => [hit.id, hit]));
    const items = artifacts.map((artifact) => {
      const mark = marks.get(artifact.id)!;
      return { artifact, highlight: match ? { name: mark.title || artifact.name, snippet: mark.snippet } : null };
    });
    return { items, total, page: query.page, pageSize: query.pageSize };
  }

  /** Every artifact the filters select, in object-number order, a batch at a time (CSV export). */
  async *all(vesselId: number, filters: ArtifactFilters, batch = 500): AsyncGenerator<ArtifactEntity[]> {
    const { qb, match } = this.filtered(vesselId, filters);
    if (filters.q && !match) return;
    qb.select('artifact.id', 'id').orderBy('artifact.objectNumberSort', 'ASC').addOrderBy('artifact.id', 'ASC');
    for (let offset = 0; ; offset += batch) {
      const ids = ArtifactRepository.idsOf(await qb.clone().offset(offset).limit(batch).getRawMany<{ id: number }>());
      if (ids.length) yield await this.loadInOrder(ids);
      if (ids.length < batch) return;
    }
  }

  create(fields: Omit<ArtifactEntity, 'id' | 'vessel' | 'compartment' | 'createdAt' | 'updatedAt' | 'version'>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(artifact: ArtifactEntity) {
    return this.repo.save(artifact);
  }

  /** Takes the artifacts of a compartment off the plan (its deck changed); their compartment stays. */
  async clearPointsIn(compartmentId: number) {
    await this.repo.createQueryBuilder().update().set({ point: () => 'NULL', updatedAt: () => '"updatedAt"', version: () => '"version"' }).where('compartmentId = :compartmentId', { compartmentId }).execute();
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
