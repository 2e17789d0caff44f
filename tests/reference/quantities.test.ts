import { describe, expect, it } from 'vitest';
import { absolutePressure, convert, HORSEPOWER_W, INHG_PA, pressureReadings, PSI_PA, UnitMismatchError } from '../../shared/calc/quantities.js';

const relative = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

describe('unit factors', () => {
  // NIST SP 811 (2008), Appendix B.8/B.9, factors as printed there (7 significant figures)
  it.each([
    ['psi → Pa', convert(1, 'psi', 'kPa') * 1000, 6.894757e3],
    ['conventional inHg → Pa (value from memory of SP 811)', convert(1, 'inHg', 'kPa') * 1000, 3.386389e3],
    ['US gallon → L', convert(1, 'gal', 'L'), 3.785412],
    ['US gallon per day → L per day', convert(1, 'gal/d', 'L/d'), 3.785412],
    ['short ton → kg', convert(1, 'short-ton', 'kg'), 9.071847e2],
    ['long ton → kg', convert(1, 'long-ton', 'kg'), 1.016047e3],
    ['horsepower (550 ft·lbf/s) → W', convert(1, 'hp', 'kW') * 1000, 7.456999e2],
  ])('%s', (_name, value, printed) => {
    expect(relative(value, printed)).toBeLessThan(5e-7);
  });

  // exact by definition: 1 lbf = 4.448 221 615 260 5 N, 1 in = 0.0254 m; 1 hp = 550 ft·lbf/s (NIST SP 811, B.8)
  it('keeps the exact definitions exact', () => {
    expect(relative(PSI_PA, 6894.757293168361)).toBeLessThan(1e-15);
    expect(relative(HORSEPOWER_W, 745.69987158227022)).toBeLessThan(1e-15);
    expect(relative(INHG_PA, 3386.38864)).toBeLessThan(1e-8);
    expect(convert(2000, 'short-ton', 't')).toBeCloseTo(1814.36948, 9);
    expect(convert(1, 'gal', 'L')).toBeCloseTo(3.785411784, 12);
  });

  // temperature: t/°C = (t/°F − 32)/1.8 (NIST SP 811, B.8, footnote on temperature)
  it('converts temperatures with their offsets', () => {
    expect(convert(212, 'F', 'C')).toBeCloseTo(100, 12);
    expect(convert(-40, 'C', 'F')).toBeCloseTo(-40, 12);
    expect(convert(0, 'C', 'K')).toBeCloseTo(273.15, 12);
    expect(convert(491.67 - 459.67, 'F', 'K')).toBeCloseTo(273.15, 12);
  });

  it('refuses to convert between dimensions', () => {
    expect(() => convert(1, 'psi', 'L')).toThrow(UnitMismatchError);
  });
});

describe('gauge readings', () => {
  // the standard atmosphere is 101 325 Pa (NIST SP 811, B.8) = 14.695 95 psia
  it('reads psig above and inHg vacuum below the local atmosphere', () => {
    expect(absolutePressure(0, 'psig')).toBe(101325);
    expect(relative(absolutePressure(14.6959488, 'psia'), 101325)).toBeLessThan(1e-8);
    expect(absolutePressure(10, 'psig', 100000)).toBeCloseTo(100000 + 10 * PSI_PA, 6);
    expect(absolutePressure(26, 'inHgVac')).toBeCloseTo(101325 - 26 * INHG_PA, 6);
    const readings = pressureReadings(absolutePressure(150, 'psig'));
    expect(readings.psig).toBeCloseTo(150, 9);
    expect(readings.psia).toBeCloseTo(164.6959488, 6);
    expect(readings.bar).toBeCloseTo((101325 + 150 * PSI_PA) / 1e5, 9);
  });
});
