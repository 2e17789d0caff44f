import path from 'node:path';
import type { Express } from 'express';
import expressStaticGzip from 'express-static-gzip';

// The build writes `.br` and `.gz` beside each file (vite.config.ts); these pick one by
// Accept-Encoding (brotli first when both are accepted), set Content-Encoding, Vary and the
// original's Content-Type, and fall back to the plain file. Range and HEAD are serve-static's.
const precompressed = { enableBrotli: true, orderPreference: ['br', 'gzip'], index: false };

/** Serves the built client: hashed assets cached for a year, other files and the page revalidated. */
export function serveClient(app: Express, clientDir: string) {
  app.use('/assets', expressStaticGzip(path.join(clientDir, 'assets'), { ...precompressed, serveStatic: { immutable: true, maxAge: '1y', fallthrough: false } }));
  app.use(expressStaticGzip(clientDir, { ...precompressed, serveStatic: { index: false } }));
  // Every other path outside the API is a page of the client: its one HTML entry, compressed too
  const page = expressStaticGzip(clientDir, { ...precompressed, serveStatic: { index: false, cacheControl: false } });
  app.get(/^(?!\/api(?:\/|$)).*/, (req, res, next) => {
    res.setHeader('Cache-Control', 'no-cache');
    req.url = '/index.html';
    page(req, res, next);
  });
}
