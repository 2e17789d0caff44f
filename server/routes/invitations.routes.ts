import { idParam } from '../../shared/schemas/common.js';
import { tokenBody } from '../../shared/schemas/auth.js';
import { acceptInvitationBody, createInvitationBody, inspectInvitationResponse, invitation, invitationPage, invitationsQuery } from '../../shared/schemas/invitations.js';
import { sessionUser } from '../../shared/schemas/auth.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed, anyone } from '../http/access.js';
import { actorOf } from '../services/audit.service.js';
import type { InvitationService } from '../services/invitation.service.js';
import { permissionsFor } from '../../shared/permissions.js';

export function invitationRoutes(api: ApiRouter, invitations: InvitationService) {
  const tag = 'Invitations';

  api.route({
    method: 'get',
    path: '/invitations',
    tag,
    summary: 'List invitations (paged, filtered by status)',
    access: allowed('invitation', 'read'),
    query: invitationsQuery,
    response: invitationPage,
    handler: ({ req, query }) => invitations.list(query, req.user!),
  });

  api.route({
    method: 'post',
    path: '/invitations',
    tag,
    summary: 'Invite a person by e-mail with a role',
    access: allowed('invitation', 'create'),
    body: createInvitationBody,
    status: 201,
    response: invitation,
    errors: [409],
    handler: ({ req, body }) => invitations.create(body, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/invitations/:id/resend',
    tag,
    summary: 'Send an invitation again with a new link and a new expiry',
    access: allowed('invitation', 'resend'),
    params: idParam,
    response: invitation,
    errors: [404, 422],
    handler: ({ req, params }) => invitations.resend(params.id, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/invitations/:id/revoke',
    tag,
    summary: 'Withdraw a pending invitation',
    access: allowed('invitation', 'revoke'),
    params: idParam,
    response: invitation,
    errors: [404, 422],
    handler: ({ req, params }) => invitations.revoke(params.id, req.user!, actorOf(req)),
  });

  api.route({
    method: 'post',
    path: '/invitations/inspect',
    tag,
    summary: 'What an invitation link is for, and whether it can still be used',
    access: anyone,
    body: tokenBody,
    response: inspectInvitationResponse,
    errors: [404],
    handler: ({ body }) => invitations.inspect(body.token),
  });

  api.route({
    method: 'post',
    path: '/invitations/accept',
    tag,
    summary: 'Accept an invitation: choose a password and create the account',
    access: anyone,
    body: acceptInvitationBody,
    status: 201,
    response: sessionUser,
    errors: [404, 409, 422],
    handler: async ({ req, body }) => {
      const user = await invitations.accept(body, req.ip ?? null);
      return { ...user, permissions: permissionsFor(user.role) };
    },
  });
}
