import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

// The forward saloon is open to visitors in the demo data, has no draft report, and no other browser test relies on it.
const SPACE = /1-20-0-L · Forward saloon/;
const PUBLIC_LINE = 'Closed while the panelling is cleaned.';
const INTERNAL = 'Graffiti in black marker on the panelling beside the saloon piano; a visitor pointed it out on the 11:00 tour.';

describe('an incident, from a docent to a conservator', () => {
  it('a docent logs vandalism and closes a space; a conservator completes the draft report it opened', async () => {
    const docent = await openBrowser();
    browsers.push(docent);
    let page = docent.page;
    await signIn(page, 'docent@shipkeeper.test');
    await page.waitForURL('**/app');

    await page.getByRole('link', { name: 'Incidents', exact: true }).click();
    await page.getByRole('button', { name: 'Log an incident' }).click();
    const dialog = page.getByRole('dialog', { name: 'Log an incident' });
    await dialog.getByRole('combobox', { name: 'Kind' }).click();
    await page.getByRole('option', { name: 'Vandalism' }).click();
    await dialog.getByLabel('Title').fill('Graffiti on the saloon panelling');
    await dialog.getByLabel('Description').fill(INTERNAL);
    // The multi-select's combobox is its hidden input; the visible box around it opens the list.
    await dialog.locator('.p-multiselect').filter({ has: page.getByRole('combobox', { name: 'Compartments' }) }).click();
    await page.getByRole('option', { name: SPACE }).click();
    await dialog.getByLabel('Title').click();
    await dialog.getByRole('checkbox', { name: SPACE }).check();
    await dialog.getByLabel('Why it is closed, for visitors').fill(PUBLIC_LINE);
    await expect.poll(() => dialog.getByText('E-mails the curators and the conservators.').isVisible()).toBe(true);
    await screenshot(page, 'incident-docent-log-1440');
    await dialog.getByRole('button', { name: 'Log the incident' }).click();

    await page.waitForURL(/\/app\/incidents\/\d+$/);
    const incidentUrl = new URL(page.url()).pathname;
    await expect.poll(() => page.getByRole('heading', { name: 'Graffiti on the saloon panelling' }).isVisible(), { timeout: 10_000 }).toBe(true);
    const reportLink = page.getByRole('region', { name: 'Condition reports it opened' }).getByRole('link', { name: /Forward saloon/ });
    await reportLink.waitFor();
    await screenshot(page, 'incident-docent-page-1440');

    // The docent's overview names the space among today's closures, with the public line.
    await page.goto('/app');
    const closures = page.getByRole('region', { name: 'Closed to visitors today' });
    await expect.poll(() => closures.getByRole('link', { name: /Forward saloon/ }).isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await closures.textContent()).toContain(PUBLIC_LINE);

    // The public site says the space is closed, and why in one line, without the internal description.
    await page.goto('/visit');
    const notice = page.getByRole('note').filter({ hasText: 'Closed today' });
    await expect.poll(() => notice.isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await notice.textContent()).toContain('Forward saloon');
    expect(await notice.textContent()).toContain(PUBLIC_LINE);
    expect(await page.locator('body').textContent()).not.toContain('saloon piano');
    await screenshot(page, 'incident-visit-closure-1440');

    // A conservator completes the draft the incident opened.
    const conservator = await openBrowser();
    browsers.push(conservator);
    page = conservator.page;
    await signIn(page, 'conservator@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.goto(incidentUrl);
    await page.getByRole('region', { name: 'Condition reports it opened' }).getByRole('link', { name: /Forward saloon/ }).click();
    await page.waitForURL(/\/app\/condition\/\d+$/);
    const reportId = Number(page.url().split('/').pop());

    const findings = page.getByRole('table', { name: 'Findings' });
    await expect.poll(() => findings.getByText('Graffiti', { exact: true }).isVisible(), { timeout: 10_000 }).toBe(true);
    await findings.getByRole('button', { name: /^Change the finding/ }).first().click();
    const finding = page.getByRole('dialog', { name: 'Change the finding' });
    await finding.getByLabel('Recommended action').fill('Lift the marker with a solvent gel tested on a hidden spot first');
    await screenshot(page, 'incident-conservator-finding-1440');
    await finding.getByRole('button', { name: 'Save the finding' }).click();
    await expect
      .poll(async () => (await (await page.request.get(`/api/v1/condition-reports/${reportId}`)).json()).findings?.[0]?.recommendedAction, { timeout: 10_000 })
      .toBe('Lift the marker with a solvent gel tested on a hidden spot first');
    const report = await (await page.request.get(`/api/v1/condition-reports/${reportId}`)).json();
    expect(report.findings).toHaveLength(1);
    expect(report.findings[0].damageType).toBe('graffiti');

    await page.getByRole('button', { name: 'Submit and sign' }).click();
    await page.getByRole('alertdialog').getByRole('button', { name: 'Submit and sign' }).click();
    await expect.poll(async () => (await (await page.request.get(`/api/v1/condition-reports/${reportId}`)).json()).status, { timeout: 10_000 }).toBe('submitted');
    await screenshot(page, 'incident-conservator-submitted-1440');

    // Once a curator (who keeps the compartments) opens the space again, it leaves today's closures.
    const curator = await openBrowser();
    browsers.push(curator);
    page = curator.page;
    await signIn(page, 'curator@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.goto(incidentUrl);
    await page.getByRole('region', { name: 'Affected' }).getByRole('link', { name: /Forward saloon/ }).click();
    await page.waitForURL(/\/app\/compartments\/\d+$/);
    await page.getByRole('button', { name: 'Edit', exact: true }).click();
    const edit = page.getByRole('dialog', { name: /^Edit 1-20-0-L/ });
    await edit.getByRole('combobox', { name: 'Access' }).click();
    await page.getByRole('option', { name: 'Open', exact: true }).click();
    await edit.getByRole('button', { name: 'Save compartment' }).click();
    await edit.waitFor({ state: 'hidden' });
    await page.goto('/app');
    const after = page.getByRole('region', { name: 'Closed to visitors today' });
    await expect.poll(() => after.getByText('Loading today’s closures…').or(after.getByText("Loading today's closures…")).isVisible()).toBe(false);
    expect(await after.textContent()).not.toContain('Forward saloon');
  });
});
