import { In, type EntityManager } from 'typeorm';
import { HazardEntity } from '../entities/hazard.entity.js';

export class HazardRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(HazardEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { verifiedBy: true } });
  }

  /** Without relations, for changes (a loaded relation would override the foreign key on save). */
  findPlain(id: number) {
    return this.repo.findOneBy({ id });
  }

  listFor(compartmentId: number) {
    return this.repo.find({ where: { compartmentId }, relations: { verifiedBy: true }, order: { kind: 'ASC', id: 'ASC' } });
  }

  /** Hazard kinds per compartment, for lists. */
  async kindsFor(compartmentIds: number[]): Promise<Map<number, HazardEntity['kind'][]>> {
    const map = new Map<number, HazardEntity['kind'][]>();
    if (!compartmentIds.length) return map;
    const rows = await this.repo.find({ select: { compartmentId: true, kind: true }, where: { compartmentId: In(compartmentIds) }, order: { kind: 'ASC' } });
    for (const row of rows) {
      const kinds = map.get(row.compartmentId) ?? [];
      if (!kinds.includes(row.kind)) kinds.push(row.kind);
      map.set(row.compartmentId, kinds);
    }
    return map;
  }

  create(fields: Pick<HazardEntity, 'compartmentId' | 'kind' | 'notes' | 'lastVerifiedOn' | 'verifiedById'>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(hazard: HazardEntity) {
    return this.repo.save(hazard);
  }

  async remove(id: number) {
    await this.repo.delete({ id });
  }
}
