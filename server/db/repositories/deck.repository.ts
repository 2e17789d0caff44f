import type { EntityManager } from 'typeorm';
import { CompartmentEntity } from '../entities/compartment.entity.js';
import { DeckEntity } from '../entities/deck.entity.js';

export class DeckRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(DeckEntity);
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  listForVessel(vesselId: number) {
    return this.repo.find({ where: { vesselId }, order: { position: 'ASC', id: 'ASC' } });
  }

  async compartmentCounts(vesselId: number): Promise<Map<number, number>> {
    const rows = await this.manager
      .getRepository(CompartmentEntity)
      .createQueryBuilder('c')
      .select('c.deckId', 'deckId')
      .addSelect('COUNT(*)', 'count')
      .where('c.vesselId = :vesselId', { vesselId })
      .groupBy('c.deckId')
      .getRawMany<{ deckId: number; count: number | string }>();
    return new Map(rows.map((r) => [Number(r.deckId), Number(r.count)]));
  }

  create(fields: Pick<DeckEntity, 'vesselId' | 'name' | 'levelCode' | 'position'>) {
    return this.repo.save(this.repo.create({ ...fields, bowTo: 'right', centerlineY: null, metresPerUnit: null, calibration: null, currentPlanId: null, planWidth: null, planHeight: null }));
  }

  save(deck: DeckEntity) {
    return this.repo.save(deck);
  }

  saveAll(decks: DeckEntity[]) {
    return this.repo.save(decks);
  }

  async remove(deck: DeckEntity) {
    await this.repo.delete({ id: deck.id });
  }
}
