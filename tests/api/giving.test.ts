import type { Server } from 'node:http';
import type Stripe from 'stripe';
import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { AppealEntity } from '../../server/db/entities/appeal.entity.js';
import { DonationEntity } from '../../server/db/entities/donation.entity.js';
import { StripeEventEntity } from '../../server/db/entities/stripe-event.entity.js';
import { DonationRepository } from '../../server/db/repositories/donation.repository.js';
import type { FakeStripeServer } from '../../server/fakes/stripe/server.js';
import { PUBLICATION_1771_STATEMENT } from '../../shared/schemas/giving-settings.js';
import { buildAppeal, payOnFake, signed, startStripeFake } from '../support/giving.js';
import { Client, signedInAs } from '../support/http.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let fake: FakeStripeServer;
let stripe: Stripe;
let visitor: Client;
let seeded: Awaited<ReturnType<typeof buildAppeal>>;

beforeAll(async () => {
  const started = await startStripeFake();
  fake = started.fake;
  stripe = started.stripe;
  ctx = await createTestApp({}, { stripe: started.client });
  seeded = await buildAppeal(ctx.store);
  visitor = new Client(ctx.app);
  await visitor.fetchCsrf();
});
afterAll(async () => {
  await ctx.close();
  await fake.stop();
});
beforeEach(() => ctx.fakeMail.clear());

const appealRow = () => ctx.dataSource.getRepository(AppealEntity).findOneByOrFail({ id: seeded.appeal.id });
const donationBySession = (id: string) => ctx.dataSource.getRepository(DonationEntity).findOneByOrFail({ checkoutSessionId: id });
const gift = (amountCents: unknown, extra: object = {}) =>
  visitor.post('/api/v1/visit/appeals/gauge-board/checkout', { amountCents, name: 'Mara Quillfeather', email: 'mara@example.test', anonymous: false, ...extra });
const postEvent = (event: unknown, secret?: string) => {
  const { payload, signature } = signed(event, secret);
  return request(ctx.app).post('/api/v1/webhooks/stripe').set('content-type', 'application/json').set('stripe-signature', signature).send(payload);
};
const eventsOf = (sessionId: string, intentId: string | null) =>
  fake.store.events.filter((e) => {
    const o = e.data.object as { id?: string; payment_intent?: string };
    return o.id === sessionId || (intentId && (o.id === intentId || o.payment_intent === intentId));
  });

/** A gift made and paid on the fake; its events are kept, not delivered (no webhook URL is set). */
async function paidGift(amountCents: number) {
  const res = await gift(amountCents);
  expect(res.status).toBe(201);
  const sessionId = new URL(res.body.url).pathname.split('/').pop()!;
  const paid = await payOnFake(fake, res.body.url);
  expect(paid.status).toBe(303);
  const session = await stripe.checkout.sessions.retrieve(sessionId);
  return { sessionId, intentId: session.payment_intent as string };
}

describe('the public appeal', () => {
  it('answers only what is published: totals, and recent gifts by first name with consent', async () => {
    const res = await request(ctx.app).get('/api/v1/visit/appeals/gauge-board').expect(200);
    expect(res.body).toMatchObject({ slug: 'gauge-board', title: 'Gauge board repair', goalCents: 1_000_000, storyHtml: '<p>The gauges were smashed.</p>', giving: { minimumCents: 100, maximumCents: 2_500_000 } });
    expect(Object.keys(res.body).sort()).toEqual(['coverPhoto', 'currency', 'giftCount', 'giving', 'goalCents', 'photos', 'raisedCents', 'recentGifts', 'slug', 'storyHtml', 'summary', 'title', 'vesselName']);
    expect((await request(ctx.app).get('/api/v1/visit/appeals')).body.items.map((a: { slug: string }) => a.slug)).toContain('gauge-board');
  });

  it('hides an unpublished appeal and one whose project is not fundraising', async () => {
    await buildAppeal(ctx.store, { slug: 'draft-one', published: false });
    await buildAppeal(ctx.store, { slug: 'done-one', status: 'complete' });
    await request(ctx.app).get('/api/v1/visit/appeals/draft-one').expect(404);
    await request(ctx.app).get('/api/v1/visit/appeals/done-one').expect(404);
    const draft = await visitor.post('/api/v1/visit/appeals/draft-one/checkout', { amountCents: 5000, name: 'Ada', email: 'ada@example.test' });
    expect(draft.status).toBe(404);
  });
});

