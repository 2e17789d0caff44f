import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

const TITLE = 'Wheelhouse windows';

describe('a repair project, from a conservator to a curator', () => {
  it('a conservator proposes a project with two estimate lines; a curator approves it', async () => {
    const conservator = await openBrowser();
    browsers.push(conservator);
    let page = conservator.page;
    await signIn(page, 'conservator@shipkeeper.test');
    await page.waitForURL('**/app');

    await page.getByRole('link', { name: 'Repair projects', exact: true }).click();
    await page.getByRole('button', { name: 'Propose a project' }).click();
    const dialog = page.getByRole('dialog', { name: 'Propose a repair project' });
    await dialog.getByLabel('Title').fill(TITLE);
    expect(await dialog.getByLabel('Slug').inputValue()).toBe('wheelhouse-windows');
    await dialog.getByRole('textbox', { name: 'Scope of the work' }).fill('Reglaze the two forward wheelhouse windows and renew their rubber seals.');
    // Two lines: 2 × 145.50 = 291.00 and 3.5 h × 62.00 = 217.00; subtotal 508.00; 10 % = 50.80; total 558.80 (by hand).
    await dialog.getByLabel('Line 1 description').fill('Toughened glass pane, cut to size');
    await dialog.getByLabel('Line 1 quantity').fill('2');
    await dialog.getByLabel('Line 1 unit', { exact: true }).fill('each');
    await dialog.getByLabel('Line 1 unit cost').fill('145.50');
    await dialog.getByRole('button', { name: 'Add a line' }).click();
    await dialog.getByLabel('Line 2 description').fill('Glazier');
    await dialog.getByLabel('Line 2 quantity').fill('3.5');
    await dialog.getByLabel('Line 2 unit', { exact: true }).fill('h');
    await dialog.getByLabel('Line 2 unit cost').fill('62');
    await expect.poll(() => dialog.getByRole('row', { name: /Total with contingency/ }).textContent()).toContain('$558.80');
    await screenshot(page, 'repair-project-propose-1440');
    await dialog.getByRole('button', { name: 'Propose the project' }).click();

    await page.waitForURL(/\/app\/repairs\/\d+$/);
    const url = new URL(page.url()).pathname;
    await expect.poll(() => page.getByRole('heading', { name: TITLE }).isVisible(), { timeout: 10_000 }).toBe(true);
    const estimate = page.getByRole('region', { name: 'Estimate' });
    expect(await estimate.getByRole('row', { name: /Total with contingency/ }).textContent()).toContain('$558.80');
    const status = page.getByRole('region', { name: 'Status' });
    // Approving is the curator's: the conservator may only cancel.
    expect(await status.getByRole('button', { name: 'Mark approved' }).count()).toBe(0);
    expect(await status.getByText('A curator approves proposed projects.').isVisible()).toBe(true);
    await screenshot(page, 'repair-project-proposed-1440');

    const curator = await openBrowser();
    browsers.push(curator);
    page = curator.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.goto(url);
    await page.getByRole('region', { name: 'Status' }).getByRole('button', { name: 'Mark approved' }).click();
    const confirm = page.getByRole('dialog', { name: 'Mark the project approved?' });
    await confirm.getByLabel('Note (optional)').fill('Approved on the spring budget.');
    await confirm.getByRole('button', { name: 'Mark approved' }).click();
    const timeline = page.getByRole('region', { name: 'Status' }).getByRole('listitem');
    await expect.poll(() => timeline.first().textContent(), { timeout: 10_000 }).toContain('Approved on the spring budget.');
    expect(await timeline.first().textContent()).toContain('Approved');
    expect(await page.getByRole('region', { name: 'Status' }).getByRole('button', { name: 'Mark fundraising' }).isVisible()).toBe(true);
    await screenshot(page, 'repair-project-approved-1440');

    // The list shows it approved, and filters by status.
    await page.getByRole('link', { name: 'All repair projects' }).click();
    await page.getByRole('combobox', { name: 'Status' }).click();
    await page.getByRole('option', { name: 'Approved' }).click();
    await expect.poll(() => page.getByRole('link', { name: 'Shaft alley water ingress' }).count(), { timeout: 10_000 }).toBe(0);
    expect(await page.getByRole('link', { name: TITLE }).isVisible()).toBe(true);
    await screenshot(page, 'repair-projects-approved-filter-1440');
  });
});
