import { describe, expect, it } from 'vitest';
import { csvCell } from '../../server/services/donation.service.js';

describe('the gifts export', () => {
  it('quotes cells as RFC 4180 asks and keeps spreadsheet formulas from running (OWASP, CSV injection)', () => {
    expect(csvCell('Plain')).toBe('Plain');
    expect(csvCell('Quill, Mara')).toBe('"Quill, Mara"');
    expect(csvCell('Say "hello"')).toBe('"Say ""hello"""');
    expect(csvCell('=HYPERLINK("http://x")')).toBe(`"'=HYPERLINK(""http://x"")"`);
    expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvCell(-5)).toBe('-5');
    expect(csvCell(null)).toBe('');
  });
});
