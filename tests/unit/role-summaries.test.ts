import { describe, expect, it } from 'vitest';
import { can } from '../../shared/permissions.js';
import { ROLE_SUMMARIES, ROLES } from '../../shared/roles.js';

// The descriptions shown on invitations and the people page say what each role can do now.
describe('role summaries', () => {
  it.each(ROLES)('%s: names incidents exactly when the role may log them, and backups when it may take them', (role) => {
    expect(/incident/i.test(ROLE_SUMMARIES[role])).toBe(can(role, 'incident', 'create'));
    expect(/backup/i.test(ROLE_SUMMARIES[role])).toBe(can(role, 'backup', 'read'));
    expect(ROLE_SUMMARIES[role]).not.toMatch(/tours|appeals|donations|receipts|treatments/i);
  });
});
