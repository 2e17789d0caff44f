import { StripeApiError, invalidParam, noSuch } from './errors.js';
import { recordEvent, type EventSource } from './events.js';
import { metadataOf, optionalInteger, optionalString, refuseUnknown, type Params } from './params.js';
import { newId, nowSeconds, type Charge, type FakeStripeStore, type Refund } from './store.js';

const REASONS = ['duplicate', 'fraudulent', 'requested_by_customer'];

function chargeFor(store: FakeStripeStore, params: Params): Charge {
  const intentId = optionalString(params, 'payment_intent');
  const chargeId = optionalString(params, 'charge');
  if (!intentId && !chargeId) {
    throw invalidParam('One of the following params should be provided for this request: payment_intent or charge.', 'payment_intent', 'parameter_missing');
  }
  if (chargeId) {
    const charge = store.charges.get(chargeId);
    if (!charge) throw noSuch('charge', chargeId, 'charge');
    return charge;
  }
  const intent = store.paymentIntents.get(intentId!);
  if (!intent) throw noSuch('payment_intent', intentId!, 'payment_intent');
  const charge = intent.latest_charge ? store.charges.get(intent.latest_charge) : undefined;
  if (intent.status !== 'succeeded' || !charge) {
    throw invalidParam(`This PaymentIntent (${intent.id}) does not have a successful charge to refund.`, 'payment_intent');
  }
  return charge;
}

/** `POST /v1/refunds`: the whole unrefunded rest by default, or `amount`; each emits refund.created and charge.refunded. */
export function createRefund(store: FakeStripeStore, source: EventSource, params: Params): Refund {
  refuseUnknown(params, ['payment_intent', 'charge', 'amount', 'reason', 'metadata', 'expand']);
  const charge = chargeFor(store, params);
  const remaining = charge.amount - charge.amount_refunded;
  if (remaining === 0) {
    throw new StripeApiError(400, 'invalid_request_error', `Charge ${charge.id} has already been refunded.`, { code: 'charge_already_refunded' });
  }
  const amount = optionalInteger(params, 'amount') ?? remaining;
  if (amount < 1) throw invalidParam('Invalid positive integer', 'amount', 'parameter_invalid_integer');
  if (amount > remaining) {
    throw invalidParam(`Refund amount (${amount}) is greater than unrefunded amount on charge (${remaining})`, 'amount', 'amount_too_large');
  }
  const reason = optionalString(params, 'reason');
  if (reason !== null && !REASONS.includes(reason)) throw invalidParam(`Invalid reason: must be one of ${REASONS.join(', ')}`, 'reason', 'parameter_invalid_string');
  const refund: Refund = {
    id: newId('re'),
    object: 'refund',
    amount,
    charge: charge.id,
    created: nowSeconds(),
    currency: charge.currency,
    metadata: metadataOf(params),
    payment_intent: charge.payment_intent,
    reason,
    status: 'succeeded',
  };
  store.refunds.set(refund.id, refund);
  const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  recordEvent(store, source, 'refund.created', refund);
  recordEvent(store, source, 'charge.refunded', charge, previous);
  return refund;
}

export function retrieveRefund(store: FakeStripeStore, id: string): Refund {
  const refund = store.refunds.get(id);
  if (!refund) throw noSuch('refund', id);
  return refund;
}
