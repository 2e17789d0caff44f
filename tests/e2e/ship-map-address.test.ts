import type { Page } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

type Rect = { left: number; top: number; width: number; height: number };
type Tile = { z: number; x: number; y: number; left: number; top: number; width: number; level: number };

/**
 * Where the plan is drawn on the screen, from its tiles: tile (0, 0) of the shown level starts at
 * the plan's corner, and a tile covers 256·2^(maxZoom − z) plan pixels.
 */
async function planOnScreen(page: Page): Promise<{ frame: Rect; plan: Rect }> {
  const deckId = new URL(page.url()).searchParams.get('deck');
  const { current } = (await (await page.request.get(`/api/v1/decks/${deckId}/plan`)).json()) as { current: { width: number; height: number; maxZoom: number; tileSize: number } };
  // A string: it runs in the page, and the tests are type-checked without the DOM's types.
  const { frame, tiles } = await page.evaluate<{ frame: Rect; tiles: Tile[] }>(`(() => {
    const r = document.querySelector('[aria-label="Deck plan"]').getBoundingClientRect();
    const tiles = [...document.querySelectorAll('.leaflet-tile-pane img.leaflet-tile-loaded')].map((img) => {
      const [, z, y, x] = /\\/(\\d+)\\/(\\d+)\\/(\\d+)\\.png/.exec(img.src).map(Number);
      const box = img.getBoundingClientRect();
      return { z, x, y, left: box.left, top: box.top, width: box.width, level: Number(img.closest('.leaflet-tile-container').style.zIndex) };
    });
    return { frame: { left: r.left, top: r.top, width: r.width, height: r.height }, tiles };
  })()`);
  const level = Math.max(...tiles.map((t) => t.level));
  const origin = tiles.find((t) => t.level === level && t.x === 0 && t.y === 0);
  if (!origin) throw new Error('the corner of the plan is not on the screen');
  const perPlanPixel = origin.width / (current.tileSize * 2 ** (current.maxZoom - origin.z));
  return { frame, plan: { left: origin.left, top: origin.top, width: current.width * perPlanPixel, height: current.height * perPlanPixel } };
}

/** The whole plan inside the frame, touching both of its sides across or both along. */
async function expectFitted(page: Page, what: string) {
  await page.waitForTimeout(800);
  const { frame, plan } = await planOnScreen(page);
  expect(plan.left, what).toBeGreaterThanOrEqual(frame.left - 1);
  expect(plan.top, what).toBeGreaterThanOrEqual(frame.top - 1);
  expect(plan.left + plan.width, what).toBeLessThanOrEqual(frame.left + frame.width + 1);
  expect(plan.top + plan.height, what).toBeLessThanOrEqual(frame.top + frame.height + 1);
  expect(Math.min(Math.abs(plan.width - frame.width), Math.abs(plan.height - frame.height)), what).toBeLessThan(2);
}

async function chooseDeck(page: Page, name: string) {
  await page.getByRole('combobox', { name: 'Deck' }).click();
  await page.getByRole('option', { name }).click();
}

const param = (page: Page, key: string) => new URL(page.url()).searchParams.get(key);

describe('the ship map keeps its place', () => {
  it('fits the plan to its frame, and keeps deck, overlay, view and card in the address through reload, back and forward', { timeout: 90_000 }, async () => {
    const desk = await openBrowser();
    browsers.push(desk);
    const page = desk.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.goto('/app/ship');
    await page.getByRole('region', { name: 'Deck plan' }).waitFor();
    await chooseDeck(page, 'Second deck');
    await expect.poll(() => page.getByRole('combobox', { name: 'Deck' }).textContent()).toContain('Second deck');
    const second = param(page, 'deck');
    await expectFitted(page, 'the second deck on load');
    expect(param(page, 'view')).toBeNull();

    // A narrower window: still the whole plan.
    await page.setViewportSize({ width: 1100, height: 800 });
    await expectFitted(page, 'after the window narrowed');
    await page.setViewportSize({ width: 1440, height: 900 });

    await page.getByRole('button', { name: 'Zoom in' }).click();
    await expect.poll(() => param(page, 'view')).toMatch(/^\d+,\d+,[\d.]+$/);
    await page.getByRole('radio', { name: 'Condition' }).check();
    await expect.poll(() => param(page, 'overlay')).toBe('condition');
    const address = page.url();

    await page.reload();
    await page.getByRole('region', { name: 'Deck plan' }).waitFor();
    await page.waitForTimeout(1200);
    // Had the view not come back, the map would show the whole plan and say so in the address.
    expect(page.url()).toBe(address);
    expect(await page.getByRole('radio', { name: 'Condition' }).isChecked()).toBe(true);

    await chooseDeck(page, 'Main deck');
    await expect.poll(() => param(page, 'deck')).not.toBe(second);
    expect(param(page, 'view')).toBeNull();
    expect(param(page, 'overlay')).toBe('condition');
    await expectFitted(page, 'the main deck');
    await page.getByRole('navigation', { name: 'Compartments on this deck' }).getByRole('button').first().click();
    await expect.poll(() => param(page, 'compartment')).toMatch(/^\d+$/);
    const withCard = page.url();

    await page.goBack();
    await expect.poll(() => page.getByRole('combobox', { name: 'Deck' }).textContent()).toContain('Second deck');
    await page.waitForTimeout(600);
    expect(page.url()).toBe(address);

    await page.goForward();
    await expect.poll(() => page.getByRole('combobox', { name: 'Deck' }).textContent()).toContain('Main deck');
    await page.getByRole('region', { name: /^Compartment / }).waitFor();
    expect(page.url()).toBe(withCard);

    // The same address as a link (the compartment page's "Show on the ship map").
    await page.goto(`/app/ship?deck=${param(page, 'deck')}&compartment=${param(page, 'compartment')}`);
    await page.getByRole('region', { name: /^Compartment / }).waitFor();
    await expectFitted(page, 'opened from a link');
  });
});
