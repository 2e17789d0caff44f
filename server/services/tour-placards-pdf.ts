import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { PDF_FONTS, printable as plain } from './pdf-fonts.js';
import type { PublishedTour } from './tour-snapshot.js';

const INK = '#1d2a36';
const MUTED = '#5b6770';

/** The address a stop's code leads to on the public site. */
export function stopUrl(publicUrl: string, slug: string, number: number): string {
  return `${publicUrl}/visit/tours/${encodeURIComponent(slug)}/stops/${number}?here=1`;
}

/** The words of a stop's stored HTML, ours and sanitized, as plain text. */
function textOf(html: string): string {
  return html
    .replace(/<\/(p|h2|h3|li|blockquote|figcaption)>/g, '\n')
    .replace(/<[^>]+>/g, '')
    .replace(/&nbsp;/g, ' ')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&');
}

/** The first line a placard prints: the first sentence, cut at 140 characters on a word. */
export function firstLine(html: string): string {
  const text = textOf(html).split('\n').map((l) => l.trim()).find(Boolean) ?? '';
  const sentence = /^.*?[.!?](?=\s|$)/.exec(text)?.[0] ?? text;
  if (sentence.length <= 140) return sentence;
  return `${sentence.slice(0, 139).replace(/\s+\S*$/, '')}…`;
}

function qr(url: string): Promise<Buffer> {
  return QRCode.toBuffer(url, { type: 'png', errorCorrectionLevel: 'M', margin: 1, width: 360 });
}

function document(title: string, layout: 'portrait' | 'landscape', size: 'A4' | 'A5') {
  const doc = new PDFDocument({ size, layout, margin: 36, font: PDF_FONTS.body, info: { Title: plain(title), Creator: 'Shipkeeper' } });
  doc.registerFont('Body', PDF_FONTS.body);
  doc.registerFont('Bold', PDF_FONTS.bodyBold);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  return { doc, done };
}

/** One placard per page (A5 landscape): number, title, first line and the code, for one stop or every stop. */
export async function placardsPdf(tour: PublishedTour, publicUrl: string, only: number | null): Promise<Buffer> {
  const stops = only === null ? tour.stops : tour.stops.filter((s) => s.number === only);
  const { doc, done } = document(`${tour.title}: placards`, 'landscape', 'A5');
  for (const [i, stop] of stops.entries()) {
    if (i > 0) doc.addPage();
    const w = doc.page.width;
    const h = doc.page.height;
    const code = 200;
    doc.font('Body').fontSize(11).fillColor(MUTED).text(plain(`${tour.title} · stop ${stop.number} of ${tour.stopCount}`), 36, 36, { width: w - 72 - code - 24 });
    doc.font('Bold').fontSize(64).fillColor(INK).text(String(stop.number), 36, 64);
    doc.font('Bold').fontSize(24).text(plain(stop.title), 36, doc.y + 4, { width: w - 72 - code - 24 });
    doc.font('Body').fontSize(13).fillColor(INK).text(plain(firstLine(stop.html)), 36, doc.y + 10, { width: w - 72 - code - 24 });
    const url = stopUrl(publicUrl, tour.slug, stop.number);
    doc.image(await qr(url), w - 36 - code, 56, { width: code });
    doc.font('Body').fontSize(9).fillColor(MUTED).text('Scan for the story, audio and transcript', w - 36 - code, 56 + code + 6, { width: code, align: 'center' });
    doc.fontSize(8).text(plain(url), 36, h - 52, { width: w - 72 });
  }
  doc.end();
  return done;
}

/** Every stop on A4 sheets, eight to a page (two columns): number, title, first line and a small code. */
export async function placardSheetPdf(tour: PublishedTour, publicUrl: string): Promise<Buffer> {
  const { doc, done } = document(`${tour.title}: all stops`, 'portrait', 'A4');
  doc.font('Bold').fontSize(16).fillColor(INK).text(plain(tour.title), 36, 36);
  doc.font('Body').fontSize(9).fillColor(MUTED).text(plain(`${tour.vessel} · ${tour.stopCount} stops · published ${tour.publishedAt.slice(0, 10)}`));
  const top = 84;
  const colW = (doc.page.width - 72 - 18) / 2;
  const rowH = (doc.page.height - top - 36) / 4;
  const code = 72;
  for (const [i, stop] of tour.stops.entries()) {
    const slot = i % 8;
    if (i > 0 && slot === 0) doc.addPage();
    const x = 36 + (slot % 2) * (colW + 18);
    const y = (i < 8 ? top : 36) + Math.floor(slot / 2) * rowH;
    doc.rect(x, y, colW, rowH - 10).lineWidth(0.5).strokeColor('#c9c2b2').stroke();
    doc.image(await qr(stopUrl(publicUrl, tour.slug, stop.number)), x + colW - code - 8, y + 8, { width: code });
    doc.font('Bold').fontSize(22).fillColor(INK).text(String(stop.number), x + 10, y + 8, { width: colW - code - 28 });
    doc.font('Bold').fontSize(11).text(plain(stop.title), x + 10, doc.y, { width: colW - code - 28, height: 30, ellipsis: true });
    doc.font('Body').fontSize(9).fillColor(MUTED).text(plain(firstLine(stop.html)), x + 10, Math.max(doc.y + 4, y + code + 14), { width: colW - 20, height: rowH - code - 40, ellipsis: true });
  }
  doc.end();
  return done;
}
