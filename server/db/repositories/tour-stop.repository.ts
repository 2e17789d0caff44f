import { In, type EntityManager } from 'typeorm';
import { TourStopEntity } from '../entities/tour-stop.entity.js';

export class TourStopRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(TourStopEntity);
  }

  listFor(tourId: number) {
    return this.repo.find({ where: { tourId }, order: { position: 'ASC', id: 'ASC' } });
  }

  findPlain(id: number) {
    return this.repo.findOneBy({ id });
  }

  /** Stops per tour, for lists. */
  async counts(tourIds: number[]): Promise<Map<number, number>> {
    if (!tourIds.length) return new Map();
    const rows = await this.repo.createQueryBuilder('s').select('s.tourId', 'tourId').addSelect('COUNT(*)', 'n').where({ tourId: In(tourIds) }).groupBy('s.tourId').getRawMany<{ tourId: number; n: number }>();
    return new Map(rows.map((r) => [Number(r.tourId), Number(r.n)]));
  }

  /** Whether any stop of any tour plays this audio or stands in this space. */
  countInCompartment(compartmentId: number) {
    return this.repo.countBy({ compartmentId });
  }

  create(fields: Omit<TourStopEntity, 'id' | 'tour' | 'compartment' | 'createdAt' | 'updatedAt' | 'version'> & { id?: number }) {
    return this.repo.save(this.repo.create(fields));
  }

  save(stop: TourStopEntity) {
    return this.repo.save(stop);
  }

  async setPosition(id: number, position: number) {
    await this.repo.update({ id }, { position });
  }

  async remove(id: number) {
    await this.repo.delete({ id });
  }
}
