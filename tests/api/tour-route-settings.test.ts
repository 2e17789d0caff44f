import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildVessel } from '../support/factories.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let vesselId: number;

beforeEach(async () => {
  ctx = await createTestApp();
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  vesselId = (await buildVessel(ctx.store)).id;
});
afterEach(() => ctx.close());

describe('route timing of tours', () => {
  it('starts from the defaults, is saved by a curator with its version, and answers 409 to an older one', async () => {
    const url = `/api/v1/vessels/${vesselId}/tour-route-settings`;
    const defaults = (await curator.get(url)).body;
    // Defaults: common practice, no published source.
    expect(defaults).toEqual({ walkingPaceMetresPerSecond: 0.5, deckChangeMetres: 10, version: 0 });

    const saved = await curator.send('put', url, { walkingPaceMetresPerSecond: 0.6, deckChangeMetres: 12, version: 0 });
    expect(saved.status).toBe(200);
    expect(saved.body).toEqual({ walkingPaceMetresPerSecond: 0.6, deckChangeMetres: 12, version: 1 });

    const stale = await curator.send('put', url, { walkingPaceMetresPerSecond: 0.7, deckChangeMetres: 12, version: 0 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.fields).toEqual({ version: 'current version is 1' });
    expect((await curator.get(url)).body.walkingPaceMetresPerSecond).toBe(0.6);

    const bad = await curator.send('put', url, { walkingPaceMetresPerSecond: 5, deckChangeMetres: -1, version: 1 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ walkingPaceMetresPerSecond: 'At most 2 m/s.', deckChangeMetres: 'Cannot be negative.' });
  });

  it('is read by every staff role and changed only by curators', async () => {
    const url = `/api/v1/vessels/${vesselId}/tour-route-settings`;
    for (const role of ['docent', 'conservator', 'fundraiser'] as const) {
      const { client } = await signedInAs(ctx.app, ctx.store, role);
      expect((await client.get(url)).status, role).toBe(200);
      expect((await client.send('put', url, { walkingPaceMetresPerSecond: 0.6, deckChangeMetres: 10, version: 0 })).status, role).toBe(403);
    }
  });
});
