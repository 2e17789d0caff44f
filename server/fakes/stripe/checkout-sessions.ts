import { StripeApiError, invalidParam, missingParam, noSuch } from './errors.js';
import { recordEvent, type EventSource } from './events.js';
import {
  expandOf, httpUrl, metadataOf, optionalInteger, optionalObject, optionalString, refuseUnknown, requiredString, type Params,
} from './params.js';
import { newId, nowSeconds, type CheckoutSession, type FakeStripeStore, type LineItem } from './store.js';

const CREATE_PARAMS = [
  'mode', 'line_items', 'success_url', 'cancel_url', 'metadata', 'customer_email', 'client_reference_id',
  'expires_at', 'payment_method_types', 'submit_type', 'locale', 'payment_intent_data', 'expand',
] as const;

/** Stripe's Checkout limits: `expires_at` from 30 minutes to 24 hours ahead; 24 hours by default. */
const MIN_EXPIRY_S = 30 * 60;
const MAX_EXPIRY_S = 24 * 60 * 60;
/** Stripe's minimum charge is 0.50 in USD (https://docs.stripe.com/currencies#minimum-and-maximum-charge-amounts). */
const MIN_USD_CENTS = 50;

function lineItemsOf(params: Params): LineItem[] {
  const raw = params.line_items;
  if (raw === undefined) throw missingParam('line_items');
  if (typeof raw !== 'object' || raw === null) throw invalidParam('Invalid array', 'line_items', 'parameter_invalid_array');
  const list = Object.values(raw as object) as unknown[];
  if (list.length === 0) throw invalidParam('Invalid array', 'line_items', 'parameter_invalid_empty');
  return list.map((item, i) => {
    const p = `line_items[${i}]`;
    if (typeof item !== 'object' || item === null) throw invalidParam(`Invalid object: ${p}`, p, 'parameter_invalid_object');
    const it = item as Params;
    refuseUnknown(it, ['price_data', 'quantity'], p);
    const priceData = optionalObject(it, 'price_data', `${p}[price_data]`);
    if (!priceData) throw missingParam(`${p}[price_data]`);
    refuseUnknown(priceData, ['currency', 'unit_amount', 'product_data'], `${p}[price_data]`);
    const currency = requiredString(priceData, 'currency', `${p}[price_data][currency]`).toLowerCase();
    if (!/^[a-z]{3}$/.test(currency)) throw invalidParam(`Invalid currency: ${currency}`, `${p}[price_data][currency]`, 'parameter_invalid_string');
    const unitAmount = optionalInteger(priceData, 'unit_amount', `${p}[price_data][unit_amount]`);
    if (unitAmount === null) throw missingParam(`${p}[price_data][unit_amount]`);
    if (unitAmount < 0) throw invalidParam('This value must be greater than or equal to 0.', `${p}[price_data][unit_amount]`, 'parameter_invalid_integer');
    const product = optionalObject(priceData, 'product_data', `${p}[price_data][product_data]`);
    if (!product) throw missingParam(`${p}[price_data][product_data]`);
    refuseUnknown(product, ['name', 'description'], `${p}[price_data][product_data]`);
    const name = requiredString(product, 'name', `${p}[price_data][product_data][name]`);
    const quantity = optionalInteger(it, 'quantity', `${p}[quantity]`);
    if (quantity === null) throw missingParam(`${p}[quantity]`);
    if (quantity < 1) throw invalidParam('This value must be greater than or equal to 1.', `${p}[quantity]`, 'parameter_invalid_integer');
    const amount = unitAmount * quantity;
    return {
      id: newId('li'),
      object: 'item',
      amount_subtotal: amount,
      amount_total: amount,
      currency,
      description: name,
      quantity,
      price: { object: 'price', currency, unit_amount: unitAmount, product_data_name: name },
    };
  });
}

