import { can } from '../../shared/permissions.js';
import type { Invitation, InvitationStatus } from '../../shared/schemas/invitations.js';
import type { InvitationEntity } from '../db/entities/invitation.entity.js';

export function invitationStatus(invitation: InvitationEntity, now = new Date()): InvitationStatus {
  if (invitation.acceptedAt) return 'accepted';
  if (invitation.revokedAt) return 'revoked';
  if (invitation.expiresAt <= now) return 'expired';
  return 'pending';
}

export function presentInvitation(invitation: InvitationEntity, viewer: Express.User): Invitation {
  const status = invitationStatus(invitation);
  return {
    id: invitation.id,
    email: invitation.email,
    name: invitation.name,
    role: invitation.role,
    status,
    expiresAt: invitation.expiresAt.toISOString(),
    createdAt: invitation.createdAt.toISOString(),
    acceptedAt: invitation.acceptedAt?.toISOString() ?? null,
    sentCount: invitation.sentCount,
    invitedBy: invitation.invitedBy ? { id: invitation.invitedBy.id, name: invitation.invitedBy.name } : null,
    abilities: {
      resend: (status === 'pending' || status === 'expired') && can(viewer.role, 'invitation', 'resend'),
      revoke: status === 'pending' && can(viewer.role, 'invitation', 'revoke'),
    },
  };
}
