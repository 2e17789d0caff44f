import { request, type APIRequestContext, type Locator, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { planPng } from '../support/images.js';
import { DEMO_PASSWORD, openBrowser, screenshot, signIn, type Browser } from './browser.js';

// Issue 9, item 2: names seeded with markup must reach every page, Leaflet's tooltips, labels and
// cards included, as text. Every injected element carries data-injected, so one query finds them all.
const markup = (label: string) => `<img src=x data-injected onerror=window.__xss=1><b data-injected>${label}</b>`;
const shortMarkup = (label: string) => `<b data-injected>${label}</b>`;
const MARK = 'data-injected>';

interface Api {
  context: APIRequestContext;
  send<T = { id: number; version: number }>(method: string, url: string, data?: unknown): Promise<T>;
  token: string;
}

async function apiAs(email: string): Promise<Api> {
  const context = await request.newContext({ baseURL: inject('baseUrl') });
  const { csrfToken } = await (await context.get('/api/v1/auth/csrf')).json();
  const login = await context.post('/api/v1/auth/login', { data: { email, password: DEMO_PASSWORD }, headers: { 'x-csrf-token': csrfToken } });
  if (!login.ok()) throw new Error(`sign-in of ${email}: ${login.status()} ${await login.text()}`);
  const token: string = (await login.json()).csrfToken;
  return {
    context,
    token,
    async send(method, url, data) {
      const res = await context.fetch(url, { method, data, headers: { 'x-csrf-token': token } });
      if (!res.ok()) throw new Error(`${method} ${url}: ${res.status()} ${await res.text()}`);
      return res.json();
    },
  };
}

const today = new Date().toISOString().slice(0, 10);
const seeded = { vesselId: 0, deckId: 0, roomA: 0, roomB: 0, artifacts: [] as number[], compartmentReport: 0, artifactReport: 0, incident: 0 };
const apis: Api[] = [];

/** A vessel of its own (named to sort after the demo's, so other tests keep theirs), with markup in every name. */
async function seed() {
  const [admin, curator, conservator] = await Promise.all(['admin', 'curator', 'conservator'].map((r) => apiAs(`${r}@shipkeeper.test`)));
  apis.push(admin!, curator!, conservator!);
  const vessel = await admin!.send('POST', '/api/v1/vessels', { name: `Zz probe ${markup('vessel')}`, vesselType: markup('type'), summary: markup('summary') });
  seeded.vesselId = vessel.id;
  const deck = await curator!.send('POST', `/api/v1/vessels/${vessel.id}/decks`, { name: markup('deck') });
  seeded.deckId = deck.id;
  const upload = await curator!.context.post(`/api/v1/decks/${deck.id}/plan`, {
    multipart: { file: { name: 'probe-plan.png', mimeType: 'image/png', buffer: await planPng(1200, 600) } },
    headers: { 'x-csrf-token': curator!.token },
  });
  if (upload.status() !== 202) throw new Error(`plan upload: ${upload.status()} ${await upload.text()}`);
  for (let waited = 0; ; waited += 250) {
    const { current } = await curator!.send<{ current: { status: string } | null }>('GET', `/api/v1/decks/${deck.id}/plan`);
    if (current?.status === 'ready') break;
    if (waited > 30_000) throw new Error(`the plan is not ready: ${current?.status}`);
    await new Promise((r) => setTimeout(r, 250));
  }

  const room = (designation: string, name: string, outline: [number, number][]) =>
    curator!.send('POST', `/api/v1/vessels/${vessel.id}/compartments`, { deckId: deck.id, designation, name, description: markup('description'), accessStatus: 'open', outline });
  const a = await room(shortMarkup('A-1'), markup('room A'), [[200, 150], [700, 150], [700, 450], [200, 450]]);
  const b = await room(shortMarkup('B-2'), markup('room B'), [[750, 150], [1050, 150], [1050, 450], [750, 450]]);
  seeded.roomA = a.id;
  seeded.roomB = b.id;
  const artifact = (n: number, compartmentId: number, point: [number, number]) =>
    curator!.send('POST', `/api/v1/vessels/${vessel.id}/artifacts`, {
      objectNumber: `2024.9.${n}`,
      name: markup(`artifact ${n}`),
      category: 'tools',
      description: markup('artifact description'),
      maker: markup('maker'),
      materials: markup('materials'),
      significance: markup('significance'),
      compartmentId,
      point,
    });
  // Two on one point always make a cluster, which spiderfies when clicked.
  for (const [n, id, point] of [[1, a.id, [300, 300]], [2, a.id, [300, 300]], [3, b.id, [1000, 420]]] as const) seeded.artifacts.push((await artifact(n, id, [...point])).id);

  await conservator!.send('POST', `/api/v1/compartments/${a.id}/hazards`, { kind: 'asbestos', notes: markup('hazard') });
  const report = async (subjectType: 'compartment' | 'artifact', subjectId: number) => {
    const r = await conservator!.send('POST', '/api/v1/condition-reports', { subjectType, subjectId, inspectedOn: today, summary: markup(`${subjectType} report`) });
    await conservator!.send('POST', `/api/v1/condition-reports/${r.id}/findings`, {
      agent: 'physical-forces',
      damageType: 'impact-damage',
      severity: 'severe',
      description: markup('finding'),
      recommendedAction: markup('action'),
    });
    const fresh = await conservator!.send('GET', `/api/v1/condition-reports/${r.id}`);
    await conservator!.send('POST', `/api/v1/condition-reports/${r.id}/submit`, { version: fresh.version });
    return r.id;
  };
  seeded.compartmentReport = await report('compartment', a.id);
  seeded.artifactReport = await report('artifact', seeded.artifacts[0]!);
  await conservator!.send('POST', '/api/v1/risks', {
    vesselId: vessel.id,
    statement: markup('risk'),
    agent: 'physical-forces',
    a: 3,
    b: 3,
    c: 3,
    compartmentIds: [a.id, b.id],
    artifactIds: [seeded.artifacts[2]!],
    notes: markup('risk notes'),
  });
  const incident = await curator!.send('POST', '/api/v1/incidents', {
    vesselId: vessel.id,
    kind: 'vandalism',
    title: markup('incident'),
    foundOn: today,
    description: markup('incident description'),
    reportedTo: markup('reported to'),
    actionsTaken: markup('actions'),
    artifactIds: [seeded.artifacts[2]!],
    compartmentIds: [b.id],
  });
  seeded.incident = incident.id;
}

/** Nothing injected anywhere in the document, no handler ran, and (unless told otherwise) the markup shows as text. */
async function expectNoInjection(page: Page, where: string, { text = true } = {}) {
  if (text) await expect.poll(() => page.getByText(MARK).filter({ visible: true }).count(), { message: `markup shown as text on ${where}`, timeout: 15_000 }).toBeGreaterThan(0);
  else await page.waitForLoadState('networkidle');
  // As strings: the tests are type-checked without the DOM's types.
  expect(await page.evaluate('document.querySelectorAll("[data-injected]").length'), `injected elements on ${where}`).toBe(0);
  expect(await page.evaluate('typeof window.__xss'), `handler ran on ${where}`).toBe('undefined');
}

/** Moves the mouse over a spot of an element (fractions of its box) and checks the tooltip Leaflet opens there. */
async function hoverTooltip(page: Page, target: Locator, where: string, expected: string, at = { x: 0.5, y: 0.5 }) {
  const box = (await target.boundingBox())!;
  await page.mouse.move(box.x + box.width * at.x, box.y + box.height * at.y, { steps: 4 });
  const tooltip = page.locator('.leaflet-tooltip').filter({ visible: true });
  await expect.poll(() => tooltip.first().textContent().catch(() => null), { message: `the tooltip on ${where}`, timeout: 5_000 }).toContain(expected);
  await expectNoInjection(page, where);
  expect(await tooltip.first().textContent()).toContain(MARK);
}

let browser: Browser;
let page: Page;

beforeAll(async () => {
  await seed();
  browser = await openBrowser();
  page = browser.page;
  // Every page load shows the probe vessel (the app keeps the current vessel there).
  await browser.context.addInitScript(`localStorage.setItem('shipkeeper.currentVessel', '${seeded.vesselId}')`);
  await signIn(page, 'admin@shipkeeper.test');
  await page.waitForURL('**/app');
});

afterAll(async () => {
  await browser?.close();
  await Promise.all(apis.map((a) => a.context.dispose()));
});

describe('names with markup, end to end', () => {
  it('reach the ship map as text: outline and badge tooltips, cluster, cards, and the overlays with their labels', { timeout: 120_000 }, async () => {
    const outlineA = page.locator('path.deck-map-outline--_b_data-injected_A-1__b_');
    const outlineB = page.locator('path.deck-map-outline--_b_data-injected_B-2__b_');
    for (const overlay of ['access', 'condition', 'risks'] as const) {
      await page.goto(`/app/ship?deck=${seeded.deckId}${overlay === 'access' ? '' : `&overlay=${overlay}`}`);
      await outlineA.waitFor({ timeout: 15_000 });
      if (overlay !== 'access') await expect.poll(() => outlineA.getAttribute(overlay === 'condition' ? 'data-grade' : 'data-band'), { timeout: 10_000 }).toMatch(/^(?!none$)./);
      await page.waitForTimeout(500);
      await expectNoInjection(page, `the ship map (${overlay})`);
      // Away from the badges: the cluster stands at a fifth of room A, the lone badge at the far corner of room B.
      await hoverTooltip(page, outlineA, `the tooltip of room A (${overlay})`, 'room A', { x: 0.75, y: 0.5 });
      await hoverTooltip(page, outlineB, `the tooltip of room B (${overlay})`, 'room B', { x: 0.3, y: 0.3 });
      await screenshot(page, `xss-ship-map-${overlay}-1440`);
    }

    // The lone badge and its card, then the cluster of two, spiderfied, and each of its badges.
    await page.goto(`/app/ship?deck=${seeded.deckId}`);
    const badges = page.locator('.leaflet-marker-pane .deck-map-artifact');
    await expect.poll(() => badges.count(), { timeout: 15_000 }).toBe(1);
    await page.waitForTimeout(500);
    await hoverTooltip(page, badges.first(), 'the badge tooltip', 'artifact 3');
    await badges.first().click();
    await page.getByRole('region', { name: 'Artifact 2024.9.3' }).waitFor();
    await expectNoInjection(page, 'the artifact card');
    await page.locator('.leaflet-marker-pane .deck-map-cluster').click();
    await expect.poll(() => badges.count()).toBe(3);
    await page.waitForTimeout(600);
    // The clicked badge keeps focus, and with it its tooltip.
    await page.evaluate('document.activeElement?.blur()');
    const names = new Set<string>();
    for (let i = 0; i < 3; i++) {
      const box = (await badges.nth(i).boundingBox())!;
      await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2, { steps: 4 });
      const tooltips = page.locator('.leaflet-tooltip').filter({ visible: true });
      await expect.poll(() => tooltips.count()).toBeGreaterThan(0);
      for (const text of await tooltips.allTextContents()) {
        expect(text).toContain(MARK);
        // A room's tooltip may be open beside the badge's.
        const name = text.match(/artifact \d/)?.[0];
        if (name) names.add(name);
      }
      await expectNoInjection(page, `badge ${i + 1} after the cluster opened`);
    }
    expect([...names].sort()).toEqual(['artifact 1', 'artifact 2', 'artifact 3']);
    await screenshot(page, 'xss-ship-map-cluster-1440');

    const box = (await outlineB.boundingBox())!;
    await page.mouse.click(box.x + box.width * 0.3, box.y + box.height * 0.3);
    await page.getByRole('region', { name: /^Compartment / }).waitFor();
    await expectNoInjection(page, 'the compartment card');
  });

  it('reach every record page as text', { timeout: 120_000 }, async () => {
    const pages: [string, boolean][] = [
      ['/app', false],
      ['/app/vessels', true],
      ['/app/compartments', true],
      [`/app/compartments/${seeded.roomA}`, true],
      [`/app/compartments/${seeded.roomB}`, true],
      ['/app/collection', true],
      ['/app/collection?q=artifact', true],
      [`/app/collection/${seeded.artifacts[0]}`, true],
      [`/app/collection/${seeded.artifacts[2]}`, true],
      ['/app/condition', true],
      [`/app/condition/${seeded.compartmentReport}`, true],
      [`/app/condition/${seeded.artifactReport}`, true],
      ['/app/risks', true],
      ['/app/incidents', true],
      [`/app/incidents/${seeded.incident}`, true],
      ['/app/audit-trail', true],
    ];
    for (const [url, text] of pages) {
      await page.goto(url);
      await expectNoInjection(page, url, { text });
    }
    await screenshot(page, 'xss-audit-trail-1440');
  });
});
