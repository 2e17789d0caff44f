import { afterEach, describe, expect, it } from 'vitest';
import { buildUser } from '../support/factories.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(async () => {
  await ctx?.close();
  ctx = undefined;
});

describe('people', () => {
  it('pages, sorts and filters on the server', async () => {
    ctx = await createTestApp();
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    for (const name of ['Carys Boiler', 'Abel Stoker', 'Bea Fireman', 'Dov Oiler']) await buildUser(ctx.store, { name, role: 'docent' });
    const first = await client.get('/api/v1/users?pageSize=2&sort=name&role=docent');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 4, page: 1, pageSize: 2 });
    expect(first.body.items.map((u: { name: string }) => u.name)).toEqual(['Abel Stoker', 'Bea Fireman']);
    const second = await client.get('/api/v1/users?pageSize=2&page=2&sort=-name&role=docent');
    expect(second.body.items.map((u: { name: string }) => u.name)).toEqual(['Bea Fireman', 'Abel Stoker']);
    const search = await client.get('/api/v1/users?q=stok');
    expect(search.body.items.map((u: { name: string }) => u.name)).toEqual(['Abel Stoker']);
    const bad = await client.get('/api/v1/users?pageSize=1000&sort=password');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['pageSize', 'sort']);
  });

  it('changes a role, records it, and refuses a stale version with 409', async () => {
    ctx = await createTestApp();
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    const person = await buildUser(ctx.store, { role: 'docent' });
    const changed = await client.patch(`/api/v1/users/${person.id}`, { role: 'curator', version: person.version });
    expect(changed.status).toBe(200);
    expect(changed.body.role).toBe('curator');
    const stale = await client.patch(`/api/v1/users/${person.id}`, { role: 'fundraiser', version: person.version });
    expect(stale.status).toBe(409);
    expect((await ctx.store.repos.users.findById(person.id))!.role).toBe('curator');
    const audit = await client.get(`/api/v1/audit-events?entityType=user&action=update`);
    expect(audit.body.items[0]).toMatchObject({ summary: `Role of ${person.email} changed from Docent to Curator`, changes: { role: { from: 'docent', to: 'curator' } } });
  });

  it('a role change applies to the person at once', async () => {
    ctx = await createTestApp();
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    const { client: docent, user } = await signedInAs(ctx.app, ctx.store, 'docent');
    expect((await docent.post('/api/v1/vessels', { name: 'X', vesselType: 'Tug' })).status).toBe(403);
    await admin.patch(`/api/v1/users/${user.id}`, { role: 'admin', version: user.version });
    expect((await docent.get('/api/v1/auth/me')).body.user.role).toBe('admin');
  });

  it('keeps at least one active administrator', async () => {
    ctx = await createTestApp();
    const { client, user } = await signedInAs(ctx.app, ctx.store, 'admin');
    const res = await client.patch(`/api/v1/users/${user.id}`, { role: 'curator', version: user.version });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.role).toBeDefined();
  });

  it("deactivating ends the person's sessions at once; reactivating lets them back", async () => {
    ctx = await createTestApp();
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    const { client: curator, user } = await signedInAs(ctx.app, ctx.store, 'curator');
    expect((await curator.get('/api/v1/auth/me')).status).toBe(200);
    const res = await admin.post(`/api/v1/users/${user.id}/deactivate`, { reason: 'Left the museum' });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('deactivated');
    expect((await curator.get('/api/v1/vessels')).status).toBe(401);
    const [{ n }] = await ctx.dataSource.query(`SELECT COUNT(*) AS n FROM sessions WHERE userId = ?`, [user.id]);
    expect(n).toBe(0);
    expect((await new Client(ctx.app).signIn(user.email)).status).toBe(401);
    await admin.post(`/api/v1/users/${user.id}/reactivate`);
    expect((await new Client(ctx.app).signIn(user.email)).status).toBe(200);
    const audit = await admin.get(`/api/v1/audit-events?entityType=user`);
    expect(audit.body.items.map((e: { action: string }) => e.action)).toEqual(expect.arrayContaining(['deactivate', 'reactivate']));
  });

  it('an administrator cannot deactivate their own account', async () => {
    ctx = await createTestApp();
    const { client, user } = await signedInAs(ctx.app, ctx.store, 'admin');
    const res = await client.post(`/api/v1/users/${user.id}/deactivate`, {});
    expect(res.status).toBe(422);
  });

  it('answers 404 for a missing person', async () => {
    ctx = await createTestApp();
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    const res = await client.get('/api/v1/users/4242');
    expect(res.status).toBe(404);
    expect(res.body.error).toEqual({ code: 'not_found', message: 'The user was not found.' });
  });
});
