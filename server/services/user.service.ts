import type { UpdateUserBody, UsersQuery } from '../../shared/schemas/users.js';
import { ROLE_LABELS } from '../../shared/roles.js';
import type { DatabaseSessionStore } from '../auth/session-store.js';
import type { Store } from '../db/store.js';
import { NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import { presentUser } from '../presenters/user.presenter.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';

export class UserService {
  constructor(private readonly store: Store, private readonly sessions: DatabaseSessionStore) {}

  async list(query: UsersQuery, viewer: Express.User) {
    const page = await this.store.repos.users.page(query);
    return { ...page, items: page.items.map((u) => presentUser(u, viewer)) };
  }

  async get(id: number, viewer: Express.User) {
    const user = await this.store.repos.users.findById(id);
    if (!user) throw new NotFoundError('The user');
    return presentUser(user, viewer);
  }

  async update(id: number, body: UpdateUserBody, viewer: Express.User, actor: Actor) {
    const result = await this.store.transaction(async (repos) => {
      const user = await repos.users.findById(id);
      if (!user) throw new NotFoundError('The user');
      if (user.version !== body.version) {
        throw new StaleVersionError('this person', user.version);
      }
      const { version: _version, ...fields } = body;
      if (fields.role && fields.role !== 'admin' && user.role === 'admin' && user.status === 'active' && (await repos.users.countActiveAdmins()) <= 1) {
        throw new UnprocessableError('This is the last active administrator. Make someone else an administrator first.', { role: 'The last administrator keeps the role.' });
      }
      const changes = changesBetween(user, fields, ['name', 'role']);
      if (!changes) return { user, roleChanged: false };
      Object.assign(user, fields);
      const saved = await repos.users.save(user);
      const summary = changes.role
        ? `Role of ${user.email} changed from ${ROLE_LABELS[changes.role.from as keyof typeof ROLE_LABELS]} to ${ROLE_LABELS[user.role]}`
        : `Details of ${user.email} changed`;
      await recordAudit(repos, actor, { action: 'update', entityType: 'user', entityId: user.id, summary, changes });
      return { user: saved, roleChanged: Boolean(changes.role) };
    });
    return presentUser(result.user, viewer);
  }

  async deactivate(id: number, reason: string | undefined, viewer: Express.User, actor: Actor) {
    const user = await this.store.transaction(async (repos) => {
      const user = await repos.users.findById(id);
      if (!user) throw new NotFoundError('The user');
      if (user.id === viewer.id) throw new UnprocessableError('You cannot deactivate your own account.');
      if (user.status === 'deactivated') return user;
      if (user.role === 'admin' && (await repos.users.countActiveAdmins()) <= 1) {
        throw new UnprocessableError('This is the last active administrator and cannot be deactivated.');
      }
      user.status = 'deactivated';
      const saved = await repos.users.save(user);
      await repos.passwordResets.useAllFor(user.id, new Date());
      await recordAudit(repos, actor, {
        action: 'deactivate',
        entityType: 'user',
        entityId: user.id,
        summary: `${user.email} deactivated${reason ? `: ${reason}` : ''}`,
        changes: { status: { from: 'active', to: 'deactivated' } },
      });
      return saved;
    });
    await this.sessions.destroyForUser(user.id);
    return presentUser(user, viewer);
  }

  async reactivate(id: number, viewer: Express.User, actor: Actor) {
    const user = await this.store.transaction(async (repos) => {
      const user = await repos.users.findById(id);
      if (!user) throw new NotFoundError('The user');
      if (user.status === 'active') return user;
      user.status = 'active';
      const saved = await repos.users.save(user);
      await recordAudit(repos, actor, {
        action: 'reactivate',
        entityType: 'user',
        entityId: user.id,
        summary: `${user.email} reactivated`,
        changes: { status: { from: 'deactivated', to: 'active' } },
      });
      return saved;
    });
    return presentUser(user, viewer);
  }
}
