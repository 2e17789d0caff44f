import { readFile } from 'node:fs/promises';
import PDFDocument from 'pdfkit';
import sharp from 'sharp';
import { PDF_FONTS, printable as plain } from './pdf-fonts.js';
import { HAZARD_CAUTIONS } from '../../shared/hazard-cautions.js';
import { HAZARD_LABELS, type HazardKind } from '../../shared/schemas/hazards.js';

export const INK = '#1d2a36';
export const MUTED = '#5b6770';
const RULE = '#c9c2b2';
const WARN = '#8a3b12';

export interface PdfPhoto {
  /** A derivative on disk (WebP); turned into JPEG for the PDF. */
  file: string;
  caption: string;
}

/** The fontkit font behind the current pdfkit font (pdfkit does not type it). */
function glyphsOf(doc: PDFKit.PDFDocument): { hasGlyphForCodePoint(codePoint: number): boolean } {
  return (doc as unknown as { _font: { font: { hasGlyphForCodePoint(codePoint: number): boolean } } })._font.font;
}

/** An A4 document in the embedded fonts, with the helpers both report PDFs lay out with. */
export function reportDocument(info: { title: string; author: string }) {
  const doc = new PDFDocument({ size: 'A4', margin: 56, font: PDF_FONTS.body, info: { Title: plain(info.title), Author: plain(info.author), Creator: 'Shipkeeper' } });
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

  const layout = {
    doc,
    width,
    heading: (text: string) => doc.moveDown(0.8).font(headingFont(plain(text))).fontSize(12).fillColor(INK).text(plain(text)).moveDown(0.3),
    field: (label: string, value: string) => doc.font('Bold').fontSize(9.5).fillColor(INK).text(`${plain(label)}: `, { continued: true }).font('Body').text(plain(value)),
    line: () => doc.moveDown(0.4).strokeColor(RULE).lineWidth(0.5).moveTo(56, doc.y).lineTo(56 + width, doc.y).stroke().moveDown(0.4),
    /** The organisation and vessel, the title in the heading face, and a muted line under it. */
    masthead: (kicker: string, title: string, subtitle: string) => {
      doc.font('Body').fontSize(9).fillColor(MUTED).text(plain(kicker));
      doc.moveDown(0.3).font(headingFont(plain(title))).fontSize(18).fillColor(INK).text(plain(title));
      doc.font('Body').fontSize(10).fillColor(MUTED).text(plain(subtitle));
    },
    warning: (text: string) => doc.fillColor(WARN).text(plain(text)),
    hazards: (kinds: readonly HazardKind[]) => {
      if (!kinds.length) return;
      layout.heading('Hazards recorded here');
      for (const kind of kinds) {
        doc.font('Bold').fontSize(9.5).fillColor(WARN).text(plain(`${HAZARD_LABELS[kind]}: `), { continued: true }).font('Body').fillColor(INK).text(plain(HAZARD_CAUTIONS[kind]), { width });
      }
    },
    /** Each photo on the page at most 240 pt high, its caption under it. */
    photos: async (photos: readonly PdfPhoto[]) => {
      for (const photo of photos) {
        const jpeg = await sharp(await readFile(photo.file)).resize({ width: 1000, height: 700, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 80 }).toBuffer();
        if (doc.y > doc.page.height - 300) doc.addPage();
        doc.image(jpeg, { fit: [width, 240] });
        doc.moveDown(0.2).font('Body').fontSize(8.5).fillColor(MUTED).text(plain(photo.caption), { width }).moveDown(0.6);
      }
    },
    footer: () => doc.moveDown(1).font('Body').fontSize(8).fillColor(MUTED).text(plain(`Made with Shipkeeper on ${new Date().toISOString().slice(0, 10)}. Hazards noted in a report do not declare a space safe; entry follows the site safety plan.`), { width }),
    /** Ends the document; resolves to its bytes. */
    end: () => {
      doc.end();
      return finished;
    },
  };
  return layout;
}
