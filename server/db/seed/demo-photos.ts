import sharp from 'sharp';
import type { DemoArtifact } from './demo-collection.js';

type Kind = NonNullable<DemoArtifact['photo']>;

/** Drawn stand-ins for photographs (no photo of any real object); 1200 × 900 JPEG. */
const DRAWINGS: Record<Kind, (hue: number) => string> = {
  gauge: (hue) => {
    const ticks = Array.from({ length: 21 }, (_, i) => {
      const a = (-225 + i * 13.5) * (Math.PI / 180);
      const r1 = 250;
      const r2 = i % 5 === 0 ? 215 : 232;
      return `<line x1="${600 + r1 * Math.cos(a)}" y1="${450 + r1 * Math.sin(a)}" x2="${600 + r2 * Math.cos(a)}" y2="${450 + r2 * Math.sin(a)}" stroke="#222" stroke-width="${i % 5 === 0 ? 6 : 3}"/>`;
    }).join('');
    return `<circle cx="600" cy="450" r="320" fill="hsl(${hue},45%,42%)"/><circle cx="600" cy="450" r="280" fill="#f4efe2"/>${ticks}<path d="M 780 300 A 250 250 0 0 1 850 450" stroke="#b22" stroke-width="12" fill="none"/><line x1="600" y1="450" x2="760" y2="330" stroke="#111" stroke-width="10" stroke-linecap="round"/><circle cx="600" cy="450" r="22" fill="#333"/>`;
  },
  wheel: (hue) => {
    const spokes = Array.from({ length: 8 }, (_, i) => {
      const a = (i * 45 * Math.PI) / 180;
      return `<line x1="600" y1="450" x2="${600 + 330 * Math.cos(a)}" y2="${450 + 330 * Math.sin(a)}" stroke="hsl(${hue},40%,30%)" stroke-width="34" stroke-linecap="round"/>`;
    }).join('');
    return `${spokes}<circle cx="600" cy="450" r="270" stroke="hsl(${hue},40%,35%)" stroke-width="40" fill="none"/><circle cx="600" cy="450" r="60" fill="#b08d3c"/>`;
  },
  machine: (hue) =>
    `<rect x="250" y="520" width="700" height="220" fill="hsl(${hue},20%,30%)"/>${[300, 520, 740]
      .map((x) => `<rect x="${x}" y="220" width="160" height="300" rx="10" fill="hsl(${hue},25%,45%)"/><rect x="${x + 20}" y="180" width="120" height="40" fill="#b08d3c"/>`)
      .join('')}<rect x="200" y="740" width="800" height="40" fill="#2b2b2b"/>`,
  paper: () =>
    `<rect x="300" y="120" width="600" height="680" fill="#f3ead2" stroke="#9a8a60" stroke-width="6"/>${Array.from({ length: 14 }, (_, i) => `<line x1="350" y1="${200 + i * 42}" x2="${850 - (i % 3) * 60}" y2="${200 + i * 42}" stroke="#6b5f45" stroke-width="5"/>`).join('')}`,
  plate: (hue) => `<rect x="260" y="260" width="680" height="380" rx="40" fill="hsl(${hue},35%,40%)" stroke="#b08d3c" stroke-width="24"/>${[330, 420, 510].map((y) => `<rect x="360" y="${y}" width="480" height="40" fill="#d8c07a"/>`).join('')}`,
  lamp: (hue) => `<path d="M 600 120 L 600 300" stroke="#555" stroke-width="12"/><path d="M 420 300 L 780 300 L 700 620 L 500 620 Z" fill="hsl(${hue},50%,55%)" stroke="#b08d3c" stroke-width="14"/><ellipse cx="600" cy="640" rx="140" ry="40" fill="#fff3c4"/>`,
};

export async function demoPhoto(kind: Kind, seed: number, takenAt: Date): Promise<Buffer> {
  const hue = (seed * 47) % 360;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="900"><rect width="1200" height="900" fill="hsl(${(hue + 180) % 360},12%,82%)"/><rect y="780" width="1200" height="120" fill="hsl(${(hue + 180) % 360},10%,62%)"/>${DRAWINGS[kind](hue)}</svg>`;
  const stamp = takenAt.toISOString().slice(0, 19).replace('T', ' ').replace(/-/g, ':');
  return sharp(Buffer.from(svg)).jpeg({ quality: 82 }).withExif({ IFD0: { Software: 'Shipkeeper demo drawing' }, IFD2: { DateTimeOriginal: stamp } }).toBuffer();
}
