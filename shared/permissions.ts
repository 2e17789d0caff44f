import { ROLES, type Role } from './roles.js';
import type { MediaOwnerType } from './schemas/media.js';

/**
 * Who may do what, declared once per resource and action. The server enforces it on every
 * route (see server/http/api-route.ts); the client reads the same table to hide what a user
 * may not do.
 */
const STAFF: readonly Role[] = ROLES;
const ADMIN: readonly Role[] = ['admin'];
const CURATOR: readonly Role[] = ['curator'];
const CONSERVATOR: readonly Role[] = ['conservator'];

export const PERMISSIONS = {
  vessel: { read: STAFF, create: ADMIN, update: ['admin', 'curator'], archive: ADMIN },
  user: { read: ADMIN, update: ADMIN, deactivate: ADMIN, reactivate: ADMIN },
  invitation: { read: ADMIN, create: ADMIN, resend: ADMIN, revoke: ADMIN },
  auditEvent: { read: ADMIN },
  settings: { read: STAFF, update: ADMIN },
  outbox: { read: ADMIN },
  backup: { read: ADMIN, create: ADMIN },
  deck: { read: STAFF, create: CURATOR, update: CURATOR, delete: CURATOR },
  compartment: { read: STAFF, create: CURATOR, update: CURATOR, delete: CURATOR },
  hazard: { read: STAFF, create: CONSERVATOR, update: CONSERVATOR, delete: CONSERVATOR },
  artifact: { read: STAFF, create: CURATOR, update: CURATOR, move: CURATOR, archive: CURATOR, import: CURATOR },
  /** Files on a record; the service also asks for the right to change the record they belong to. */
  /** Every staff role reads summaries; findings and details are for the people who care for the ship. */
  conditionReport: { read: STAFF, readFindings: ['admin', 'curator', 'conservator'], create: CONSERVATOR, update: CONSERVATOR, delete: CONSERVATOR, submit: ['conservator', 'curator'], amend: CONSERVATOR },
  /** Curators log incidents too: they find vandalism on their rounds and close spaces. */
  risk: { read: STAFF, create: CONSERVATOR, update: CONSERVATOR, delete: CONSERVATOR },
  /** Docents find damage on tours and log it; a conservator or curator completes the record. */
  incident: { read: STAFF, create: ['conservator', 'curator', 'docent'], update: ['conservator', 'curator'] },
  /** Docents write tours and submit them; curators publish (their own work too). */
  tour: { read: STAFF, create: ['docent', 'curator'], update: ['docent', 'curator'], submit: ['docent', 'curator'], comment: ['docent', 'curator'], approve: CURATOR, return: CURATOR, retire: CURATOR },
  /** Approving is the curator's alone: the service refuses a conservator's approval (changeStatus covers the other steps). */
  repairProject: { read: STAFF, create: ['curator', 'conservator'], update: ['curator', 'conservator'], changeStatus: ['curator', 'conservator'] },
  treatment: { read: STAFF, create: ['conservator', 'curator'], update: ['conservator', 'curator'] },
  /** The public appeal of a repair project: fundraisers run it, curators may edit it too. */
  appeal: { read: STAFF, update: ['fundraiser', 'curator', 'admin'] },
  /** Gifts: donors' e-mail addresses, refunds and exports are for fundraisers and administrators only. */
  donation: { read: ['fundraiser', 'admin', 'curator'], readDonor: ['fundraiser', 'admin'], refund: ['fundraiser', 'admin'], export: ['fundraiser', 'admin'] },
  /** Placard labels and stories on artifacts and compartments: docents write and submit, a curator publishes. */
  interpretation: { read: STAFF, update: ['docent', 'curator'], submit: ['docent', 'curator'], approve: CURATOR, return: CURATOR },
  media: { read: STAFF, create: ['curator', 'conservator', 'docent'], update: ['curator', 'conservator'], delete: ['curator', 'conservator'] },
} as const satisfies Record<string, Record<string, readonly Role[]>>;

export type Resource = keyof typeof PERMISSIONS;
export type Action<R extends Resource = Resource> = keyof (typeof PERMISSIONS)[R] & string;

/** A permission as carried by a route or a navigation entry. */
export interface Permission<R extends Resource = Resource> {
  resource: R;
  action: Action<R>;
}

export function can<R extends Resource>(role: Role | null | undefined, resource: R, action: Action<R>): boolean {
  if (!role) return false;
  const allowed = (PERMISSIONS[resource] as Record<string, readonly Role[]>)[action];
  return allowed ? allowed.includes(role) : false;
}

/**
 * The record a file belongs to, by owner type, and the action whose roles may read its files. Files
 * inherit the read rule of their owner: a condition report's photos and documents are evidence of
 * its findings (their captions describe them), so they follow `readFindings`, not `read`.
 */
export const MEDIA_OWNERS = {
  artifact: { resource: 'artifact', read: 'read' },
  compartment: { resource: 'compartment', read: 'read' },
  /** Whoever may log an incident may add its photos (attach); changing them takes update. */
  incident: { resource: 'incident', read: 'read', attach: 'create' },
  'condition-report': { resource: 'conditionReport', read: 'readFindings' },
  /** A tour's cover photo and its stops' audio. */
  tour: { resource: 'tour', read: 'read' },
  'treatment-before': { resource: 'treatment', read: 'read' },
  'treatment-after': { resource: 'treatment', read: 'read' },
} as const satisfies Record<MediaOwnerType, { resource: Resource; read: string; attach?: string }>;

/** Whether the role may see the files of this kind of record: listed, described or served, in any response. */
export function canReadMediaOf(role: Role | null | undefined, ownerType: MediaOwnerType): boolean {
  const owner = MEDIA_OWNERS[ownerType];
  return can(role, 'media', 'read') && can(role, owner.resource, owner.read as never);
}

/** Every resource and the actions the role may take on it; sent to the client with the user. */
export type PermissionMap = { [R in Resource]: Action<R>[] };

export function permissionsFor(role: Role): PermissionMap {
  const map = {} as Record<string, string[]>;
  for (const [resource, actions] of Object.entries(PERMISSIONS)) {
    map[resource] = Object.entries(actions as Record<string, readonly Role[]>)
      .filter(([, roles]) => roles.includes(role))
      .map(([action]) => action);
  }
  return map as PermissionMap;
}

export function allPermissions(): Permission[] {
  const list: Permission[] = [];
  for (const [resource, actions] of Object.entries(PERMISSIONS)) {
    for (const action of Object.keys(actions)) list.push({ resource, action } as Permission);
  }
  return list;
}
