import { IsNull, type EntityManager } from 'typeorm';
import { PasswordResetEntity } from '../entities/password-reset.entity.js';

export class PasswordResetRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(PasswordResetEntity);
  }

  create(fields: Pick<PasswordResetEntity, 'userId' | 'tokenHash' | 'expiresAt'>) {
    return this.repo.save(this.repo.create(fields));
  }

  findByTokenHash(tokenHash: string) {
    return this.repo.findOneBy({ tokenHash });
  }

  /** Marks every unused reset of a user as used (after a successful reset or a password change). */
  async useAllFor(userId: number, at: Date) {
    await this.repo.update({ userId, usedAt: IsNull() }, { usedAt: at });
  }
}
