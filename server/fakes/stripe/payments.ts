import { recordEvent, type EventSource } from './events.js';
import { newId, nowSeconds, type CheckoutSession, type FakeStripeStore, type PaymentIntent } from './store.js';

/** The session's payment intent, made on the first attempt to pay (as Checkout does). */
function intentOf(store: FakeStripeStore, session: CheckoutSession): PaymentIntent {
  const existing = session.payment_intent ? store.paymentIntents.get(session.payment_intent) : undefined;
  if (existing) return existing;
  const intent: PaymentIntent = {
    id: newId('pi'),
    object: 'payment_intent',
    amount: session.amount_total,
    amount_received: 0,
    currency: session.currency,
    created: nowSeconds(),
    latest_charge: null,
    last_payment_error: null,
    livemode: false,
    metadata: { ...session.metadata },
    status: 'requires_payment_method',
  };
  store.paymentIntents.set(intent.id, intent);
  session.payment_intent = intent.id;
  return intent;
}

export function failPayment(
  store: FakeStripeStore, source: EventSource, session: CheckoutSession,
  error: { code: string; declineCode?: string; message: string },
): void {
  const intent = intentOf(store, session);
  intent.status = 'requires_payment_method';
  intent.last_payment_error = { type: 'card_error', code: error.code, message: error.message, ...(error.declineCode ? { decline_code: error.declineCode } : {}) };
  recordEvent(store, source, 'payment_intent.payment_failed', intent);
}

export function requireAction(store: FakeStripeStore, session: CheckoutSession): void {
  const intent = intentOf(store, session);
  intent.status = 'requires_action';
}

export function completePayment(store: FakeStripeStore, source: EventSource, session: CheckoutSession, name: string): void {
  const intent = intentOf(store, session);
  const chargeId = newId('ch');
  store.charges.set(chargeId, {
    id: chargeId,
    object: 'charge',
    amount: intent.amount,
    amount_captured: intent.amount,
    amount_refunded: 0,
    currency: intent.currency,
    created: nowSeconds(),
    livemode: false,
    metadata: { ...intent.metadata },
    paid: true,
    payment_intent: intent.id,
    refunded: false,
    status: 'succeeded',
  });
  intent.status = 'succeeded';
  intent.amount_received = intent.amount;
  intent.latest_charge = chargeId;
  intent.last_payment_error = null;
  session.status = 'complete';
  session.payment_status = 'paid';
  session.url = null;
  session.customer_details = { email: session.customer_email, name };
  store.pages.get(session.id)!.awaitingAuthentication = null;
  recordEvent(store, source, 'charge.succeeded', store.charges.get(chargeId));
  recordEvent(store, source, 'payment_intent.succeeded', intent);
  recordEvent(store, source, 'checkout.session.completed', session);
}