export function createSession(store: FakeStripeStore, params: Params, pageUrl: (id: string) => string): CheckoutSession {
  refuseUnknown(params, CREATE_PARAMS);
  const mode = requiredString(params, 'mode');
  if (mode !== 'payment') throw invalidParam(`Invalid mode: this local fake supports only "payment", got "${mode}".`, 'mode', 'parameter_invalid_string');
  const successUrl = httpUrl(requiredString(params, 'success_url'), 'success_url');
  const cancelRaw = optionalString(params, 'cancel_url');
  const cancelUrl = cancelRaw === null ? null : httpUrl(cancelRaw, 'cancel_url');
  const items = lineItemsOf(params);
  const currency = items[0]!.currency;
  if (items.some((i) => i.currency !== currency)) throw invalidParam('All line items must use the same currency.', 'line_items', 'parameter_invalid_string');
  const total = items.reduce((s, i) => s + i.amount_total, 0);
  if (currency === 'usd' && total < MIN_USD_CENTS) {
    throw invalidParam("The Checkout Session's total amount due must add up to at least $0.50 usd", 'line_items', 'amount_too_small');
  }
  const email = optionalString(params, 'customer_email');
  if (email !== null && !/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) throw invalidParam(`Invalid email address: ${email}`, 'customer_email', 'email_invalid');
  const clientRef = optionalString(params, 'client_reference_id');
  if (clientRef !== null && clientRef.length > 200) throw invalidParam('Invalid string: client_reference_id must be at most 200 characters.', 'client_reference_id', 'parameter_invalid_string');
  const now = nowSeconds();
  const expiresAt = optionalInteger(params, 'expires_at') ?? now + MAX_EXPIRY_S;
  if (expiresAt < now + MIN_EXPIRY_S - 5 || expiresAt > now + MAX_EXPIRY_S + 5) {
    throw invalidParam('The `expires_at` timestamp must be between 30 minutes and 24 hours from Checkout Session creation.', 'expires_at', 'parameter_invalid_integer');
  }
  const id = newId('cs_test');
  const session: CheckoutSession = {
    id,
    object: 'checkout.session',
    amount_subtotal: total,
    amount_total: total,
    cancel_url: cancelUrl,
    client_reference_id: clientRef,
    created: now,
    currency,
    customer_details: null,
    customer_email: email,
    expires_at: expiresAt,
    livemode: false,
    metadata: metadataOf(params),
    mode: 'payment',
    payment_intent: null,
    payment_method_types: ['card'],
    payment_status: 'unpaid',
    status: 'open',
    success_url: successUrl,
    url: pageUrl(id),
  };
  store.sessions.set(id, session);
  store.pages.set(id, { lineItems: items, awaitingAuthentication: null });
  return session;
}

function markExpired(store: FakeStripeStore, source: EventSource, session: CheckoutSession): void {
  session.status = 'expired';
  session.url = null;
  store.pages.get(session.id)!.awaitingAuthentication = null;
  recordEvent(store, source, 'checkout.session.expired', session, { status: 'open' });
}

/** Sessions past their `expires_at` become expired (with their event) when next looked at or swept. */
export function expireIfDue(store: FakeStripeStore, source: EventSource, session: CheckoutSession): boolean {
  if (session.status !== 'open' || session.expires_at > nowSeconds()) return false;
  markExpired(store, source, session);
  return true;
}

export function findSession(store: FakeStripeStore, id: string): CheckoutSession {
  const session = store.sessions.get(id);
  if (!session) throw noSuch('checkout.session', id);
  return session;
}

/** The session as the API answers it, with `expand[]` of `payment_intent` and `line_items`. */
export function presentSession(store: FakeStripeStore, session: CheckoutSession, params: Params): unknown {
  const expand = expandOf(params);
  const out: Record<string, unknown> = { ...session };
  if (expand.includes('payment_intent') && session.payment_intent) out.payment_intent = store.paymentIntents.get(session.payment_intent) ?? null;
  if (expand.includes('line_items')) out.line_items = lineItemList(store, session);
  return out;
}

export function lineItemList(store: FakeStripeStore, session: CheckoutSession) {
  const items = store.pages.get(session.id)?.lineItems ?? [];
  return { object: 'list', data: items, has_more: false, url: `/v1/checkout/sessions/${session.id}/line_items` };
}

export function expireSession(store: FakeStripeStore, source: EventSource, session: CheckoutSession): CheckoutSession {
  if (expireIfDue(store, source, session)) return session;
  if (session.status !== 'open') {
    throw new StripeApiError(400, 'invalid_request_error',
      `Only Checkout Sessions with a status in ["open"] can be expired. This Checkout Session has a status of "${session.status}".`);
  }
  markExpired(store, source, session);
  return session;
}