describe('checkout', () => {
  it('refuses amounts out of bounds, not whole or not numbers with 422 before any session is made', async () => {
    const before = fake.store.sessions.size;
    const rows = await ctx.dataSource.getRepository(DonationEntity).count();
    for (const [amount, message] of [
      [99, 'The smallest gift we can take is $1.00.'],
      [2_500_001, 'The largest gift we can take online is $25,000.00. Please write to us for a larger gift.'],
      [1000.5, 'Give the amount in whole cents.'],
      ['5000', 'Give the amount as a number of cents.'],
      [null, 'Give the amount as a number of cents.'],
    ] as const) {
      const res = await gift(amount);
      expect(res.status, String(amount)).toBe(422);
      expect(res.body.error.message).toBe(message);
    }
    expect(fake.store.sessions.size).toBe(before);
    expect(await ctx.dataSource.getRepository(DonationEntity).count()).toBe(rows);
  });

  it('takes the bounds themselves, and records a pending gift with the session', async () => {
    for (const amount of [100, 2_500_000]) {
      const res = await gift(amount);
      expect(res.status).toBe(201);
      expect(res.body.url).toMatch(new RegExp(`^${fake.baseUrl}/pay/cs_test_`));
      const id = new URL(res.body.url).pathname.split('/').pop()!;
      expect(await donationBySession(id)).toMatchObject({ status: 'pending', amountCents: amount, currency: 'USD', showFirstName: true });
      expect(fake.store.sessions.get(id)!.amount_total).toBe(amount);
    }
  });

  it('needs the CSRF token like every public change', async () => {
    const res = await request(ctx.app).post('/api/v1/visit/appeals/gauge-board/checkout').send({ amountCents: 5000, name: 'A', email: 'a@example.test' });
    expect(res.status).toBe(403);
  });

  it('answers 503 and records nothing when Stripe cannot be reached', async () => {
    const down = await startStripeFake();
    await down.fake.stop();
    const other = await createTestApp({}, { stripe: down.client });
    try {
      await buildAppeal(other.store);
      const client = new Client(other.app);
      const res = await client.post('/api/v1/visit/appeals/gauge-board/checkout', { amountCents: 5000, name: 'Ada', email: 'ada@example.test' });
      expect(res.status).toBe(503);
      expect(res.body.error.message).toMatch(/^Giving is unavailable for now/);
      expect(await other.dataSource.getRepository(DonationEntity).count()).toBe(0);
    } finally {
      await other.close();
    }
  });
});

