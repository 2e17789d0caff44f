import type { Page } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

// The demo tour no other browser test changes (server/db/seed/demo-tours.ts).
const TOUR = '/visit/tours/main-deck-step-free';
const horizontalOverflow = (page: Page) => page.evaluate<number>('document.documentElement.scrollWidth - document.documentElement.clientWidth');
// evaluated as text: the browser's globals are not in this (node) project's types
const fontSize = (page: Page, selector: string) => page.evaluate<number>(`parseFloat(getComputedStyle(document.querySelector(${JSON.stringify(selector)})).fontSize)`);

describe('a visitor takes a published tour', () => {
  it('opens the step-free tour from the ship’s page, reads stop 1, turns to stop 2 with the arrow key and back', async () => {
    const visitor = await openBrowser({ width: 1280, height: 900 });
    browsers.push(visitor);
    const { page } = visitor;
    await page.goto('/visit');
    const card = page.locator('li', { has: page.getByRole('link', { name: 'The main deck, step-free' }) });
    await expect.poll(() => card.textContent()).toContain('Step-free');
    expect(await card.textContent()).toContain('2 stops');
    await page.getByRole('link', { name: 'The main deck, step-free' }).click();

    await page.waitForURL(`**${TOUR}`);
    await page.getByRole('heading', { level: 1, name: 'The main deck, step-free' }).waitFor();
    const route = page.getByRole('list').filter({ hasText: 'The forward saloon' });
    expect(await route.textContent()).toContain('Tickets and letters');
    await screenshot(page, 'visit-tour');
    await page.getByRole('link', { name: 'Start the tour' }).click();

    await page.waitForURL(`**${TOUR}/stops/1`);
    await page.getByRole('heading', { level: 1, name: 'The forward saloon' }).waitFor();
    expect(await page.getByTestId('stop-position').textContent()).toBe('Stop 1 of 2');
    expect(await page.locator('.stop__html').textContent()).toContain('Count the carved panels');
    expect(await page.getByText('The mirrored panel by the stair').isVisible()).toBe(true);
    await screenshot(page, 'visit-stop-1');

    await page.keyboard.press('ArrowRight');
    await page.waitForURL(`**${TOUR}/stops/2`);
    await expect.poll(() => page.getByTestId('stop-position').textContent()).toMatch(/^Stop 2 of/);
    await page.getByRole('heading', { level: 1, name: 'Tickets and letters' }).waitFor();
    await page.keyboard.press('ArrowLeft');
    await page.waitForURL(`**${TOUR}/stops/1`);
    await page.getByRole('heading', { level: 1, name: 'The forward saloon' }).waitFor();
  });

  it('says "You are here" on the address a stop’s code opens, and not otherwise', async () => {
    const visitor = await openBrowser({ width: 390, height: 844 });
    browsers.push(visitor);
    const { page } = visitor;
    await page.goto(`${TOUR}/stops/2?here=1`);
    await page.getByRole('heading', { level: 1, name: 'Tickets and letters' }).waitFor();
    expect(await page.getByRole('status').filter({ hasText: 'You are here' }).isVisible()).toBe(true);
    await screenshot(page, 'visit-stop-here-390');
    await page.goto(`${TOUR}/stops/2`);
    await page.getByRole('heading', { level: 1, name: 'Tickets and letters' }).waitFor();
    expect(await page.getByText('You are here').count()).toBe(0);
  });

  it('draws the boiling ladder of a stop as a diagram above its sentence', async () => {
    const visitor = await openBrowser({ width: 1280, height: 900 });
    browsers.push(visitor);
    const { page } = visitor;
    // The evaporator stop of the demo's engine-room tour carries a boiling-ladder explainer.
    await page.goto('/visit/tours/fire-and-steam/stops/3');
    const figure = page.locator('.stop__html figure[data-explainer="boiling-ladder"]');
    await expect.poll(() => figure.locator('svg[role="img"]').count()).toBe(1);
    const rungs = await figure.locator('svg text').allTextContents();
    expect(rungs.some((t) => /^\d+ °[FC]$/.test(t))).toBe(true);
    expect(await figure.locator('figcaption').textContent()).toMatch(/boils at/);
    await screenshot(page, 'visit-stop-boiling-ladder');
  });

  it('answers an unknown tour with its own page', async () => {
    const visitor = await openBrowser({ width: 390, height: 844 });
    browsers.push(visitor);
    await visitor.page.goto('/visit/tours/no-such-tour');
    await visitor.page.getByRole('heading', { name: 'This tour is not available' }).waitFor();
  });

  it('grows the text with the text-size control, keeps it on reload, and fits 375 px without sideways scrolling', async () => {
    const visitor = await openBrowser({ width: 375, height: 812 });
    browsers.push(visitor);
    const { page } = visitor;
    await page.goto(`${TOUR}/stops/1`);
    await page.getByRole('heading', { level: 1, name: 'The forward saloon' }).waitFor();
    const standard = await fontSize(page, '.stop__html p');
    const plain = await fontSize(page, '.stop__facts dd');
    expect(await horizontalOverflow(page)).toBe(0);

    await page.getByRole('button', { name: 'Largest text' }).click();
    await expect.poll(() => fontSize(page, '.stop__html p')).toBeGreaterThan(standard * 1.3);
    expect(await page.getByRole('button', { name: 'Largest text' }).getAttribute('aria-pressed')).toBe('true');
    // text that only inherits its size follows too
    expect(await fontSize(page, '.stop__facts dd')).toBeGreaterThan(plain * 1.3);
    expect(await horizontalOverflow(page)).toBe(0);
    await screenshot(page, 'visit-stop-375-largest');

    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'The forward saloon' }).waitFor();
    expect(await fontSize(page, '.stop__html p')).toBeGreaterThan(standard * 1.3);
    // the whole visitor layout follows, not only the stop
    await page.goto(TOUR);
    await page.getByRole('heading', { level: 1, name: 'The main deck, step-free' }).waitFor();
    expect(await horizontalOverflow(page)).toBe(0);
    await page.goto('/visit');
    await page.getByRole('link', { name: 'The main deck, step-free' }).waitFor();
    expect(await horizontalOverflow(page)).toBe(0);
    await screenshot(page, 'visit-home-375-largest');

    await page.goto(TOUR);
    await page.getByRole('button', { name: 'Standard text' }).click();
    await expect.poll(() => fontSize(page, '.tour__summary')).toBeLessThan(20);
  });
});
