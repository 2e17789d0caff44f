import { afterEach, describe, expect, it } from 'vitest';
import { PUBLICATION_1771_STATEMENT } from '../../shared/schemas/giving-settings.js';
import { openBrowser, screenshot, signIn, type Browser } from './browser.js';

const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

// The demo appeal no other browser test uses.
const APPEAL = '/visit/appeals/steering-gear-room-deckhead';

async function payWith(page: Browser['page'], card: string) {
  await page.getByLabel('Card number').fill(card);
  await page.getByLabel('Expiry').fill('12 / 34');
  await page.getByLabel('CVC').fill('123');
  await page.getByLabel('Name on card').fill('Wren Ashgrove');
  await page.getByRole('button', { name: 'Pay' }).click();
}

const dollars = (text: string | null) => Number((text ?? '').replace(/[^0-9.]/g, ''));

describe('a gift, from the appeal to the acknowledgment', () => {
  it('gives 250.00 with 4242…, sees the thanks and the total rise; a decline first shows why', async () => {
    const visitor = await openBrowser({ width: 390, height: 844 });
    browsers.push(visitor);
    const { page } = visitor;
    await page.goto(APPEAL);
    await page.getByRole('heading', { name: 'Steering gear room deckhead' }).waitFor();
    const raisedBefore = dollars(await page.getByTestId('appeal-raised').textContent());
    await screenshot(page, 'giving-appeal-390');

    // validation before anything is sent
    await page.getByLabel('Another amount').fill('0.50');
    await page.getByRole('button', { name: /^Give/ }).click();
    await expect.poll(() => page.getByText('The smallest gift we can take is $1.00.').isVisible()).toBe(true);
    await expect.poll(() => page.getByText('Enter your name for the acknowledgment.').isVisible()).toBe(true);

    await page.getByLabel('Another amount').fill('250.00');
    await page.getByLabel('Your name').fill('Wren Ashgrove');
    await page.getByLabel('E-mail').fill('wren.ashgrove@example.test');
    await page.getByLabel('Show my first name among recent gifts').check();
    await page.getByRole('button', { name: 'Give $250.00' }).click();

    await page.waitForURL(/\/pay\/cs_test_/);
    await payWith(page, '4000 0000 0000 0002');
    await expect.poll(() => page.getByRole('alert').textContent()).toBe('Your card was declined.');
    await payWith(page, '4242 4242 4242 4242');

    await page.waitForURL(/\/visit\/appeals\/steering-gear-room-deckhead\/thanks\?session_id=cs_test_/);
    await expect.poll(() => page.getByText('has been received').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('status').filter({ hasText: 'Thank you' }).textContent()).toContain('$250.00');
    await screenshot(page, 'giving-thanks-390');

    await page.getByRole('link', { name: 'Back to the appeal' }).click();
    await page.getByTestId('appeal-raised').waitFor();
    await expect.poll(async () => dollars(await page.getByTestId('appeal-raised').textContent())).toBe(raisedBefore + 250);
    expect(await page.getByRole('region', { name: 'Recent gifts' }).textContent()).toContain('Wren');

    const admin = await openBrowser();
    browsers.push(admin);
    await signIn(admin.page, 'admin@shipkeeper.test');
    await admin.page.waitForURL('**/app');
    const outbox = async () => (await (await admin.page.request.get('/api/v1/outbox?to=wren.ashgrove%40example.test')).json()) as { items: { id: string }[] };
    await expect.poll(async () => (await outbox()).items.length, { timeout: 15_000 }).toBe(1);
    const list = await outbox();
    const message = await (await admin.page.request.get(`/api/v1/outbox/${list.items[0]!.id}`)).json();
    expect(message.subject).toMatch(/^Thank you for your gift/);
    expect(message.text).toContain('Amount of gift: $250.00');
    expect(message.text).toContain(PUBLICATION_1771_STATEMENT);
    await admin.page.goto('/app/outbox');
    await admin.page.getByText(message.subject).first().click();
    // the HTML shows in a sandboxed frame; the statement is read in it
    const frame = admin.page.frameLocator('iframe.outbox-message__frame');
    await expect.poll(() => frame.getByText(PUBLICATION_1771_STATEMENT).isVisible()).toBe(true);
    await screenshot(admin.page, 'giving-receipt-outbox-1440');
  });

  it('shows the fundraiser the gifts and totals, and refunds part of a gift after confirming with a reason', async () => {
    const fundraiser = await openBrowser();
    browsers.push(fundraiser);
    const { page } = fundraiser;
    await signIn(page, 'fundraiser@shipkeeper.test');
    await page.waitForURL('**/app');
    await page.getByRole('link', { name: 'Giving', exact: true }).click();
    await page.getByRole('heading', { name: 'Giving', level: 1 }).waitFor();
    // The first row may be the loading row: wait for the gifts themselves.
    await expect.poll(() => page.getByRole('table', { name: 'Gifts' }).textContent(), { timeout: 15_000 }).toContain('@example.test');
    await screenshot(page, 'giving-workspace-1440');

    // the gift of the test above is the newest, and was paid on the fake: refund part of it
    await page.getByLabel('Search').fill('Wren Ashgrove');
    const row = page.getByRole('row').filter({ hasText: 'wren.ashgrove@example.test' });
    await row.getByRole('button', { name: /^Refund gift/ }).click();
    const dialog = page.getByRole('dialog', { name: 'Refund a gift' });
    await dialog.getByLabel(/Amount to refund/).fill('100.00');
    await dialog.getByRole('button', { name: 'Refund' }).click();
    await expect.poll(() => dialog.getByText('Say why the gift is refunded; it goes into the audit trail.').isVisible()).toBe(true);
    await dialog.getByLabel('Reason').fill('The donor asked to give 150.00 instead.');
    await screenshot(page, 'giving-refund-1440');
    await dialog.getByRole('button', { name: 'Refund' }).click();
    await expect.poll(() => row.getByText('Partly refunded').isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await row.textContent()).toContain('−$100.00 refunded');
  });
});
