import { describe, expect, it } from 'vitest';
import { centsToAmount, formatCents, parseAmountToCents, percentOf } from '../../shared/calc/money.js';

describe('money in integer cents', () => {
  it('parses amounts digit by digit, never through a float', () => {
    expect(parseAmountToCents('25,000.00')).toBe(2_500_000);
    expect(parseAmountToCents('19.99')).toBe(1999);
    // 0.29 * 100 is 28.999999999999996 in binary floating point; the string route gives 29.
    expect(parseAmountToCents('0.29')).toBe(29);
    expect(parseAmountToCents('1.005')).toBeNull();
    expect(parseAmountToCents('12.5')).toBe(1250);
    expect(parseAmountToCents('$40')).toBe(4000);
    expect(parseAmountToCents('.5')).toBe(50);
    expect(parseAmountToCents('1,00')).toBeNull();
    expect(parseAmountToCents('abc')).toBeNull();
    expect(parseAmountToCents('')).toBeNull();
    expect(parseAmountToCents('500', 'JPY')).toBe(500);
    expect(parseAmountToCents('5.5', 'JPY')).toBeNull();
  });

  it('writes cents back as the amount', () => {
    expect(centsToAmount(2_500_000)).toBe('25,000.00');
    expect(centsToAmount(5)).toBe('0.05');
    expect(formatCents(25_000, 'USD')).toBe('$250.00');
    expect(formatCents(-1250, 'USD')).toBe('-$12.50');
    expect(formatCents(4000, 'CAD')).toBe('CAD 40.00');
  });

  it('sums ten gifts of 0.10 to exactly 1.00', () => {
    const gifts = Array.from({ length: 10 }, () => parseAmountToCents('0.10')!);
    expect(gifts.reduce((a, b) => a + b, 0)).toBe(100);
    expect(0.1 * 10 === 1 && [0.1, 0.2].reduce((a, b) => a + b) !== 0.3).toBe(true);
  });

  it('rounds a goal percentage down in integers', () => {
    expect(percentOf(33_333, 100_000)).toBe(33);
    expect(percentOf(200_000, 100_000)).toBe(100);
    expect(percentOf(10, 0)).toBe(0);
  });
});
