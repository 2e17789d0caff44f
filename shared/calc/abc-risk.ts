/**
 * The ABC method of risk assessment for heritage (Michalski & Pedersoli, "The ABC Method: a risk
 * management approach to the preservation of cultural heritage", Canadian Conservation
 * Institute and ICCROM, 2016). A (how often, or how fast), B (loss of value to each affected
 * item) and C (share of the heritage asset's value affected) are each scored 1–5 in half steps on
 * a logarithmic scale; the magnitude of risk MR = A + B + C.
 *
 * The anchors of the scales (A 5 ≈ once a year, each step down ten times rarer; B and C 5 = 100 %,
 * each step down a tenth) follow the manual as remembered, not checked against a copy here. So do
 * the priority bands below: confirm them against the manual before relying on them.
 */
// The note that the anchors and bands come from memory stays here, in the code, not on every register view.
export const ABC_SOURCE = 'Michalski & Pedersoli, “The ABC Method: a risk management approach to the preservation of cultural heritage”, Canadian Conservation Institute and ICCROM, 2016';

export const SCORE_MIN = 1;
export const SCORE_MAX = 5;

/** Whether a score is 1–5 in half steps. */
export function isHalfStepScore(score: number): boolean {
  return Number.isFinite(score) && score >= SCORE_MIN && score <= SCORE_MAX && Number.isInteger(score * 2);
}

function halfStep(value: number): number {
  return Math.min(SCORE_MAX, Math.max(SCORE_MIN, Math.round(value * 2) / 2));
}

/** A from "once every N years": 5 at 1 year, one point less for each tenfold rarer. */
export function scoreA(yearsBetween: number): number {
  if (!Number.isFinite(yearsBetween) || yearsBetween <= 0) throw new RangeError('Years between events must be more than 0.');
  return halfStep(5 - Math.log10(yearsBetween));
}

/** B or C from a percentage: 5 at 100 %, one point less for each tenth. */
export function scoreFromPercent(percent: number, what: string): number {
  if (!Number.isFinite(percent) || percent <= 0 || percent > 100) throw new RangeError(`${what} must be more than 0 and at most 100 %.`);
  return halfStep(3 + Math.log10(percent));
}

export const scoreB = (lossPerItemPercent: number) => scoreFromPercent(lossPerItemPercent, 'Loss of value to each affected item');
export const scoreC = (assetFractionPercent: number) => scoreFromPercent(assetFractionPercent, 'Share of the heritage value affected');

export const PRIORITY_BANDS = ['extreme', 'very-high', 'high', 'medium', 'low'] as const;
export type PriorityBand = (typeof PRIORITY_BANDS)[number];

/** Lowest MR of each band (MR runs from 3 to 15 in half steps). */
const BAND_FLOORS: readonly [PriorityBand, number][] = [
  ['extreme', 13.5],
  ['very-high', 11.5],
  ['high', 9.5],
  ['medium', 7.5],
  ['low', 3],
];

export const PRIORITY_LABELS: Record<PriorityBand, string> = {
  extreme: 'Extreme priority',
  'very-high': 'Very high priority',
  high: 'High priority',
  medium: 'Medium priority',
  low: 'Low priority',
};

export const PRIORITY_MEANINGS: Record<PriorityBand, string> = {
  extreme: 'Loss of most of the heritage value within a few years or less: act now.',
  'very-high': 'Significant loss to much of the heritage value within a decade or so.',
  high: 'Significant loss to a small part of the value within decades, or a small loss to much of it.',
  medium: 'Small loss to a small part of the value, or a slow one: plan for it.',
  low: 'Very small or very slow loss: watch it.',
};

export interface AbcRisk {
  a: number;
  b: number;
  c: number;
  magnitude: number;
  band: PriorityBand;
  label: string;
  meaning: string;
  source: string;
}

/** The priority band of a magnitude of risk (3–15). */
export function bandOf(magnitude: number): PriorityBand {
  return BAND_FLOORS.find(([, floor]) => magnitude >= floor)?.[0] ?? 'low';
}

export function abcRisk(a: number, b: number, c: number): AbcRisk {
  for (const [name, score] of [['A', a], ['B', b], ['C', c]] as const) {
    if (!isHalfStepScore(score)) throw new RangeError(`${name} must be between 1 and 5 in steps of 0.5.`);
  }
  const magnitude = a + b + c;
  const band = bandOf(magnitude);
  return { a, b, c, magnitude, band, label: PRIORITY_LABELS[band], meaning: PRIORITY_MEANINGS[band], source: ABC_SOURCE };
}

/** The band's range of MR in words, for the screen that explains it. */
export function bandRange(band: PriorityBand): string {
  const i = BAND_FLOORS.findIndex(([b]) => b === band);
  const floor = BAND_FLOORS[i]![1];
  const ceiling = i === 0 ? 15 : BAND_FLOORS[i - 1]![1] - 0.5;
  return `MR ${floor}–${ceiling}`;
}
