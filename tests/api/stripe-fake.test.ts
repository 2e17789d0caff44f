import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { FAKE_STRIPE_SECRET_KEY, FAKE_STRIPE_WEBHOOK_SECRET } from '../../server/fakes/stripe/keys.js';
import { FakeStripeServer } from '../../server/fakes/stripe/server.js';
import { createStripeClient } from '../../server/payments/stripe-client.js';

/** Our stand-in webhook endpoint: records every delivery and answers what `respond` says. */
class Receiver {
  readonly received: Array<{ body: string; signature: string }> = [];
  respond: (n: number) => number = () => 200;
  private server: Server | null = null;
  url = '';

  async start(): Promise<void> {
    this.server = createServer((req: IncomingMessage, res: ServerResponse) => {
      const chunks: Buffer[] = [];
      req.on('data', (c: Buffer) => chunks.push(c));
      req.on('end', () => {
        this.received.push({ body: Buffer.concat(chunks).toString('utf8'), signature: String(req.headers['stripe-signature'] ?? '') });
        res.writeHead(this.respond(this.received.length)).end();
      });
    });
    await new Promise<void>((resolve) => this.server!.listen(0, '127.0.0.1', resolve));
    this.url = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}/api/v1/webhooks/stripe`;
  }

  events(): Stripe.Event[] {
    return this.received.map((r) => JSON.parse(r.body) as Stripe.Event);
  }

  async stop(): Promise<void> {
    await new Promise<void>((resolve) => this.server!.close(() => resolve()));
  }
}

let fake: FakeStripeServer;
let stripe: Stripe;
const receiver = new Receiver();

beforeAll(async () => {
  await receiver.start();
  fake = new FakeStripeServer({ webhookUrl: receiver.url, retryBaseDelayMs: 30, maxDeliveryAttempts: 4 });
  const port = await fake.start(0);
  stripe = createStripeClient({ secretKey: null, webhookSecret: null, fakePort: port }).stripe;
});
afterAll(async () => {
  await fake.stop();
  await receiver.stop();
});
beforeEach(async () => {
  await fake.webhooks.idle();
  receiver.received.length = 0;
  receiver.respond = () => 200;
});

function newSession(extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [{ price_data: { currency: 'usd', unit_amount: 2500, product_data: { name: 'Deckhead repair' } }, quantity: 2 }],
    success_url: 'http://localhost:3000/visit/thanks?session_id={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://localhost:3000/visit/appeals/deckhead',
    metadata: { donationId: '42' },
    customer_email: 'giver@example.test',
    client_reference_id: 'donation-42',
    ...extra,
  });
}

const CARD = { expiry: '12 / 34', cvc: '123', name: 'Ada Giver' };

/** Submits the hosted checkout form as a browser would, without following the redirect. */
function pay(url: string, number: string, fields: Partial<typeof CARD> = {}) {
  const form = new URLSearchParams({ card_number: number, ...CARD, ...fields });
  return fetch(url, { method: 'POST', body: form, redirect: 'manual' });
}

async function paidSession(number = '4242 4242 4242 4242') {
  const session = await newSession();
  const res = await pay(session.url!, number);
  expect(res.status).toBe(303);
  return stripe.checkout.sessions.retrieve(session.id);
}

describe('Checkout Sessions through the real SDK', () => {
  it('creates, retrieves and expires a session in Stripe’s shape', async () => {
    const session = await newSession();
    expect(session).toMatchObject({
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: 5000,
      currency: 'usd',
      metadata: { donationId: '42' },
      customer_email: 'giver@example.test',
      client_reference_id: 'donation-42',
      payment_intent: null,
    });
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]{24}$/);
    expect(session.url).toBe(`${fake.baseUrl}/pay/${session.id}`);
    // 24 hours by default (Stripe's Checkout default)
    expect(session.expires_at - session.created).toBe(24 * 3600);

    const again = await stripe.checkout.sessions.retrieve(session.id, { expand: ['line_items'] });
    expect(again.line_items?.data[0]).toMatchObject({ description: 'Deckhead repair', quantity: 2, amount_total: 5000 });

    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ status: 'expired', url: null });
    const page = await fetch(session.url!);
    expect(page.status).toBe(410);
    expect(await page.text()).toContain('This checkout session has expired.');
    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({ type: 'StripeInvalidRequestError', statusCode: 400 });
    const events = await stripe.events.list({ type: 'checkout.session.expired', limit: 5 });
    expect(events.data[0]!.data.object).toMatchObject({ id: session.id, status: 'expired' });
  });

  it('expires a session whose expires_at has passed when it is next looked at', async () => {
    const session = await newSession({ expires_at: Math.floor(Date.now() / 1000) + 31 * 60 });
    fake.store.sessions.get(session.id)!.expires_at = Math.floor(Date.now() / 1000) - 1;
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');
  });

  it('answers the same object to a repeated Idempotency-Key', async () => {
    const params: Stripe.Checkout.SessionCreateParams = {
      mode: 'payment', success_url: 'http://localhost/ok',
      line_items: [{ price_data: { currency: 'usd', unit_amount: 100, product_data: { name: 'Gift' } }, quantity: 1 }],
    };
    const a = await stripe.checkout.sessions.create(params, { idempotencyKey: 'gift-7' });
    const b = await stripe.checkout.sessions.create(params, { idempotencyKey: 'gift-7' });
    expect(b.id).toBe(a.id);
    await expect(stripe.checkout.sessions.create({ ...params, success_url: 'http://localhost/other' }, { idempotencyKey: 'gift-7' }))
      .rejects.toMatchObject({ type: 'StripeIdempotencyError' });
  });
});

// The cards are Stripe's published test cards (https://docs.stripe.com/testing).
describe('the hosted checkout page', () => {
  it('has the labelled fields, the Pay button, a Cancel link and no external assets', async () => {
    const session = await newSession();
    const res = await fetch(session.url!);
    expect(res.headers.get('content-security-policy')).toContain("default-src 'none'");
    const html = await res.text();
    for (const [id, label] of [['card-number', 'Card number'], ['card-expiry', 'Expiry'], ['card-cvc', 'CVC'], ['card-name', 'Name on card']]) {
      expect(html).toContain(`<label for="${id}">${label}</label>`);
      expect(html).toContain(`id="${id}"`);
    }
    expect(html).toContain('<button type="submit">Pay</button>');
    expect(html).toContain('<a href="http://localhost:3000/visit/appeals/deckhead">Cancel</a>');
    expect(html).toContain('$50.00');
    expect(html).not.toMatch(/<(script|link|img)\b|src=/);
  });

  it('pays with 4242 4242 4242 4242 and redirects to success_url with the session id', async () => {
    const session = await newSession();
    const res = await pay(session.url!, '4242 4242 4242 4242');
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`http://localhost:3000/visit/thanks?session_id=${session.id}`);
    const done = await stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    expect(done).toMatchObject({ status: 'complete', payment_status: 'paid', url: null, customer_details: { name: 'Ada Giver', email: 'giver@example.test' } });
    const intent = done.payment_intent as Stripe.PaymentIntent;
    expect(intent.id).toMatch(/^pi_/);
    expect(intent).toMatchObject({ status: 'succeeded', amount: 5000, amount_received: 5000, metadata: { donationId: '42' } });
    const page = await fetch(`${fake.baseUrl}/pay/${session.id}`);
    expect(await page.text()).toContain('This payment is complete.');

