import { In, type EntityManager } from 'typeorm';
import type { MediaOwnerType } from '../../../shared/schemas/media.js';
import { MediaEntity } from '../entities/media.entity.js';

export class MediaRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(MediaEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { uploadedBy: true } });
  }

  findByIds(ids: number[]) {
    return ids.length ? this.repo.findBy({ id: In([...new Set(ids)]) }) : Promise.resolve([]);
  }

  forOwner(ownerType: MediaOwnerType, ownerId: number) {
    return this.repo.find({ where: { ownerType, ownerId }, relations: { uploadedBy: true }, order: { id: 'ASC' } });
  }

  countForOwner(ownerType: MediaOwnerType, ownerId: number) {
    return this.repo.countBy({ ownerType, ownerId });
  }

  /** The first photo of a record, its cover in lists. */
  firstPhoto(ownerType: MediaOwnerType, ownerId: number) {
    return this.repo.findOne({ where: { ownerType, ownerId, kind: 'photo' }, order: { id: 'ASC' } });
  }

  /** Alt text of the given media, for covers in lists. */
  async altTexts(ids: number[]): Promise<Map<number, string>> {
    if (ids.length === 0) return new Map();
    const rows = await this.repo.createQueryBuilder('m').select(['m.id', 'm.altText']).where('m.id IN (:...ids)', { ids }).getMany();
    return new Map(rows.map((m) => [m.id, m.altText]));
  }

  /**
   * Of the given ids, the photos the public may no longer see (not marked for public use, no alt
   * text, or gone), in one query; audio and documents are not photos and are left out.
   */
  async hiddenPhotos(ids: number[]): Promise<Set<number>> {
    const wanted = [...new Set(ids)];
    if (!wanted.length) return new Set();
    const rows = await this.repo.find({ select: { id: true, kind: true, publicUse: true, altText: true }, where: { id: In(wanted) } });
    const found = new Map(rows.map((m) => [m.id, m]));
    return new Set(wanted.filter((id) => {
      const m = found.get(id);
      return !m || (m.kind === 'photo' && (!m.publicUse || !m.altText.trim()));
    }));
  }

  create(fields: Omit<MediaEntity, 'id' | 'vessel' | 'uploadedBy' | 'createdAt' | 'updatedAt' | 'version'>) {
    return this.repo.save(this.repo.create(fields));
  }

  save(media: MediaEntity) {
    return this.repo.save(media);
  }

  async remove(id: number) {
    await this.repo.delete({ id });
  }
}
