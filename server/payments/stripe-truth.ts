import type Stripe from 'stripe';
import { receivedStatus } from '../../shared/calc/giving-ledger.js';
import type { DonationStatus } from '../../shared/schemas/donations.js';

/** A gift's state as Stripe holds it now: what the ledger follows, whatever event brought us here. */
export interface StripeTruth {
  status: DonationStatus;
  amountCents: number;
  currency: string;
  paymentIntentId: string | null;
  refundedCents: number;
  failureMessage: string;
}

/**
 * Reads the session, its payment intent and charge through the SDK. An event's body only says
 * that something happened; the answer here says what is true, so a duplicate, late or reordered
 * event leads to the same state.
 */
export async function readStripeTruth(stripe: Stripe, checkoutSessionId: string): Promise<StripeTruth> {
  const session = await stripe.checkout.sessions.retrieve(checkoutSessionId, { expand: ['payment_intent'] });
  const intent = typeof session.payment_intent === 'object' ? session.payment_intent : null;
  const intentId = typeof session.payment_intent === 'string' ? session.payment_intent : (intent?.id ?? null);
  const amountCents = session.amount_total ?? 0;
  const base = { amountCents, currency: (session.currency ?? 'usd').toUpperCase(), paymentIntentId: intentId, refundedCents: 0, failureMessage: '' };
  if (session.payment_status === 'paid') {
    const chargeId = intent && typeof intent.latest_charge === 'string' ? intent.latest_charge : (intent?.latest_charge as Stripe.Charge | null)?.id;
    const refundedCents = chargeId ? (await stripe.charges.retrieve(chargeId)).amount_refunded : 0;
    return { ...base, refundedCents, status: receivedStatus(amountCents, refundedCents) };
  }
  if (session.status === 'expired') return { ...base, status: 'expired' };
  const error = intent?.last_payment_error;
  if (error) return { ...base, status: 'failed', failureMessage: (error.message ?? 'The payment was not accepted.').slice(0, 300) };
  return { ...base, status: 'pending' };
}

/** The payment intent an event is about, when it names one. */
export function paymentIntentOf(event: Stripe.Event): string | null {
  const object = event.data.object as unknown as Record<string, unknown>;
  if (event.type.startsWith('payment_intent.')) return typeof object.id === 'string' ? object.id : null;
  const pi = object.payment_intent;
  return typeof pi === 'string' ? pi : pi && typeof pi === 'object' && typeof (pi as { id?: unknown }).id === 'string' ? (pi as { id: string }).id : null;
}
