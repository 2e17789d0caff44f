/**
 * The ABC method of risk assessment for heritage (Michalski & Pedersoli, "The ABC Method: a risk
 * management approach to the preservation of cultural heritage", Canadian Conservation
 * Institute and ICCROM, 2016). A (how often, or how fast), B (loss of value to each affected
 * item) and C (share of the heritage asset's value affected) are each scored 1–5 in half steps on
 * a logarithmic scale; the magnitude of risk MR = A + B + C.
 *
 * The anchors of the scales (A 5 ≈ once a year, each step down ten times rarer; B and C 5 = 100 %,
 * each step down a tenth) follow the manual as remembered, not checked against a copy here. So do
 * the priority bands below: confirm them against the manual before relying on them. They are the
 * defaults of the organisation's settings (DEFAULT_RISK_SCALE); an admin can change them there, and
 * the settings page repeats this note. Register views do not.
 */
export const ABC_SOURCE = 'Michalski & Pedersoli, “The ABC Method: a risk management approach to the preservation of cultural heritage”, Canadian Conservation Institute and ICCROM, 2016';

export const SCORE_MIN = 1;
export const SCORE_MAX = 5;

/** Whether a score is 1–5 in half steps. */
export function isHalfStepScore(score: number): boolean {
  return Number.isFinite(score) && score >= SCORE_MIN && score <= SCORE_MAX && Number.isInteger(score * 2);
}

export const MR_MIN = 3 * SCORE_MIN;
export const MR_MAX = 3 * SCORE_MAX;

function halfStep(value: number): number {
  return Math.min(SCORE_MAX, Math.max(SCORE_MIN, Math.round(value * 2) / 2));
}

export const PRIORITY_BANDS = ['extreme', 'very-high', 'high', 'medium', 'low'] as const;
export type PriorityBand = (typeof PRIORITY_BANDS)[number];
/** The bands from the lowest MR up, the order their floors must rise in. */
export const BANDS_ASCENDING: readonly PriorityBand[] = [...PRIORITY_BANDS].reverse();

/** The organisation's anchors of the scales and floors of the bands (settings; defaults below). */
export interface RiskScale {
  /** Years between events at A = 5. */
  aYearsAtFive: number;
  /** How many times rarer (A) or smaller (B, C) one whole point down is. B and C are 5 at 100 %. */
  stepFactor: number;
  /** Lowest MR of each band; low starts at MR 3 and each band above starts higher. */
  bandFloors: Record<PriorityBand, number>;
}

/** Today's values, from the manual as remembered (see the note at the top of this file). */
export const DEFAULT_RISK_SCALE: RiskScale = {
  aYearsAtFive: 1,
  stepFactor: 10,
  bandFloors: { low: 3, medium: 7.5, high: 9.5, 'very-high': 11.5, extreme: 13.5 },
};

export const MAX_A_YEARS_AT_FIVE = 1000;
export const MAX_STEP_FACTOR = 100;

/** What is wrong with a scale, each problem naming its field (`bandFloors.medium`, …); empty when usable. */
export function riskScaleProblems(scale: RiskScale): { field: string; message: string }[] {
  const problems: { field: string; message: string }[] = [];
  if (!Number.isFinite(scale.aYearsAtFive) || scale.aYearsAtFive <= 0 || scale.aYearsAtFive > MAX_A_YEARS_AT_FIVE) {
    problems.push({ field: 'aYearsAtFive', message: `The years between events at A = 5 must be more than 0 and at most ${MAX_A_YEARS_AT_FIVE}.` });
  }
  if (!Number.isFinite(scale.stepFactor) || scale.stepFactor <= 1 || scale.stepFactor > MAX_STEP_FACTOR) {
    problems.push({ field: 'stepFactor', message: `The factor of one point must be more than 1 and at most ${MAX_STEP_FACTOR}.` });
  }
  let below: PriorityBand | null = null;
  for (const band of BANDS_ASCENDING) {
    const floor = scale.bandFloors[band];
    const field = `bandFloors.${band}`;
    const name = PRIORITY_LABELS[band];
    if (!Number.isFinite(floor) || !Number.isInteger(floor * 2)) {
      problems.push({ field, message: `${name} must start at a whole or half MR, e.g. 9.5.` });
    } else if (band === 'low' && floor !== MR_MIN) {
      problems.push({ field, message: `${name} must start at MR ${MR_MIN}, the lowest magnitude, so that every score has a band.` });
    } else if (floor > MR_MAX) {
      problems.push({ field, message: `${name} must start at MR ${MR_MAX} or lower, the highest magnitude.` });
    } else if (below && Number.isFinite(scale.bandFloors[below]) && floor <= scale.bandFloors[below]) {
      problems.push({ field, message: `${name} must start above ${PRIORITY_LABELS[below].toLowerCase()} (MR ${scale.bandFloors[below]}): the bands rise from low to extreme.` });
    }
    below = band;
  }
  return problems;
}

