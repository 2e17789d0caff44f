import { describe, expect, it } from 'vitest';
import { nextRunAt } from '../../server/backup/schedule.js';

// Dates are built in the local time zone, as the schedule reads BACKUP_HOUR.
describe('the daily backup time', () => {
  it('is today at the hour when the hour is still ahead', () => {
    expect(nextRunAt(3, new Date(2026, 0, 5, 2, 30))).toEqual(new Date(2026, 0, 5, 3, 0, 0, 0));
  });

  it('is tomorrow once the hour has come', () => {
    expect(nextRunAt(3, new Date(2026, 0, 5, 3, 0))).toEqual(new Date(2026, 0, 6, 3, 0, 0, 0));
    expect(nextRunAt(3, new Date(2026, 0, 5, 23, 59))).toEqual(new Date(2026, 0, 6, 3, 0, 0, 0));
  });

  it('crosses the end of a month and a year', () => {
    expect(nextRunAt(0, new Date(2026, 11, 31, 12, 0))).toEqual(new Date(2027, 0, 1, 0, 0, 0, 0));
  });
});
