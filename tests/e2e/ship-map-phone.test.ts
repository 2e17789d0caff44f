import type { Page } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

/** How far the page reaches beyond the width of the screen, in CSS pixels. */
// Strings: these run in the page, and the tests are type-checked without the DOM's types.
const horizontalOverflow = (page: Page) => page.evaluate<number>('document.documentElement.scrollWidth - document.documentElement.clientWidth');

async function openSecondDeck(page: Page, overlay?: 'condition' | 'risks') {
  await page.goto(`/app/ship${overlay ? `?overlay=${overlay}` : ''}`);
  await page.getByRole('combobox', { name: 'Deck' }).click();
  await page.getByRole('option', { name: 'Second deck' }).click();
  await page.getByRole('region', { name: 'Deck plan' }).waitFor();
  await page.waitForTimeout(600);
}

describe('the ship map on a phone (375 px wide)', () => {
  it('gives the map the width of the screen, the list and card below it, and nothing wider than the screen', async () => {
    const phone = await openBrowser({ width: 375, height: 780 });
    browsers.push(phone);
    const page = phone.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');

    for (const overlay of [undefined, 'condition', 'risks'] as const) {
      await openSecondDeck(page, overlay);
      expect(await horizontalOverflow(page), `overflow in the ${overlay ?? 'access'} overlay`).toBe(0);
      const map = (await page.getByRole('region', { name: 'Deck plan' }).boundingBox())!;
      // Edge to edge, and most of the screen's height.
      expect(map.x).toBeGreaterThanOrEqual(0);
      expect(map.x).toBeLessThanOrEqual(1);
      expect(map.width).toBeGreaterThanOrEqual(373);
      expect(map.height).toBeGreaterThanOrEqual(300);
      // The list comes after the map, not beside it.
      const list = (await page.getByRole('navigation', { name: 'Compartments on this deck' }).boundingBox())!;
      expect(list.y).toBeGreaterThanOrEqual(map.y + map.height);
      await screenshot(page, `ship-map-${overlay ?? 'access'}-375`);
    }

    // The tools are one menu.
    expect(await page.getByRole('toolbar', { name: 'Map tools' }).isVisible()).toBe(false);
    await page.getByRole('button', { name: 'Tools' }).click();
    await page.getByRole('menuitem', { name: 'Measure' }).click();
    const measure = page.locator('.deck-map-measure');
    await measure.waitFor();
    const measureBox = (await measure.boundingBox())!;
    expect(measureBox.x + measureBox.width).toBeLessThanOrEqual(375);
    await page.getByRole('button', { name: 'Tools' }).click();
    await page.getByRole('menuitem', { name: 'Stop measuring' }).click();
    await expect.poll(() => measure.count()).toBe(0);

    // The card opens below the map, can be read and closed, and fits the screen.
    await page.getByRole('navigation', { name: 'Compartments on this deck' }).getByRole('button', { name: /2-62-0-E/ }).click();
    const card = page.getByRole('region', { name: 'Compartment 2-62-0-E' });
    await card.waitFor();
    await card.scrollIntoViewIfNeeded();
    const box = (await card.boundingBox())!;
    const map = (await page.getByRole('region', { name: 'Deck plan' }).boundingBox())!;
    expect(box.y).toBeGreaterThanOrEqual(map.y + map.height);
    expect(box.x).toBeGreaterThanOrEqual(0);
    expect(box.x + box.width).toBeLessThanOrEqual(375);
    expect(await card.getByRole('link', { name: 'Open the compartment page' }).isVisible()).toBe(true);
    expect(await horizontalOverflow(page)).toBe(0);
    await screenshot(page, 'ship-map-card-375');
    await card.getByRole('button', { name: 'Close the card' }).click();
    await expect.poll(() => card.count()).toBe(0);

    // Chosen on the map, the card below it is brought into view.
    const deckId = new URL(page.url()).searchParams.get('deck');
    const { current } = (await (await page.request.get(`/api/v1/decks/${deckId}/plan`)).json()) as { current: { maxZoom: number } };
    const { vesselId } = (await (await page.request.get(`/api/v1/decks/${deckId}`)).json()) as { vesselId: number };
    const { items } = (await (await page.request.get(`/api/v1/vessels/${vesselId}/compartments?deckId=${deckId}&pageSize=100`)).json()) as { items: { designation: string; outline: [number, number][] }[] };
    const outline = items.find((c) => c.designation === '2-62-0-E')!.outline;
    const xs = outline.map(([x]) => x);
    const ys = outline.map(([, y]) => y);
    await page.goto(`/app/ship?deck=${deckId}&view=${(Math.min(...xs) + Math.max(...xs)) / 2},${(Math.min(...ys) + Math.max(...ys)) / 2},${current.maxZoom - 1}`);
    const shape = page.locator('path.deck-map-outline--2-62-0-E');
    await shape.waitFor();
    await page.getByRole('region', { name: 'Deck plan' }).scrollIntoViewIfNeeded();
    await page.waitForTimeout(500);
    const room = (await shape.boundingBox())!;
    // Low in the outline, clear of the badges near its middle.
    await page.mouse.click(Math.max(room.x, 0) + Math.min(room.width, 375) / 2, room.y + room.height * 0.85);
    await card.waitFor();
    // Within the screen (bounding boxes are measured from the top of the viewport).
    await expect.poll(async () => (await card.boundingBox())!.y).toBeLessThan(780 - 100);
    expect((await card.boundingBox())!.y).toBeGreaterThanOrEqual(0);
    await screenshot(page, 'ship-map-card-from-map-375');
  });
});

describe('the ship map on a wide screen', () => {
  it('opens the card beside the map and draws the overlay labels above the artifact badges and clusters', async () => {
    const desk = await openBrowser();
    browsers.push(desk);
    const page = desk.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');
    await openSecondDeck(page, 'condition');
    await page.getByRole('navigation', { name: 'Compartments on this deck' }).getByRole('button', { name: /2-62-0-E/ }).click();
    const card = page.getByRole('region', { name: 'Compartment 2-62-0-E' });
    await card.waitFor();
    const map = (await page.getByRole('region', { name: 'Deck plan' }).boundingBox())!;
    const cardBox = (await card.boundingBox())!;
    expect(cardBox.x).toBeGreaterThanOrEqual(map.x + map.width);
    expect(cardBox.y).toBeLessThan(map.y + 20);

    await expect.poll(() => page.locator('.deck-map-label').count(), { timeout: 10_000 }).toBeGreaterThan(0);
    const z = await page.evaluate<{ labels: number; badges: number; tooltips: number }>(`(() => {
      const zOf = (el) => Number(getComputedStyle(el).zIndex);
      return {
        labels: zOf(document.querySelector('.deck-map-label').closest('.leaflet-pane')),
        badges: zOf(document.querySelector('.leaflet-marker-pane')),
        tooltips: zOf(document.querySelector('.leaflet-tooltip-pane')),
      };
    })()`);
    expect(z.labels).toBeGreaterThan(z.badges);
    expect(z.labels).toBeLessThan(z.tooltips);
    await screenshot(page, 'ship-map-card-beside-1440');
  });
});
