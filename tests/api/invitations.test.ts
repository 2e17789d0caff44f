import { afterEach, describe, expect, it } from 'vitest';
import { Client, signedInAs, tokenFromMail, waitForMail } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(async () => {
  await ctx?.close();
  ctx = undefined;
});

const NEW_PASSWORD = 'funnel-smoke-brass-rail-42';

async function invite(overrides = {}) {
  ctx = await createTestApp(overrides);
  const { client: admin, user } = await signedInAs(ctx.app, ctx.store, 'admin');
  const res = await admin.post('/api/v1/invitations', { email: 'New.Docent@Example.test', name: 'Nell Docent', role: 'docent' });
  return { admin, adminUser: user, res };
}

describe('invitations', () => {
  it('invites by e-mail, and the invited person sets a password and signs in', async () => {
    const { admin, res } = await invite();
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: 'new.docent@example.test', role: 'docent', status: 'pending', sentCount: 1 });
    const mail = await waitForMail(ctx!.fakeMail, 'new.docent@example.test');
    expect(mail.subject).toMatch(/invited/);
    expect(mail.text).toMatch(/expires on (Monday|Tuesday|Wednesday|Thursday|Friday|Saturday|Sunday) \d{1,2} [A-Z][a-z]+ \d{4}, \d{2}:\d{2} UTC\./);
    const token = tokenFromMail(mail.text, '/invitation');

    const visitor = new Client(ctx!.app);
    const preview = await visitor.post('/api/v1/invitations/inspect', { token });
    expect(preview.body).toMatchObject({ email: 'new.docent@example.test', role: 'docent', status: 'pending' });

    const accepted = await visitor.post('/api/v1/invitations/accept', { token, name: 'Nell Docent', password: NEW_PASSWORD });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ email: 'new.docent@example.test', role: 'docent' });
    expect((await visitor.signIn('new.docent@example.test', NEW_PASSWORD)).status).toBe(200);

    const list = await admin.get('/api/v1/invitations?status=accepted');
    expect(list.body.total).toBe(1);
    const audit = await admin.get('/api/v1/audit-events?entityType=invitation');
    expect(audit.body.items.map((e: { action: string }) => e.action)).toEqual(['accept', 'invite']);
  });

  it('refuses a used invitation with a clear 422 and changes nothing', async () => {
    await invite();
    const token = tokenFromMail((await waitForMail(ctx!.fakeMail, 'new.docent@example.test')).text, '/invitation');
    const visitor = new Client(ctx!.app);
    expect((await visitor.post('/api/v1/invitations/accept', { token, name: 'Nell', password: NEW_PASSWORD })).status).toBe(201);
    const again = await visitor.post('/api/v1/invitations/accept', { token, name: 'Someone else', password: 'another-long-password-here' });
    expect(again.status).toBe(422);
    expect(again.body.error.message).toMatch(/already been used/);
    const [user] = await ctx!.dataSource.query(`SELECT name FROM users WHERE email = 'new.docent@example.test'`);
    expect(user.name).toBe('Nell');
  });

  it('refuses an expired invitation with a clear 422 and creates no account', async () => {
    await invite({ invitationTtlHours: 0 });
    const token = tokenFromMail((await waitForMail(ctx!.fakeMail, 'new.docent@example.test')).text, '/invitation');
    const visitor = new Client(ctx!.app);
    expect((await visitor.post('/api/v1/invitations/inspect', { token })).body.status).toBe('expired');
    const res = await visitor.post('/api/v1/invitations/accept', { token, name: 'Nell', password: NEW_PASSWORD });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/expired/);
    expect(await ctx!.store.repos.users.findByEmail('new.docent@example.test')).toBeNull();
  });

  it('resending makes a new link and the old one stops working', async () => {
    const { admin, res } = await invite();
    const oldToken = tokenFromMail((await waitForMail(ctx!.fakeMail, 'new.docent@example.test')).text, '/invitation');
    ctx!.fakeMail.clear();
    const resent = await admin.post(`/api/v1/invitations/${res.body.id}/resend`);
    expect(resent.status).toBe(200);
    expect(resent.body.sentCount).toBe(2);
    const newToken = tokenFromMail((await waitForMail(ctx!.fakeMail, 'new.docent@example.test')).text, '/invitation');
    expect(newToken).not.toBe(oldToken);
    expect((await new Client(ctx!.app).post('/api/v1/invitations/inspect', { token: oldToken })).status).toBe(404);
    expect((await new Client(ctx!.app).post('/api/v1/invitations/inspect', { token: newToken })).status).toBe(200);
  });

  it('a revoked invitation cannot be accepted', async () => {
    const { admin, res } = await invite();
    const token = tokenFromMail((await waitForMail(ctx!.fakeMail, 'new.docent@example.test')).text, '/invitation');
    expect((await admin.post(`/api/v1/invitations/${res.body.id}/revoke`)).body.status).toBe('revoked');
    const accept = await new Client(ctx!.app).post('/api/v1/invitations/accept', { token, name: 'Nell', password: NEW_PASSWORD });
    expect(accept.status).toBe(422);
    expect(accept.body.error.message).toMatch(/withdrawn/);
  });

  it('answers a duplicate invitation or an existing account with 409', async () => {
    const { admin, adminUser } = await invite();
    const again = await admin.post('/api/v1/invitations', { email: 'new.docent@example.test', name: 'Nell', role: 'curator' });
    expect(again.status).toBe(409);
    expect(again.body.error.fields.email).toBe('Already invited.');
    const existing = await admin.post('/api/v1/invitations', { email: adminUser.email, name: 'Me', role: 'curator' });
    expect(existing.status).toBe(409);
  });

  it('validates the invitation body and the new password', async () => {
    const { admin } = await invite();
    const bad = await admin.post('/api/v1/invitations', { email: 'nope', name: '', role: 'captain' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'name', 'role']);
    expect(bad.body.error.fields.role).toBe('Choose one of the roles.');

    const token = tokenFromMail((await waitForMail(ctx!.fakeMail, 'new.docent@example.test')).text, '/invitation');
    const short = await new Client(ctx!.app).post('/api/v1/invitations/accept', { token, name: 'Nell', password: 'fourteen chars' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toMatch(/at least 15 characters/);
    const common = await new Client(ctx!.app).post('/api/v1/invitations/accept', { token, name: 'Nell', password: 'qwertyuiopasdfghjkl' });
    expect(common.status).toBe(400);
    expect(common.body.error.fields.password).toMatch(/too common/);
  });

  it('keeps nothing when the invitation e-mail cannot be sent', async () => {
    ctx = await createTestApp();
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    await ctx.fakeMail.stop();
    const res = await admin.post('/api/v1/invitations', { email: 'lost@example.test', name: 'Lost', role: 'docent' });
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('internal');
    const [{ n }] = await ctx.dataSource.query(`SELECT COUNT(*) AS n FROM invitations`);
    const [{ a }] = await ctx.dataSource.query(`SELECT COUNT(*) AS a FROM audit_events WHERE entityType = 'invitation'`);
    expect(n).toBe(0);
    expect(a).toBe(0);
  });
});

