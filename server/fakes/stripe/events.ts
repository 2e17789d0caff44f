import { noSuch, invalidParam } from './errors.js';
import { optionalInteger, optionalObject, optionalString, refuseUnknown, type Params } from './params.js';
import { newId, nowSeconds, type FakeStripeStore, type StripeEvent } from './store.js';

export interface EventSource {
  requestId: string | null;
  idempotencyKey: string | null;
  apiVersion: string;
}

/** Records an event with a snapshot of the object as it is now. */
export function recordEvent(
  store: FakeStripeStore,
  source: EventSource,
  type: string,
  object: unknown,
  previousAttributes?: Record<string, unknown>,
): StripeEvent {
  const event: StripeEvent = {
    id: newId('evt'),
    object: 'event',
    api_version: source.apiVersion,
    created: nowSeconds(),
    data: previousAttributes ? { object: structuredClone(object), previous_attributes: previousAttributes } : { object: structuredClone(object) },
    livemode: false,
    pending_webhooks: 0,
    request: { id: source.requestId, idempotency_key: source.idempotencyKey },
    type,
  };
  store.events.push(event);
  return event;
}

export function retrieveEvent(store: FakeStripeStore, id: string): StripeEvent {
  const event = store.event(id);
  if (!event) throw noSuch('event', id);
  return event;
}

/** `GET /v1/events`: newest first, `limit` 1–100 (10 by default), cursors, `type`, `types[]` and `created` bounds. */
export function listEvents(store: FakeStripeStore, query: Params) {
  refuseUnknown(query, ['limit', 'starting_after', 'ending_before', 'type', 'types', 'created', 'delivery_success', 'expand']);
  const limit = optionalInteger(query, 'limit') ?? 10;
  if (limit < 1 || limit > 100) throw invalidParam('This value must be greater than or equal to 1 and less than or equal to 100.', 'limit', 'parameter_invalid_integer');
  const type = optionalString(query, 'type');
  const types = query.types === undefined ? null : Object.values(query.types as object).map(String);
  let created: Params | null = null;
  let createdExact: number | null = null;
  if (typeof query.created === 'string') createdExact = optionalInteger(query, 'created');
  else created = optionalObject(query, 'created');
  const bound = (key: string) => (created ? optionalInteger(created, key, `created[${key}]`) : null);
  const [gt, gte, lt, lte] = [bound('gt'), bound('gte'), bound('lt'), bound('lte')];

  const matchesType = (t: string) => {
    if (types) return types.includes(t);
    if (!type) return true;
    if (type.endsWith('*')) return t.startsWith(type.slice(0, -1));
    return t === type;
  };
  let all = [...store.events].reverse().filter((e) =>
    matchesType(e.type) &&
    (createdExact === null || e.created === createdExact) &&
    (gt === null || e.created > gt) && (gte === null || e.created >= gte) &&
    (lt === null || e.created < lt) && (lte === null || e.created <= lte));

  const after = optionalString(query, 'starting_after');
  const before = optionalString(query, 'ending_before');
  if (after) {
    const i = all.findIndex((e) => e.id === after);
    if (i < 0) throw noSuch('event', after, 'starting_after');
    all = all.slice(i + 1);
  } else if (before) {
    const i = all.findIndex((e) => e.id === before);
    if (i < 0) throw noSuch('event', before, 'ending_before');
    all = all.slice(Math.max(0, i - limit), i);
    return { object: 'list', data: all, has_more: i - limit > 0, url: '/v1/events' };
  }
  return { object: 'list', data: all.slice(0, limit), has_more: all.length > limit, url: '/v1/events' };
}
