import { afterEach, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/db/seed/seed.js';
import { seedDemoCollection } from '../../server/db/seed/seed-collection.js';
import { seedDemoInterpretation } from '../../server/db/seed/seed-interpretation.js';
import { seedDemoPlans } from '../../server/db/seed/seed-plans.js';
import { Client } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
afterEach(() => ctx.close());

describe('demo interpretation', () => {
  it('publishes the main engine’s story with its photo at the public address, which a visitor loads', async () => {
    ctx = await createTestApp({}, { mail: false });
    await seedDemo(ctx.dataSource, { bcryptCost: 4 });
    await seedDemoPlans(ctx.dataSource, ctx.config);
    await seedDemoCollection(ctx.dataSource, ctx.config);
    await seedDemoInterpretation(ctx.dataSource, ctx.config);
    const [vessel] = await ctx.store.repos.vessels.listActive();
    const engine = (await ctx.store.repos.artifacts.findByNumber(vessel!.id, '1998.1.1'))!;
    const visitor = new Client(ctx.app);
    const read = await visitor.get(`/api/v1/visit/artifacts/${engine.id}/interpretation`);
    expect(read.status).toBe(200);
    const story = read.body.audiences.general.story as string;
    expect(story).not.toContain('/api/v1/media/');
    const src = new RegExp(`^<img src="(/api/v1/visit/artifacts/${engine.id}/interpretation/media/\\d+/display)" alt="[^"]+"`).exec(story)?.[1];
    expect(src).toBeDefined();
    const file = await visitor.get(src!);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/webp');
  });
});
