import { readFile } from 'node:fs/promises';
import PDFDocument from 'pdfkit';
import sharp from 'sharp';
import { PDF_FONTS, printable as plain } from './pdf-fonts.js';
import { GRADE_LABELS, RULE_TEXT, SEVERITY_LABELS, gradeFromFindings } from '../../shared/calc/condition-grade.js';
import { RUST_DISTRIBUTION_LABELS, rustGradeRange, rustGrade } from '../../shared/calc/rust-grade.js';
import { AGENT_LABELS, DAMAGE_TYPES, METHOD_LABELS, URGENCY_LABELS } from '../../shared/schemas/condition.js';
import { HAZARD_CAUTIONS, workCautions } from '../../shared/hazard-cautions.js';
import { HAZARD_LABELS, type HazardKind } from '../../shared/schemas/hazards.js';
import type { ConditionFindingEntity } from '../db/entities/condition-finding.entity.js';
import type { ConditionReportEntity } from '../db/entities/condition-report.entity.js';

export interface PdfPhoto {
  /** A derivative on disk (WebP); turned into JPEG for the PDF. */
  file: string;
  caption: string;
}

export interface ReportPdfInput {
  organisationName: string;
  vesselName: string;
  subjectLabel: string;
  report: ConditionReportEntity;
  surveyorName: string | null;
  supersededById: number | null;
  findings: ConditionFindingEntity[];
  photos: PdfPhoto[];
  /** The hazards recorded where the subject is. */
  hazards: readonly HazardKind[];
}

/** The fontkit font behind the current pdfkit font (pdfkit does not type it). */
function glyphsOf(doc: PDFKit.PDFDocument): { hasGlyphForCodePoint(codePoint: number): boolean } {
  return (doc as unknown as { _font: { font: { hasGlyphForCodePoint(codePoint: number): boolean } } })._font.font;
}

const INK = '#1d2a36';
const MUTED = '#5b6770';
const RULE = '#c9c2b2';

/** A condition report as a PDF for a grant maker or an insurer: the record, its findings and photos. */
export async function conditionReportPdf(input: ReportPdfInput): Promise<Buffer> {
  const { report, findings } = input;
  const doc = new PDFDocument({ size: 'A4', margin: 56, font: PDF_FONTS.body, info: { Title: plain(`Condition report ${report.id}: ${input.subjectLabel}`), Author: plain(input.organisationName), Creator: 'Shipkeeper' } });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  doc.registerFont('Body', PDF_FONTS.body);
  doc.registerFont('Bold', PDF_FONTS.bodyBold);
  doc.registerFont('Heading', PDF_FONTS.heading);
  const headingGlyphs = glyphsOf(doc.font('Heading'));
  /** Merriweather where it has every character of the text, else the bold sans. */
  const headingFont = (text: string) => ([...text].every((c) => /\s/.test(c) || headingGlyphs.hasGlyphForCodePoint(c.codePointAt(0)!)) ? 'Heading' : 'Bold');
  const width = doc.page.width - 112;
  const heading = (text: string) => doc.moveDown(0.8).font(headingFont(plain(text))).fontSize(12).fillColor(INK).text(plain(text)).moveDown(0.3);
  const field = (label: string, value: string) => doc.font('Bold').fontSize(9.5).fillColor(INK).text(`${plain(label)}: `, { continued: true }).font('Body').text(plain(value));
  const line = () => doc.moveDown(0.4).strokeColor(RULE).lineWidth(0.5).moveTo(56, doc.y).lineTo(56 + width, doc.y).stroke().moveDown(0.4);

  doc.font('Body').fontSize(9).fillColor(MUTED).text(plain(`${input.organisationName} · ${input.vesselName}`));
  const title = plain(`Condition report: ${input.subjectLabel}`);
  doc.moveDown(0.3).font(headingFont(title)).fontSize(18).fillColor(INK).text(title);
  doc.font('Body').fontSize(10).fillColor(MUTED).text(plain(`Report ${report.id}, revision ${report.revision}${report.supersedesId ? `, amending report ${report.supersedesId}` : ''}`));
  if (input.supersededById) doc.fillColor('#8a3b12').text(plain(`Superseded by report ${input.supersededById}; this revision is kept for the record.`));
  line();

  field('Inspected on', report.inspectedOn);
  field('Surveyor', input.surveyorName ?? 'not recorded');
  field('Method', METHOD_LABELS[report.method]);
  const environment = [report.temperatureC !== null ? `${report.temperatureC} °C` : null, report.relativeHumidity !== null ? `${report.relativeHumidity} % relative humidity` : null].filter(Boolean).join(', ');
  field('Environment at the time', environment || 'not recorded');
  field('Status', report.status === 'submitted' ? `Submitted and signed by ${report.signedBy} on ${report.submittedAt?.toISOString().slice(0, 16).replace('T', ' ')} UTC` : 'DRAFT: not signed, may still change');

  if (input.hazards.length) {
    heading('Hazards recorded here');
    for (const kind of input.hazards) {
      doc.font('Bold').fontSize(9.5).fillColor('#8a3b12').text(plain(`${HAZARD_LABELS[kind]}: `), { continued: true }).font('Body').fillColor(INK).text(plain(HAZARD_CAUTIONS[kind]), { width });
    }
  }

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
    for (const photo of input.photos) {
      const jpeg = await sharp(await readFile(photo.file)).resize({ width: 1000, height: 700, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 80 }).toBuffer();
      if (doc.y > doc.page.height - 300) doc.addPage();
      doc.image(jpeg, { fit: [width, 240] });
      doc.moveDown(0.2).font('Body').fontSize(8.5).fillColor(MUTED).text(plain(photo.caption), { width }).moveDown(0.6);
    }
  }

  doc.moveDown(1).font('Body').fontSize(8).fillColor(MUTED).text(plain(`Made with Shipkeeper on ${new Date().toISOString().slice(0, 10)}. Hazards noted in a report do not declare a space safe; entry follows the site safety plan.`), { width });
  doc.end();
  return finished;
}
