import { readdir } from 'node:fs/promises';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { planPng } from '../support/images.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

/**
 * Hand-built multipart bodies that a careless or hostile client sends to the three upload routes
 * (issue 9, item 5): each is answered 400 with a message, and leaves no row and no file behind.
 * Multipart framing as RFC 7578 and RFC 2046 section 5.1.1 describe it.
 */
let ctx: TestApp;
let curator: Client;
let vesselId: number;
let deckId: number;
let artifactId: number;
let png: Buffer;

beforeAll(async () => {
  ctx = await createTestApp({}, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  await curator.fetchCsrf();
  vesselId = (await buildVessel(ctx.store)).id;
  deckId = (await deckWithCompartments(ctx.store, curator, vesselId)).deckId;
  artifactId = (await addArtifact(curator, vesselId, { objectNumber: '2019.1.1', name: 'Steam gauge' })).id;
  png = await planPng(300, 200);
});
afterAll(() => ctx.close());

const CSV = Buffer.from('object_number,name,category,status\r\n2022.1.1,Feed pump,tools,in-store\r\n');

const routes = [
  { name: 'media', url: () => `/api/v1/media?ownerType=artifact&ownerId=${artifactId}`, table: 'media', content: () => png, type: 'image/png' },
  { name: 'plan', url: () => `/api/v1/decks/${deckId}/plan`, table: 'plans', content: () => png, type: 'image/png' },
  { name: 'CSV import', url: () => `/api/v1/vessels/${vesselId}/artifacts/import?mode=all`, table: 'artifacts', content: () => CSV, type: 'text/csv' },
];

const BOUNDARY = '----shipkeeper-test-boundary';

/** One part named `file`; `disposition` is the rest of its Content-Disposition header, raw. */
function part(disposition: string, type: string, content: Buffer, close = true): Buffer {
  return Buffer.concat([
    Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; ${disposition}\r\nContent-Type: ${type}\r\n\r\n`, 'latin1'),
    content,
    Buffer.from(close ? `\r\n--${BOUNDARY}--\r\n` : '', 'latin1'),
  ]);
}

interface Malformed {
  what: string;
  contentType: string;
  body: (content: Buffer, type: string) => Buffer;
  message: RegExp;
  field?: string;
}

const malformed: Malformed[] = [
  { what: 'no boundary', contentType: 'multipart/form-data', body: (c, t) => part('filename="a.png"', t, c), message: /boundary/i },
  { what: 'an unterminated body', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part('filename="a.png"', t, c, false), message: /ended before|incomplete|unexpected end/i },
  { what: 'a NUL in the file name', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part('filename="a\u0000b.png"', t, c), message: /file name/i, field: 'file' },
  { what: 'a NUL in an encoded file name', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part("filename*=UTF-8''a%00b.png", t, c), message: /file name/i, field: 'file' },
  { what: 'CR LF in an encoded file name', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part("filename*=UTF-8''a%0D%0Ab.png", t, c), message: /file name/i, field: 'file' },
  { what: 'CR LF as a browser escapes it', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part('filename="a%0D%0Ab.png"', t, c), message: /file name/i, field: 'file' },
  { what: 'CR LF in the raw file name', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part('filename="a\r\nb.png"', t, c), message: /part header/i, field: 'file' },
  { what: 'a lone CR in the file name', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part('filename="a\rb.png"', t, c), message: /file name/i, field: 'file' },
  { what: 'a right-to-left override in the file name', contentType: `multipart/form-data; boundary=${BOUNDARY}`, body: (c, t) => part("filename*=UTF-8''photo%E2%80%AEgnp.exe", t, c), message: /file name/i, field: 'file' },
];

async function filesUnder(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true }).catch(() => []);
  return entries.filter((e) => e.isFile()).map((e) => path.join(e.parentPath, e.name)).sort();
}

async function rows(table: string): Promise<number> {
  return (await ctx.dataSource.query(`SELECT COUNT(*) AS n FROM "${table}"`))[0].n as number;
}

describe('malformed multipart uploads', () => {
  for (const route of routes) {
    it.each(malformed)(`answers 400 on ${route.name} for $what and keeps nothing`, async ({ contentType, body, message, field }) => {
      const before = { rows: await rows(route.table), files: await filesUnder(ctx.config.uploadsDir) };
      const res = await curator.agent.post(route.url()).set('x-csrf-token', curator.csrf).set('content-type', contentType).send(body(route.content(), route.type));
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.code).toBe('malformed_upload');
      expect(res.body.error.message).toMatch(message);
      if (field) expect(res.body.error.fields).toEqual({ [field]: expect.any(String) });
      await ctx.plans.idle();
      expect(await rows(route.table)).toBe(before.rows);
      expect(await filesUnder(ctx.config.uploadsDir)).toEqual(before.files);
    });
  }

  it('still takes a well-formed upload by the same hand-built framing', async () => {
    const res = await curator.agent
      .post(routes[0]!.url())
      .set('x-csrf-token', curator.csrf)
      .set('content-type', `multipart/form-data; boundary=${BOUNDARY}`)
      .send(part("filename*=UTF-8''gauge%20%C3%A9t%C3%A9.png", 'image/png', png));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.fileName).toBe('gauge été.png');
  });
});
