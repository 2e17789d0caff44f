import { afterEach, describe, expect, it, vi } from 'vitest';
import { clearData, seedDemo, SeedRefused } from '../../server/db/seed/seed.js';
import { seedDemoPlans } from '../../server/db/seed/seed-plans.js';
import { seedDemoCollection } from '../../server/db/seed/seed-collection.js';
import { DEMO_ARTIFACTS } from '../../server/db/seed/demo-collection.js';
import { DEMO_REPORTS, DEMO_RISKS } from '../../server/db/seed/demo-condition.js';
import { seedDemoCondition } from '../../server/db/seed/seed-condition.js';
import { seedDemoRepairs } from '../../server/db/seed/seed-repairs.js';
import { signedInAs } from '../support/http.js';
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

  it('draws, tiles and calibrates a plan for every deck of the demo ship and maps its compartments', async () => {
    ctx = await createTestApp({}, { mail: false });
    await seedDemo(ctx.dataSource, { bcryptCost: 4 });
    await seedDemoPlans(ctx.dataSource, ctx.config);
    const { client } = await signedInAs(ctx.app, ctx.store, 'docent');
    const [vessel] = (await client.get('/api/v1/vessels?sort=createdAt')).body.items;
    const decks = (await client.get(`/api/v1/vessels/${vessel.id}/decks`)).body;
    expect(decks).toHaveLength(4);
    for (const deck of decks) expect((await client.get(`/api/v1/decks/${deck.id}/plan`)).body.current).toMatchObject({ status: 'ready', width: 3200, height: 1000 });
    const rooms = (await client.get(`/api/v1/vessels/${vessel.id}/compartments?pageSize=100`)).body.items;
    expect(rooms).toHaveLength(DEMO_COMPARTMENTS.length);
    for (const room of rooms) expect(room.designationWarnings, room.designation).toEqual([]);
    // Boiler room, frames 40 to 60 at 24 in, 24 ft wide: 40 ft × 24 ft = 960 ft² (by hand).
    const boiler = rooms.find((r: { designation: string }) => r.designation === '2-40-0-E');
    expect(boiler.floorArea.squareFeet).toBeCloseTo(960, 6);
  });

  it('records the demo collection with places inside their compartments, histories, photos and search', async () => {
    ctx = await createTestApp({}, { mail: false });
    await seedDemo(ctx.dataSource, { bcryptCost: 4 });
    await seedDemoPlans(ctx.dataSource, ctx.config);
    await seedDemoCollection(ctx.dataSource, ctx.config);
    const { client } = await signedInAs(ctx.app, ctx.store, 'docent');
    const [vessel] = (await client.get('/api/v1/vessels?sort=createdAt')).body.items;
    const list = (await client.get(`/api/v1/vessels/${vessel.id}/artifacts?pageSize=100`)).body;
    expect(list.total).toBe(DEMO_ARTIFACTS.length);
    expect(list.total).toBeGreaterThanOrEqual(30);
    const statuses = new Set(list.items.map((a: { status: string }) => a.status));
    expect([...statuses].sort()).toEqual(['deaccessioned', 'in-place', 'in-store', 'missing', 'on-loan']);
    const placed = list.items.filter((a: { location: { point: unknown } }) => a.location.point);
    expect(placed.length).toBeGreaterThan(20);
    const clock = list.items.find((a: { objectNumber: string }) => a.objectNumber === '2003.1.3');
    const history = (await client.get(`/api/v1/artifacts/${clock.id}/moves`)).body;
    expect(history.map((m: { kind: string; to: { status: string } }) => `${m.kind}:${m.to.status}`)).toEqual(['moved:in-place', 'moved:in-store', 'recorded:in-place']);
    const withPhotos = list.items.filter((a: { cover: unknown }) => a.cover);
    expect(withPhotos.length).toBe(DEMO_ARTIFACTS.filter((a) => a.photo).length);
    const photo = (await client.get(`/api/v1/media?ownerType=artifact&ownerId=${withPhotos[0].id}`)).body[0];
    expect(photo).toMatchObject({ kind: 'photo', width: 1200, height: 900, takenAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/) });
    expect((await client.get(`/api/v1/vessels/${vessel.id}/artifacts?q=gauge`)).body.total).toBeGreaterThanOrEqual(3);

    await seedDemoCondition(ctx.dataSource, ctx.config);
    const reports = (await client.get(`/api/v1/condition-reports?vesselId=${vessel.id}&pageSize=100`)).body;
    // One per demo survey, the amendment of one of them, and the drafts the two incidents opened (three affected items).
    expect(reports.total).toBe(DEMO_REPORTS.length + 1 + 3);
    expect(reports.items.filter((r: { status: string }) => r.status === 'draft')).toHaveLength(1 + 3);
    expect(reports.items.filter((r: { supersededById: number | null }) => r.supersededById)).toHaveLength(1);
    const incidents = (await client.get(`/api/v1/incidents?vesselId=${vessel.id}`)).body.items;
    expect(incidents.map((i: { kind: string }) => i.kind).sort()).toEqual(['vandalism', 'water-ingress']);
    const purser = (await client.get(`/api/v1/vessels/${vessel.id}/compartments?q=purser`)).body.items[0];
    expect(purser.accessStatus).toBe('staff-only');
    const register = (await client.get(`/api/v1/risks?vesselId=${vessel.id}&pageSize=100`)).body;
    expect(register.total).toBe(DEMO_RISKS.length);
    expect(register.items[0].magnitude).toBeGreaterThanOrEqual(register.items[1].magnitude);
    const second = (await client.get(`/api/v1/vessels/${vessel.id}/decks`)).body.find((d: { name: string }) => d.name === 'Second deck');
    const overlay = (await client.get(`/api/v1/decks/${second.id}/condition`)).body.compartments;
    expect(overlay.filter((c: { grade: string | null }) => c.grade).length).toBeGreaterThanOrEqual(3);

    // Repair projects from the findings: two fundraising, one complete with a treatment, its photos and the survey after it.
    await seedDemoRepairs(ctx.dataSource, ctx.config);
    const repairs = (await client.get(`/api/v1/vessels/${vessel.id}/repair-projects?sort=title`)).body.items;
    expect(repairs.map((r: { slug: string; status: string }) => `${r.slug} ${r.status}`)).toEqual(['gauge-board-glasses complete', 'shaft-alley-water-ingress fundraising', 'steering-gear-room-deckhead fundraising']);
    const keeper = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
    const gaugeProject = (await keeper.get(`/api/v1/repair-projects/${repairs[0].id}`)).body;
    expect(gaugeProject.statusChanges.map((c: { toStatus: string }) => c.toStatus)).toEqual(['proposed', 'approved', 'fundraising', 'funded', 'underway', 'complete']);
    expect(gaugeProject.findingOutcomes).toMatchObject([{ finding: { description: 'Two gauge glasses cracked.' }, treatedOn: expect.any(String), next: { findings: [] } }]);
    const [treatment] = (await client.get(`/api/v1/repair-projects/${repairs[0].id}/treatments`)).body;
    expect([treatment.beforePhotos.length, treatment.afterPhotos.length]).toEqual([1, 1]);
    const shaft = (await client.get(`/api/v1/repair-projects/${repairs[1].id}`)).body;
    expect(shaft).toMatchObject({ hotWork: true, findingCount: 1, workCautions: [{ kind: 'hotWork' }] });

    // `npm run seed` empties all of it (an amendment refers to the report it supersedes) and starts over.
    await clearData(ctx.dataSource);
    const [{ n }] = await ctx.dataSource.query('SELECT COUNT(*) AS n FROM condition_reports');
    expect(n).toBe(0);
  });

  it('refuses to run when NODE_ENV=production', async () => {
    ctx = await createTestApp({}, { mail: false });
    vi.stubEnv('NODE_ENV', 'production');
    await expect(seedDemo(ctx.dataSource, { bcryptCost: 4 })).rejects.toThrow(SeedRefused);
    await expect(clearData(ctx.dataSource)).rejects.toThrow(SeedRefused);
  });
});
