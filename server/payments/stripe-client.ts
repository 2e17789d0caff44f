import Stripe from 'stripe';
import { FAKE_STRIPE_SECRET_KEY, FAKE_STRIPE_WEBHOOK_SECRET } from '../fakes/stripe/keys.js';
import type { StripeConfig } from '../config.js';

export interface StripeClient {
  stripe: Stripe;
  /** The secret that signs the webhooks this client's account sends. */
  webhookSecret: string;
  /** True when talking to the local fake rather than to Stripe. */
  usesFake: boolean;
}

/**
 * The one place the Stripe SDK is built. With a real `STRIPE_SECRET_KEY` it talks to Stripe;
 * without one, to the local fake on `fakePort` (the port it actually listens on).
 */
export function createStripeClient(config: StripeConfig, fakePort: number = config.fakePort): StripeClient {
  if (config.secretKey) {
    if (!config.webhookSecret) throw new Error('STRIPE_WEBHOOK_SECRET must be set with STRIPE_SECRET_KEY.');
    return { stripe: new Stripe(config.secretKey, { maxNetworkRetries: 2 }), webhookSecret: config.webhookSecret, usesFake: false };
  }
  const stripe = new Stripe(FAKE_STRIPE_SECRET_KEY, {
    host: '127.0.0.1',
    port: fakePort,
    protocol: 'http',
    maxNetworkRetries: 2,
    telemetry: false,
  });
  return { stripe, webhookSecret: config.webhookSecret ?? FAKE_STRIPE_WEBHOOK_SECRET, usesFake: true };
}
