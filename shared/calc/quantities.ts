/**
 * Units of the unit card and the boiling ladder. Factors exact by definition are from NIST SP 811
 * (2008), Appendix B; the conventional inch of mercury from memory of the same table (3.386 389 E+03 Pa,
 * here from its definition: 13 595.1 kg/m³ × 9.806 65 m/s² × 0.0254 m).
 */
const POUND_KG = 0.45359237;
const STANDARD_GRAVITY = 9.80665;
const POUND_FORCE_N = POUND_KG * STANDARD_GRAVITY;
const INCH_M = 0.0254;
const FOOT_M = 0.3048;
const US_GALLON_L = 231 * INCH_M ** 3 * 1000;

export const PSI_PA = POUND_FORCE_N / (INCH_M * INCH_M);
export const INHG_PA = 13595.1 * STANDARD_GRAVITY * INCH_M;
/** The standard atmosphere, 101 325 Pa (NIST SP 811, Appendix B), = 14.695 949 psia. */
export const STANDARD_ATMOSPHERE_PA = 101325;
/** Mechanical horsepower: 550 ft·lbf/s. */
export const HORSEPOWER_W = 550 * FOOT_M * POUND_FORCE_N;

export type Dimension = 'pressure' | 'temperature' | 'volume' | 'volume flow' | 'mass' | 'power';

interface LinearUnit {
  dimension: Dimension;
  label: string;
  /** Value in the dimension's base unit = value × factor + offset. */
  factor: number;
  offset?: number;
}

export const UNITS = {
  Pa: { dimension: 'pressure', label: 'Pa', factor: 1 },
  kPa: { dimension: 'pressure', label: 'kPa', factor: 1000 },
  MPa: { dimension: 'pressure', label: 'MPa', factor: 1e6 },
  bar: { dimension: 'pressure', label: 'bar', factor: 1e5 },
  psi: { dimension: 'pressure', label: 'psi', factor: PSI_PA },
  inHg: { dimension: 'pressure', label: 'inHg', factor: INHG_PA },
  C: { dimension: 'temperature', label: '°C', factor: 1, offset: 273.15 },
  F: { dimension: 'temperature', label: '°F', factor: 5 / 9, offset: 273.15 - (32 * 5) / 9 },
  K: { dimension: 'temperature', label: 'K', factor: 1 },
  gal: { dimension: 'volume', label: 'US gal', factor: US_GALLON_L },
  L: { dimension: 'volume', label: 'L', factor: 1 },
  'gal/d': { dimension: 'volume flow', label: 'US gal/day', factor: US_GALLON_L },
  'L/d': { dimension: 'volume flow', label: 'L/day', factor: 1 },
  'short-ton': { dimension: 'mass', label: 'short ton', factor: 2000 * POUND_KG },
  'long-ton': { dimension: 'mass', label: 'long ton', factor: 2240 * POUND_KG },
  t: { dimension: 'mass', label: 'tonne', factor: 1000 },
  kg: { dimension: 'mass', label: 'kg', factor: 1 },
  hp: { dimension: 'power', label: 'hp', factor: HORSEPOWER_W },
  kW: { dimension: 'power', label: 'kW', factor: 1000 },
} as const satisfies Record<string, LinearUnit>;

export type UnitCode = keyof typeof UNITS;
export const UNIT_CODES = Object.keys(UNITS) as [UnitCode, ...UnitCode[]];

export class UnitMismatchError extends Error {}

/** A value in one unit expressed in another of the same dimension. */
export function convert(value: number, from: UnitCode, to: UnitCode): number {
  const a: LinearUnit = UNITS[from];
  const b: LinearUnit = UNITS[to];
  if (a.dimension !== b.dimension) throw new UnitMismatchError(`${a.label} is a ${a.dimension} and ${b.label} a ${b.dimension}; they do not convert.`);
  const base = value * a.factor + (a.offset ?? 0);
  return (base - (b.offset ?? 0)) / b.factor;
}

/** How a steam plant's gauges read pressure: absolute, above the atmosphere, or as vacuum below it. */
export const PRESSURE_READINGS = ['psia', 'psig', 'inHgVac', 'kPa', 'bar', 'MPa'] as const;
export type PressureReading = (typeof PRESSURE_READINGS)[number];

/** The absolute pressure in pascals of a gauge reading; psig and vacuum are taken from the local atmosphere. */
export function absolutePressure(value: number, reading: PressureReading, atmospherePa = STANDARD_ATMOSPHERE_PA): number {
  switch (reading) {
    case 'psia':
      return value * PSI_PA;
    case 'psig':
      return atmospherePa + value * PSI_PA;
    case 'inHgVac':
      return atmospherePa - value * INHG_PA;
    case 'kPa':
      return value * 1000;
    case 'bar':
      return value * 1e5;
    case 'MPa':
      return value * 1e6;
  }
}

/** An absolute pressure as every reading shows it. */
export function pressureReadings(pressurePa: number, atmospherePa = STANDARD_ATMOSPHERE_PA): Record<PressureReading, number> {
  return {
    psia: pressurePa / PSI_PA,
    psig: (pressurePa - atmospherePa) / PSI_PA,
    inHgVac: (atmospherePa - pressurePa) / INHG_PA,
    kPa: pressurePa / 1000,
    bar: pressurePa / 1e5,
    MPa: pressurePa / 1e6,
  };
}
