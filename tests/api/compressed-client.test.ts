import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { request as httpRequest, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app.js';

// Raw HTTP (supertest and fetch would undo the encoding before the test could see it)
type Raw = { status: number; headers: IncomingHttpHeaders; body: Buffer };
let ctx: TestApp;
let server: Server;
let clientDir: string;
const script = `export const stops = ${JSON.stringify(Array.from({ length: 200 }, (_, i) => `Stop ${i}: the boiler room`))};\n`;
const page = `<!doctype html><html lang="en"><title>Shipkeeper</title><script type="module" src="/assets/main-abc123.js"></script>${' '.repeat(600)}</html>`;

function get(url: string, headers: Record<string, string> = {}, method = 'GET'): Promise<Raw> {
  const { port } = server.address() as AddressInfo;
  return new Promise((resolve, reject) => {
    const req = httpRequest({ host: '127.0.0.1', port, path: url, method, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on('error', reject);
    req.end();
  });
}

/** A build as vite.config.ts writes it: each file with its `.br` and `.gz` beside it. */
function writeWithVariants(file: string, text: string) {
  writeFileSync(file, text);
  writeFileSync(`${file}.br`, brotliCompressSync(text));
  writeFileSync(`${file}.gz`, gzipSync(text));
}

beforeAll(async () => {
  clientDir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-client-'));
  mkdirSync(path.join(clientDir, 'assets'));
  writeWithVariants(path.join(clientDir, 'index.html'), page);
  writeWithVariants(path.join(clientDir, 'assets', 'main-abc123.js'), script);
  writeFileSync(path.join(clientDir, 'assets', 'tiny-abc123.js'), 'export {};');
  ctx = await createTestApp({ clientDir });
  server = ctx.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
});

afterAll(async () => {
  await new Promise((r) => server.close(r));
  await ctx.close();
  rmSync(clientDir, { recursive: true, force: true });
});

describe('the built client, precompressed', () => {
  it('sends the brotli file to a browser that accepts it, with its type and the immutable cache', async () => {
    const res = await get('/assets/main-abc123.js', { 'accept-encoding': 'gzip, deflate, br, zstd' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(res.headers['content-type']).toMatch(/^(text|application)\/javascript; charset=utf-8$/i);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(Number(res.headers['content-length'])).toBe(res.body.length);
    expect(res.body.length).toBeLessThan(Buffer.byteLength(script) / 4);
    expect(brotliDecompressSync(res.body).toString()).toBe(script);
  });

  it('sends the gzip file when only gzip is accepted, or brotli is refused', async () => {
    for (const accept of ['gzip', 'br;q=0, gzip;q=0.8']) {
      const res = await get('/assets/main-abc123.js', { 'accept-encoding': accept });
      expect(res.headers['content-encoding'], accept).toBe('gzip');
      expect(res.headers.vary, accept).toMatch(/Accept-Encoding/i);
      expect(res.headers['content-type'], accept).toMatch(/^text\/javascript; charset=utf-8$/i);
      expect(gunzipSync(res.body).toString(), accept).toBe(script);
    }
  });

  it('sends the plain file without Accept-Encoding, or when only identity is accepted', async () => {
    for (const headers of [{}, { 'accept-encoding': 'identity' }, { 'accept-encoding': 'zstd' }] as Record<string, string>[]) {
      const res = await get('/assets/main-abc123.js', headers);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBeUndefined();
      expect(res.headers.vary).toMatch(/Accept-Encoding/i);
      expect(res.headers['content-type']).toMatch(/^text\/javascript; charset=utf-8$/i);
      expect(res.body.toString()).toBe(script);
    }
    // a file too small to have variants is sent as it is
    const tiny = await get('/assets/tiny-abc123.js', { 'accept-encoding': 'br' });
    expect(tiny.headers['content-encoding']).toBeUndefined();
    expect(tiny.body.toString()).toBe('export {};');
  });

  it('compresses the HTML entry on every page address, and keeps it revalidated', async () => {
    for (const url of ['/visit', '/app/collection', '/index.html']) {
      const res = await get(url, { 'accept-encoding': 'br, gzip' });
      expect(res.status, url).toBe(200);
      expect(res.headers['content-encoding'], url).toBe('br');
      expect(res.headers['content-type'], url).toMatch(/^text\/html; charset=utf-8$/i);
      expect(res.headers.vary, url).toMatch(/Accept-Encoding/i);
      expect(brotliDecompressSync(res.body).toString(), url).toBe(page);
      expect(res.headers['set-cookie'], url).toBeUndefined();
    }
    const visit = await get('/visit', { 'accept-encoding': 'br' });
    expect(visit.headers['cache-control']).toBe('no-cache');
    const plain = await get('/visit');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.toString()).toBe(page);
    // the API keeps its own answers
    expect((await get('/api/v1/no-such-thing', { 'accept-encoding': 'br' })).headers['content-type']).toMatch(/json/);
  });

  it('answers a range of the encoded bytes, and HEAD with the headers alone', async () => {
    const whole = await get('/assets/main-abc123.js', { 'accept-encoding': 'br' });
    const part = await get('/assets/main-abc123.js', { 'accept-encoding': 'br', range: 'bytes=0-9' });
    expect(part.status).toBe(206);
    expect(part.headers['content-encoding']).toBe('br');
    expect(part.headers['content-range']).toBe(`bytes 0-9/${whole.body.length}`);
    expect(part.body).toEqual(whole.body.subarray(0, 10));
    const plainPart = await get('/assets/main-abc123.js', { range: 'bytes=7-12' });
    expect(plainPart.status).toBe(206);
    expect(plainPart.body.toString()).toBe(script.slice(7, 13));

    const head = await get('/assets/main-abc123.js', { 'accept-encoding': 'gzip' }, 'HEAD');
    expect(head.status).toBe(200);
    expect(head.headers['content-encoding']).toBe('gzip');
    expect(Number(head.headers['content-length'])).toBe(gzipSync(script).length);
    expect(head.body.length).toBe(0);
    const headPage = await get('/visit', { 'accept-encoding': 'br' }, 'HEAD');
    expect(headPage.status).toBe(200);
    expect(headPage.headers['content-encoding']).toBe('br');
    expect(headPage.body.length).toBe(0);
    // a missing asset is still a 404, not the page
    expect((await get('/assets/missing.js', { 'accept-encoding': 'br' })).status).toBe(404);
  });
});
