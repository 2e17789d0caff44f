import { z } from 'zod';
import { ROLES } from '../roles.js';
import { linkToken, newPassword } from './auth.js';
import { email, listQuery, pageOf } from './common.js';
import { text } from './text.js';

export const INVITATION_STATUSES = ['pending', 'accepted', 'expired', 'revoked'] as const;
export type InvitationStatus = (typeof INVITATION_STATUSES)[number];

export const invitation = z
  .object({
    id: z.number().int(),
    email: z.string(),
    name: z.string(),
    role: z.enum(ROLES),
    status: z.enum(INVITATION_STATUSES),
    expiresAt: z.string(),
    createdAt: z.string(),
    acceptedAt: z.string().nullable(),
    sentCount: z.number().int(),
    invitedBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
    abilities: z.object({ resend: z.boolean(), revoke: z.boolean() }),
  })
  .meta({ id: 'Invitation' });
export type Invitation = z.infer<typeof invitation>;

export const invitationsQuery = listQuery(['createdAt', 'email', 'expiresAt'], '-createdAt').extend({
  status: z.enum(INVITATION_STATUSES).optional(),
});
export type InvitationsQuery = z.infer<typeof invitationsQuery>;

export const invitationPage = pageOf(invitation).meta({ id: 'InvitationPage' });

export const createInvitationBody = z
  .object({
    email,
    name: text(120, 'Name'),
    role: z.enum(ROLES, { error: 'Choose one of the roles.' }),
  })
  .meta({ id: 'CreateInvitationBody' });
export type CreateInvitationBody = z.infer<typeof createInvitationBody>;

export const inspectInvitationResponse = z
  .object({
    email: z.string(),
    name: z.string(),
    role: z.enum(ROLES),
    status: z.enum(INVITATION_STATUSES),
    expiresAt: z.string(),
    organisationName: z.string(),
  })
  .meta({ id: 'InvitationPreview' });
export type InspectInvitationResponse = z.infer<typeof inspectInvitationResponse>;

export const acceptInvitationBody = z
  .object({
    token: linkToken,
    name: text(120, 'Name'),
    password: newPassword,
  })
  .meta({ id: 'AcceptInvitationBody' });
export type AcceptInvitationBody = z.infer<typeof acceptInvitationBody>;
