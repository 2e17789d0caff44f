import type { UnitSystem } from '@shared/schemas/settings';
import { formatFeetAndInches, squareMetresToSquareFeet } from '@shared/calc/units';

const one = new Intl.NumberFormat(undefined, { maximumFractionDigits: 1 });
const two = new Intl.NumberFormat(undefined, { maximumFractionDigits: 2 });

export function formatLength(metres: number, units: UnitSystem): string {
  return units === 'metric' ? `${two.format(metres)} m` : formatFeetAndInches(metres);
}

/** Both systems, the organisation's first: staff quote either to contractors. */
export function formatArea(squareMetres: number, units: UnitSystem): string {
  const feet = `${one.format(squareMetresToSquareFeet(squareMetres))} ft²`;
  const metres = `${one.format(squareMetres)} m²`;
  return units === 'metric' ? `${metres} (${feet})` : `${feet} (${metres})`;
}
