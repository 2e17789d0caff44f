import type { EntityManager } from 'typeorm';
import type { VesselsQuery } from '../../../shared/schemas/vessels.js';
import { VesselEntity } from '../entities/vessel.entity.js';
import { pageOf } from './paging.js';

export class VesselRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(VesselEntity);
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  findByName(name: string) {
    return this.repo.createQueryBuilder('vessel').where('LOWER(vessel.name) = :name', { name: name.toLowerCase() }).getOne();
  }

  page(query: VesselsQuery) {
    const qb = this.repo.createQueryBuilder('vessel');
    if (!query.includeArchived) qb.andWhere('vessel.archivedAt IS NULL');
    return pageOf(qb, query);
  }

  listActive() {
    return this.repo.createQueryBuilder('vessel').where('vessel.archivedAt IS NULL').orderBy('vessel.name', 'ASC').getMany();
  }

  create(fields: Omit<VesselEntity, 'id' | 'createdAt' | 'updatedAt' | 'version' | 'archivedAt'>) {
    return this.repo.save(this.repo.create({ ...fields, archivedAt: null }));
  }

  save(vessel: VesselEntity) {
    return this.repo.save(vessel);
  }
}
