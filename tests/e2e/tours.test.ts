import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

// The engine room is guided-only in the demo (a stop on board there may be published) and no other browser test changes it.
const TITLE = 'The engine in ten minutes';
const SLUG = 'the-engine-in-ten-minutes';
const TEXT = 'Steam worked three times over in this engine, in three cylinders of growing size.';
const ALT = 'The triple-expansion engine seen from the starting platform';

describe('a tour, from a docent to the public site', () => {
  it('a docent writes a stop with a photo and a boiling-ladder explainer and submits; a curator approves and the public API serves it', async () => {
    const docent = await openBrowser();
    browsers.push(docent);
    let page = docent.page;
    await signIn(page, 'docent@shipkeeper.test');
    await page.waitForURL('**/app');

    await page.getByRole('link', { name: 'Tours', exact: true }).click();
    await page.getByRole('button', { name: 'Start a tour' }).click();
    const start = page.getByRole('dialog', { name: 'Start a tour' });
    await start.getByLabel('Title').fill(TITLE);
    expect(await start.getByLabel('Slug').inputValue()).toBe(SLUG);
    await start.getByRole('button', { name: 'Start the tour' }).click();
    await page.waitForURL(/\/app\/tours\/\d+$/);
    const tourUrl = new URL(page.url()).pathname;

    await page.getByRole('button', { name: 'Add a stop' }).click();
    const stop = page.getByRole('dialog', { name: 'Add a stop' });
    await stop.getByRole('button', { name: 'Add the stop' }).click();
    await expect.poll(() => stop.getByText('Title is required.').isVisible()).toBe(true);
    await stop.getByLabel('Title').fill('The starting platform');
    await stop.getByRole('combobox', { name: 'Space' }).click();
    await page.getByRole('option', { name: /2-62-0-E Engine room/ }).click();
    await expect.poll(() => stop.getByText('What visitors are told here').isVisible()).toBe(true);
    await stop.locator('.p-multiselect').filter({ has: page.getByRole('combobox', { name: 'Artifacts shown' }) }).click();
    await page.getByRole('option', { name: /1998\.1\.1 Triple-expansion main engine/ }).click();
    await stop.getByLabel('Title').click();
    await stop.getByRole('textbox', { name: 'Text of the stop' }).click();
    await page.keyboard.type(TEXT);
    await stop.getByRole('button', { name: 'Photo from the collection' }).click();
    const photo = page.getByRole('dialog', { name: 'Photo from the collection' });
    await photo.locator('.rte-image__choice').first().click();
    await photo.getByLabel('Alt text (required)').fill(ALT);
    await photo.getByRole('button', { name: 'Insert photo' }).click();
    await expect.poll(() => stop.locator('.rich-text-editor__content img').count()).toBe(1);
    // A boiling ladder with the dialog's own two stages (14.7 psia and 7 psia).
    await stop.getByRole('button', { name: 'Explainer' }).click();
    const explainer = page.getByRole('dialog', { name: 'Insert an explainer' });
    await explainer.getByRole('button', { name: 'Insert explainer' }).click();
    await expect.poll(() => stop.locator('.rich-text-editor__content [data-explainer="boiling-ladder"]').count()).toBe(1);
    await screenshot(page, 'tour-stop-dialog-1440');
    await stop.getByRole('button', { name: 'Add the stop' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'The starting platform', exact: true }).isVisible(), { timeout: 10_000 }).toBe(true);

    await page.getByRole('button', { name: 'Submit for review' }).click();
    await expect.poll(() => page.getByText('In review', { exact: true }).isVisible(), { timeout: 10_000 }).toBe(true);
    await screenshot(page, 'tour-docent-submitted-1440');
    expect((await page.request.get(`/api/v1/visit/tours/${SLUG}`)).status()).toBe(404);

    const curator = await openBrowser();
    browsers.push(curator);
    page = curator.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.goto(tourUrl);
    await page.getByRole('button', { name: 'Approve…' }).click();
    const approve = page.getByRole('dialog', { name: `Approve and publish “${TITLE}”` });
    await approve.getByRole('button', { name: 'Approve and publish' }).click();
    await expect.poll(() => page.getByText('Published', { exact: true }).first().isVisible(), { timeout: 10_000 }).toBe(true);
    await screenshot(page, 'tour-curator-published-1440');

    const res = await page.request.get(`/api/v1/visit/tours/${SLUG}`);
    expect(res.status()).toBe(200);
    const published = await res.json();
    expect(published).toMatchObject({ title: TITLE, stopCount: 1 });
    expect(published.stops[0]).toMatchObject({ number: 1, title: 'The starting platform', space: 'Engine room', virtual: false });
    expect(published.stops[0].html).toContain(`<p>${TEXT}</p>`);
    expect(published.stops[0].html).toMatch(new RegExp(`<img src="/api/v1/visit/tours/${SLUG}/media/\\d+/display" alt="${ALT}"`));
    expect(published.stops[0].cautions.length).toBeGreaterThan(0);
    expect(published.stops[0].html).toMatch(/<figure data-explainer="boiling-ladder" data-config="[^"]+" class="explainer"><figcaption>[^<]+<\/figcaption><\/figure>/);
  });
});
