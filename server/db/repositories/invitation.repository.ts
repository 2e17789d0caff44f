import { IsNull, MoreThan, type EntityManager } from 'typeorm';
import type { InvitationsQuery } from '../../../shared/schemas/invitations.js';
import { InvitationEntity } from '../entities/invitation.entity.js';
import { pageOf } from './paging.js';

export class InvitationRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(InvitationEntity);
  }

  findById(id: number) {
    return this.repo.findOne({ where: { id }, relations: { invitedBy: true } });
  }

  findByTokenHash(tokenHash: string) {
    return this.repo.findOneBy({ tokenHash });
  }

  findOpenForEmail(email: string, now: Date) {
    return this.repo.findOneBy({ email, acceptedAt: IsNull(), revokedAt: IsNull(), expiresAt: MoreThan(now) });
  }

  page(query: InvitationsQuery, now: Date) {
    const qb = this.repo.createQueryBuilder('invitation').leftJoinAndSelect('invitation.invitedBy', 'invitedBy');
    switch (query.status) {
      case 'accepted':
        qb.andWhere('invitation.acceptedAt IS NOT NULL');
        break;
      case 'revoked':
        qb.andWhere('invitation.revokedAt IS NOT NULL AND invitation.acceptedAt IS NULL');
        break;
      case 'expired':
        qb.andWhere('invitation.acceptedAt IS NULL AND invitation.revokedAt IS NULL AND invitation.expiresAt <= :now', { now });
        break;
      case 'pending':
        qb.andWhere('invitation.acceptedAt IS NULL AND invitation.revokedAt IS NULL AND invitation.expiresAt > :now', { now });
        break;
    }
    return pageOf(qb, query);
  }

  create(fields: Pick<InvitationEntity, 'email' | 'name' | 'role' | 'tokenHash' | 'expiresAt' | 'invitedById'>) {
    return this.repo.save(this.repo.create({ ...fields, sentCount: 1 }));
  }

  save(invitation: InvitationEntity) {
    return this.repo.save(invitation);
  }
}
