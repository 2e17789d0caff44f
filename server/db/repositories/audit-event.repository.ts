import type { EntityManager } from 'typeorm';
import type { AuditEventsQuery } from '../../../shared/schemas/audit.js';
import { AuditEventEntity } from '../entities/audit-event.entity.js';
import { pageOf } from './paging.js';

export class AuditEventRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(AuditEventEntity);
  }

  add(fields: Omit<AuditEventEntity, 'id' | 'actor'>) {
    return this.repo.save(this.repo.create(fields));
  }

  /** The latest events on one record, newest first. */
  latestFor(entityType: string, entityId: number, count: number) {
    return this.repo.find({ where: { entityType, entityId: String(entityId) }, relations: { actor: true }, order: { id: 'DESC' }, take: count });
  }

  page(query: AuditEventsQuery) {
    const qb = this.repo.createQueryBuilder('event').leftJoinAndSelect('event.actor', 'actor');
    if (query.actorId) qb.andWhere('event.actorId = :actorId', { actorId: query.actorId });
    if (query.entityType) qb.andWhere('event.entityType = :entityType', { entityType: query.entityType });
    if (query.action) qb.andWhere('event.action = :action', { action: query.action });
    if (query.from) qb.andWhere('event.at >= :from', { from: new Date(`${query.from}T00:00:00.000Z`) });
    if (query.to) qb.andWhere('event.at < :to', { to: new Date(new Date(`${query.to}T00:00:00.000Z`).getTime() + 86_400_000) });
    return pageOf(qb, query);
  }

  entityTypes() {
    return this.repo
      .createQueryBuilder('event')
      .select('DISTINCT event.entityType', 'entityType')
      .orderBy('entityType')
      .getRawMany<{ entityType: string }>()
      .then((rows) => rows.map((r) => r.entityType));
  }
}
