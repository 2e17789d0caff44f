import { describe, expect, it } from 'vitest';
import { changesBetween } from '../../server/services/audit.service.js';

describe('changesBetween', () => {
  it('lists only the fields whose values differ', () => {
    const before = { name: 'Tug A', builtYear: 1910 as number | null, berth: 'North' };
    expect(changesBetween(before, { name: 'Tug A', builtYear: null }, ['name', 'builtYear', 'berth'])).toEqual({ builtYear: { from: 1910, to: null } });
  });

  it('answers null when nothing changed', () => {
    expect(changesBetween({ a: 1 }, { a: 1 }, ['a'])).toBeNull();
  });
});
