import { estimateTotals, formatDecimal, parseDecimal, type EstimateTotals } from '@shared/calc/estimate';
import type { EstimateLine, EstimateLineBody } from '@shared/schemas/repair-projects';

/** One estimate line as typed: quantity and unit cost are the person's text until saved. */
export interface EstimateRow {
  key: number;
  description: string;
  quantity: string;
  unit: string;
  unitCost: string;
}

let nextKey = 1;
export const blankRow = (): EstimateRow => ({ key: nextKey++, description: '', quantity: '1', unit: '', unitCost: '' });

export function rowsOf(lines: EstimateLine[]): EstimateRow[] {
  return lines.map((l) => ({ key: nextKey++, description: l.description, quantity: formatDecimal(l.quantityMilli, 3).replace(/,/g, ''), unit: l.unit, unitCost: formatDecimal(l.unitCostCents, 2, 2).replace(/,/g, '') }));
}

/** The rows without those left wholly blank (as a new form starts): dropped before saving, so errors name the lines sent. */
export const withoutBlankRows = (rows: EstimateRow[]) => rows.filter((r) => r.description.trim() || r.unit.trim() || r.unitCost.trim());

export const percentOf = (basisPoints: number) => formatDecimal(basisPoints, 2);

export interface ReadEstimate {
  lines: EstimateLineBody[];
  contingencyBasisPoints: number | null;
  /** `lines.N.quantityMilli` etc., as the server names them. */
  problems: Record<string, string>;
  /** Totals of what can be read so far (rows that cannot be read count as nothing). */
  totals: EstimateTotals;
}

/** Reads the typed rows into the API's integers, without floats, naming what cannot be read. */
export function readEstimate(rows: EstimateRow[], contingencyPercent: string): ReadEstimate {
  const problems: Record<string, string> = {};
  const lines: EstimateLineBody[] = [];
  const readable: { quantityMilli: number; unitCostCents: number }[] = [];
  rows.forEach((row, i) => {
    const quantityMilli = parseDecimal(row.quantity, 3);
    const unitCostCents = parseDecimal(row.unitCost, 2);
    if (quantityMilli === null) problems[`lines.${i}.quantityMilli`] = 'Enter a quantity such as 2.5 (at most three decimals).';
    if (unitCostCents === null) problems[`lines.${i}.unitCostCents`] = 'Enter a cost such as 84.37 (at most two decimals).';
    lines.push({ description: row.description, quantityMilli: quantityMilli ?? Number.NaN, unit: row.unit, unitCostCents: unitCostCents ?? Number.NaN });
    readable.push({ quantityMilli: quantityMilli ?? 0, unitCostCents: unitCostCents ?? 0 });
  });
  const contingencyBasisPoints = parseDecimal(contingencyPercent, 2);
  if (contingencyBasisPoints === null) problems.contingencyBasisPoints = 'Enter a percentage such as 10 or 12.5.';
  let totals: EstimateTotals;
  try {
    totals = estimateTotals(readable, contingencyBasisPoints ?? 0);
  } catch {
    totals = { lineTotalsCents: readable.map(() => 0), subtotalCents: 0, contingencyCents: 0, totalCents: 0 };
  }
  return { lines, contingencyBasisPoints, problems, totals };
}
