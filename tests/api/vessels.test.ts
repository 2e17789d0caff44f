import { afterEach, describe, expect, it } from 'vitest';
import { buildVessel } from '../support/factories.js';
import { signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(async () => {
  await ctx?.close();
  ctx = undefined;
});

describe('vessels', () => {
  it('an administrator adds a vessel; the change is in the audit trail', async () => {
    ctx = await createTestApp();
    const { client, user } = await signedInAs(ctx.app, ctx.store, 'admin');
    const res = await client.post('/api/v1/vessels', { name: 'SS Example Tern', vesselType: 'Steam yacht', builtYear: 1902 });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'SS Example Tern', designationScheme: 'free-text', archived: false, abilities: { update: true, archive: true } });
    const audit = await client.get('/api/v1/audit-events?entityType=vessel');
    expect(audit.body.items[0]).toMatchObject({ action: 'create', entityId: String(res.body.id), vesselId: res.body.id, actor: { id: user.id } });
    expect(audit.body.items[0].changes.name).toEqual({ from: null, to: 'SS Example Tern' });
  });

  it('validates with messages by field', async () => {
    ctx = await createTestApp();
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    const res = await client.post('/api/v1/vessels', { name: '  ', vesselType: 'Tug', builtYear: 1500, designationScheme: 'lloyds' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({
      name: 'Name is required.',
      builtYear: 'Year built must be 1700 or later.',
      designationScheme: 'Choose a designation scheme.',
    });
  });

  it('a curator edits a vessel; a stale version gets 409 and nothing is overwritten', async () => {
    ctx = await createTestApp();
    const vessel = await buildVessel(ctx.store, { name: 'Tug Sample' });
    const { client } = await signedInAs(ctx.app, ctx.store, 'curator');
    const ok = await client.patch(`/api/v1/vessels/${vessel.id}`, { berth: 'North wall', version: vessel.version });
    expect(ok.status).toBe(200);
    expect(ok.body.berth).toBe('North wall');
    const stale = await client.patch(`/api/v1/vessels/${vessel.id}`, { berth: 'South wall', version: vessel.version });
    expect(stale.status).toBe(409);
    expect((await ctx.store.repos.vessels.findById(vessel.id))!.berth).toBe('North wall');
  });

  it('refuses a duplicate name with 409', async () => {
    ctx = await createTestApp();
    await buildVessel(ctx.store, { name: 'Tug Sample' });
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    const res = await client.post('/api/v1/vessels', { name: 'tug sample', vesselType: 'Tug' });
    expect(res.status).toBe(409);
    expect(res.body.error.fields.name).toBe('Already in use.');
  });

  it('archived vessels leave the list and the public site until restored', async () => {
    ctx = await createTestApp();
    const vessel = await buildVessel(ctx.store, { name: 'Tug Sample' });
    const { client } = await signedInAs(ctx.app, ctx.store, 'admin');
    expect((await client.post(`/api/v1/vessels/${vessel.id}/archive`)).body.archived).toBe(true);
    expect((await client.get('/api/v1/vessels')).body.total).toBe(0);
    expect((await client.get('/api/v1/vessels?includeArchived=true')).body.total).toBe(1);
    expect((await client.get('/api/v1/visit/site')).body.vessels).toEqual([]);
    await client.post(`/api/v1/vessels/${vessel.id}/restore`);
    const site = await client.get('/api/v1/visit/site');
    expect(site.body.vessels).toEqual([{ id: vessel.id, name: 'Tug Sample', vesselType: 'Steam tug', builtYear: 1910, berth: 'Test berth', summary: '', closures: [] }]);
  });
});
