import type { Repositories } from '../db/store.js';
import { ConflictError } from '../http/errors.js';

/**
 * The 409 for a save made on an outdated version, naming the fields others changed since. Every
 * version of a record that uses it is written with exactly one audit event, so the events after the
 * caller's version are the latest (current − theirs).
 */
export async function staleEditError(repos: Repositories, entityType: string, entityId: number, subject: string, current: number, theirs: number): Promise<ConflictError> {
  const events = current > theirs ? await repos.auditEvents.latestFor(entityType, entityId, current - theirs) : [];
  const fields: Record<string, string> = { version: `current version is ${current}` };
  for (const event of events.reverse()) {
    for (const [field, change] of Object.entries(event.changes ?? {})) {
      fields[field] = `Changed${event.actor ? ` by ${event.actor.name}` : ''} to ${JSON.stringify(change.to)}.`;
    }
  }
  const names = Object.keys(fields).filter((f) => f !== 'version');
  const what = names.length ? ` (${names.join(', ')})` : '';
  return new ConflictError(`Someone else changed ${subject} since you opened it${what}. Reload to see their changes; yours are not saved.`, fields);
}