    const completed = await stripe.events.list({ type: 'checkout.session.completed' });
    expect(completed.data[0]!.data.object).toMatchObject({ id: session.id, payment_status: 'paid', payment_intent: intent.id });
  });

  it('declines 4000 0000 0000 0002 with the reason on the page, then takes another card', async () => {
    const session = await newSession();
    const res = await pay(session.url!, '4000 0000 0000 0002');
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('role="alert"');
    expect(html).toContain('Your card was declined.');
    let now = await stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    expect(now).toMatchObject({ status: 'open', payment_status: 'unpaid' });
    expect((now.payment_intent as Stripe.PaymentIntent).last_payment_error).toMatchObject({ code: 'card_declined', decline_code: 'generic_decline' });

    expect((await pay(session.url!, '4242424242424242')).status).toBe(303);
    now = await stripe.checkout.sessions.retrieve(session.id);
    expect(now.payment_status).toBe('paid');
  });

  it('refuses 4000 0000 0000 9995 for insufficient funds', async () => {
    const session = await newSession();
    const html = await (await pay(session.url!, '4000000000009995')).text();
    expect(html).toContain('Your card has insufficient funds.');
    const intent = await stripe.paymentIntents.retrieve((await stripe.checkout.sessions.retrieve(session.id)).payment_intent as string);
    expect(intent.last_payment_error).toMatchObject({ code: 'card_declined', decline_code: 'insufficient_funds' });
    expect((await stripe.events.list({ type: 'payment_intent.payment_failed', limit: 1 })).data[0]!.data.object).toMatchObject({ id: intent.id });
  });

  it('asks 4000 0025 0000 3155 for an extra step: Fail shows the error, Complete pays', async () => {
    const session = await newSession();
    const step = await (await pay(session.url!, '4000 0025 0000 3155')).text();
    expect(step).toContain('value="complete">Complete</button>');
    expect(step).toContain('value="fail">Fail</button>');
    const authUrl = `${session.url}/authenticate`;
    const failed = await fetch(authUrl, { method: 'POST', body: new URLSearchParams({ action: 'fail' }), redirect: 'manual' });
    expect(await failed.text()).toContain('We are unable to authenticate your payment method.');
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');

    await pay(session.url!, '4000 0025 0000 3155');
    const ok = await fetch(authUrl, { method: 'POST', body: new URLSearchParams({ action: 'complete' }), redirect: 'manual' });
    expect(ok.status).toBe(303);
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('paid');
  });

  it('names the wrong field for a bad number, a past expiry or a bad CVC, and charges nothing', async () => {
    const session = await newSession();
    expect(await (await pay(session.url!, '4242 4242 4242 4241')).text()).toContain('Your card number is invalid.');
    expect(await (await pay(session.url!, '4242424242424242', { expiry: '01/20' })).text()).toContain('expiration date is in the past');
    expect(await (await pay(session.url!, '4242424242424242', { cvc: '1' })).text()).toContain('security code is invalid');
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe('unpaid');
  });

  it('escapes what it echoes', async () => {
    const session = await newSession({
      line_items: [{ price_data: { currency: 'usd', unit_amount: 500, product_data: { name: '<script>alert(1)</script>' } }, quantity: 1 }],
    });
    const html = await (await pay(session.url!, '4000000000000002', { name: '"><img src=x onerror=alert(1)>' })).text();
    expect(html).toContain('&lt;script&gt;alert(1)&lt;/script&gt;');
    expect(html).toContain('value="&quot;&gt;&lt;img src=x onerror=alert(1)&gt;"');
    expect(html).not.toContain('<script>');
    expect(html).not.toContain('<img');
  });
});

