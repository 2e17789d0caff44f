import { afterEach, describe, expect, it } from 'vitest';
import { cameraJpeg } from '../support/images.js';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

describe('condition work, end to end', () => {
  it('a conservator writes and submits a report with a photo, and the map overlay changes', async () => {
    const conservator = await openBrowser();
    browsers.push(conservator);
    const page = conservator.page;
    await signIn(page, 'conservator@shipkeeper.test');
    await page.waitForURL('**/app');

    const vessels = await (await page.request.get('/api/v1/vessels?sort=createdAt')).json();
    const decks = await (await page.request.get(`/api/v1/vessels/${vessels.items[0].id}/decks`)).json();
    const lower = decks.find((d: { name: string }) => d.name === 'Lower deck');
    const tank = page.locator('path.deck-map-outline--3-70-0-W');

    // The feed water tank has never been surveyed.
    await page.goto(`/app/ship?deck=${lower.id}&overlay=condition`);
    await tank.waitFor();
    await expect.poll(() => tank.getAttribute('data-grade'), { timeout: 10_000 }).toBe('none');

    await page.getByRole('link', { name: 'Condition', exact: true }).click();
    await page.getByRole('button', { name: 'Start a report' }).click();
    const start = page.getByRole('dialog');
    await start.getByRole('button', { name: 'A compartment' }).or(start.getByRole('radio', { name: 'A compartment' })).first().click();
    await start.getByRole('combobox', { name: 'Compartment' }).click();
    await page.getByRole('option', { name: /3-70-0-W · Feed water tank/ }).click();
    await start.getByLabel('Summary').fill('Tank top and sides after the wet autumn.');
    await start.getByRole('button', { name: 'Start the report' }).click();
    await page.waitForURL(/\/app\/condition\/\d+$/);
    const id = Number(page.url().split('/').pop());

    await page.locator('input[type=file]').setInputFiles({ name: 'tank-top.jpg', mimeType: 'image/jpeg', buffer: await cameraJpeg() });
    await page.getByRole('button', { name: 'Upload 1 file' }).click();
    await expect.poll(() => page.getByText('tank-top.jpg').first().isVisible(), { timeout: 15_000 }).toBe(true);

    await page.getByRole('button', { name: 'Add a finding' }).click();
    const finding = page.getByRole('dialog', { name: 'Record a finding' });
    await finding.getByRole('combobox', { name: 'Agent of deterioration' }).click();
    await page.getByRole('option', { name: 'Incorrect relative humidity' }).click();
    await finding.getByRole('combobox', { name: 'Type of damage' }).click();
    await page.getByRole('option', { name: 'Coating failure' }).click();
    await finding.getByRole('radio', { name: 'Severe' }).or(finding.getByRole('button', { name: 'Severe', exact: true })).first().click();
    await finding.getByLabel('Surface rusted (%)').fill('12');
    await finding.getByLabel('Recommended action').fill('Blast and recoat the tank top');
    await screenshot(page, 'condition-finding-1440');
    await finding.getByRole('button', { name: 'Add the finding' }).click();
    await expect.poll(async () => (await (await page.request.get(`/api/v1/condition-reports/${id}`)).json()).findings?.[0]?.rustGrade, { timeout: 10_000 }).toBe('3');

    await page.getByRole('button', { name: 'Submit and sign' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Submit and sign' }).click();
    await expect.poll(async () => (await (await page.request.get(`/api/v1/condition-reports/${id}`)).json()).status, { timeout: 10_000 }).toBe('submitted');
    await screenshot(page, 'condition-report-submitted-1440');

    await page.goto(`/app/ship?deck=${lower.id}&overlay=condition`);
    await tank.waitFor();
    await expect.poll(() => tank.getAttribute('data-grade'), { timeout: 10_000 }).toBe('poor');
    await screenshot(page, 'condition-overlay-1440');
  });
});
