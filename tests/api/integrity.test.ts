import { afterEach, describe, expect, it } from 'vitest';
import { buildUser, buildVessel, TEST_PASSWORD } from '../support/factories.js';
import { Client, signedInAs, tokenFromMail, waitForMail } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(async () => {
  await ctx?.close();
  ctx = undefined;
});

describe('nothing half-written, nothing lost', () => {
  it("a failing change does not take another request's change down with it", async () => {
    ctx = await createTestApp();
    const vessel = await buildVessel(ctx.store, { name: 'Tug Before' });
    const { client } = await signedInAs(ctx.app, ctx.store, 'curator');
    let release!: () => void;
    const gate = new Promise<void>((r) => (release = r));
    // A change that holds its transaction open and then fails.
    const failing = ctx.store
      .transaction(async (repos) => {
        const v = await repos.vessels.findById(vessel.id);
        v!.berth = 'should never be kept';
        await repos.vessels.save(v!);
        await gate;
        throw new Error('boom');
      })
      .catch((err: Error) => err.message);
    const edit = client.patch(`/api/v1/vessels/${vessel.id}`, { name: 'Tug After', version: vessel.version });
    await new Promise((r) => setTimeout(r, 50));
    release();
    expect(await failing).toBe('boom');
    const res = await edit;
    expect(res.status).toBe(200);
    const stored = await ctx.store.repos.vessels.findById(vessel.id);
    expect(stored).toMatchObject({ name: 'Tug After', berth: 'Test berth' });
  });

  it('two role changes at the same moment both land, each with its audit event', async () => {
    ctx = await createTestApp();
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    const a = await buildUser(ctx.store, { role: 'docent' });
    const b = await buildUser(ctx.store, { role: 'docent' });
    const [ra, rb] = await Promise.all([
      client.patch(`/api/v1/users/${a.id}`, { role: 'curator', version: a.version }),
      client.patch(`/api/v1/users/${b.id}`, { role: 'fundraiser', version: b.version }),
    ]);
    expect([ra.status, rb.status]).toEqual([200, 200]);
    const [{ n }] = await ctx.dataSource.query(`SELECT COUNT(*) AS n FROM audit_events WHERE entityType = 'user' AND action = 'update'`);
    expect(n).toBe(2);
  });
});

describe('CSRF on every change', () => {
  it('refuses every non-GET route without the token with 403 csrf, signed in or not', async () => {
    ctx = await createTestApp({}, { mail: false });
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    const anonymous = new Client(ctx.app);
    // Stripe's webhook carries no cookie or token: its signature is its proof (tests/api/giving.test.ts)
    const changes = ctx.routes.filter((r) => r.method !== 'get' && r.path !== '/webhooks/stripe');
    expect(changes.length).toBeGreaterThan(10);
    const unsigned = await anonymous.agent.post('/api/v1/webhooks/stripe').send({});
    expect(unsigned.status).toBe(400);
    for (const who of [client, anonymous]) {
      for (const route of changes) {
        const path = `/api/v1${route.path.replace(/:[A-Za-z]+/g, '1')}`;
        const res = await who.agent[route.method as 'post'](path).send({});
        expect(res.status, `${route.method} ${route.path}`).toBe(403);
        expect(res.body.error.code).toBe('csrf');
      }
    }
  });
});

describe('account safety', () => {
  it('deactivating an account voids its open reset links', async () => {
    ctx = await createTestApp();
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    const user = await buildUser(ctx.store, { role: 'curator' });
    await new Client(ctx.app).post('/api/v1/auth/password-reset', { email: user.email });
    const token = tokenFromMail((await waitForMail(ctx.fakeMail, user.email)).text, '/reset-password');
    await admin.post(`/api/v1/users/${user.id}/deactivate`, {});
    await admin.post(`/api/v1/users/${user.id}/reactivate`);
    const res = await new Client(ctx.app).post('/api/v1/auth/password-reset/complete', { token, password: 'someone-else-took-over' });
    expect(res.status).toBe(422);
  });

  it('limits guesses at the current password', async () => {
    ctx = await createTestApp({ loginLimitPerAccount: 3 });
    const { client } = await signedInAs(ctx.app, ctx.store, 'docent');
    for (let i = 0; i < 3; i++) expect((await client.post('/api/v1/auth/password', { currentPassword: `guess ${i}`, newPassword: 'a-brand-new-long-password' })).status).toBe(400);
    const res = await client.post('/api/v1/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'a-brand-new-long-password' });
    expect(res.status).toBe(429);
  });

  it('failed sign-ins from one address do not lock the account for another address', async () => {
    ctx = await createTestApp({ loginLimitPerAccount: 2, trustProxy: true });
    const user = await buildUser(ctx.store);
    const from = async (ip: string, password: string) => {
      const client = new Client(ctx!.app);
      const csrf = await client.agent.get('/api/v1/auth/csrf').set('x-forwarded-for', ip);
      return client.agent.post('/api/v1/auth/login').set('x-forwarded-for', ip).set('x-csrf-token', csrf.body.csrfToken).send({ email: user.email, password });
    };
    for (let i = 0; i < 2; i++) await from('203.0.113.7', 'wrong wrong wrong wrong');
    expect((await from('203.0.113.7', TEST_PASSWORD)).status).toBe(429);
    expect((await from('198.51.100.20', TEST_PASSWORD)).status).toBe(200);
  });

  it('an invitation to a deactivated account says to reactivate it', async () => {
    ctx = await createTestApp();
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    const gone = await buildUser(ctx.store, { status: 'deactivated' });
    const res = await client.post('/api/v1/invitations', { email: gone.email, name: 'Back', role: 'docent' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Reactivate it/);
  });
});

describe('request hygiene', () => {
  it('answers a body that is not JSON with 415', async () => {
    ctx = await createTestApp({}, { mail: false });
    const client = new Client(ctx.app);
    await client.fetchCsrf();
    const res = await client.agent.post('/api/v1/auth/login').set('x-csrf-token', client.csrf).set('content-type', 'text/plain').send('email=a');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
  });

  it('treats % and _ in a search as themselves', async () => {
    ctx = await createTestApp({}, { mail: false });
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    await buildUser(ctx.store, { name: '100% Volunteer' });
    expect((await client.get('/api/v1/users?q=%25')).body.items.map((u: { name: string }) => u.name)).toEqual(['100% Volunteer']);
    expect((await client.get('/api/v1/users?q=_')).body.total).toBe(0);
  });
});
