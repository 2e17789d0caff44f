export const ROLES = ['admin', 'curator', 'conservator', 'docent', 'fundraiser'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  curator: 'Curator',
  conservator: 'Conservator',
  docent: 'Docent',
  fundraiser: 'Fundraiser',
};

export const ROLE_SUMMARIES: Record<Role, string> = {
  admin: 'People, roles, organisation settings, backups and the audit trail; edits appeals and refunds gifts.',
  curator: 'The ship map, the collection and the risk register; logs incidents and closes spaces; writes and publishes tours and interpretive text; proposes and approves repair projects, records treatments and edits appeals.',
  conservator: 'Condition reports, incidents, hazards and the risk register; proposes repair projects and records treatments.',
  docent: 'Writes tours and interpretive text for a curator to publish; reads the ship map and the collection, and logs the incidents they find, with photos.',
  fundraiser: 'Runs the appeals of repair projects: gifts, receipts, refunds and donor exports; reads the ship map, the collection and condition summaries.',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
