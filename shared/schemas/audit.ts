import { z } from 'zod';
import { listQuery, pageOf } from './common.js';
import { line } from './text.js';

export const AUDIT_ACTIONS = ['create', 'update', 'delete', 'archive', 'move', 'import', 'upload', 'submit', 'amend', 'restore', 'deactivate', 'reactivate', 'invite', 'resend', 'revoke', 'accept', 'sign-in', 'sign-in-failed', 'sign-out', 'password-reset-request', 'password-reset', 'password-change', 'approve', 'return', 'retire', 'comment', 'refund', 'export', 'publish', 'unpublish', 'payment'] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

export const auditChange = z.object({ from: z.unknown(), to: z.unknown() });

export const auditEvent = z
  .object({
    id: z.number().int(),
    at: z.string(),
    actor: z.object({ id: z.number().int(), name: z.string(), email: z.string() }).nullable(),
    action: z.enum(AUDIT_ACTIONS),
    entityType: z.string(),
    entityId: z.string().nullable(),
    vesselId: z.number().int().nullable(),
    summary: z.string(),
    changes: z.record(z.string(), auditChange).nullable(),
  })
  .meta({ id: 'AuditEvent' });
export type AuditEvent = z.infer<typeof auditEvent>;

export const auditEventsQuery = listQuery(['at'], '-at').extend({
  actorId: z.coerce.number().int().positive().optional(),
  entityType: line(60, 'Record type').optional(),
  action: z.enum(AUDIT_ACTIONS).optional(),
  from: z.iso.date('Use a date as YYYY-MM-DD.').optional(),
  to: z.iso.date('Use a date as YYYY-MM-DD.').optional(),
});
export type AuditEventsQuery = z.infer<typeof auditEventsQuery>;

export const auditEventPage = pageOf(auditEvent).meta({ id: 'AuditEventPage' });
