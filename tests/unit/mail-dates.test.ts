import { describe, expect, it } from 'vitest';
import { mailDate, mailDateTime } from '../../server/mail/dates.js';

describe('dates in e-mails', () => {
  // 5 December 2026 is a Saturday (checked against a calendar by hand)
  it('are written for people, in UTC', () => {
    expect(mailDateTime(new Date('2026-12-05T16:16:00Z'))).toBe('Saturday 5 December 2026, 16:16 UTC');
    expect(mailDateTime(new Date('2026-12-05T00:05:00-02:00'))).toBe('Saturday 5 December 2026, 02:05 UTC');
    expect(mailDate('2026-11-29')).toBe('Sunday 29 November 2026');
  });
});
