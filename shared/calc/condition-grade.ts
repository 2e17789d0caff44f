/**
 * A condition report's overall grade from its findings. Our own rule (common practice in
 * condition surveys, no published source); the screen shows it word for word from RULE_TEXT.
 */
export const SEVERITIES = ['slight', 'moderate', 'severe', 'critical'] as const;
export type Severity = (typeof SEVERITIES)[number];

export const GRADES = ['good', 'fair', 'poor', 'critical'] as const;
export type ConditionGrade = (typeof GRADES)[number];

export const GRADE_LABELS: Record<ConditionGrade, string> = { good: 'Good', fair: 'Fair', poor: 'Poor', critical: 'Critical' };
export const SEVERITY_LABELS: Record<Severity, string> = { slight: 'Slight', moderate: 'Moderate', severe: 'Severe', critical: 'Critical' };

export interface GradedFinding {
  severity: Severity;
  /** Percent of the surface or object affected, when given. */
  extentPercent: number | null;
}

/** Extent of slight findings, added up, above which the whole is only fair. */
export const SLIGHT_EXTENT_LIMIT = 10;
/** Moderate findings from which the whole is poor. */
export const MODERATE_COUNT_LIMIT = 3;

export const RULE_TEXT: readonly string[] = [
  'Critical if any finding is critical.',
  `Otherwise poor if any finding is severe, or if there are ${MODERATE_COUNT_LIMIT} or more moderate findings.`,
  `Otherwise fair if any finding is moderate, or if slight findings together cover more than ${SLIGHT_EXTENT_LIMIT} % of the surface or object.`,
  'Otherwise good (no findings, or only slight ones over a small area).',
];

export interface GradeResult {
  grade: ConditionGrade;
  /** Which line of RULE_TEXT decided it (0-based). */
  ruleLine: number;
  because: string;
}

export function gradeFromFindings(findings: readonly GradedFinding[]): GradeResult {
  const count = (s: Severity) => findings.filter((f) => f.severity === s).length;
  if (count('critical') > 0) return { grade: 'critical', ruleLine: 0, because: `${count('critical')} critical finding${count('critical') > 1 ? 's' : ''}.` };
  if (count('severe') > 0) return { grade: 'poor', ruleLine: 1, because: `${count('severe')} severe finding${count('severe') > 1 ? 's' : ''}.` };
  if (count('moderate') >= MODERATE_COUNT_LIMIT) return { grade: 'poor', ruleLine: 1, because: `${count('moderate')} moderate findings.` };
  if (count('moderate') > 0) return { grade: 'fair', ruleLine: 2, because: `${count('moderate')} moderate finding${count('moderate') > 1 ? 's' : ''}.` };
  const slightExtent = findings.filter((f) => f.severity === 'slight').reduce((sum, f) => sum + (f.extentPercent ?? 0), 0);
  if (slightExtent > SLIGHT_EXTENT_LIMIT) return { grade: 'fair', ruleLine: 2, because: `Slight findings cover ${Math.round(slightExtent * 10) / 10} % together.` };
  return { grade: 'good', ruleLine: 3, because: findings.length ? 'Only slight findings over a small area.' : 'No findings.' };
}
