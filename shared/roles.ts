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
  admin: 'People, roles, organisation settings and the audit trail.',
  curator: 'The ship map, the collection, tours and repair projects.',
  conservator: 'Condition reports, incidents, treatments and hazards.',
  docent: 'Writes tours and stops for review.',
  fundraiser: 'Repair appeals, donations and receipts.',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
