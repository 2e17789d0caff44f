import { In, type EntityManager } from 'typeorm';
import type { CompartmentsQuery } from '../../../shared/schemas/compartments.js';
import { CompartmentEntity } from '../entities/compartment.entity.js';
import { HazardEntity } from '../entities/hazard.entity.js';
import { likePattern, pageOf } from './paging.js';

export class CompartmentRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(CompartmentEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { deck: true } });
  }

  /** The given compartments with their decks, in one query. */
  withDecks(ids: number[]) {
    return ids.length ? this.repo.find({ where: { id: In([...new Set(ids)]) }, relations: { deck: true } }) : Promise.resolve([]);
  }

  /** Access status of the given compartments (the public tour checks it on every request). */
  async accessOf(ids: number[]): Promise<Map<number, CompartmentEntity['accessStatus']>> {
    if (!ids.length) return new Map();
    const rows = await this.repo.find({ select: { id: true, accessStatus: true }, where: { id: In([...new Set(ids)]) } });
    return new Map(rows.map((c) => [c.id, c.accessStatus]));
  }

  findByDesignation(vesselId: number, designationKey: string) {
    return this.repo.findOneBy({ vesselId, designationKey });
  }

  /** Compartments of a deck that have been drawn on its plan. */
  outlinesOnDeck(deckId: number) {
    return this.repo.createQueryBuilder('c').where('c.deckId = :deckId', { deckId }).andWhere('c.outline IS NOT NULL').getMany();
  }

  /** Designation, name and deck of the given compartments, in one query (labels in lists). */
  async labels(ids: number[]): Promise<Map<number, { label: string; deckId: number }>> {
    if (ids.length === 0) return new Map();
    const rows = await this.repo.createQueryBuilder('c').select(['c.id', 'c.designation', 'c.name', 'c.deckId']).where('c.id IN (:...ids)', { ids: [...new Set(ids)] }).getMany();
    return new Map(rows.map((c) => [c.id, { label: `${c.designation} ${c.name}`, deckId: c.deckId }]));
  }

  countOnDeck(deckId: number) {
    return this.repo.countBy({ deckId });
  }

  page(vesselId: number, query: CompartmentsQuery) {
    const qb = this.repo.createQueryBuilder('compartment').leftJoinAndSelect('compartment.deck', 'deck').where('compartment.vesselId = :vesselId', { vesselId });
    if (query.deckId) qb.andWhere('compartment.deckId = :deckId', { deckId: query.deckId });
    if (query.accessStatus) qb.andWhere('compartment.accessStatus = :accessStatus', { accessStatus: query.accessStatus });
    if (query.hazard) {
      qb.andWhere((sub) => {
        const exists = sub.subQuery().select('1').from(HazardEntity, 'h').where('h.compartmentId = compartment.id').andWhere('h.kind = :kind').getQuery();
        return `EXISTS ${exists}`;
      }).setParameter('kind', query.hazard);
    }
    if (query.q) qb.andWhere("(LOWER(compartment.name) LIKE :q ESCAPE '\\' OR LOWER(compartment.designation) LIKE :q ESCAPE '\\')", { q: likePattern(query.q) });
    return pageOf(qb, query);
  }

  create(fields: Omit<CompartmentEntity, 'id' | 'vessel' | 'deck' | 'createdAt' | 'updatedAt' | 'version'>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(compartment: CompartmentEntity) {
    return this.repo.save(compartment);
  }

  async remove(id: number) {
    await this.repo.delete({ id });
  }
}
