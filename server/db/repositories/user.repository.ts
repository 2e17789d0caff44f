import type { EntityManager } from 'typeorm';
import type { UsersQuery } from '../../../shared/schemas/users.js';
import { UserEntity } from '../entities/user.entity.js';
import { likePattern, pageOf } from './paging.js';

export class UserRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(UserEntity);
  }

  /** Active people of a role (who gets the condition alerts). */
  activeWithRole(role: UserEntity['role']) {
    return this.repo.find({ where: { role, status: 'active' }, order: { id: 'ASC' } });
  }

  findById(id: number) {
    return this.repo.findOneBy({ id });
  }

  findByEmail(email: string) {
    return this.repo.findOneBy({ email: email.toLowerCase() });
  }

  page(query: UsersQuery) {
    const qb = this.repo.createQueryBuilder('user');
    if (query.role) qb.andWhere('user.role = :role', { role: query.role });
    if (query.status) qb.andWhere('user.status = :status', { status: query.status });
    if (query.q) qb.andWhere("(LOWER(user.name) LIKE :q ESCAPE '\\' OR user.email LIKE :q ESCAPE '\\')", { q: likePattern(query.q) });
    return pageOf(qb, query);
  }

  countActiveAdmins() {
    return this.repo.countBy({ role: 'admin', status: 'active' });
  }

  create(fields: Pick<UserEntity, 'email' | 'name' | 'role' | 'passwordHash'>) {
    return this.repo.save(this.repo.create({ ...fields, status: 'active' }));
  }

  save(user: UserEntity) {
    return this.repo.save(user);
  }

  /** Records a sign-in without counting it as an edit (version and updatedAt stay). */
  touchSignIn(id: number, at: Date) {
    return this.repo.update({ id }, { lastSignInAt: at, version: () => '"version"', updatedAt: () => '"updatedAt"' });
  }

  count() {
    return this.repo.count();
  }
}