/** A from "once every N years": 5 at the scale's years (1), one point less for each step factor (10) rarer. */
export function scoreA(yearsBetween: number, scale: RiskScale = DEFAULT_RISK_SCALE): number {
  if (!Number.isFinite(yearsBetween) || yearsBetween <= 0) throw new RangeError('Years between events must be more than 0.');
  return halfStep(5 - Math.log(yearsBetween / scale.aYearsAtFive) / Math.log(scale.stepFactor));
}

/** B or C from a percentage: 5 at 100 %, one point less for each step factor (10) smaller. */
export function scoreFromPercent(percent: number, what: string, scale: RiskScale = DEFAULT_RISK_SCALE): number {
  if (!Number.isFinite(percent) || percent <= 0 || percent > 100) throw new RangeError(`${what} must be more than 0 and at most 100 %.`);
  return halfStep(5 + Math.log(percent / 100) / Math.log(scale.stepFactor));
}

export const scoreB = (lossPerItemPercent: number, scale?: RiskScale) => scoreFromPercent(lossPerItemPercent, 'Loss of value to each affected item', scale);
export const scoreC = (assetFractionPercent: number, scale?: RiskScale) => scoreFromPercent(assetFractionPercent, 'Share of the heritage value affected', scale);

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
export function bandOf(magnitude: number, scale: RiskScale = DEFAULT_RISK_SCALE): PriorityBand {
  return PRIORITY_BANDS.find((band) => magnitude >= scale.bandFloors[band]) ?? 'low';
}

export function abcRisk(a: number, b: number, c: number, scale: RiskScale = DEFAULT_RISK_SCALE): AbcRisk {
  for (const [name, score] of [['A', a], ['B', b], ['C', c]] as const) {
    if (!isHalfStepScore(score)) throw new RangeError(`${name} must be between 1 and 5 in steps of 0.5.`);
  }
  const magnitude = a + b + c;
  const band = bandOf(magnitude, scale);
  return { a, b, c, magnitude, band, label: PRIORITY_LABELS[band], meaning: PRIORITY_MEANINGS[band], source: ABC_SOURCE };
}

/** The band's range of MR in words, for the screen that explains it. */
export function bandRange(band: PriorityBand, scale: RiskScale = DEFAULT_RISK_SCALE): string {
  const i = PRIORITY_BANDS.indexOf(band);
  const floor = scale.bandFloors[band];
  const ceiling = i === 0 ? MR_MAX : scale.bandFloors[PRIORITY_BANDS[i - 1]!] - 0.5;
  return floor === ceiling ? `MR ${floor}` : `MR ${floor}–${ceiling}`;
}

/** What a whole score of A means in years between events under a scale (5 → 1 year, 4 → 10 years, …). */
export function yearsAtScore(score: number, scale: RiskScale = DEFAULT_RISK_SCALE): number {
  return scale.aYearsAtFive * scale.stepFactor ** (5 - score);
}

/** What a whole score of B or C means as a percentage under a scale (5 → 100 %, 4 → 10 %, …). */
export function percentAtScore(score: number, scale: RiskScale = DEFAULT_RISK_SCALE): number {
  return 100 / scale.stepFactor ** (5 - score);
}
