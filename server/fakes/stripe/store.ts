import { randomBytes } from 'node:crypto';

/** Stripe-style identifier: a prefix and random letters and digits, e.g. `cs_test_a1B2…`. */
export function newId(prefix: string): string {
  const alphabet = 'abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789';
  const bytes = randomBytes(24);
  let s = '';
  for (const b of bytes) s += alphabet[b % alphabet.length];
  return `${prefix}_${s}`;
}

export const nowSeconds = (): number => Math.floor(Date.now() / 1000);

export interface LineItem {
  id: string;
  object: 'item';
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  description: string;
  quantity: number;
  price: { object: 'price'; currency: string; unit_amount: number; product_data_name: string };
}

export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer_details: { email: string | null; name: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Record<string, string>;
  mode: 'payment';
  payment_intent: string | null;
  payment_method_types: string[];
  payment_status: 'unpaid' | 'paid';
  status: 'open' | 'complete' | 'expired';
  success_url: string;
  url: string | null;
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_received: number;
  currency: string;
  created: number;
  latest_charge: string | null;
  last_payment_error: { type: string; code: string; decline_code?: string; message: string } | null;
  livemode: false;
  metadata: Record<string, string>;
  status: 'requires_payment_method' | 'requires_action' | 'succeeded';
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  currency: string;
  created: number;
  livemode: false;
  metadata: Record<string, string>;
  paid: boolean;
  payment_intent: string;
  refunded: boolean;
  status: 'succeeded';
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Record<string, string>;
  payment_intent: string;
  reason: string | null;
  status: 'succeeded';
}

export interface StripeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: unknown; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export interface DeliveryAttempt {
  eventId: string;
  eventType: string;
  attempt: number;
  at: string;
  url: string;
  status: number | null;
  error: string | null;
  succeeded: boolean;
}

/** Fake-only state of a checkout page that is not part of the Stripe session object. */
export interface CheckoutPageState {
  lineItems: LineItem[];
  /** Set while the 3-D Secure style extra step is shown. */
  awaitingAuthentication: { name: string } | null;
}

/** Everything the fake knows, in memory; a fresh fake starts empty. */
export class FakeStripeStore {
  readonly sessions = new Map<string, CheckoutSession>();
  readonly pages = new Map<string, CheckoutPageState>();
  readonly paymentIntents = new Map<string, PaymentIntent>();
  readonly charges = new Map<string, Charge>();
  readonly refunds = new Map<string, Refund>();
  /** Newest last; lists answer newest first. */
  readonly events: StripeEvent[] = [];
  readonly deliveries: DeliveryAttempt[] = [];
  /** Path and Idempotency-Key → the answer first given and the body it answered. */
  readonly idempotent = new Map<string, { status: number; body: unknown; request: string }>();

  event(id: string): StripeEvent | undefined {
    return this.events.find((e) => e.id === id);
  }
}
