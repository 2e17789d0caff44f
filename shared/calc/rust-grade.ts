/**
 * Rust grade of a painted steel surface from the percent of its area rusted: ASTM D610-08
 * (reapproved 2019), "Standard Practice for Evaluating Degree of Rusting on Painted Steel
 * Surfaces", Table 1. Written with the distribution of the rust, e.g. `5-G`.
 */
export const RUST_GRADE_SOURCE = 'ASTM D610-08 (reapproved 2019), Table 1';

export const RUST_DISTRIBUTIONS = ['S', 'G', 'P', 'H'] as const;
export type RustDistribution = (typeof RUST_DISTRIBUTIONS)[number];
export const RUST_DISTRIBUTION_LABELS: Record<RustDistribution, string> = { S: 'spot', G: 'general', P: 'pinpoint', H: 'hybrid' };

/** Upper bound (inclusive) of percent rusted for grades 10 down to 1; above 50 % is grade 0. */
const UPPER_BOUNDS: readonly [grade: number, maxPercent: number][] = [
  [10, 0.01],
  [9, 0.03],
  [8, 0.1],
  [7, 0.3],
  [6, 1],
  [5, 3],
  [4, 10],
  [3, 16],
  [2, 33],
  [1, 50],
];

export interface RustGrade {
  grade: number;
  /** The range of percent rusted the grade covers: above `above` (exclusive), up to `upTo` (inclusive; null for grade 0). */
  above: number | null;
  upTo: number | null;
  /** e.g. `5-G`, or `5` without a distribution. */
  label: string;
  source: string;
}

export function rustGrade(percentRusted: number, distribution?: RustDistribution | null): RustGrade {
  if (!Number.isFinite(percentRusted) || percentRusted < 0 || percentRusted > 100) throw new RangeError('Percent of surface rusted must be between 0 and 100.');
  let above: number | null = null;
  let grade = 0;
  let upTo: number | null = null;
  for (const [g, max] of UPPER_BOUNDS) {
    if (percentRusted <= max) {
      grade = g;
      upTo = max;
      break;
    }
    above = max;
  }
  return { grade, above: grade === 10 ? null : above, upTo, label: distribution ? `${grade}-${distribution}` : String(grade), source: RUST_GRADE_SOURCE };
}

/** The range in words: "more than 1 % up to 3 %". */
export function rustGradeRange(g: Pick<RustGrade, 'above' | 'upTo'>): string {
  if (g.above === null) return `up to ${g.upTo} %`;
  if (g.upTo === null) return `more than ${g.above} %`;
  return `more than ${g.above} % up to ${g.upTo} %`;
}
