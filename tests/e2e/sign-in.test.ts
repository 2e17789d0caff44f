import { afterEach, describe, expect, it } from 'vitest';
import { can } from '../../shared/permissions.js';
import { ROLE_LABELS, ROLES } from '../../shared/roles.js';
import { STAFF_NAV } from '../../src/components/navigation.js';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

describe('signing in', () => {
  it.each(ROLES)('%s signs in, sees the navigation of the role, and signs out', async (role) => {
    browser = await openBrowser();
    const { page } = browser;
    await signIn(page, `${role}@shipkeeper.test`);
    await page.waitForURL('**/app');
    await expect.poll(() => page.getByTestId('current-role').textContent()).toBe(ROLE_LABELS[role]);
    const nav = page.getByRole('navigation', { name: 'Workspace' });
    await nav.getByRole('link').first().waitFor();
    const shown = (await nav.getByRole('link').allTextContents()).map((t) => t.trim());
    const expected = STAFF_NAV.filter((e) => !e.permission || can(role, e.permission.resource, e.permission.action as never)).map((e) => e.label);
    expect(shown).toEqual(expected);
    await screenshot(page, `overview-${role}-1440`);

    await page.getByRole('button', { name: /Account menu/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.waitForURL('**/sign-in?signedOut=1');
    await expect.poll(() => page.getByText('You are signed out.').isVisible()).toBe(true);
    await page.goto('/app');
    await page.waitForURL('**/sign-in?next=**');
  });

  it('a wrong password shows one generic message and stays on the sign-in page', async () => {
    browser = await openBrowser({ width: 375, height: 812 });
    const { page } = browser;
    await signIn(page, 'curator@shipkeeper.test', 'this is not the password');
    const alert = page.getByRole('alert');
    await expect.poll(() => alert.textContent()).toContain('The e-mail address or the password is not correct.');
    expect(page.url()).toMatch(/\/sign-in$/);
    await screenshot(page, 'sign-in-error-375');
  });

  it('a role that may not use a page gets the friendly "not for your role" page', async () => {
    browser = await openBrowser();
    const { page } = browser;
    await signIn(page, 'docent@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.goto('/app/people');
    await expect.poll(() => page.getByRole('heading', { name: 'Not for your role' }).isVisible()).toBe(true);
    await page.goto('/no/such/page');
    await expect.poll(() => page.getByRole('heading', { name: 'This page is not on the plan' }).isVisible()).toBe(true);
  });
});