describe('password reset', () => {
  it('sends a link, sets the new password once, and ends existing sessions', async () => {
    ctx = await createTestApp();
    const { client: signedIn, user } = await signedInAs(ctx.app, ctx.store, 'curator');
    const visitor = new Client(ctx.app);
    const asked = await visitor.post('/api/v1/auth/password-reset', { email: user.email.toUpperCase() });
    expect(asked.status).toBe(202);
    const unknown = await visitor.post('/api/v1/auth/password-reset', { email: 'nobody@example.test' });
    expect(unknown.body).toEqual(asked.body);
    const token = tokenFromMail((await waitForMail(ctx.fakeMail, user.email)).text, '/reset-password');
    expect(ctx.fakeMail.list().some((m) => m.to.includes('nobody@example.test'))).toBe(false);

    const done = await visitor.post('/api/v1/auth/password-reset/complete', { token, password: 'steam-whistle-at-dawn' });
    expect(done.status).toBe(204);
    expect((await signedIn.get('/api/v1/auth/me')).status).toBe(401);
    expect((await visitor.signIn(user.email, 'steam-whistle-at-dawn')).status).toBe(200);
    const reused = await new Client(ctx.app).post('/api/v1/auth/password-reset/complete', { token, password: 'another-password-entirely' });
    expect(reused.status).toBe(422);
  });
});
