import { printable as plain } from './pdf-fonts.js';
import { reportDocument, MUTED, INK, type PdfPhoto } from './pdf-layout.js';
import { GRADE_LABELS, RULE_TEXT, SEVERITY_LABELS, gradeFromFindings } from '../../shared/calc/condition-grade.js';
import { RUST_DISTRIBUTION_LABELS, rustGradeRange, rustGrade } from '../../shared/calc/rust-grade.js';
import { AGENT_LABELS, DAMAGE_TYPES, METHOD_LABELS, URGENCY_LABELS } from '../../shared/schemas/condition.js';
import { workCautions } from '../../shared/hazard-cautions.js';
import type { HazardKind } from '../../shared/schemas/hazards.js';
import type { ConditionFindingEntity } from '../db/entities/condition-finding.entity.js';
import type { ConditionReportEntity } from '../db/entities/condition-report.entity.js';

export type { PdfPhoto };

export interface ReportPdfInput {
  organisationName: string;
  vesselName: string;
  subjectLabel: string;
  report: ConditionReportEntity;
  surveyorName: string | null;
  supersededById: number | null;
  findings: ConditionFindingEntity[];
  /** Each finding's location in words (frame and offset, or the photo marked). */
  locate: (finding: ConditionFindingEntity) => string | null;
  photos: PdfPhoto[];
  /** The hazards recorded where the subject is. */
  hazards: readonly HazardKind[];
}

/** A condition report as a PDF for a grant maker or an insurer: the record, its findings and photos. */
export async function conditionReportPdf(input: ReportPdfInput): Promise<Buffer> {
  const { report, findings } = input;
  const { doc, width, heading, field, line, masthead, warning, hazards, photos, footer, end } = reportDocument({ title: `Condition report ${report.id}: ${input.subjectLabel}`, author: input.organisationName });

  masthead(`${input.organisationName} · ${input.vesselName}`, `Condition report: ${input.subjectLabel}`, `Report ${report.id}, revision ${report.revision}${report.supersedesId ? `, amending report ${report.supersedesId}` : ''}`);
  if (input.supersededById) warning(`Superseded by report ${input.supersededById}; this revision is kept for the record.`);
  line();

  field('Inspected on', report.inspectedOn);
  field('Surveyor', input.surveyorName ?? 'not recorded');
  field('Method', METHOD_LABELS[report.method]);
  const environment = [report.temperatureC !== null ? `${report.temperatureC} °C` : null, report.relativeHumidity !== null ? `${report.relativeHumidity} % relative humidity` : null].filter(Boolean).join(', ');
  field('Environment at the time', environment || 'not recorded');
  field('Status', report.status === 'submitted' ? `Submitted and signed by ${report.signedBy} on ${report.submittedAt?.toISOString().slice(0, 16).replace('T', ' ')} UTC` : 'DRAFT: not signed, may still change');

  hazards(input.hazards);

  heading(`Overall condition: ${GRADE_LABELS[report.grade]}`);
  const rule = gradeFromFindings(findings);
  doc.font('Body').fontSize(9.5).fillColor(INK).text(plain(`By the rule: ${GRADE_LABELS[rule.grade]} (${rule.because})`));
  if (report.gradeOverride) doc.text(plain(`Set by the surveyor to ${GRADE_LABELS[report.gradeOverride]}: ${report.overrideReason ?? ''}`));
  doc.moveDown(0.2).fontSize(8.5).fillColor(MUTED);
  for (const text of RULE_TEXT) doc.text(plain(`• ${text}`), { indent: 8 });

  if (report.summary) {
    heading('Summary');
    doc.font('Body').fontSize(10).fillColor(INK).text(plain(report.summary), { width });
  }

  heading(`Findings (${findings.length})`);
  if (findings.length === 0) doc.font('Body').fontSize(10).fillColor(MUTED).text('No findings recorded.');
  findings.forEach((f, i) => {
    if (doc.y > doc.page.height - 160) doc.addPage();
    doc.font('Bold').fontSize(10.5).fillColor(INK).text(plain(`${i + 1}. ${DAMAGE_TYPES[f.damageType].label}: ${SEVERITY_LABELS[f.severity]}`));
    doc.font('Body').fontSize(9.5);
    field('Agent of deterioration', AGENT_LABELS[f.agent]);
    if (f.artifact) field('Artifact', `${f.artifact.objectNumber} ${f.artifact.name}`);
    const where = input.locate(f);
    if (where) field('Location', where);
    if (f.extentPercent !== null) field('Extent', `${f.extentPercent} % of the surface or object`);
    if (f.percentRusted !== null) {
      const grade = rustGrade(f.percentRusted, f.rustDistribution);
      field('Rust grade (ASTM D610)', `${grade.label}: ${f.percentRusted} % rusted (${rustGradeRange(grade)})${f.rustDistribution ? `, ${RUST_DISTRIBUTION_LABELS[f.rustDistribution]} rusting` : ''}`);
    }
    if (f.description) field('Observed', f.description);
    field('Recommended action', f.recommendedAction || 'none given');
    for (const caution of workCautions(input.hazards, f.damageType, f.recommendedAction ?? '')) field('Caution', caution.message);
    field('Urgency', URGENCY_LABELS[f.urgency]);
    doc.moveDown(0.5);
  });

  if (input.photos.length) {
    doc.addPage();
    heading('Photographs');
    await photos(input.photos);
  }

  footer();
  return end();
}
