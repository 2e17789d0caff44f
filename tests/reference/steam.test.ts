import { describe, expect, it } from 'vitest';
import { absolutePressure, convert } from '../../shared/calc/quantities.js';
import { saturationPressure, saturationTemperature } from '../../shared/calc/steam.js';

const relative = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

describe('IAPWS-IF97 region 4', () => {
  // IAPWS R7-97(2012), Table 35: verification values of equation 30 (p in MPa)
  it.each([
    [300, 0.353658941e-2],
    [500, 0.263889776e1],
    [600, 0.123443146e2],
  ])('saturation pressure at %d K is %f MPa (Table 35)', (t, pMpa) => {
    expect(relative(saturationPressure(t), pMpa * 1e6)).toBeLessThan(1e-8);
  });

  // IAPWS R7-97(2012), Table 36: verification values of equation 31 (T in K)
  it.each([
    [0.1, 0.372755919e3],
    [1, 0.453035632e3],
    [10, 0.584149488e3],
  ])('saturation temperature at %f MPa is %f K (Table 36)', (pMpa, t) => {
    expect(relative(saturationTemperature(pMpa * 1e6), t)).toBeLessThan(1e-8);
  });

  // US customary values computed with IF97 (REFERENCES.md, ±0.1 °F)
  it('1 psia boils at 101.7 °F and 14.696 psia at 212.0 °F', () => {
    const f = (psia: number) => convert(saturationTemperature(absolutePressure(psia, 'psia')), 'K', 'F');
    expect(Math.abs(f(1) - 101.7)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(f(14.696) - 212.0)).toBeLessThanOrEqual(0.1);
  });

  it('the two equations invert each other along the whole line', () => {
    for (let t = 273.15; t <= 647.096; t += 7.3) expect(relative(saturationTemperature(saturationPressure(t)), t)).toBeLessThan(1e-6);
  });

  // IAPWS-IF97 section 8: the saturation line runs from 273.15 K (611.213 Pa) to the critical point 647.096 K (22.064 MPa)
  it('refuses temperatures and pressures off the saturation line instead of extrapolating', () => {
    expect(relative(saturationPressure(273.15), 611.213)).toBeLessThan(1e-6);
    expect(relative(saturationPressure(647.096), 22.064e6)).toBeLessThan(1e-5);
    for (const t of [273.14, 647.1, Number.NaN, Number.POSITIVE_INFINITY]) expect(() => saturationPressure(t)).toThrow(RangeError);
    for (const p of [600, 22.07e6, -1, Number.NaN]) expect(() => saturationTemperature(p)).toThrow(/611.213 Pa and 22.064 MPa/);
    expect(saturationTemperature(611.213)).toBeCloseTo(273.15, 4);
  });
});
