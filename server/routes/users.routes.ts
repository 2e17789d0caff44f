import { idParam } from '../../shared/schemas/common.js';
import { deactivateUserBody, updateUserBody, user, userPage, usersQuery } from '../../shared/schemas/users.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { UserService } from '../services/user.service.js';

export function userRoutes(api: ApiRouter, users: UserService) {
  const tag = 'People';

  api.route({
    method: 'get',
    path: '/users',
    tag,
    summary: 'List people with accounts (paged, sorted, filtered)',
    access: allowed('user', 'read'),
    query: usersQuery,
    response: userPage,
    handler: ({ req, query }) => users.list(query, req.user!),
  });

  api.route({
    method: 'get',
    path: '/users/:id',
    tag,
    summary: 'One person',
    access: allowed('user', 'read'),
    params: idParam,
    response: user,
    errors: [404],
    handler: ({ req, params }) => users.get(params.id, req.user!),
  });

  api.route({
    method: 'patch',
    path: '/users/:id',
    tag,
    summary: "Change a person's name or role",
    access: allowed('user', 'update'),
    params: idParam,
    body: updateUserBody,
    response: user,
    errors: [404, 409, 422],
    handler: ({ req, params, body }) => users.update(params.id, body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/users/:id/deactivate',
    tag,
    summary: 'Deactivate an account; its sessions end at once',
    access: allowed('user', 'deactivate'),
    params: idParam,
    body: deactivateUserBody,
    response: user,
    errors: [404, 422],
    handler: ({ req, params, body }) => users.deactivate(params.id, body.reason, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/users/:id/reactivate',
    tag,
    summary: 'Reactivate a deactivated account',
    access: allowed('user', 'reactivate'),
    params: idParam,
    response: user,
    errors: [404],
    handler: ({ req, params }) => users.reactivate(params.id, req.user!, actorOf(req)),
  });
}
