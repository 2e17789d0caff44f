import type { AuditEvent } from '../../shared/schemas/audit.js';
import type { AuditEventEntity } from '../db/entities/audit-event.entity.js';

export function presentAuditEvent(event: AuditEventEntity): AuditEvent {
  return {
    id: event.id,
    at: event.at.toISOString(),
    actor: event.actor ? { id: event.actor.id, name: event.actor.name, email: event.actor.email } : null,
    action: event.action,
    entityType: event.entityType,
    entityId: event.entityId,
    vesselId: event.vesselId,
    summary: event.summary,
    changes: event.changes,
  };
}
