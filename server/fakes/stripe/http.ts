import type { IncomingMessage, ServerResponse } from 'node:http';

const MAX_BODY_BYTES = 1024 * 1024;
const PAGE_CSP = "default-src 'none'; style-src 'unsafe-inline'; frame-ancestors 'none'; base-uri 'none'";

/** Stripe's 401 answers; null when the secret key is right. */
export function authenticate(req: IncomingMessage, secretKey: string): { error: { type: string; message: string } } | null {
  const header = req.headers.authorization ?? '';
  let key: string | null = null;
  if (/^Bearer /i.test(header)) key = header.slice(7).trim();
  else if (/^Basic /i.test(header)) key = Buffer.from(header.slice(6).trim(), 'base64').toString('utf8').split(':')[0] ?? '';
  if (!key) {
    return { error: { type: 'invalid_request_error', message: "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY')." } };
  }
  if (key === secretKey) return null;
  const masked = key.length > 12 ? `${key.slice(0, 8)}${'*'.repeat(key.length - 12)}${key.slice(-4)}` : '*'.repeat(key.length);
  return { error: { type: 'invalid_request_error', message: `Invalid API Key provided: ${masked}` } };
}

export function readBody(req: IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on('data', (chunk: Buffer) => {
      size += chunk.length;
      if (size > MAX_BODY_BYTES) {
        reject(new Error('Request body too large.'));
        req.destroy();
        return;
      }
      chunks.push(chunk);
    });
    req.on('end', () => resolve(Buffer.concat(chunks).toString('utf8')));
    req.on('error', reject);
  });
}

export function sendJson(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { 'content-type': 'application/json', 'cache-control': 'no-store' });
  res.end(JSON.stringify(body, null, 2));
}

export function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, {
    'content-type': 'text/html; charset=utf-8',
    'cache-control': 'no-store',
    'content-security-policy': PAGE_CSP,
    'x-content-type-options': 'nosniff',
    'referrer-policy': 'no-referrer',
  });
  res.end(html);
}
