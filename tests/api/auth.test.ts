import { afterEach, describe, expect, it } from 'vitest';
import { buildUser, TEST_PASSWORD } from '../support/factories.js';
import { Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(async () => {
  await ctx?.close();
  ctx = undefined;
});

function sessionCookie(res: { headers: Record<string, unknown> }): string | undefined {
  const cookies = (res.headers['set-cookie'] as string[] | undefined) ?? [];
  return cookies.find((c) => c.startsWith('shipkeeper.sid='));
}

describe('POST /api/v1/auth/login', () => {
  it('refuses a change without a CSRF token with 403 csrf', async () => {
    ctx = await createTestApp();
    const res = await new Client(ctx.app).agent.post('/api/v1/auth/login').send({ email: 'a@example.test', password: 'x' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
  });

  it('refuses a wrong CSRF token with 403 csrf', async () => {
    ctx = await createTestApp();
    const client = new Client(ctx.app);
    await client.fetchCsrf();
    const res = await client.agent.post('/api/v1/auth/login').set('x-csrf-token', 'not-the-token').send({ email: 'a@example.test', password: 'x' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
  });

  it('answers a malformed body with 400 naming the fields', async () => {
    ctx = await createTestApp();
    const res = await new Client(ctx.app).post('/api/v1/auth/login', { email: 'not an address' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation');
    expect(res.body.error.fields).toMatchObject({ email: 'Enter a valid e-mail address.', password: expect.any(String) });
  });

  it('gives one generic 401 for a wrong password and for an unknown account', async () => {
    ctx = await createTestApp();
    const user = await buildUser(ctx.store, { role: 'curator' });
    const wrong = await new Client(ctx.app).signIn(user.email, 'not the right password at all');
    const unknown = await new Client(ctx.app).signIn('nobody@example.test', 'not the right password at all');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.message).toBe('The e-mail address or the password is not correct.');
  });

  it('writes refused sign-ins and reset requests to the audit trail', async () => {
    ctx = await createTestApp();
    const user = await buildUser(ctx.store, { role: 'curator' });
    await new Client(ctx.app).signIn(user.email, 'not the right password at all');
    await new Client(ctx.app).signIn('nobody@example.test', 'not the right password at all');
    await new Client(ctx.app).post('/api/v1/auth/password-reset', { email: 'nobody@example.test' });
    const rows = await ctx.dataSource.query(`SELECT actorId, action, entityId, summary FROM audit_events ORDER BY id`);
    expect(rows).toEqual([
      { actorId: null, action: 'sign-in-failed', entityId: String(user.id), summary: `Sign-in refused for ${user.email}` },
      { actorId: null, action: 'sign-in-failed', entityId: null, summary: 'Sign-in refused for nobody@example.test' },
      { actorId: null, action: 'password-reset-request', entityId: null, summary: 'Reset link asked for nobody@example.test (no active account; nothing sent)' },
    ]);
  });

  it('refuses a deactivated account with the same generic 401', async () => {
    ctx = await createTestApp();
    const user = await buildUser(ctx.store, { status: 'deactivated' });
    const res = await new Client(ctx.app).signIn(user.email);
    expect(res.status).toBe(401);
    expect(res.body.error.message).toBe('The e-mail address or the password is not correct.');
  });

  it('signs in, regenerates the session id, and sets a HttpOnly SameSite=Lax cookie with the idle timeout', async () => {
    ctx = await createTestApp();
    const user = await buildUser(ctx.store, { role: 'conservator' });
    const client = new Client(ctx.app);
    const csrfRes = await client.agent.get('/api/v1/auth/csrf');
    expect(sessionCookie(csrfRes)).toBeUndefined();
    client.csrf = csrfRes.body.csrfToken;
    const first = await client.signIn(user.email);
    const before = sessionCookie(first)!.split(';')[0];
    // signing in again on a live session gives it a new id (OWASP ASVS 4.0.3, 3.2.1)
    const res = await client.signIn(user.email);
    expect(res.status).toBe(200);
    const after = sessionCookie(res)!;
    expect(after.split(';')[0]).not.toBe(before);
    expect(after).toMatch(/HttpOnly/i);
    expect(after).toMatch(/SameSite=Lax/i);
    expect(after).not.toMatch(/Secure/i);
    // OWASP ASVS 4.0.3, 3.3.2 (level 2): 30 minutes idle.
    const expires = new Date(/Expires=([^;]+)/.exec(after)![1]!).getTime();
    expect(Math.abs(expires - (Date.now() + 30 * 60_000))).toBeLessThan(5_000);
    expect(res.body.user).toMatchObject({ email: user.email, role: 'conservator' });
    expect(res.body.user.permissions.vessel).toContain('read');
    expect(res.body.user.permissions.user).toEqual([]);
    expect(res.body.session).toMatchObject({ idleTimeoutMinutes: 30, absoluteTimeoutHours: 12 });
    // The old CSRF tokens belonged to the anonymous caller and to the old session.
    for (const old of [csrfRes.body.csrfToken, first.body.csrfToken]) {
      const stale = await client.agent.post('/api/v1/auth/password').set('x-csrf-token', old).send({});
      expect(stale.body.error.code).toBe('csrf');
    }
  });

  it('marks the cookie Secure when served over HTTPS', async () => {
    ctx = await createTestApp({ secureCookies: true, trustProxy: true });
    const user = await buildUser(ctx.store);
    const { default: request } = await import('supertest');
    const csrf = await request(ctx.app).get('/api/v1/auth/csrf').set('x-forwarded-proto', 'https');
    const csrfCookie = (csrf.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('shipkeeper.csrf='))!;
    expect(csrfCookie).toMatch(/Secure/);
    const res = await request(ctx.app)
      .post('/api/v1/auth/login')
      .set('x-forwarded-proto', 'https')
      .set('Cookie', csrfCookie.split(';')[0]!)
      .set('x-csrf-token', csrf.body.csrfToken)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(sessionCookie(res)).toMatch(/Secure/);
  });

  it('limits failed attempts per account with 429 and says when to retry', async () => {
    ctx = await createTestApp({ loginLimitPerAccount: 3 });
    const user = await buildUser(ctx.store);
    for (let i = 0; i < 3; i++) expect((await new Client(ctx.app).signIn(user.email, 'wrong password, wrong again')).status).toBe(401);
    const res = await new Client(ctx.app).signIn(user.email, TEST_PASSWORD);
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('rate_limited');
    expect(res.body.error.message).toMatch(/Too many failed sign-in attempts for this account. Try again in 15 minutes./);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(800);
    // Another account from the same address is not blocked by this one's failures.
    const other = await buildUser(ctx.store);
    expect((await new Client(ctx.app).signIn(other.email)).status).toBe(200);
  });

  it('limits attempts per address with 429', async () => {
    ctx = await createTestApp({ loginLimitPerAddress: 4 });
    for (let i = 0; i < 4; i++) await new Client(ctx.app).signIn(`person${i}@example.test`, 'wrong password, wrong again');
    const res = await new Client(ctx.app).signIn('someone-else@example.test', 'wrong password, wrong again');
    expect(res.status).toBe(429);
    expect(res.body.error.message).toMatch(/from this network address/);
  });
});

describe('sessions', () => {
  it('GET /auth/me answers 401 without a session', async () => {
    ctx = await createTestApp();
    const res = await new Client(ctx.app).get('/api/v1/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('signs out: the session ends and the audit trail records both', async () => {
    ctx = await createTestApp();
    const user = await buildUser(ctx.store, { role: 'admin' });
    const client = new Client(ctx.app);
    await client.signIn(user.email);
    expect((await client.get('/api/v1/auth/me')).status).toBe(200);
    expect((await client.post('/api/v1/auth/logout')).status).toBe(204);
    expect((await client.get('/api/v1/auth/me')).status).toBe(401);
    const events = await ctx.dataSource.query(`SELECT action FROM audit_events WHERE actorId = ? ORDER BY id`, [user.id]);
    expect(events.map((e: { action: string }) => e.action)).toEqual(['sign-in', 'sign-out']);
  });

  it('keeps people signed in across a restart (sessions live in the database)', async () => {
    ctx = await createTestApp();
    const user = await buildUser(ctx.store);
    const client = new Client(ctx.app);
    const login = await client.signIn(user.email);
    const cookie = sessionCookie(login)!.split(';')[0]!;
    const dataDir = ctx.dataDir;
    await ctx.close(true);
    ctx = await createTestApp({}, { dataDir });
    const { default: request } = await import('supertest');
    const res = await request(ctx.app).get('/api/v1/auth/me').set('Cookie', cookie);
    expect(res.status).toBe(200);
    expect(res.body.user.email).toBe(user.email);
  });

  it('ends a session past the absolute timeout even while it is in use', async () => {
    ctx = await createTestApp({ sessionAbsoluteHours: 0 });
    const user = await buildUser(ctx.store);
    const client = new Client(ctx.app);
    expect((await client.signIn(user.email)).status).toBe(200);
    await new Promise((r) => setTimeout(r, 5));
    expect((await client.get('/api/v1/auth/me')).status).toBe(401);
  });

  it('changing your password ends your other sessions but keeps this one', async () => {
    ctx = await createTestApp();
    const user = await buildUser(ctx.store);
    const here = new Client(ctx.app);
    const elsewhere = new Client(ctx.app);
    await here.signIn(user.email);
    await elsewhere.signIn(user.email);
    const weak = await here.post('/api/v1/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'passwordpassword' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields.newPassword).toMatch(/too common/);
    const res = await here.post('/api/v1/auth/password', { currentPassword: TEST_PASSWORD, newPassword: 'quay-barnacle-pressure-dial' });
    expect(res.status).toBe(204);
    expect((await here.get('/api/v1/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/v1/auth/me')).status).toBe(401);
    expect((await new Client(ctx.app).signIn(user.email, 'quay-barnacle-pressure-dial')).status).toBe(200);
  });
});

describe('GET /api/v1/auth/csrf for anonymous callers', () => {
  it('stores no session, yet its token protects an anonymous change', async () => {
    ctx = await createTestApp({ csrfLimitPerMinute: 1000 });
    const sessionsBefore = Number((await ctx.dataSource.query('SELECT COUNT(*) AS n FROM sessions'))[0].n);
    for (let i = 0; i < 200; i++) await new Client(ctx.app).fetchCsrf();
    const sessionsAfter = Number((await ctx.dataSource.query('SELECT COUNT(*) AS n FROM sessions'))[0].n);
    expect(sessionsAfter - sessionsBefore).toBe(0);
    // the token works only with the cookie it came with
    const client = new Client(ctx.app);
    await client.fetchCsrf();
    const other = new Client(ctx.app);
    await other.fetchCsrf();
    const crossed = await other.agent.post('/api/v1/auth/password-reset').set('x-csrf-token', client.csrf).send({ email: 'a@example.test' });
    expect(crossed.status).toBe(403);
    expect(crossed.body.error.code).toBe('csrf');
    expect((await client.post('/api/v1/auth/password-reset', { email: 'a@example.test' })).status).toBe(202);
  });

  it('is rate-limited per network address', async () => {
    ctx = await createTestApp({ csrfLimitPerMinute: 5 });
    for (let i = 0; i < 5; i++) expect((await new Client(ctx.app).agent.get('/api/v1/auth/csrf')).status).toBe(200);
    const res = await new Client(ctx.app).agent.get('/api/v1/auth/csrf');
    expect(res.status).toBe(429);
    expect(res.body.error.message).toMatch(/Too many security token requests/);
  });
});
