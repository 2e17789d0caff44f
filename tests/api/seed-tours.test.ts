import { afterEach, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/db/seed/seed.js';
import { seedDemoCollection } from '../../server/db/seed/seed-collection.js';
import { seedDemoCondition } from '../../server/db/seed/seed-condition.js';
import { seedDemoPlans } from '../../server/db/seed/seed-plans.js';
import { seedDemoTours } from '../../server/db/seed/seed-tours.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
afterEach(() => ctx.close());

describe('demo tours', () => {
  it('publishes three tours and leaves one in review with a curator’s comment', async () => {
    ctx = await createTestApp({}, { mail: false });
    await seedDemo(ctx.dataSource, { bcryptCost: 4 });
    await seedDemoPlans(ctx.dataSource, ctx.config);
    await seedDemoCollection(ctx.dataSource, ctx.config);
    await seedDemoCondition(ctx.dataSource, ctx.config);
    await seedDemoTours(ctx.dataSource, ctx.config);
    const visitor = new Client(ctx.app);
    const published = (await visitor.get('/api/v1/visit/tours')).body;
    expect(published.map((t: { slug: string }) => t.slug).sort()).toEqual(['closed-spaces', 'fire-and-steam', 'main-deck-step-free']);

    const steam = (await visitor.get('/api/v1/visit/tours/fire-and-steam')).body;
    expect(steam.stops.map((s: { space: string }) => s.space)).toEqual(['Boiler room', 'Engine room', 'Evaporator flat', 'Steering gear room']);
    expect(steam.stops[0].html).toMatch(/<img src="\/api\/v1\/visit\/tours\/fire-and-steam\/media\/\d+\/display" alt="[^"]+"/);
    expect(steam.stops[0].cautions).toContain('Some old pipe coverings here contain asbestos. Please do not touch pipe coverings or insulation.');
    expect(steam.stops[1].cautions).toContain('Steep ladder: face the ladder, hold the rails with both hands and carry nothing in them.');
    expect(steam.stops[2]).toMatchObject({ virtual: true });
    expect(steam.stops[2].html).toContain('data-explainer="boiling-ladder"');
    expect(steam.distanceMetres).toBeGreaterThan(0);
    const image = /src="([^"]+)"/.exec(steam.stops[0].html)![1]!;
    const file = await visitor.get(image);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('image/webp');

    // The purser's office is closed by the demo's incident: the step-free tour shows it as virtual today.
    const deck = (await visitor.get('/api/v1/visit/tours/main-deck-step-free')).body;
    expect(deck.stops[1]).toMatchObject({ space: 'Purser’s office', virtual: true, notice: 'This space is closed to visitors today, so the stop is shown here as a virtual stop.' });

    const { client } = await signedInAs(ctx.app, ctx.store, 'docent');
    const [vessel] = (await client.get('/api/v1/vessels?sort=createdAt')).body.items;
    const review = (await client.get(`/api/v1/vessels/${vessel.id}/tours?state=in_review`)).body.items;
    expect(review.map((t: { slug: string }) => t.slug)).toEqual(['young-explorers']);
    const comments = (await client.get(`/api/v1/tours/${review[0].id}/comments`)).body;
    expect(comments).toMatchObject([{ stopTitle: 'Who steers the ship?', author: { name: expect.any(String) } }]);
  });
});
