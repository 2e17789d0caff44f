import { z } from 'zod';
import { auditEventPage, auditEventsQuery } from '../../shared/schemas/audit.js';
import { outboxIdParam, outboxMessage, outboxPage, outboxQuery } from '../../shared/schemas/outbox.js';
import { organisationSettings, updateSettingsBody } from '../../shared/schemas/settings.js';
import type { ApiRouter } from '../http/api-router.js';
import { allowed } from '../http/access.js';
import { actorOf, type AuditService } from '../services/audit.service.js';
import type { OutboxService } from '../services/outbox.service.js';
import type { SettingsService } from '../services/settings.service.js';

export function adminRoutes(api: ApiRouter, deps: { audit: AuditService; settings: SettingsService; outbox: OutboxService }) {
  api.route({
    method: 'get',
    path: '/audit-events',
    tag: 'Audit trail',
    summary: 'Who changed what and when (paged, filtered by person, record type, action and dates)',
    access: allowed('auditEvent', 'read'),
    query: auditEventsQuery,
    response: auditEventPage,
    handler: ({ query }) => deps.audit.list(query),
  });

  api.route({
    method: 'get',
    path: '/audit-events/entity-types',
    tag: 'Audit trail',
    summary: 'The record types that appear in the audit trail, for its filter',
    access: allowed('auditEvent', 'read'),
    response: z.array(z.string()),
    handler: () => deps.audit.entityTypes(),
  });

  api.route({
    method: 'get',
    path: '/settings',
    tag: 'Settings',
    summary: "The organisation's settings",
    access: allowed('settings', 'read'),
    response: organisationSettings,
    handler: () => deps.settings.get(),
  });

  api.route({
    method: 'patch',
    path: '/settings',
    tag: 'Settings',
    summary: "Change the organisation's settings",
    access: allowed('settings', 'update'),
    body: updateSettingsBody,
    response: organisationSettings,
    errors: [409],
    handler: ({ req, body }) => deps.settings.update(body, actorOf(req)),
  });

  api.route({
    method: 'get',
    path: '/outbox',
    tag: 'Outbox',
    summary: 'Messages kept by the local fake mail server',
    access: allowed('outbox', 'read'),
    query: outboxQuery,
    response: outboxPage,
    handler: ({ query }) => deps.outbox.list(query),
  });

  api.route({
    method: 'get',
    path: '/outbox/:id',
    tag: 'Outbox',
    summary: 'One message as the recipient would see it',
    access: allowed('outbox', 'read'),
    params: outboxIdParam,
    response: outboxMessage,
    errors: [404],
    handler: ({ params }) => deps.outbox.get(params.id),
  });
}