describe('the Stripe webhook', () => {
  it('refuses a tampered or missing signature with 400 and records nothing', async () => {
    const { sessionId } = await paidGift(5000);
    const completed = eventsOf(sessionId, null).find((e) => e.type === 'checkout.session.completed')!;
    const { payload, signature } = signed(completed);
    const tampered = payload.replace('"amount_total": 5000', '"amount_total": 1').replace('"amount_total":5000', '"amount_total":1');
    expect(tampered).not.toBe(payload);
    const bad = await request(ctx.app).post('/api/v1/webhooks/stripe').set('content-type', 'application/json').set('stripe-signature', signature).send(tampered);
    expect(bad.status).toBe(400);
    expect((await postEvent(completed, 'whsec_someone_else')).status).toBe(400);
    const none = await request(ctx.app).post('/api/v1/webhooks/stripe').set('content-type', 'application/json').send(payload);
    expect(none.status).toBe(400);
    expect(await ctx.dataSource.getRepository(StripeEventEntity).countBy({ id: completed.id })).toBe(0);
    expect((await donationBySession(sessionId)).status).toBe('pending');
  });

  it('makes one gift of an event delivered three times, and sends one receipt', async () => {
    const before = await appealRow();
    const { sessionId } = await paidGift(12_345);
    const completed = eventsOf(sessionId, null).find((e) => e.type === 'checkout.session.completed')!;
    const answers = [];
    for (let i = 0; i < 3; i++) answers.push((await postEvent(completed)).body);
    expect(answers.map((a) => a.duplicate)).toEqual([false, true, true]);
    const after = await appealRow();
    expect(after.raisedCents - before.raisedCents).toBe(12_345);
    expect(after.giftCount - before.giftCount).toBe(1);
    expect((await donationBySession(sessionId)).status).toBe('succeeded');
    const receipts = ctx.fakeMail.list().filter((m) => m.to.includes('mara@example.test'));
    expect(receipts).toHaveLength(1);
    // below the 250.00 threshold: no Publication 1771 statement
    expect(receipts[0]!.text).not.toContain(PUBLICATION_1771_STATEMENT);
    expect(receipts[0]!.text).toContain('Amount of gift: $123.45');
  });

  it('ends right when the refund arrives before the payment', async () => {
    const before = await appealRow();
    const { sessionId, intentId } = await paidGift(40_000);
    await stripe.refunds.create({ payment_intent: intentId, amount: 15_000 });
    const events = eventsOf(sessionId, intentId);
    const order = ['charge.refunded', 'refund.created', 'payment_intent.succeeded', 'charge.succeeded', 'checkout.session.completed'];
    for (const type of order) expect((await postEvent(events.find((e) => e.type === type)!)).status).toBe(200);
    const after = await appealRow();
    expect(after.raisedCents - before.raisedCents).toBe(40_000);
    expect(after.refundedCents - before.refundedCents).toBe(15_000);
    expect(after.giftCount - before.giftCount).toBe(1);
    expect(await donationBySession(sessionId)).toMatchObject({ status: 'partially_refunded', refundedCents: 15_000 });
  });

  it('completes an event once when the first attempt failed before answering', async () => {
    const before = await appealRow();
    const { sessionId } = await paidGift(7_500);
    const completed = eventsOf(sessionId, null).find((e) => e.type === 'checkout.session.completed')!;
    const crash = vi.spyOn(DonationRepository.prototype, 'recordEvent').mockRejectedValueOnce(new Error('the server stopped'));
    expect((await postEvent(completed)).status).toBe(500);
    crash.mockRestore();
    // the failed attempt left nothing: its effect and its id went together
    expect((await appealRow()).raisedCents).toBe(before.raisedCents);
    expect((await postEvent(completed)).body).toEqual({ received: true, duplicate: false });
    expect((await postEvent(completed)).body).toEqual({ received: true, duplicate: true });
    expect((await appealRow()).raisedCents - before.raisedCents).toBe(7_500);
  });

  it('takes the fake’s own signed deliveries, with the Publication 1771 statement at 250.00', async () => {
    const server: Server = ctx.app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    fake.setWebhookUrl(`http://127.0.0.1:${(server.address() as { port: number }).port}/api/v1/webhooks/stripe`);
    try {
      const { sessionId } = await paidGift(25_000);
      await fake.webhooks.idle();
      expect((await donationBySession(sessionId)).status).toBe('succeeded');
      expect(fake.store.deliveries.filter((d) => d.eventId.startsWith('evt_') && !d.succeeded)).toEqual([]);
      const receipt = ctx.fakeMail.list().find((m) => m.subject.startsWith('Thank you for your gift'))!;
      expect(receipt.text).toContain(PUBLICATION_1771_STATEMENT);
      expect(receipt.text).toContain('Amount of gift: $250.00');
    } finally {
      fake.setWebhookUrl(null);
      await new Promise((r) => server.close(r));
    }
  });
});

