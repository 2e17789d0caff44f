import { existsSync, readdirSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { planPng } from '../support/images.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let deck: { id: number; version: number };

async function setUp(overrides = {}) {
  ctx = await createTestApp(overrides, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  const vessel = await buildVessel(ctx.store, { designationScheme: 'free-text' });
  deck = (await curator.post(`/api/v1/vessels/${vessel.id}/decks`, { name: 'Main deck' })).body;
}
afterEach(() => ctx.close());

async function upload(body: Buffer, name = 'plan.png') {
  if (!curator.csrf) await curator.fetchCsrf();
  return curator.agent.post(`/api/v1/decks/${deck.id}/plan`).set('x-csrf-token', curator.csrf).attach('file', body, name);
}

async function planState() {
  await ctx.plans.idle();
  return (await curator.get(`/api/v1/decks/${deck.id}/plan`)).body;
}

function filesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => path.join(e.parentPath, e.name));
}

describe('plan upload and tiles', () => {
  it('answers at once, builds every zoom level down to one tile, and serves tiles with a long cache', async () => {
    await setUp();
    const res = await upload(await planPng(1000, 600));
    expect(res.status).toBe(202);
    expect(res.body).toMatchObject({ status: 'building', width: 1000, height: 600, maxZoom: 2 });
    // By hand: zoom 2 is 4 × 3 tiles of 256 px over 1000 × 600, zoom 1 is 2 × 2 over 500 × 300, zoom 0 is 1.
    expect(res.body.tilesTotal).toBe(17);
    const state = await planState();
    expect(state.current).toMatchObject({ status: 'ready', tilesDone: 17, tilesTotal: 17 });
    expect(state.current.tileUrl).toMatch(new RegExp(`^/api/v1/decks/${deck.id}/tiles/\\d+-[0-9a-f]{12}/\\{z\\}/\\{y\\}/\\{x\\}\\.png$`));
    const tile = await curator.get(state.current.tileUrl.replace('{z}', '2').replace('{y}', '2').replace('{x}', '3'));
    expect(tile.status).toBe(200);
    expect(tile.headers['content-type']).toBe('image/png');
    expect(tile.headers['cache-control']).toBe('private, max-age=31536000, immutable');
    expect((await curator.get(state.current.tileUrl.replace('{z}', '2').replace('{y}', '3').replace('{x}', '0'))).status).toBe(404);
    expect((await ctx.store.repos.decks.findById(deck.id))).toMatchObject({ planWidth: 1000, planHeight: 600 });
    expect(filesUnder(ctx.files.path('.work'))).toEqual([]);
    expect(filesUnder(ctx.files.incoming)).toEqual([]);
  });

  it('replaces orphaned files left at the new plan\'s place (a database reset without the uploads)', async () => {
    await setUp();
    const png = await planPng(600, 400);
    const { createHash } = await import('node:crypto');
    const orphan = `plans/deck-${deck.id}/1-${createHash('sha256').update(png).digest('hex').slice(0, 12)}/pyramid/0/0`;
    const { mkdirSync, writeFileSync } = await import('node:fs');
    mkdirSync(ctx.files.path(orphan), { recursive: true });
    writeFileSync(ctx.files.path(`${orphan}/0.png`), 'stale');
    await upload(png);
    const state = await planState();
    expect(state.current).toMatchObject({ id: 1, status: 'ready' });
    const tile = await curator.get(state.current.tileUrl.replace('{z}', '0').replace('{y}', '0').replace('{x}', '0'));
    expect(tile.status).toBe(200);
    expect(tile.body.length).toBeGreaterThan(100);
  });

  it('refuses a file that is not an image, whatever its name, with 415 and keeps nothing', async () => {
    await setUp();
    const res = await upload(Buffer.from('this is a text file pretending to be a plan'), 'plan.png');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
    expect(filesUnder(ctx.config.uploadsDir)).toEqual([]);
    expect((await planState()).latest).toBeNull();
  });

  it('refuses a file that is too large with 413 before anything is kept', async () => {
    await setUp({ planMaxBytes: 2_000 });
    const res = await upload(await planPng(1000, 600));
    expect(res.status).toBe(413);
    expect(filesUnder(ctx.config.uploadsDir)).toEqual([]);
    expect((await planState()).latest).toBeNull();
  });

  it('refuses an image with too many pixels a side with 413', async () => {
    await setUp({ planMaxSide: 800 });
    const res = await upload(await planPng(1000, 600));
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/at most 800 pixels a side/);
    expect(filesUnder(ctx.config.uploadsDir)).toEqual([]);
  });

  it('an upload interrupted half way leaves no file and no row', async () => {
    await setUp();
    const server = ctx.app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const port = (server.address() as AddressInfo).port;
    const cookie = (await curator.agent.jar.getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false })).map((c) => `${c.name}=${c.value}`).join('; ');
    const png = await planPng(1500, 1000);
    const boundary = 'shipkeeper-test-boundary';
    const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="plan.png"\r\nContent-Type: image/png\r\n\r\n`);
    await new Promise<void>((resolve) => {
      const req = httpRequest({
        host: '127.0.0.1',
        port,
        method: 'POST',
        path: `/api/v1/decks/${deck.id}/plan`,
        headers: { 'content-type': `multipart/form-data; boundary=${boundary}`, 'content-length': head.length + png.length + 100, cookie, 'x-csrf-token': curator.csrf },
      });
      req.on('error', () => resolve());
      req.write(head);
      req.write(png.subarray(0, png.length / 2));
      setTimeout(() => {
        req.destroy();
        resolve();
      }, 200);
    });
    await new Promise((r) => setTimeout(r, 300));
    server.close();
    expect(filesUnder(ctx.config.uploadsDir)).toEqual([]);
    expect((await planState()).latest).toBeNull();
  });

  it('a build that fails leaves no pyramid, and the deck stays on its plan', async () => {
    await setUp();
    await upload(await planPng(600, 400));
    const before = (await planState()).current;
    const whole = await planPng(1200, 800);
    const res = await upload(whole.subarray(0, Math.floor(whole.length * 0.6)));
    expect(res.status).toBe(202);
    const state = await planState();
    expect(state.latest).toMatchObject({ status: 'failed', tileUrl: null });
    expect(state.latest.error).toMatch(/could not be built/);
    expect(state.current.id).toBe(before.id);
    expect(filesUnder(ctx.files.path('.work'))).toEqual([]);
    expect(filesUnder(ctx.files.path('plans')).every((f) => f.includes(`/${before.id}-`))).toBe(true);
  });

  it('a cancelled build leaves no pyramid and no row pointing at files', async () => {
    await setUp();
    const res = await upload(await planPng(4000, 3000));
    const cancel = await curator.post(`/api/v1/decks/${deck.id}/plan/${res.body.id}/cancel`);
    expect(cancel.status).toBe(200);
    const state = await planState();
    expect(state.latest).toMatchObject({ status: 'cancelled', tileUrl: null });
    expect(state.current).toBeNull();
    expect(filesUnder(ctx.config.uploadsDir)).toEqual([]);
  });
});

describe('deleting a deck', () => {
  it('removes its plans and their files', async () => {
    await setUp();
    await upload(await planPng(600, 400));
    await planState();
    expect(filesUnder(ctx.files.path(`plans/deck-${deck.id}`)).length).toBeGreaterThan(5);
    const fresh = (await curator.get(`/api/v1/decks/${deck.id}`)).body;
    expect(fresh.abilities.delete).toBe(true);
    expect((await curator.send('delete', `/api/v1/decks/${deck.id}`)).status).toBe(204);
    expect(filesUnder(ctx.files.path('plans'))).toEqual([]);
    const [{ n }] = await ctx.dataSource.query('SELECT COUNT(*) AS n FROM plans');
    expect(n).toBe(0);
  });
});

describe('replacing a plan', () => {
  async function drawnDeck() {
    await upload(await planPng(1000, 500));
    await ctx.plans.idle();
    let d = (await curator.get(`/api/v1/decks/${deck.id}`)).body;
    d = (await curator.post(`/api/v1/decks/${deck.id}/calibration`, { method: 'points', a: [100, 100], b: [600, 100], realMetres: 10, version: d.version })).body;
    const vesselId = d.vesselId;
    const room = (await curator.post(`/api/v1/vessels/${vesselId}/compartments`, { deckId: deck.id, designation: 'ER', name: 'Engine room', outline: [[100, 100], [300, 100], [300, 200], [100, 200]] })).body;
    return room;
  }

  it('with the same proportions, carries outlines and the scale over to the new pixels', async () => {
    await setUp();
    const room = await drawnDeck();
    const gauge = (await curator.post(`/api/v1/vessels/${room.vesselId}/artifacts`, { objectNumber: '2019.4.12', name: 'Gauge', category: 'instruments-and-gauges', compartmentId: room.id, point: [150, 150] })).body;
    const oldPlan = (await planState()).current;
    await upload(await planPng(2000, 1000));
    const state = await planState();
    expect(state.current).toMatchObject({ status: 'ready', width: 2000 });
    const moved = (await curator.get(`/api/v1/compartments/${room.id}`)).body;
    expect(moved.outline).toEqual([[200, 200], [600, 200], [600, 400], [200, 400]]);
    // The artifact stays where it is on board: its point follows the pixels, and no move is recorded.
    const after = (await curator.get(`/api/v1/artifacts/${gauge.id}`)).body;
    expect(after).toMatchObject({ location: { point: [300, 300] }, version: gauge.version });
    expect((await curator.get(`/api/v1/artifacts/${gauge.id}/moves`)).body).toHaveLength(1);
    // The same room, the same real size: 200 × 100 units at 0.02 m = 8 m² before and after.
    expect(moved.floorArea.squareMetres).toBeCloseTo(room.floorArea.squareMetres, 9);
    expect(filesUnder(ctx.files.path('plans')).some((f) => f.includes(`/${oldPlan.id}-`))).toBe(false);
  });

  it('with other proportions, waits for the curator to choose how to fit', async () => {
    await setUp();
    const room = await drawnDeck();
    const oldPlan = (await planState()).current;
    const res = await upload(await planPng(1000, 1000));
    let state = await planState();
    expect(state.latest).toMatchObject({ id: res.body.id, status: 'awaiting-choice', aspectChange: { from: 2, to: 1 } });
    expect(state.current.id).toBe(oldPlan.id);
    const wrong = await curator.post(`/api/v1/decks/${deck.id}/plan/${res.body.id}/activate`, { fit: 'sideways' });
    expect(wrong.status).toBe(400);
    state = (await curator.post(`/api/v1/decks/${deck.id}/plan/${res.body.id}/activate`, { fit: 'stretch' })).body;
    expect(state.current).toMatchObject({ id: res.body.id, status: 'ready' });
    const moved = (await curator.get(`/api/v1/compartments/${room.id}`)).body;
    expect(moved.outline).toEqual([[100, 200], [300, 200], [300, 400], [100, 400]]);
    // A stretch changes the scale along one axis only, so the deck must be calibrated again.
    expect(moved.floorArea).toBeNull();
    expect((await curator.get(`/api/v1/decks/${deck.id}`)).body.calibration).toBeNull();
  });
});