// Signature scheme: https://docs.stripe.com/webhooks#verify-manually; verified here by the SDK itself.
describe('webhook delivery', () => {
  it('signs each event so that stripe.webhooks.constructEvent verifies it, and refuses a tampered body', async () => {
    const session = await paidSession();
    await fake.webhooks.idle();
    const delivery = receiver.received.find((r) => r.body.includes('"checkout.session.completed"'))!;
    expect(delivery.signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    const event = stripe.webhooks.constructEvent(delivery.body, delivery.signature, FAKE_STRIPE_WEBHOOK_SECRET);
    expect(event.type).toBe('checkout.session.completed');
    expect((event.data.object as Stripe.Checkout.Session).id).toBe(session.id);
    expect(() => stripe.webhooks.constructEvent(delivery.body.replace('"paid"', '"unpaid"'), delivery.signature, FAKE_STRIPE_WEBHOOK_SECRET))
      .toThrow(Stripe.errors.StripeSignatureVerificationError);
    expect(() => stripe.webhooks.constructEvent(delivery.body, delivery.signature, 'whsec_other')).toThrow(Stripe.errors.StripeSignatureVerificationError);

    const ids = receiver.events().map((e) => e.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(receiver.events().map((e) => e.type)).toEqual(['charge.succeeded', 'payment_intent.succeeded', 'checkout.session.completed']);
  });

  it('retries with growing delays until the endpoint answers 2xx', async () => {
    receiver.respond = (n) => (n <= 2 ? 500 : 200);
    const session = await newSession();
    await stripe.checkout.sessions.expire(session.id);
    await fake.webhooks.idle();
    const event = receiver.events()[0]!;
    expect(receiver.events().map((e) => e.id)).toEqual([event.id, event.id, event.id]);
    const res = await fetch(`${fake.baseUrl}/_control/deliveries?event=${event.id}`, { headers: { authorization: `Bearer ${FAKE_STRIPE_SECRET_KEY}` } });
    const attempts = ((await res.json()) as { data: Array<{ attempt: number; status: number; at: string }> }).data;
    expect(attempts.map((a) => [a.attempt, a.status])).toEqual([[1, 500], [2, 500], [3, 200]]);
    const t = attempts.map((a) => Date.parse(a.at));
    expect(t[1]! - t[0]!).toBeGreaterThanOrEqual(30);
    expect(t[2]! - t[1]!).toBeGreaterThanOrEqual(60);
    expect((await stripe.events.retrieve(event.id)).pending_webhooks).toBe(0);
  });

  it('gives up after the configured number of attempts', async () => {
    receiver.respond = () => 503;
    const session = await newSession();
    await stripe.checkout.sessions.expire(session.id);
    await fake.webhooks.idle();
    expect(receiver.received).toHaveLength(4);
    expect((await stripe.events.retrieve(receiver.events()[0]!.id)).pending_webhooks).toBe(1);
  });

  it('redelivers an event on POST /_control/events/:id/redeliver', async () => {
    const session = await newSession();
    await stripe.checkout.sessions.expire(session.id);
    await fake.webhooks.idle();
    const [first] = receiver.events();
    const unauthorised = await fetch(`${fake.baseUrl}/_control/events/${first!.id}/redeliver`, { method: 'POST' });
    expect(unauthorised.status).toBe(401);
    const res = await fetch(`${fake.baseUrl}/_control/events/${first!.id}/redeliver`, {
      method: 'POST', headers: { authorization: `Bearer ${FAKE_STRIPE_SECRET_KEY}` },
    });
    expect(res.status).toBe(200);
    await fake.webhooks.idle();
    expect(receiver.events().map((e) => e.id)).toEqual([first!.id, first!.id]);
    const missing = await fetch(`${fake.baseUrl}/_control/events/evt_nope/redeliver`, { method: 'POST', headers: { authorization: `Bearer ${FAKE_STRIPE_SECRET_KEY}` } });
    expect(missing.status).toBe(404);
  });
});

describe('events', () => {
  it('lists newest first with limit, cursors and type, and retrieves one', async () => {
    await paidSession();
    const page1 = await stripe.events.list({ limit: 2 });
    expect(page1).toMatchObject({ object: 'list', has_more: true, url: '/v1/events' });
    expect(page1.data.map((e) => e.type)).toEqual(['checkout.session.completed', 'payment_intent.succeeded']);
    const page2 = await stripe.events.list({ limit: 1, starting_after: page1.data[1]!.id });
    expect(page2.data[0]!.type).toBe('charge.succeeded');
    const one = await stripe.events.retrieve(page1.data[0]!.id);
    expect(one).toMatchObject({ object: 'event', livemode: false, type: 'checkout.session.completed' });
    expect(one.id).toMatch(/^evt_/);
    const all: string[] = [];
    for await (const e of stripe.events.list({ limit: 3 })) all.push(e.id);
    expect(new Set(all).size).toBe(fake.store.events.length);
  });
});

describe('refunds', () => {
  it('refunds part, then the rest, then refuses a third', async () => {
    const session = await paidSession();
    const intent = session.payment_intent as string;
    const part = await stripe.refunds.create({ payment_intent: intent, amount: 1200, reason: 'requested_by_customer' });
    expect(part).toMatchObject({ object: 'refund', amount: 1200, payment_intent: intent, status: 'succeeded', currency: 'usd' });
    expect(part.id).toMatch(/^re_/);
    await expect(stripe.refunds.create({ payment_intent: intent, amount: 3801 })).rejects.toMatchObject({
      type: 'StripeInvalidRequestError', param: 'amount', code: 'amount_too_large',
    });
    const rest = await stripe.refunds.create({ payment_intent: intent });
    expect(rest.amount).toBe(3800);
    const charged = await stripe.events.list({ type: 'charge.refunded', limit: 2 });
    expect(charged.data.map((e) => (e.data.object as Stripe.Charge).amount_refunded)).toEqual([5000, 1200]);
    expect(charged.data.map((e) => (e.data.object as Stripe.Charge).refunded)).toEqual([true, false]);
    expect((await stripe.events.list({ type: 'refund.created', limit: 2 })).data.map((e) => (e.data.object as Stripe.Refund).id)).toEqual([rest.id, part.id]);
    await expect(stripe.refunds.create({ payment_intent: intent })).rejects.toMatchObject({ code: 'charge_already_refunded' });
    expect((await stripe.refunds.retrieve(part.id)).amount).toBe(1200);
  });

  it('refuses to refund an unpaid or unknown payment intent', async () => {
    await expect(stripe.refunds.create({ payment_intent: 'pi_missing' })).rejects.toMatchObject({ statusCode: 404, code: 'resource_missing', param: 'payment_intent' });
    await expect(stripe.refunds.create({})).rejects.toMatchObject({ type: 'StripeInvalidRequestError', param: 'payment_intent' });
  });
});

describe('errors in Stripe’s shape', () => {
  it('answers a wrong key with 401, which the SDK raises as StripeAuthenticationError', async () => {
    const wrong = new Stripe('sk_test_wrong_key_12345', { host: '127.0.0.1', port: fake.port!, protocol: 'http', maxNetworkRetries: 0 });
    const err = await wrong.checkout.sessions.retrieve('cs_test_x').catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(err).toMatchObject({ statusCode: 401, message: 'Invalid API Key provided: sk_test_***********2345' });
    const none = await fetch(`${fake.baseUrl}/v1/events`);
    expect(none.status).toBe(401);
    expect(((await none.json()) as { error: { type: string } }).error.type).toBe('invalid_request_error');
  });

  it('answers a malformed URL with 400 and keeps serving', async () => {
    expect((await fetch(`${fake.baseUrl}/pay/%E0%A4%A`)).status).toBe(400);
    const res = await fetch(`${fake.baseUrl}/v1/events/%E0%A4%A`, { headers: { authorization: `Bearer ${FAKE_STRIPE_SECRET_KEY}` } });
    expect(res.status).toBe(400);
    expect((await stripe.events.list({ limit: 1 })).object).toBe('list');
  });

  it('raises StripeInvalidRequestError naming the param', async () => {
    const cases: Array<[Partial<Stripe.Checkout.SessionCreateParams>, string, string]> = [
      [{ line_items: [{ price_data: { currency: 'usd', product_data: { name: 'x' } }, quantity: 1 }] }, 'line_items[0][price_data][unit_amount]', 'parameter_missing'],
      [{ line_items: [{ price_data: { currency: 'usd', unit_amount: 100, product_data: { name: 'x' } }, quantity: 0 }] }, 'line_items[0][quantity]', 'parameter_invalid_integer'],
      // Stripe's minimum charge, 0.50 USD: https://docs.stripe.com/currencies#minimum-and-maximum-charge-amounts
      [{ line_items: [{ price_data: { currency: 'usd', unit_amount: 10, product_data: { name: 'x' } }, quantity: 1 }] }, 'line_items', 'amount_too_small'],
      [{ success_url: 'javascript:alert(1)' }, 'success_url', 'url_invalid'],
      // expires_at from 30 minutes to 24 hours ahead: Stripe API reference, Checkout Session create
      [{ expires_at: Math.floor(Date.now() / 1000) + 60 }, 'expires_at', 'parameter_invalid_integer'],
      [{ customer_email: 'not-an-address' }, 'customer_email', 'email_invalid'],
      [{ mode: 'subscription' }, 'mode', 'parameter_invalid_string'],
    ];
    for (const [extra, param, code] of cases) {
      const err = await newSession(extra).catch((e: unknown) => e);
      expect(err, param).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(err, param).toMatchObject({ statusCode: 400, param, code });
    }
    const unknown = await stripe.checkout.sessions.create({ mode: 'payment', success_url: 'http://x.test/', line_items: [], colour: 'red' } as never).catch((e: unknown) => e);
    expect(unknown).toMatchObject({ type: 'StripeInvalidRequestError', code: 'parameter_unknown', param: 'colour' });
    const missing = await stripe.checkout.sessions.retrieve('cs_test_nope').catch((e: unknown) => e);
    expect(missing).toMatchObject({ type: 'StripeInvalidRequestError', statusCode: 404, code: 'resource_missing', message: "No such checkout.session: 'cs_test_nope'" });
  });
});

describe('starting the fake and building the client', () => {
  it('takes any free port when the asked one is taken', async () => {
    const other = new FakeStripeServer();
    const port = await other.start(fake.port!);
    try {
      expect(port).not.toBe(fake.port);
      const client = createStripeClient({ secretKey: null, webhookSecret: null, fakePort: port });
      expect(client).toMatchObject({ usesFake: true, webhookSecret: FAKE_STRIPE_WEBHOOK_SECRET });
      expect((await client.stripe.events.list()).data).toEqual([]);
    } finally {
      await other.stop();
    }
  });

  it('talks to Stripe with a real key, and wants its webhook secret', () => {
    expect(() => createStripeClient({ secretKey: 'sk_test_real', webhookSecret: null, fakePort: 12111 })).toThrow(/STRIPE_WEBHOOK_SECRET/);
    const real = createStripeClient({ secretKey: 'sk_test_real', webhookSecret: 'whsec_real', fakePort: 12111 });
    expect(real).toMatchObject({ usesFake: false, webhookSecret: 'whsec_real' });
  });
});
