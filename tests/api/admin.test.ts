import { afterEach, describe, expect, it } from 'vitest';
import { Client, signedInAs, waitForMail } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(async () => {
  await ctx?.close();
  ctx = undefined;
});

describe('audit trail', () => {
  it('filters by person, action, record type and dates', async () => {
    ctx = await createTestApp();
    const { client, user } = await signedInAs(ctx.app, ctx.store, 'admin');
    await client.post('/api/v1/vessels', { name: 'Tug A', vesselType: 'Tug' });
    await client.post('/api/v1/vessels', { name: 'Tug B', vesselType: 'Tug' });
    const all = await client.get('/api/v1/audit-events');
    expect(all.body.items.map((e: { action: string }) => e.action)).toEqual(['create', 'create', 'sign-in']);
    expect((await client.get(`/api/v1/audit-events?action=sign-in&actorId=${user.id}`)).body.total).toBe(1);
    expect((await client.get('/api/v1/audit-events?entityType=vessel&sort=at')).body.items[0].summary).toBe('Vessel Tug A added');
    const today = new Date().toISOString().slice(0, 10);
    expect((await client.get(`/api/v1/audit-events?from=${today}&to=${today}`)).body.total).toBe(3);
    expect((await client.get('/api/v1/audit-events?to=2001-01-01')).body.total).toBe(0);
    const bad = await client.get('/api/v1/audit-events?from=yesterday');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.from).toBe('Use a date as YYYY-MM-DD.');
    expect((await client.get('/api/v1/audit-events/entity-types')).body).toEqual(['user', 'vessel']);
  });
});

describe('organisation settings', () => {
  it('every staff role reads them; the administrator changes them with a version', async () => {
    ctx = await createTestApp();
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    const { client: docent } = await signedInAs(ctx.app, ctx.store, 'docent');
    const current = (await docent.get('/api/v1/settings')).body;
    expect(current).toMatchObject({ country: 'US', currency: 'USD', unitSystem: 'us-customary' });
    const bad = await admin.patch('/api/v1/settings', { country: 'USA', currency: 'dollars', version: current.version });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['country', 'currency']);
    const ok = await admin.patch('/api/v1/settings', { organisationName: 'Test Trust', unitSystem: 'metric', country: 'gb', version: current.version });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ organisationName: 'Test Trust', unitSystem: 'metric', country: 'GB' });
    expect((await admin.patch('/api/v1/settings', { organisationName: 'Again', version: current.version })).status).toBe(409);
  });

  it('refuses an object-number pattern with numbers side by side, or longer than 40 characters, naming the field', async () => {
    ctx = await createTestApp();
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    const current = (await admin.get('/api/v1/settings')).body;
    const adjacent = await admin.patch('/api/v1/settings', { objectNumberPattern: 'NNNNNNNNNNNNNN', version: current.version });
    expect(adjacent.status).toBe(400);
    expect(adjacent.body.error.fields).toEqual({ objectNumberPattern: 'Put a separator or a letter between two numbers of the pattern (NN or YYYYN cannot be told apart).' });
    const long = await admin.patch('/api/v1/settings', { objectNumberPattern: 'N.'.repeat(20) + 'N', version: current.version });
    expect(long.status).toBe(400);
    expect(long.body.error.fields).toEqual({ objectNumberPattern: 'A pattern has at most 40 characters.' });
    expect((await admin.get('/api/v1/settings')).body).toMatchObject({ objectNumberPattern: 'YYYY.N.N', version: current.version });
    expect((await admin.patch('/api/v1/settings', { objectNumberPattern: 'SK YYYY.N-N', version: current.version })).status).toBe(200);
  });
});

describe('outbox', () => {
  it('lists the messages the fake mail server kept and shows one whole', async () => {
    ctx = await createTestApp();
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    await client.post('/api/v1/invitations', { email: 'one@example.test', name: 'One', role: 'docent' });
    await client.post('/api/v1/invitations', { email: 'two@example.test', name: 'Two', role: 'curator' });
    await waitForMail(ctx.fakeMail, 'two@example.test');
    const list = await client.get('/api/v1/outbox');
    expect(list.body).toMatchObject({ total: 2, available: true });
    expect(list.body.items[0].to).toEqual(['two@example.test']);
    const filtered = await client.get('/api/v1/outbox?to=one@');
    expect(filtered.body.total).toBe(1);
    const message = await client.get(`/api/v1/outbox/${filtered.body.items[0].id}`);
    expect(message.body.text).toMatch(/\/invitation#/);
    expect(message.body.html).toMatch(/Accept the invitation/);
    expect((await client.get('/api/v1/outbox/00000000-0000-0000-0000-000000000000')).status).toBe(404);
  });
});

describe('service routes', () => {
  it('GET /health tells anonymous callers and staff only the status', async () => {
    ctx = await createTestApp();
    const anonymous = await new Client(ctx.app).get('/api/v1/health');
    expect(anonymous.status).toBe(200);
    expect(anonymous.body).toEqual({ status: 'ok' });
    const { client: curator } = await signedInAs(ctx.app, ctx.store, 'curator');
    expect((await curator.get('/api/v1/health')).body).toEqual({ status: 'ok' });
  });

  it('GET /health reports the database and the fakes to administrators', async () => {
    ctx = await createTestApp();
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    const res = await admin.get('/api/v1/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', database: { status: 'ok', pendingMigrations: 0, journalMode: 'wal' }, fakes: { mail: { running: true, port: ctx.fakeMail.port } } });
  });

  it('the OpenAPI document covers every route', async () => {
    ctx = await createTestApp();
    const doc = (await new Client(ctx.app).get('/api/v1/openapi.json')).body;
    expect(doc.openapi).toBe('3.0.3');
    for (const spec of ctx.routes) {
      const path = `/api/v1${spec.path.replace(/:([A-Za-z]+)/g, '{$1}')}`;
      expect(doc.paths[path]?.[spec.method], `${spec.method} ${path}`).toBeDefined();
    }
    expect(doc.paths['/api/v1/users/{id}'].patch.responses['409']).toBeDefined();
    expect(doc.components.schemas.Error).toBeDefined();
  });

  it('answers unknown API paths with a JSON 404 and bad JSON with 400', async () => {
    ctx = await createTestApp();
    const client = new Client(ctx.app);
    const missing = await client.get('/api/v1/no-such-thing');
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe('not_found');
    await client.fetchCsrf();
    const badJson = await client.agent.post('/api/v1/auth/login').set('x-csrf-token', client.csrf).set('content-type', 'application/json').send('{"email":');
    expect(badJson.status).toBe(400);
    expect(badJson.body.error.code).toBe('bad_request');
  });
});
