import { afterEach, describe, expect, it } from 'vitest';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

describe('inviting a person, end to end through the fake mail server', () => {
  it('the admin invites a docent, the docent follows the e-mailed link, chooses a password and is signed in', async () => {
    const admin = await openBrowser();
    browsers.push(admin);
    const page = admin.page;
    await signIn(page, 'admin@shipkeeper.test');
    await page.waitForURL('**/app');

    await page.getByRole('link', { name: 'People' }).click();
    await page.getByRole('tab', { name: 'Invitations' }).click();
    await page.getByRole('button', { name: 'Invite a person' }).click();
    const dialog = page.getByRole('dialog', { name: 'Invite a person' });
    await dialog.getByLabel('E-mail address').fill('marta.volunteer@example.test');
    await dialog.getByLabel('Name').fill('Marta Volunteer');
    await dialog.getByRole('combobox').click();
    await page.getByRole('option', { name: /Docent/ }).click();
    await screenshot(page, 'people-invite-dialog-1440');
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => page.getByText('Invitation sent').first().isVisible()).toBe(true);
    await expect.poll(() => page.getByRole('cell', { name: /marta\.volunteer@example\.test/ }).first().isVisible()).toBe(true);
    await screenshot(page, 'people-invitations-1440');

    await page.getByRole('link', { name: 'Outbox' }).click();
    await page.getByRole('cell', { name: /To marta\.volunteer@example\.test/ }).first().click();
    await page.getByRole('button', { name: 'Plain text' }).click();
    const text = (await page.locator('#outbox-plain-text').textContent()) ?? '';
    const link = /(http\S+\/invitation#[A-Za-z0-9_-]+)/.exec(text)?.[1];
    expect(link, text).toBeDefined();
    await screenshot(page, 'outbox-message-1440');

    const invited = await openBrowser({ width: 375, height: 812 });
    browsers.push(invited);
    const phone = invited.page;
    await phone.goto(link!);
    await expect.poll(() => phone.getByText('marta.volunteer@example.test').first().isVisible()).toBe(true);
    await phone.getByLabel('Your name').fill('Marta Volunteer');
    await phone.getByLabel('Password', { exact: true }).fill('riveted-funnel-evening-tide');
    await phone.getByLabel('Confirm password').fill('riveted-funnel-evening-tide');
    await screenshot(phone, 'accept-invitation-375');
    await phone.getByRole('button', { name: 'Create my account' }).click();
    await phone.waitForURL('**/app');
    await expect.poll(() => phone.getByTestId('current-role').textContent()).toBe('Docent');
    await screenshot(phone, 'overview-new-docent-375');

    // The link works once: a second visit explains, and offers no form.
    await phone.goto(link!);
    await expect.poll(() => phone.getByText(/already (been )?used/i).first().isVisible()).toBe(true);
    expect(await phone.getByRole('button', { name: 'Create my account' }).count()).toBe(0);
  });
});
