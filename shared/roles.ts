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
  admin: 'People, roles, organisation settings, backups and the audit trail.',
  curator: 'The ship map, the collection and the risk register; logs incidents and closes spaces.',
  conservator: 'Condition reports, incidents, hazards and the risk register.',
  docent: 'Reads the ship map and the collection, and logs the incidents they find, with photos.',
  fundraiser: 'Reads the ship map, the collection and condition summaries.',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
