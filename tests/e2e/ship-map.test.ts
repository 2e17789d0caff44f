import { afterEach, describe, expect, it } from 'vitest';
import { planPng } from '../support/images.js';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

describe('the ship map, end to end', () => {
  it('a curator uploads a deck plan, calibrates it, draws a compartment, names it and sees its area', async () => {
    const curator = await openBrowser();
    browsers.push(curator);
    const page = curator.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');

    await page.getByRole('link', { name: 'Ship map' }).click();
    await page.getByRole('button', { name: 'Add deck' }).click();
    const deckDialog = page.getByRole('dialog', { name: 'Add a deck' });
    await deckDialog.getByLabel('Name').fill('Test platform');
    await deckDialog.getByRole('button', { name: 'Add deck' }).click();
    await expect.poll(() => page.getByText('No plan for Test platform yet').isVisible()).toBe(true);

    await page.getByTestId('plan-file').setInputFiles({ name: 'test-platform.png', mimeType: 'image/png', buffer: await planPng(3000, 1200) });
    const plan = page.getByRole('region', { name: 'Deck plan' });
    await plan.waitFor({ timeout: 30_000 });
    await page.waitForTimeout(500);
    const box = (await plan.boundingBox())!;
    const at = (fx: number, fy: number) => page.mouse.click(box.x + box.width * fx, box.y + box.height * fy);

    await page.getByRole('button', { name: 'Calibrate by two points' }).click();
    await at(0.3, 0.5);
    await at(0.7, 0.5);
    const calibrate = page.getByRole('dialog', { name: 'Distance between the two points' });
    await calibrate.getByLabel('Real distance').fill(`60' 0"`);
    await calibrate.getByRole('button', { name: 'Save scale' }).click();
    await expect.poll(() => page.getByText('Scale saved').first().isVisible()).toBe(true);
    await expect.poll(() => page.getByRole('img', { name: /^Scale: the bar is/ }).isVisible()).toBe(true);

    await page.getByRole('button', { name: 'Set centerline' }).click();
    await at(0.5, 0.5);
    await expect.poll(() => page.getByText('Centerline set').first().isVisible()).toBe(true);
    await expect.poll(() => page.getByRole('list', { name: 'Key to the plan' }).getByText('Centerline').isVisible()).toBe(true);
    expect(await page.getByRole('button', { name: 'Set centerline' }).getAttribute('aria-pressed')).toBe('false');

    await page.getByRole('button', { name: 'Draw a compartment' }).click();
    for (const [fx, fy] of [[0.4, 0.4], [0.55, 0.4], [0.55, 0.6], [0.4, 0.6], [0.4, 0.4]] as const) {
      await at(fx, fy);
      await page.waitForTimeout(100);
    }
    const name = page.getByRole('dialog', { name: 'Name the new compartment' });
    await name.getByLabel('Designation').fill('4-110-0-E');
    await expect.poll(() => name.getByText(/frame 110, on the centerline, engineering space/).isVisible()).toBe(true);
    await name.getByLabel('Name', { exact: true }).fill('Test engine flat');
    await screenshot(page, 'ship-map-name-compartment-1440');
    await name.getByRole('button', { name: 'Save compartment' }).click();

    const area = page.getByTestId('compartment-area');
    await expect.poll(() => area.textContent()).toMatch(/^[\d,.]+ ft² \([\d,.]+ m²\)$/);
    expect(await page.getByRole('button', { name: /4-110-0-E/ }).getAttribute('aria-current')).toBe('true');
    await screenshot(page, 'ship-map-compartment-1440');
  });
});