describe('the fundraiser’s workspace', () => {
  it('refunds with a reason (fundraiser only), lowers the totals and sends a corrected acknowledgment', async () => {
    const { sessionId } = await paidGift(30_000);
    await request(ctx.app).get(`/api/v1/visit/gifts/${sessionId}`).expect(200); // confirms with Stripe
    const donation = await donationBySession(sessionId);
    expect(donation.status).toBe('succeeded');
    const before = await appealRow();
    const fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
    const curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    expect((await curator.post(`/api/v1/donations/${donation.id}/refund`, { reason: 'Asked by donor', version: donation.version })).status).toBe(403);
    expect((await docent.get(`/api/v1/donations?vesselId=${seeded.vessel.id}`)).status).toBe(403);
    const tooMuch = await fundraiser.post(`/api/v1/donations/${donation.id}/refund`, { amountCents: 30_001, reason: 'x', version: donation.version });
    expect(tooMuch.status).toBe(422);
    expect(tooMuch.body.error.message).toBe('At most $300.00 of this gift can still be refunded.');
    ctx.fakeMail.clear();
    const res = await fundraiser.post(`/api/v1/donations/${donation.id}/refund`, { amountCents: 10_000, reason: 'Gave twice by mistake', version: donation.version });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'partially_refunded', refundedCents: 10_000 });
    const after = await appealRow();
    expect(after.refundedCents - before.refundedCents).toBe(10_000);
    expect((await request(ctx.app).get('/api/v1/visit/appeals/gauge-board')).body.raisedCents).toBe(after.raisedCents - after.refundedCents);
    const corrected = ctx.fakeMail.list().find((m) => m.subject.startsWith('Corrected acknowledgment'))!;
    expect(corrected.text).toContain('Refunded: $100.00');
    expect(corrected.text).toContain('Amount of the contribution now: $200.00');
    expect(corrected.text).toContain(PUBLICATION_1771_STATEMENT);
    // the late webhook of that refund changes nothing
    const intent = (await donationBySession(sessionId)).paymentIntentId!;
    for (const e of eventsOf(sessionId, intent)) await postEvent(e);
    expect((await appealRow()).refundedCents).toBe(after.refundedCents);

    const fundraiserList = (await fundraiser.get(`/api/v1/donations?vesselId=${seeded.vessel.id}&status=partially_refunded`)).body;
    expect(fundraiserList.items.find((d: { id: number }) => d.id === donation.id).donorEmail).toBe('mara@example.test');
    const curatorList = (await curator.get(`/api/v1/donations?vesselId=${seeded.vessel.id}`)).body;
    expect(curatorList.items.every((d: { donorEmail: string | null }) => d.donorEmail === null)).toBe(true);
  });

  it('keeps totals equal to the gifts summed, and exports CSV into the audit trail', async () => {
    const fundraiser = (await signedInAs(ctx.app, ctx.store, 'fundraiser')).client;
    const totals = (await fundraiser.get(`/api/v1/vessels/${seeded.vessel.id}/giving/totals`)).body;
    const summed = await ctx.store.repos.donations.sumByAppeal(seeded.vessel.id);
    const kept = totals.byProject.find((p: { appealId: number }) => p.appealId === seeded.appeal.id);
    const sum = summed.find((s) => s.appealId === seeded.appeal.id)!;
    expect([kept.raisedCents, kept.refundedCents, kept.giftCount]).toEqual([Number(sum.raisedCents), Number(sum.refundedCents), Number(sum.giftCount)]);
    expect(totals.byMonth.reduce((s: number, m: { raisedCents: number }) => s + m.raisedCents, 0)).toBe(kept.raisedCents);
    const csv = await fundraiser.get(`/api/v1/donations/export?vesselId=${seeded.vessel.id}`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toContain('text/csv');
    expect(csv.text.split('\r\n')[0]).toBe('Gift,Date,Project,Amount,Refunded,Currency,Status,Donor,E-mail,Anonymous,Dedication');
    expect(csv.text).toContain('mara@example.test');
    const audit = await ctx.store.repos.auditEvents.page({ page: 1, pageSize: 5, sort: '-at', action: 'export' } as never);
    expect(audit.items.some((e) => e.entityType === 'donation')).toBe(true);
  });
});
