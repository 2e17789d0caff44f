import { In, type EntityManager } from 'typeorm';
import type { PlanStatus } from '../../../shared/schemas/plans.js';
import { PlanEntity } from '../entities/plan.entity.js';

export class PlanRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(PlanEntity);
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  latestFor(deckId: number) {
    return this.repo.findOne({ where: { deckId }, order: { id: 'DESC' } });
  }

  withStatus(statuses: PlanStatus[]) {
    return this.repo.findBy({ status: In(statuses) });
  }

  create(fields: Omit<PlanEntity, 'id' | 'deck' | 'createdAt' | 'finishedAt' | 'tilesDone' | 'storageKey' | 'error'>) {
    return this.repo.save(this.repo.create({ ...fields, tilesDone: 0, storageKey: null, error: null, finishedAt: null }));
  }

  save(plan: PlanEntity) {
    return this.repo.save(plan);
  }

  /** Progress only, and only while the build is still wanted. */
  async setProgress(id: number, tilesDone: number) {
    await this.repo.update({ id, status: 'building' }, { tilesDone });
  }
}
