import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { can, type Resource } from '../../shared/permissions.js';
import { ROLES, type Role } from '../../shared/roles.js';
import type { RouteSpec } from '../../server/http/api-router.js';
import { addArtifact } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

/**
 * Every text field of every registered route, found from the route's zod schemas, refuses control
 * and text-direction characters with 422 naming the field (issue 9, item 3). A route added with a
 * plain `z.string()` fails here.
 */
let ctx: TestApp;
const clients = new Map<Role, Client>();

beforeAll(async () => {
  ctx = await createTestApp();
  for (const role of ROLES) clients.set(role, (await signedInAs(ctx.app, ctx.store, role)).client);
});
afterAll(() => ctx.close());

/** Passwords at sign-in are compared, never stored or shown: any password that exists is taken. */
const NOT_TEXT = new Set(['password', 'currentPassword']);
/** Fields of several lines, which keep tabs and line breaks. */
const FREE_TEXT = new Set(['description', 'significance', 'reason', 'summary', 'overrideReason', 'recommendedAction', 'notes', 'statement', 'caption', 'altText', 'rights', 'actionsTaken', 'contractorNotes', 'permitNotes', 'note', 'method', 'acknowledgmentStatement', 'transcript', 'accessNotes', 'lookFor', 'comment', 'body']);

type Def = { type: string; shape?: Record<string, z.ZodType>; innerType?: z.ZodType; in?: z.ZodType; options?: z.ZodType[]; format?: string };
const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def } })._zod.def;

/** Paths of the string fields a caller types (not dates or other formats checked by pattern). */
function textPaths(schema: z.ZodType, path: string[] = []): string[][] {
  const def = defOf(schema);
  switch (def.type) {
    case 'object':
      return Object.entries(def.shape!).flatMap(([key, field]) => textPaths(field, [...path, key]));
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'readonly':
      return textPaths(def.innerType!, path);
    case 'pipe':
      return textPaths(def.in!, path);
    case 'union':
      return def.options!.flatMap((option) => textPaths(option, path));
    case 'string':
      return def.format && def.format !== 'regex' ? [] : [path];
    default:
      return [];
  }
}

function bodyWith(path: string[], value: string): Record<string, unknown> {
  return path.reduceRight<unknown>((inner, key) => ({ [key]: inner }), value) as Record<string, unknown>;
}

function clientFor(spec: RouteSpec): Client {
  const access = spec.access;
  const role = access.kind === 'permission' ? ROLES.find((r) => can(r, access.resource as Resource, access.action as never)) : 'admin';
  if (!role) throw new Error(`no role may call ${spec.method} ${spec.path}`);
  return clients.get(role as Role)!;
}

const concretePath = (path: string) => `/api/v1${path.replace(/:[A-Za-z]+/g, '999999')}`;

interface Case {
  spec: RouteSpec;
  where: 'body' | 'query';
  path: string[];
}

function cases(): Case[] {
  return ctx.routes.flatMap((spec) => [
    ...(spec.body && spec.method !== 'get' ? textPaths(spec.body).map((path) => ({ spec, where: 'body' as const, path })) : []),
    ...(spec.query ? textPaths(spec.query).map((path) => ({ spec, where: 'query' as const, path })) : []),
  ]).filter((c) => !NOT_TEXT.has(c.path.join('.')));
}

async function call(c: Case, value: string) {
  const client = clientFor(c.spec);
  const url = concretePath(c.spec.path);
  if (c.where === 'query') {
    if (c.spec.method === 'get') return client.get(url).query({ [c.path.join('.')]: value });
    if (!client.csrf) await client.fetchCsrf();
    return client.agent[c.spec.method](url).query({ [c.path.join('.')]: value }).set('x-csrf-token', client.csrf).send({});
  }
  return client.send(c.spec.method as 'post', url, bodyWith(c.path, value));
}

const label = (c: Case) => `${c.spec.method.toUpperCase()} ${c.spec.path} ${c.where} ${c.path.join('.')}`;

