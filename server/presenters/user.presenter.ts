import { can } from '../../shared/permissions.js';
import type { User } from '../../shared/schemas/users.js';
import type { UserEntity } from '../db/entities/user.entity.js';

export function presentUser(user: UserEntity, viewer: Express.User): User {
  const isSelf = viewer.id === user.id;
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    status: user.status,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
    createdAt: user.createdAt.toISOString(),
    updatedAt: user.updatedAt.toISOString(),
    version: user.version,
    abilities: {
      update: can(viewer.role, 'user', 'update'),
      deactivate: !isSelf && user.status === 'active' && can(viewer.role, 'user', 'deactivate'),
      reactivate: user.status === 'deactivated' && can(viewer.role, 'user', 'reactivate'),
    },
  };
}
