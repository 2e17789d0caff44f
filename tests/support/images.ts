import sharp from 'sharp';

/** A drawn test plan (a hull outline and frames) as PNG; test data only. */
export function planPng(width: number, height: number): Promise<Buffer> {
  const frames = Array.from({ length: 20 }, (_, i) => `<line x1="${((i + 1) * width) / 21}" y1="${height * 0.1}" x2="${((i + 1) * width) / 21}" y2="${height * 0.9}" stroke="#8aa" stroke-width="2"/>`).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}"><rect width="100%" height="100%" fill="#f7f3ea"/>${frames}<path d="M ${width * 0.05} ${height * 0.5} Q ${width * 0.2} ${height * 0.08} ${width * 0.6} ${height * 0.1} L ${width * 0.95} ${height * 0.5} L ${width * 0.6} ${height * 0.9} Q ${width * 0.2} ${height * 0.92} ${width * 0.05} ${height * 0.5} Z" fill="none" stroke="#123" stroke-width="6"/></svg>`;
  return sharp(Buffer.from(svg)).png().toBuffer();
}
