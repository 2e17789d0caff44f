/**
 * Repair estimates in integer cents. A quantity is an integer of thousandths of its unit
 * (2.5 m² = 2500), a unit cost an integer of cents, contingency an integer of basis points
 * (hundredths of a percent: 10 % = 1000).
 *
 * Rounding rule: each line total is quantity × unit cost rounded to the nearest cent, half a cent
 * rounding up (every value is zero or more, so this is also half away from zero); the subtotal is
 * the sum of the rounded line totals; the contingency is subtotal × basis points ÷ 10 000 rounded
 * the same way; the total is subtotal + contingency. Products are computed with BigInt, so no
 * float ever meets money and nothing overflows before the result is checked.
 */
export const QUANTITY_SCALE = 1000;
const BASIS_POINTS = 10_000n;

export interface EstimateLineInput {
  quantityMilli: number;
  unitCostCents: number;
}

export interface EstimateTotals {
  lineTotalsCents: number[];
  subtotalCents: number;
  contingencyCents: number;
  totalCents: number;
}

/** n ÷ d rounded to the nearest integer, halves up; n ≥ 0, d > 0. */
function divideRoundingHalfUp(n: bigint, d: bigint): bigint {
  return (n * 2n + d) / (d * 2n);
}

function toSafeNumber(value: bigint, what: string): number {
  if (value > BigInt(Number.MAX_SAFE_INTEGER)) throw new RangeError(`${what} is too large to keep exactly.`);
  return Number(value);
}

function assertNonNegativeInteger(value: number, what: string) {
  if (!Number.isSafeInteger(value) || value < 0) throw new RangeError(`${what} must be a whole number, zero or more.`);
}

export function lineTotalCents(line: EstimateLineInput): number {
  assertNonNegativeInteger(line.quantityMilli, 'Quantity');
  assertNonNegativeInteger(line.unitCostCents, 'Unit cost');
  return toSafeNumber(divideRoundingHalfUp(BigInt(line.quantityMilli) * BigInt(line.unitCostCents), BigInt(QUANTITY_SCALE)), 'A line total');
}

export function estimateTotals(lines: readonly EstimateLineInput[], contingencyBasisPoints: number): EstimateTotals {
  assertNonNegativeInteger(contingencyBasisPoints, 'Contingency');
  const lineTotalsCents = lines.map(lineTotalCents);
  const subtotal = lineTotalsCents.reduce((sum, cents) => sum + BigInt(cents), 0n);
  const contingency = divideRoundingHalfUp(subtotal * BigInt(contingencyBasisPoints), BASIS_POINTS);
  return {
    lineTotalsCents,
    subtotalCents: toSafeNumber(subtotal, 'The subtotal'),
    contingencyCents: toSafeNumber(contingency, 'The contingency'),
    totalCents: toSafeNumber(subtotal + contingency, 'The total'),
  };
}

/**
 * A decimal typed by a person ("2.5", "1,200.75") as an integer of 10^-places units, read from its
 * digits (never through a float). Null when it is not a plain decimal with at most `places` places.
 */
export function parseDecimal(input: string, places: number): number | null {
  const match = /^\s*(\d{1,3}(?:,\d{3})+|\d+)?(?:\.(\d*))?\s*$/.exec(input);
  if (!match || (match[1] === undefined && !match[2])) return null;
  const whole = (match[1] ?? '0').replace(/,/g, '');
  const fraction = match[2] ?? '';
  if (fraction.length > places) return null;
  const value = BigInt(whole) * 10n ** BigInt(places) + BigInt(fraction.padEnd(places, '0') || '0');
  return value > BigInt(Number.MAX_SAFE_INTEGER) ? null : Number(value);
}

/** An integer of 10^-places units written as a decimal: 2500 with 3 places is "2.5"; trailing zeros dropped down to `minPlaces`. */
export function formatDecimal(value: number, places: number, minPlaces = 0): string {
  const negative = value < 0;
  const digits = String(Math.abs(value)).padStart(places + 1, '0');
  const whole = digits.slice(0, digits.length - places);
  let fraction = digits.slice(digits.length - places);
  while (fraction.length > minPlaces && fraction.endsWith('0')) fraction = fraction.slice(0, -1);
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return `${negative ? '-' : ''}${grouped}${fraction ? `.${fraction}` : ''}`;
}

/** Basis points as a percent: 1000 is "10", 1250 is "12.5". */
export const formatBasisPointsAsPercent = (basisPoints: number) => formatDecimal(basisPoints, 2);
