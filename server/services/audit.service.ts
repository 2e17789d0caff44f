import type { Request } from 'express';
import type { AuditAction, AuditEventsQuery } from '../../shared/schemas/audit.js';
import type { AuditChanges, AuditEventEntity } from '../db/entities/audit-event.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { presentAuditEvent } from '../presenters/audit-event.presenter.js';

/** Who is making a change, as the audit trail records it. */
export interface Actor {
  id: number | null;
  ip: string | null;
}

export function actorOf(req: Request): Actor {
  return { id: req.user?.id ?? null, ip: req.ip ?? null };
}

export interface AuditEntry {
  action: AuditAction;
  entityType: string;
  entityId: string | number | null;
  vesselId?: number | null;
  summary: string;
  changes?: AuditChanges | null;
}

export type AuditRow = Omit<AuditEventEntity, 'id' | 'actor'>;

/** The row of one audit event (also written in bulk by the CSV import). */
export function auditRowOf(actor: Actor, entry: AuditEntry): AuditRow {
  return {
    at: new Date(),
    actorId: actor.id,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId === null ? null : String(entry.entityId),
    vesselId: entry.vesselId ?? null,
    summary: entry.summary.slice(0, 300),
    changes: entry.changes ?? null,
    ipAddress: actor.ip,
  };
}

/** Writes one audit event with the repositories of the change's own transaction. */
export function recordAudit(repos: Repositories, actor: Actor, entry: AuditEntry) {
  return repos.auditEvents.add(auditRowOf(actor, entry));
}

/** The fields whose values differ between two versions of a record. */
export function changesBetween<T extends object>(before: T, after: Partial<T>, keys: (keyof T & string)[]): AuditChanges | null {
  const changes: AuditChanges = {};
  for (const key of keys) {
    if (!(key in after)) continue;
    const from = before[key];
    const to = after[key];
    if (JSON.stringify(from) !== JSON.stringify(to)) changes[key] = { from: from ?? null, to: to ?? null };
  }
  return Object.keys(changes).length ? changes : null;
}

export class AuditService {
  constructor(private readonly store: Store) {}

  async list(query: AuditEventsQuery) {
    const page = await this.store.repos.auditEvents.page(query);
    return { ...page, items: page.items.map(presentAuditEvent) };
  }

  entityTypes() {
    return this.store.repos.auditEvents.entityTypes();
  }
}
