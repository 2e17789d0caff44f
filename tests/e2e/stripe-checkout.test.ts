import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FakeStripeServer } from '../../server/fakes/stripe/server.js';
import { createStripeClient } from '../../server/payments/stripe-client.js';
import { openBrowser, screenshot, type Browser } from './browser.js';

let fake: FakeStripeServer;
let stripe: Stripe;
let thanks: Server;
let thanksUrl: string;
let browser: Browser;

beforeAll(async () => {
  fake = new FakeStripeServer();
  stripe = createStripeClient({ secretKey: null, webhookSecret: null, fakePort: await fake.start(0) }).stripe;
  thanks = createServer((_req, res) => res.writeHead(200, { 'content-type': 'text/html' }).end('<!doctype html><title>Thanks</title><h1>Thank you</h1>'));
  await new Promise<void>((resolve) => thanks.listen(0, '127.0.0.1', resolve));
  thanksUrl = `http://127.0.0.1:${(thanks.address() as AddressInfo).port}`;
  browser = await openBrowser({ width: 390, height: 844 });
});
afterAll(async () => {
  await browser?.close();
  await fake.stop();
  await new Promise<void>((resolve) => thanks.close(() => resolve()));
});

const session = () => stripe.checkout.sessions.create({
  mode: 'payment',
  line_items: [{ price_data: { currency: 'usd', unit_amount: 25_000, product_data: { name: 'Gauge board repair' } }, quantity: 1 }],
  success_url: `${thanksUrl}/thanks?session_id={CHECKOUT_SESSION_ID}`,
  cancel_url: `${thanksUrl}/appeal`,
});

async function fillCard(number: string) {
  const { page } = browser;
  await page.getByLabel('Card number').fill(number);
  await page.getByLabel('Expiry').fill('12 / 34');
  await page.getByLabel('CVC').fill('123');
  await page.getByLabel('Name on card').fill('Ada Giver');
  await page.getByRole('button', { name: 'Pay' }).click();
}

describe('the Stripe fake’s hosted checkout page in Chromium', () => {
  it('shows a decline, then pays with 4242… and lands on the success page', async () => {
    const { page } = browser;
    const s = await session();
    await page.goto(s.url!);
    await fillCard('4000 0000 0000 0002');
    await expect.poll(() => page.getByRole('alert').textContent()).toBe('Your card was declined.');
    await screenshot(page, 'stripe-fake-declined-390');
    await fillCard('4242 4242 4242 4242');
    await page.waitForURL(`${thanksUrl}/thanks?session_id=${s.id}`);
    expect((await stripe.checkout.sessions.retrieve(s.id)).payment_status).toBe('paid');
  });

  it('takes 4000 0025 0000 3155 through the extra step', async () => {
    const { page } = browser;
    const s = await session();
    await page.goto(s.url!);
    await fillCard('4000 0025 0000 3155');
    await page.getByRole('button', { name: 'Complete' }).click();
    await page.waitForURL(`${thanksUrl}/thanks?session_id=${s.id}`);
    expect((await stripe.checkout.sessions.retrieve(s.id)).status).toBe('complete');
  });

  it('goes back to cancel_url with Cancel', async () => {
    const { page } = browser;
    const s = await session();
    await page.goto(s.url!);
    await page.getByRole('link', { name: 'Cancel' }).click();
    await page.waitForURL(`${thanksUrl}/appeal`);
  });
});
