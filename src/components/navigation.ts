import type { Action, Resource } from '@shared/permissions';

/** A resource with one of its own actions (a plain `Action` would allow only those every resource has). */
export type NavPermission = { [R in Resource]: { resource: R; action: Action<R> } }[Resource];

export interface NavEntry {
  label: string;
  icon: string;
  route: string;
  permission?: NavPermission;
}

/** The staff navigation: only parts that exist; each shows to the roles that may use it. */
export const STAFF_NAV: NavEntry[] = [
  { label: 'Overview', icon: 'pi pi-compass', route: 'staff-home' },
  { label: 'Vessels', icon: 'pi pi-flag', route: 'vessels', permission: { resource: 'vessel', action: 'read' } },
  { label: 'Ship map', icon: 'pi pi-map', route: 'ship-map', permission: { resource: 'deck', action: 'read' } },
  { label: 'Compartments', icon: 'pi pi-th-large', route: 'compartments', permission: { resource: 'compartment', action: 'read' } },
  { label: 'Collection', icon: 'pi pi-box', route: 'artifacts', permission: { resource: 'artifact', action: 'read' } },
  { label: 'Condition', icon: 'pi pi-clipboard', route: 'condition-reports', permission: { resource: 'conditionReport', action: 'read' } },
  { label: 'Incidents', icon: 'pi pi-exclamation-triangle', route: 'incidents', permission: { resource: 'incident', action: 'read' } },
  { label: 'Interpretation', icon: 'pi pi-book', route: 'interpretations', permission: { resource: 'interpretation', action: 'read' } },
  { label: 'Risk register', icon: 'pi pi-sort-amount-down', route: 'risks', permission: { resource: 'risk', action: 'read' } },
  { label: 'Tours', icon: 'pi pi-directions', route: 'tours', permission: { resource: 'tour', action: 'read' } },
  { label: 'Repair projects', icon: 'pi pi-wrench', route: 'repair-projects', permission: { resource: 'repairProject', action: 'read' } },
  { label: 'Giving', icon: 'pi pi-heart', route: 'giving', permission: { resource: 'donation', action: 'read' } },
  { label: 'People', icon: 'pi pi-users', route: 'people', permission: { resource: 'user', action: 'read' } },
  { label: 'Audit trail', icon: 'pi pi-history', route: 'audit-trail', permission: { resource: 'auditEvent', action: 'read' } },
  { label: 'Outbox', icon: 'pi pi-envelope', route: 'outbox', permission: { resource: 'outbox', action: 'read' } },
  { label: 'Settings', icon: 'pi pi-sliders-h', route: 'settings', permission: { resource: 'settings', action: 'update' } },
];