describe('control and text-direction characters in every text field', () => {
  it('finds the text fields of the routes', () => {
    const found = cases();
    expect(found.filter((c) => c.where === 'body').length).toBeGreaterThan(60);
    expect(found.filter((c) => c.where === 'query').map(label)).toEqual(
      expect.arrayContaining(['GET /users query q', 'GET /vessels/:vesselId/artifacts query q', 'GET /vessels/:vesselId/compartments query q', 'GET /condition-reports query q']),
    );
    // Every free-text name is a field of some route, so the list above cannot silently rot.
    for (const name of FREE_TEXT) expect(found.some((c) => c.path.at(-1) === name), name).toBe(true);
  });

  it.each([
    ['a lone NUL', '\u0000', 'U+0000'],
    ['a right-to-left override', 'a\u202Eb', 'U+202E'],
    ['a C1 next-line control', 'x\u0085', 'U+0085'],
    ['a first-strong isolate', 'a\u2068b', 'U+2068'],
  ])('answers 422 naming the field for %s', async (_what, value, codePoint) => {
    const failures: string[] = [];
    for (const c of cases()) {
      const res = await call(c, value);
      const field = c.path.join('.');
      const message = res.body?.error?.fields?.[field] as string | undefined;
      if (res.status !== 422 || res.body.error.code !== 'invalid_characters' || !message?.includes(codePoint)) {
        failures.push(`${label(c)}: ${res.status} ${JSON.stringify(res.body)}`);
      }
    }
    expect(failures).toEqual([]);
  });

  it('keeps tabs and line breaks in free text and refuses them in single lines', async () => {
    const failures: string[] = [];
    for (const c of cases()) {
      const field = c.path.join('.');
      const free = FREE_TEXT.has(c.path.at(-1)!) && c.where === 'body';
      const res = await call(c, 'a\tb\nc');
      const refused = res.status === 422 && res.body.error.fields?.[field]?.includes('U+0009');
      if (free ? res.status === 422 || res.body.error?.fields?.[field] : !refused) failures.push(`${label(c)} (${free ? 'free' : 'line'}): ${res.status} ${JSON.stringify(res.body)}`);
    }
    expect(failures).toEqual([]);
  });

  it('tells the field in the message and names every refused field', async () => {
    const admin = clients.get('admin')!;
    const one = await admin.post('/api/v1/vessels', { name: '\u0000', vesselType: 'Steam tug' });
    expect(one.status).toBe(422);
    expect(one.body.error).toEqual({ code: 'invalid_characters', message: 'Name contains a control character (U+0000). Remove it and try again.', fields: { name: 'Name contains a control character (U+0000). Remove it and try again.' } });
    const two = await admin.post('/api/v1/vessels', { name: 'a\u202Eb', vesselType: 'x\u0085', builtYear: 1600 });
    expect(two.status).toBe(422);
    expect(two.body.error.message).toBe('These fields hold control or text-direction characters that cannot be stored: name, vesselType. Remove them and try again.');
    // The other problems of the form come along, so that it can mark them all at once.
    expect(two.body.error.fields).toEqual({ name: expect.stringContaining('U+202E'), vesselType: expect.stringContaining('U+0085'), builtYear: 'Year built must be 1700 or later.' });
  });

  it('stores free text with its tabs and line breaks, CR LF as LF', async () => {
    const admin = clients.get('admin')!;
    const res = await admin.post('/api/v1/vessels', { name: 'Harbour tug', vesselType: 'Steam tug', berth: '', summary: 'Built 1911.\tRiveted hull.\r\nRestored 1990.', builtYear: null, designationScheme: 'free-text' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.summary).toBe('Built 1911.\tRiveted hull.\nRestored 1990.');
  });
});

describe('control and text-direction characters in CSV files', () => {
  let vesselId: number;
  beforeAll(async () => {
    vesselId = (await buildVessel(ctx.store)).id;
  });

  const importCsv = (mode: string, csv: string) => {
    const curator = clients.get('curator')!;
    return curator.agent.post(`/api/v1/vessels/${vesselId}/artifacts/import?mode=${mode}`).set('x-csrf-token', curator.csrf).attach('file', Buffer.from(csv), 'artifacts.csv');
  };
  const count = async () => (await ctx.dataSource.query('SELECT COUNT(*) AS n FROM artifacts WHERE "vesselId" = ?', [vesselId]))[0].n as number;

  it('refuses each cell that holds one, naming its column, and imports nothing of it', async () => {
    const csv = [
      'object_number,name,category,description,maker,status,compartment',
      '2021.1.1,\u0000,tools,,,in-store,',
      '2021.1.2,Oil can,tools,"Two\tparts\r\nand a lid",a\u202Eb,in-store,',
      '2021.1.\u00853,Wrench,tools,,,in-store,',
      '2021.1.4,Gauge,tools,Bad \u0007 bell,,in-store,\u2066X',
      '2021.1.5,Good one,tools,"Line one\r\nline two",,in-store,',
    ].join('\r\n');
    const preview = await importCsv('preview', csv);
    expect(preview.status, JSON.stringify(preview.body)).toBe(200);
    const errors = Object.fromEntries(preview.body.rows.map((r: { line: number; errors: unknown[] }) => [r.line, r.errors]));
    const cell = (cp: string) => expect.stringContaining(`control character (${cp})`);
    expect(errors[2]).toEqual([{ column: 'name', message: cell('U+0000') }]);
    expect(errors[3]).toEqual([{ column: 'maker', message: expect.stringContaining('text-direction character (U+202E)') }]);
    expect(errors[4]).toEqual([{ column: 'object_number', message: cell('U+0085') }]);
    expect(errors[5]).toEqual([
      { column: 'description', message: cell('U+0007') },
      { column: 'compartment', message: expect.stringContaining('(U+2066)') },
    ]);
    expect(errors[6]).toEqual([]);
    // What the preview echoes carries none of them either.
    expect(preview.body.rows.map((r: { objectNumber: string }) => r.objectNumber)).toContain('2021.1.3');

    expect((await importCsv('all', csv)).status).toBe(422);
    expect(await count()).toBe(0);
    const valid = await importCsv('valid-only', csv);
    expect(valid.body.imported).toBe(1);
    const names = (await ctx.dataSource.query('SELECT name, description FROM artifacts WHERE "vesselId" = ?', [vesselId])) as { name: string; description: string }[];
    expect(names).toEqual([{ name: 'Good one', description: 'Line one\nline two' }]);
  });

  it('never writes them out, even when older data holds them', async () => {
    const curator = clients.get('curator')!;
    const artifact = await addArtifact(curator, vesselId, { objectNumber: '2021.2.1', name: 'Plain name', description: 'Tab\there\nnext line' });
    await ctx.dataSource.query('UPDATE artifacts SET name = ?, maker = ? WHERE id = ?', ['A\u0000b\u202Ec\u0085d', '\u2067Maker\u2069', artifact.id]);
    const res = await curator.get(`/api/v1/vessels/${vesselId}/artifacts/export`);
    expect(res.status).toBe(200);
    const body = res.text.replace(/\r\n/g, '\n');
    expect(body).not.toMatch(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069\u200E\u200F\u061C]/);
    expect(body).toContain('2021.2.1,Abcd,tools,"Tab\there\nnext line",,Maker,');
  });
});
