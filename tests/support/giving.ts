import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type Stripe from 'stripe';
import { RepairProjectEntity } from '../../server/db/entities/repair-project.entity.js';
import { AppealEntity } from '../../server/db/entities/appeal.entity.js';
import type { Store } from '../../server/db/store.js';
import { FakeStripeServer } from '../../server/fakes/stripe/server.js';
import { signatureHeader } from '../../server/fakes/stripe/webhooks.js';
import { FAKE_STRIPE_WEBHOOK_SECRET } from '../../server/fakes/stripe/keys.js';
import { createStripeClient, type StripeClient } from '../../server/payments/stripe-client.js';
import { buildVessel } from './factories.js';

/** The Stripe fake on a free port, and the SDK client pointed at it. */
export async function startStripeFake(options: ConstructorParameters<typeof FakeStripeServer>[0] = {}) {
  const fake = new FakeStripeServer({ retryBaseDelayMs: 20, maxDeliveryAttempts: 4, ...options });
  const port = await fake.start(0);
  const client: StripeClient = createStripeClient({ secretKey: null, webhookSecret: null, fakePort: port });
  return { fake, client, stripe: client.stripe as Stripe };
}

/** A vessel, a fundraising repair project and its published appeal. */
export async function buildAppeal(store: Store, fields: { slug?: string; title?: string; status?: string; goalCents?: number; published?: boolean } = {}) {
  const vessel = await buildVessel(store);
  const manager = store.dataSource.manager;
  const project = await manager.getRepository(RepairProjectEntity).save(manager.getRepository(RepairProjectEntity).create({
    vesselId: vessel.id,
    title: fields.title ?? 'Gauge board repair',
    slug: fields.slug ?? 'gauge-board',
    status: (fields.status ?? 'fundraising') as RepairProjectEntity['status'],
    scope: { type: 'doc', content: [{ type: 'paragraph' }] },
  }));
  const appeal = await manager.getRepository(AppealEntity).save(manager.getRepository(AppealEntity).create({
    vesselId: vessel.id,
    repairProjectId: project.id,
    storyDoc: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'The gauges were smashed.' }] }] },
    storyHtml: '<p>The gauges were smashed.</p>',
    storyText: 'The gauges were smashed.',
    goalCents: fields.goalCents ?? 1_000_000,
    photos: [],
    publishedAt: fields.published === false ? null : new Date(),
  }));
  return { vessel, project, appeal };
}

/** Posts an event to the app's webhook as Stripe would, signed with the fake's secret. */
export function signed(event: unknown, secret = FAKE_STRIPE_WEBHOOK_SECRET) {
  const payload = JSON.stringify(event);
  return { payload, signature: signatureHeader(payload, secret) };
}

/** Listens on a free port (so the fake can deliver to the app). */
export async function listen(handler: Parameters<typeof createServer>[1]): Promise<{ server: Server; url: string }> {
  const server = createServer(handler);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return { server, url: `http://127.0.0.1:${(server.address() as AddressInfo).port}` };
}

/** Pays a fake checkout session with a card, as its hosted page does. */
export async function payOnFake(fake: FakeStripeServer, checkoutUrl: string, card = '4242 4242 4242 4242') {
  const res = await fetch(checkoutUrl, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ card_number: card, expiry: '12 / 34', cvc: '123', name: 'Ada Giver' }).toString(),
    redirect: 'manual',
  });
  void fake;
  return res;
}
