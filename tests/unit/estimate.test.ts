import { describe, expect, it } from 'vitest';
import { estimateTotals, formatDecimal, lineTotalCents, parseDecimal } from '../../shared/calc/estimate.js';

describe('estimate totals in integer cents', () => {
  it('adds lines and contingency, checked by hand', () => {
    // By hand (common practice, no published source; the arithmetic is ours):
    //   12.5 m² of deckhead plate at 84.37 per m²: 12.5 × 84.37 = 1,054.625 → 1,054.63 (half a cent rounds up)
    //   3 h of a rigger at 65.00 per h:             3 × 65.00   =   195.00
    //   0.333 kg of primer at 29.99 per kg:          0.333 × 29.99 = 9.98667 → 9.99
    //   subtotal                                                 = 1,259.62
    //   contingency 12.5 % of 1,259.62 = 157.4525 → 157.45
    //   total 1,259.62 + 157.45                                  = 1,417.07
    const totals = estimateTotals(
      [
        { quantityMilli: 12_500, unitCostCents: 8_437 },
        { quantityMilli: 3_000, unitCostCents: 6_500 },
        { quantityMilli: 333, unitCostCents: 2_999 },
      ],
      1_250,
    );
    expect(totals).toEqual({ lineTotalsCents: [105_463, 19_500, 999], subtotalCents: 125_962, contingencyCents: 15_745, totalCents: 141_707 });
  });

  it('rounds half a cent up and below half down', () => {
    // 0.5 × 0.01 = 0.005 → 0.01; 0.499 × 0.01 = 0.00499 → 0.00
    expect(lineTotalCents({ quantityMilli: 500, unitCostCents: 1 })).toBe(1);
    expect(lineTotalCents({ quantityMilli: 499, unitCostCents: 1 })).toBe(0);
    // 10 % of 0.05 = 0.005 → 0.01
    expect(estimateTotals([{ quantityMilli: 1000, unitCostCents: 5 }], 1000).contingencyCents).toBe(1);
  });

  it('stays exact where floats would drift', () => {
    // 0.1 + 0.2 in floats is 0.30000000000000004; here 3 lines of 0.1 unit at 1.00 = 0.30 exactly
    const totals = estimateTotals([100, 100, 100].map((q) => ({ quantityMilli: q, unitCostCents: 100 })), 0);
    expect(totals.totalCents).toBe(30);
    // The largest line the schema allows: 1,000,000 units at 10,000,000.00 = 10^13.00 = 10^15 cents, inside 2^53 ≈ 9.007 × 10^15
    expect(lineTotalCents({ quantityMilli: 1_000_000_000, unitCostCents: 1_000_000_000 })).toBe(1_000_000_000_000_000);
    // Ten times that is past 2^53: refused rather than rounded by a float
    expect(() => lineTotalCents({ quantityMilli: 1_000_000_000, unitCostCents: 10_000_000_000 })).toThrow(RangeError);
  });

  it('gives zero for no lines and refuses fractions and negatives', () => {
    expect(estimateTotals([], 1000)).toEqual({ lineTotalsCents: [], subtotalCents: 0, contingencyCents: 0, totalCents: 0 });
    expect(() => lineTotalCents({ quantityMilli: 1.5, unitCostCents: 1 })).toThrow(RangeError);
    expect(() => lineTotalCents({ quantityMilli: 1, unitCostCents: -1 })).toThrow(RangeError);
  });
});

describe('decimals typed by people', () => {
  it('reads digits without floats', () => {
    expect(parseDecimal('2.5', 3)).toBe(2500);
    expect(parseDecimal('1,200.75', 2)).toBe(120_075);
    expect(parseDecimal('.5', 3)).toBe(500);
    expect(parseDecimal('0.29', 2)).toBe(29); // 0.29 × 100 in floats is 28.999999999999996
    expect(parseDecimal('1.2345', 3)).toBeNull();
    expect(parseDecimal('-1', 2)).toBeNull();
    expect(parseDecimal('1e3', 2)).toBeNull();
    expect(parseDecimal('', 2)).toBeNull();
  });

  it('writes them back', () => {
    expect(formatDecimal(2500, 3)).toBe('2.5');
    expect(formatDecimal(120_075, 2, 2)).toBe('1,200.75');
    expect(formatDecimal(5, 2, 2)).toBe('0.05');
    expect(formatDecimal(1000, 2)).toBe('10');
  });
});
