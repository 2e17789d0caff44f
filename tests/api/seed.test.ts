import { afterEach, describe, expect, it, vi } from 'vitest';
import { clearData, seedDemo, SeedRefused } from '../../server/db/seed/seed.js';
import { DEMO_COMPARTMENTS } from '../../server/db/seed/demo-ship-map.js';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/db/seed/demo-data.js';
import { Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp | undefined;
afterEach(async () => {
  vi.unstubAllEnvs();
  await ctx?.close();
  ctx = undefined;
});

describe('demo seed', () => {
  it('seeds an empty database once, and every demo account signs in', async () => {
    ctx = await createTestApp({}, { mail: false });
    expect(await seedDemo(ctx.dataSource, { bcryptCost: 4 })).toBe(true);
    expect(await seedDemo(ctx.dataSource, { bcryptCost: 4 })).toBe(false);
    for (const user of DEMO_USERS) {
      const res = await new Client(ctx.app).signIn(user.email, DEMO_PASSWORD);
      expect(res.status, user.email).toBe(200);
      expect(res.body.user.role).toBe(user.role);
    }
    const [{ n }] = await ctx.dataSource.query('SELECT COUNT(*) AS n FROM compartments');
    expect(n).toBe(DEMO_COMPARTMENTS.length);
  });

  it('starts over after clearing (npm run seed)', async () => {
    ctx = await createTestApp({}, { mail: false });
    await seedDemo(ctx.dataSource, { bcryptCost: 4 });
    await clearData(ctx.dataSource);
    expect(await seedDemo(ctx.dataSource, { bcryptCost: 4 })).toBe(true);
    const [{ n }] = await ctx.dataSource.query('SELECT COUNT(*) AS n FROM users');
    expect(n).toBe(DEMO_USERS.length);
  });

  it('refuses to run when NODE_ENV=production', async () => {
    ctx = await createTestApp({}, { mail: false });
    vi.stubEnv('NODE_ENV', 'production');
    await expect(seedDemo(ctx.dataSource, { bcryptCost: 4 })).rejects.toThrow(SeedRefused);
    await expect(clearData(ctx.dataSource)).rejects.toThrow(SeedRefused);
  });
});
