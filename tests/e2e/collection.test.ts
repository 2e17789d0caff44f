import { afterEach, describe, expect, it } from 'vitest';
import { cameraJpeg } from '../support/images.js';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

describe('the collection, end to end', () => {
  it('a curator records an artifact, adds a photo, places it on the plan and finds it by search', async () => {
    const curator = await openBrowser();
    browsers.push(curator);
    const page = curator.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');

    await page.getByRole('link', { name: 'Collection' }).click();
    await page.getByRole('button', { name: 'New artifact' }).click();
    const dialog = page.getByRole('dialog', { name: 'New artifact' });
    await dialog.getByLabel('Object number').fill('2026.9.1');
    await dialog.getByLabel('Name', { exact: true }).fill('Sight-feed lubricator');
    await dialog.getByRole('combobox', { name: 'Category' }).click();
    await page.getByRole('option', { name: 'Instruments and gauges' }).click();
    await dialog.getByRole('combobox', { name: 'Compartment' }).click();
    await page.getByRole('option', { name: '2-62-0-E · Engine room' }).click();
    await screenshot(page, 'collection-new-artifact-1440');
    await dialog.getByRole('button', { name: 'Record artifact' }).click();
    await page.waitForURL(/\/app\/collection\/\d+$/);
    const id = Number(page.url().split('/').pop());
    await expect.poll(() => page.getByRole('heading', { name: 'Sight-feed lubricator' }).isVisible()).toBe(true);

    // A phone photo: the gallery shows it upright with the date the camera wrote.
    await page.locator('input[type=file]').setInputFiles({ name: 'lubricator.jpg', mimeType: 'image/jpeg', buffer: await cameraJpeg() });
    await page.getByRole('button', { name: 'Upload 1 file' }).click();
    await expect.poll(() => page.getByText('lubricator.jpg').first().isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => page.getByText(/Taken May 17, 2024/).first().isVisible()).toBe(true);
    const photos = await (await page.request.get(`/api/v1/media?ownerType=artifact&ownerId=${id}`)).json();
    expect(photos).toMatchObject([{ fileName: 'lubricator.jpg', width: 200, height: 400 }]);

    await page.getByRole('link', { name: 'Place on the plan' }).click();
    await page.waitForURL(/place=/);
    await expect.poll(() => page.getByText(/Click on the plan where 2026\.9\.1 Sight-feed lubricator is/).isVisible(), { timeout: 15_000 }).toBe(true);
    const room = page.locator('path.deck-map-outline--2-62-0-E');
    await room.waitFor();
    await page.waitForTimeout(500);
    const box = (await room.boundingBox())!;
    await page.mouse.click(box.x + box.width * 0.5, box.y + box.height * 0.5);
    // Recorded in the engine room without a point: its first point is a placement, so no reason is asked.
    const move = page.getByRole('dialog', { name: 'Place on the plan' });
    await expect.poll(() => move.getByText('Its first point on the plan, in 2-62-0-E · Engine room').isVisible()).toBe(true);
    expect(await move.getByLabel('Reason').count()).toBe(0);
    await screenshot(page, 'collection-place-on-plan-1440');
    await move.getByRole('button', { name: 'Place it here' }).click();
    await expect.poll(() => page.url()).not.toMatch(/place=/);
    const placed = await (await page.request.get(`/api/v1/artifacts/${id}`)).json();
    expect(placed.location).toMatchObject({ compartmentDesignation: '2-62-0-E', point: expect.any(Array) });
    const history = await (await page.request.get(`/api/v1/artifacts/${id}/moves`)).json();
    expect(history.map((m: { kind: string; reason: string }) => `${m.kind}: ${m.reason}`)).toEqual(['placed: ', 'recorded: Recorded in the collection']);
    await expect.poll(() => page.getByRole('button', { name: '2026.9.1 Sight-feed lubricator' }).isVisible(), { timeout: 10_000 }).toBe(true);

    await page.getByRole('link', { name: 'Collection' }).click();
    await page.getByLabel('Search').fill('lubricator');
    await expect.poll(() => page.locator('mark:visible', { hasText: /^lubricator$/i }).count(), { timeout: 10_000 }).toBeGreaterThan(0);
    await expect.poll(() => page.getByRole('link', { name: '2026.9.1' }).isVisible()).toBe(true);
    await screenshot(page, 'collection-search-1440');
  });
});
