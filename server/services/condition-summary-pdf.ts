import { printable as plain } from './pdf-fonts.js';
import { reportDocument, INK, MUTED, type PdfPhoto } from './pdf-layout.js';
import { GRADE_LABELS, RULE_TEXT, type ConditionGrade } from '../../shared/calc/condition-grade.js';
import type { HazardKind } from '../../shared/schemas/hazards.js';
import type { ConditionReportEntity } from '../db/entities/condition-report.entity.js';

export interface SummaryPdfInput {
  organisationName: string;
  vesselName: string;
  subjectLabel: string;
  report: ConditionReportEntity;
  supersededById: number | null;
  /** The grade the written rule gives and which line of RULE_TEXT decided it; never the reasoning from the findings. */
  rule: { grade: ConditionGrade; ruleLine: number };
  /** Only publishable photos; the caption carries the alt text. */
  photos: PdfPhoto[];
  hazards: readonly HazardKind[];
}

/**
 * A condition report for a grant application, for every staff role that may read the report:
 * the record, the grade and the rule line that applies, the summary, the hazards and the publishable
 * photos. Nothing drawn from the findings (their text, actions, places, the reason for an override).
 */
export async function conditionSummaryPdf(input: SummaryPdfInput): Promise<Buffer> {
  const { report } = input;
  const { doc, width, heading, field, line, masthead, warning, hazards, photos, footer, end } = reportDocument({ title: `Condition summary ${report.id}: ${input.subjectLabel}`, author: input.organisationName });

  masthead(`${input.organisationName} · ${input.vesselName}`, `Condition summary: ${input.subjectLabel}`, `Report ${report.id}, revision ${report.revision}. The full report with its findings is kept by the conservators.`);
  if (input.supersededById) warning(`Superseded by report ${input.supersededById}; this revision is kept for the record.`);
  line();

  field('Inspected on', report.inspectedOn);
  field('Status', report.status === 'submitted' ? `Submitted and signed by ${report.signedBy} on ${report.submittedAt?.toISOString().slice(0, 16).replace('T', ' ')} UTC` : 'DRAFT: not signed, may still change');

  hazards(input.hazards);

  heading(`Overall condition: ${GRADE_LABELS[report.grade]}`);
  doc.font('Body').fontSize(9.5).fillColor(INK).text(plain(`By the rule: ${GRADE_LABELS[input.rule.grade]}. ${RULE_TEXT[input.rule.ruleLine]}`), { width });
  if (report.gradeOverride) doc.text(plain(`Set by the surveyor to ${GRADE_LABELS[report.gradeOverride]}; the reason is in the full report.`), { width });

  if (report.summary) {
    heading('Summary');
    doc.font('Body').fontSize(10).fillColor(INK).text(plain(report.summary), { width });
  }

  if (input.photos.length) {
    heading('Photographs');
    await photos(input.photos);
  } else {
    doc.moveDown(0.6).font('Body').fontSize(9).fillColor(MUTED).text('No photographs of this report are marked for public use.');
  }

  footer();
  return end();
}
