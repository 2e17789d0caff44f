import { describe, expect, it } from 'vitest';
import { can } from '../../shared/permissions.js';
import { ROLE_SUMMARIES, ROLES } from '../../shared/roles.js';

// The descriptions shown on invitations and the people page say what each role can do now.
describe('role summaries', () => {
  it.each(ROLES)('%s: names each kind of work exactly when the role may do it', (role) => {
    const summary = ROLE_SUMMARIES[role];
    expect(/incident/i.test(summary)).toBe(can(role, 'incident', 'create'));
    expect(/backup/i.test(summary)).toBe(can(role, 'backup', 'read'));
    expect(/tours/i.test(summary)).toBe(can(role, 'tour', 'create'));
    expect(/interpretive text/i.test(summary)).toBe(can(role, 'interpretation', 'update'));
    expect(/\bpublishes\b/i.test(summary)).toBe(can(role, 'tour', 'approve'));
    expect(/proposes/i.test(summary)).toBe(can(role, 'repairProject', 'create'));
    expect(/approves repair/i.test(summary)).toBe(role === 'curator');
    expect(/treatments/i.test(summary)).toBe(can(role, 'treatment', 'create'));
    expect(/appeals/i.test(summary)).toBe(can(role, 'appeal', 'update'));
    expect(/refund/i.test(summary)).toBe(can(role, 'donation', 'refund'));
  });
});
