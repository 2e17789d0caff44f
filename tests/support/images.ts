import sharp from 'sharp';

/** A drawn test plan (a hull outline and frames) as PNG; test data only. */
export function planPng(width: number, height: number): Promise<Buffer> {
  const frames = Array.from({ length: 20 }, (_, i) => `<line x1="${((i + 1) * width) / 21}" y1="${height * 0.1}" x2="${((i + 1) * width) / 21}" y2="${height * 0.9}" stroke="#8aa" stroke-width="2"/>`).join('');
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}"><rect width="100%" height="100%" fill="#f7f3ea"/>${frames}<path d="M ${width * 0.05} ${height * 0.5} Q ${width * 0.2} ${height * 0.08} ${width * 0.6} ${height * 0.1} L ${width * 0.95} ${height * 0.5} L ${width * 0.6} ${height * 0.9} Q ${width * 0.2} ${height * 0.92} ${width * 0.05} ${height * 0.5} Z" fill="none" stroke="#123" stroke-width="6"/></svg>`;
  return sharp(Buffer.from(svg)).png().toBuffer();
}

/**
 * A 400 × 200 JPEG whose EXIF says "rotate 90° clockwise" (orientation 6), with a GPS position,
 * a camera make and the date taken; test data only.
 */
export function cameraJpeg(): Promise<Buffer> {
  // A red left half and a blue right half, so the turn can be seen in the pixels.
  const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="400" height="200"><rect width="200" height="200" fill="#d00"/><rect x="200" width="200" height="200" fill="#00d"/></svg>';
  return sharp(Buffer.from(svg))
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExifMerge({
      IFD0: { Make: 'TestCam', Model: 'Serial 0042' },
      IFD2: { DateTimeOriginal: '2024:05:17 14:03:22' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '3/1 10/1 0/1' },
    })
    .toBuffer();
}

/** The smallest well-formed one-page PDF; test data only. */
export function tinyPdf(): Buffer {
  const objects = ['<< /Type /Catalog /Pages 2 0 R >>', '<< /Type /Pages /Kids [3 0 R] /Count 1 >>', '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 200 200] >>'];
  let body = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((object, i) => {
    offsets.push(body.length);
    body += `${i + 1} 0 obj\n${object}\nendobj\n`;
  });
  const xref = body.length;
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, '0')} 00000 n \n`).join('')}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body);
}
