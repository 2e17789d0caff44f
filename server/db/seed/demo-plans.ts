import sharp from 'sharp';
import type { Point } from '../../../shared/calc/geometry.js';
import type { DemoCompartment } from './demo-ship-map.js';

/**
 * Deck plans of the invented demo steamship, drawn by code: hull outline, frames, centerline,
 * compartment bulkheads and labels. Bow to the right; frame 0 at the bow, numbered aft.
 */
export const PLAN_WIDTH = 3200;
export const PLAN_HEIGHT = 1000;
export const CENTERLINE_Y = 500;
/** Frames are 24 in apart (demo figure) and drawn 20 px apart: 0.6096 m / 20 px. */
export const FRAME_SPACING_METRES = 0.6096;
const FRAME_PX = 20;
/** The aftmost frame drawn on the demo plans. */
export const DEMO_LAST_FRAME = 140;
const BOW_X = 3000;
const HALF_BEAM = 180;

export function frameX(frame: number): number {
  return BOW_X - frame * FRAME_PX;
}

function band(side: DemoCompartment['side']): [number, number] {
  switch (side) {
    case 'starboard':
      return [CENTERLINE_Y, CENTERLINE_Y + 150];
    case 'port':
      return [CENTERLINE_Y - 150, CENTERLINE_Y];
    case 'narrow':
      return [CENTERLINE_Y - 60, CENTERLINE_Y + 60];
    default:
      return [CENTERLINE_Y - 120, CENTERLINE_Y + 120];
  }
}

/** The outline of a demo compartment in plan pixels (starboard is below the centerline). */
export function demoOutline(c: Pick<DemoCompartment, 'frames' | 'side'>): Point[] {
  const [top, bottom] = band(c.side);
  const fore = frameX(c.frames[0]);
  const aft = frameX(c.frames[1]);
  return [
    [aft, top],
    [fore, top],
    [fore, bottom],
    [aft, bottom],
  ];
}

function escape(text: string): string {
  return text.replace(/[&<>"]/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[ch]!);
}

export function drawDeckPlan(title: string, compartments: DemoCompartment[]): Promise<Buffer> {
  const sternX = frameX(145);
  const hull = `M ${sternX + 60} ${CENTERLINE_Y - HALF_BEAM} L ${frameX(12)} ${CENTERLINE_Y - HALF_BEAM} Q ${BOW_X + 40} ${CENTERLINE_Y - HALF_BEAM + 20} ${BOW_X + 110} ${CENTERLINE_Y} Q ${BOW_X + 40} ${CENTERLINE_Y + HALF_BEAM - 20} ${frameX(12)} ${CENTERLINE_Y + HALF_BEAM} L ${sternX + 60} ${CENTERLINE_Y + HALF_BEAM} Q ${sternX - 40} ${CENTERLINE_Y} ${sternX + 60} ${CENTERLINE_Y - HALF_BEAM} Z`;
  const frames: string[] = [];
  for (let f = 0; f <= DEMO_LAST_FRAME; f += 2) {
    const x = frameX(f);
    const major = f % 10 === 0;
    frames.push(`<line x1="${x}" y1="${CENTERLINE_Y - HALF_BEAM - (major ? 40 : 15)}" x2="${x}" y2="${CENTERLINE_Y - HALF_BEAM}" stroke="#6b7f8c" stroke-width="${major ? 2 : 1}"/>`);
    if (major) frames.push(`<text x="${x}" y="${CENTERLINE_Y - HALF_BEAM - 50}" font-size="22" text-anchor="middle" fill="#41525d" font-family="DejaVu Sans, sans-serif">${f}</text>`);
  }
  const rooms = compartments
    .map((c) => {
      const outline = demoOutline(c);
      const [x1, y1] = outline[0]!;
      const [x2, y2] = outline[2]!;
      const cx = (x1 + x2) / 2;
      const cy = (y1 + y2) / 2;
      return `<rect x="${x1}" y="${y1}" width="${x2 - x1}" height="${y2 - y1}" fill="#fdfbf6" stroke="#1d2a36" stroke-width="4"/>
<text x="${cx}" y="${cy - 6}" font-size="20" text-anchor="middle" fill="#1d2a36" font-family="DejaVu Serif, serif">${escape(c.name)}</text>
<text x="${cx}" y="${cy + 20}" font-size="16" text-anchor="middle" fill="#5b6770" font-family="DejaVu Sans, sans-serif">${escape(c.designation)}</text>`;
    })
    .join('\n');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${PLAN_WIDTH}" height="${PLAN_HEIGHT}">
<rect width="100%" height="100%" fill="#f4efe2"/>
<rect x="20" y="20" width="${PLAN_WIDTH - 40}" height="${PLAN_HEIGHT - 40}" fill="none" stroke="#9aa7ae" stroke-width="2"/>
<text x="60" y="90" font-size="40" fill="#1f4e5f" font-family="DejaVu Serif, serif" font-weight="bold">${escape(title)}</text>
<text x="60" y="130" font-size="22" fill="#5b6770" font-family="DejaVu Sans, sans-serif">Frames at 24 in · bow to the right · demo drawing</text>
<path d="${hull}" fill="#ebe4d3" stroke="#1d2a36" stroke-width="6"/>
<line x1="${sternX}" y1="${CENTERLINE_Y}" x2="${BOW_X + 110}" y2="${CENTERLINE_Y}" stroke="#b08d3c" stroke-width="2" stroke-dasharray="24 12"/>
${frames.join('\n')}
${rooms}
<text x="${BOW_X + 60}" y="${CENTERLINE_Y + HALF_BEAM + 70}" font-size="24" text-anchor="end" fill="#41525d" font-family="DejaVu Sans, sans-serif">BOW →</text>
<text x="${PLAN_WIDTH / 2}" y="${CENTERLINE_Y + HALF_BEAM + 70}" font-size="22" text-anchor="middle" fill="#41525d" font-family="DejaVu Sans, sans-serif">STARBOARD</text>
<text x="${PLAN_WIDTH / 2}" y="${CENTERLINE_Y - HALF_BEAM - 80}" font-size="22" text-anchor="middle" fill="#41525d" font-family="DejaVu Sans, sans-serif">PORT</text>
</svg>`;
  return sharp(Buffer.from(svg)).png().toBuffer();
}
