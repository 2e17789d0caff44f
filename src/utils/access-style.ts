import type { AccessStatus } from '@shared/schemas/compartments';

/** How each access status is drawn on the plan: a colour and, for those who cannot tell colours apart, a border pattern. */
export const ACCESS_STYLE: Record<AccessStatus, { color: string; dashArray: string | undefined; pattern: string }> = {
  open: { color: '#2f7d4a', dashArray: undefined, pattern: 'solid border' },
  'guided-only': { color: '#1f5f9e', dashArray: '10 5', pattern: 'long dashes' },
  'staff-only': { color: '#8a6a1f', dashArray: '2 5', pattern: 'dotted border' },
  sealed: { color: '#a4262c', dashArray: '12 4 2 4', pattern: 'dash-dot border' },
};

export const ACCESS_SEVERITY: Record<AccessStatus, 'success' | 'info' | 'warn' | 'danger'> = {
  open: 'success',
  'guided-only': 'info',
  'staff-only': 'warn',
  sealed: 'danger',
};
