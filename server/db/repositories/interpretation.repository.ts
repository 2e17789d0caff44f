import type { EntityManager } from 'typeorm';
import type { Page } from '../../../shared/schemas/common.js';
import type { InterpretationsQuery, InterpretationSubject } from '../../../shared/schemas/interpretation.js';
import { mergeHighlights, matchExpression, scopedMatch, SEARCH_TABLE } from '../../search/search-index.js';
import { HIGHLIGHT_END, HIGHLIGHT_START } from '../../../shared/schemas/artifacts.js';
import { InterpretationRevisionEntity } from '../entities/interpretation-revision.entity.js';
import { InterpretationEntity } from '../entities/interpretation.entity.js';

const PEOPLE = { publishedBy: true, submittedBy: true, lastEditedBy: true, returnedBy: true } as const;

export class InterpretationRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(InterpretationEntity);
  }

  private get revisions() {
    return this.manager.getRepository(InterpretationRevisionEntity);
  }

  findFor(subjectType: InterpretationSubject, subjectId: number) {
    return this.repo.findOne({ where: { subjectType, subjectId }, relations: PEOPLE });
  }

  /** The row alone, to change: with its people loaded, TypeORM would write their old ids back over the new ones. */
  findForChange(subjectType: InterpretationSubject, subjectId: number) {
    return this.repo.findOneBy({ subjectType, subjectId });
  }

  create(fields: Partial<InterpretationEntity>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(record: InterpretationEntity) {
    return this.repo.save(record);
  }

  addRevision(fields: Omit<InterpretationRevisionEntity, 'id' | 'interpretation' | 'savedBy'>) {
    return this.revisions.save(this.revisions.create(fields));
  }

  revisionsOf(interpretationId: number) {
    return this.revisions.find({ where: { interpretationId }, relations: { savedBy: true }, order: { number: 'DESC' } });
  }

  findRevision(interpretationId: number, number: number) {
    return this.revisions.findOneBy({ interpretationId, number });
  }

  revisionCount(interpretationId: number) {
    return this.revisions.countBy({ interpretationId });
  }

  /** A page of a vessel's texts, filtered by state and kind of subject; with `q`, only those whose words match, with a snippet each. */
  async page(vesselId: number, query: InterpretationsQuery): Promise<Page<{ record: InterpretationEntity; snippet: string | null }>> {
    const qb = this.repo.createQueryBuilder('interpretation').leftJoinAndSelect('interpretation.submittedBy', 'submittedBy').leftJoinAndSelect('interpretation.lastEditedBy', 'lastEditedBy').where('interpretation.vesselId = :vesselId', { vesselId });
    if (query.state) qb.andWhere('interpretation.state = :state', { state: query.state });
    if (query.subjectType) qb.andWhere('interpretation.subjectType = :subjectType', { subjectType: query.subjectType });
    const words = query.q ? matchExpression(query.q) : null;
    if (query.q && !words) return { items: [], total: 0, page: query.page, pageSize: query.pageSize };
    const match = words ? scopedMatch('interpretation', vesselId, words) : null;
    if (match) {
      qb.andWhere(`interpretation.id IN (SELECT record_id FROM ${SEARCH_TABLE} WHERE ${SEARCH_TABLE} MATCH :match)`, { match });
    }
    const descending = query.sort.startsWith('-');
    qb.orderBy(`interpretation.${descending ? query.sort.slice(1) : query.sort}`, descending ? 'DESC' : 'ASC').addOrderBy('interpretation.id', 'ASC');
    qb.skip((query.page - 1) * query.pageSize).take(query.pageSize);
    const [records, total] = await qb.getManyAndCount();
    const snippets = new Map<number, string>();
    if (match && records.length) {
      // Marks for the page's rows only (a second, narrow run of the match).
      const rows = (await this.manager.query(
        `SELECT record_id AS id, snippet(${SEARCH_TABLE}, 6, '${HIGHLIGHT_START}', '${HIGHLIGHT_END}', '…', 16) AS snippet FROM ${SEARCH_TABLE} WHERE ${SEARCH_TABLE} MATCH ? AND record_id IN (${records.map(() => '?').join(', ')})`,
        [match, ...records.map((r) => BigInt(r.id))],
      )) as { id: number; snippet: string }[];
      for (const row of rows) snippets.set(Number(row.id), mergeHighlights(row.snippet));
    }
    return { items: records.map((record) => ({ record, snippet: snippets.get(record.id) ?? null })), total, page: query.page, pageSize: query.pageSize };
  }

  /** Removes a subject's interpretation and its revisions (a compartment deleted). */
  async removeFor(subjectType: InterpretationSubject, subjectId: number) {
    await this.repo.delete({ subjectType, subjectId });
  }
}
