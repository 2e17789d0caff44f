import { afterEach, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

// The starting platform's reversing wheel has no interpretive text in the demo data, and no other browser test uses it.
const OBJECT = '1998.1.4';
const LABEL = 'The engineer turned this wheel to run the engine backwards. The ship could then go astern.';
const STORY = 'Reversing a steam engine means changing when the steam enters each cylinder. This wheel moved the valve gear.';

describe('interpretive text, from a docent to the public', () => {
  it('a docent writes a label and a story and submits them; a curator approves; the public endpoint serves them', async () => {
    const docent = await openBrowser();
    browsers.push(docent);
    let page = docent.page;
    await signIn(page, 'docent@shipkeeper.test');
    await page.waitForURL('**/app');
    const vessels = (await (await page.request.get('/api/v1/vessels')).json()) as { items: { id: number }[] };
    const found = (await (await page.request.get(`/api/v1/vessels/${vessels.items[0]!.id}/artifacts?q=${OBJECT}`)).json()) as { items: { id: number; objectNumber: string }[] };
    const artifactId = found.items.find((a) => a.objectNumber === OBJECT)!.id;

    await page.goto(`/app/collection/${artifactId}`);
    let section = page.getByRole('region', { name: 'Interpretation' });
    await section.getByText('Nothing written yet.').waitFor({ timeout: 15_000 });
    await section.getByRole('textbox', { name: 'General label' }).click();
    await page.keyboard.type(LABEL);
    await section.getByRole('textbox', { name: 'General story' }).click();
    await page.keyboard.type(STORY);
    // Bold the first word of the story with the toolbar.
    await page.keyboard.press('Home');
    await page.keyboard.press('Control+Home');
    await page.keyboard.press('Shift+Control+ArrowRight');
    await section.getByRole('toolbar', { name: 'General story: formatting' }).getByRole('button', { name: 'Bold' }).click();
    await expect.poll(() => section.getByRole('toolbar', { name: 'General story: formatting' }).getByRole('button', { name: 'Bold' }).getAttribute('aria-pressed')).toBe('true');
    // The figures follow the writing: 16 words in the label, against the default limit of 75.
    await expect.poll(() => section.getByText('16 of 75').isVisible()).toBe(true);
    await screenshot(page, 'interpretation-docent-writes-1440');

    await section.getByRole('button', { name: 'Save draft' }).click();
    await expect.poll(() => section.getByText(/revision/).isVisible(), { timeout: 10_000 }).toBe(true);
    await section.getByRole('button', { name: 'Submit for review' }).click();
    await expect.poll(() => section.getByText('In review', { exact: true }).isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await section.getByRole('button', { name: 'Approve and publish' }).count()).toBe(0);

    const curator = await openBrowser();
    browsers.push(curator);
    page = curator.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.goto(`/app/collection/${artifactId}`);
    section = page.getByRole('region', { name: 'Interpretation' });
    await section.getByRole('button', { name: 'Approve and publish' }).click();
    await expect.poll(() => section.getByText('Published', { exact: true }).isVisible(), { timeout: 10_000 }).toBe(true);
    await screenshot(page, 'interpretation-curator-published-1440');

    const res = await fetch(`${inject('baseUrl')}/api/v1/visit/artifacts/${artifactId}/interpretation`);
    expect(res.status).toBe(200);
    const body = (await res.json()) as { audiences: { general: { label: string; story: string } } };
    expect(body.audiences.general.label).toBe(`<p>${LABEL}</p>`);
    expect(body.audiences.general.story).toBe(`<p><strong>Reversing</strong>${STORY.slice('Reversing'.length)}</p>`);
  });
});
