import { cardOutcome } from './cards.js';
import { authenticationPage, checkoutPage, closedPage } from './checkout-html.js';
import { expireIfDue } from './checkout-sessions.js';
import type { EventSource } from './events.js';
import { completePayment, failPayment, requireAction } from './payments.js';
import type { CheckoutSession, FakeStripeStore } from './store.js';

export type PageAnswer = { status: number; html: string } | { redirect: string };

const AUTH_FAILED = 'We are unable to authenticate your payment method. Please choose a different payment method and try again.';

function successRedirect(session: CheckoutSession): PageAnswer {
  return { redirect: session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', session.id) };
}

function field(form: Record<string, unknown>, key: string): string {
  const v = form[key];
  return typeof v === 'string' ? v : '';
}

/**
 * The hosted checkout page: `GET /pay/:id` shows the form, `POST /pay/:id` pays with a test card,
 * `POST /pay/:id/authenticate` answers the extra step with `action=complete|fail`.
 */
export function handleCheckoutPage(
  store: FakeStripeStore, source: EventSource, method: string, sessionId: string, step: 'pay' | 'authenticate', form: Record<string, unknown>,
): PageAnswer | null {
  const session = store.sessions.get(sessionId);
  const state = store.pages.get(sessionId);
  if (!session || !state) return null;
  expireIfDue(store, source, session);
  if (session.status !== 'open') return { status: session.status === 'expired' ? 410 : 200, html: closedPage(session) };

  if (step === 'authenticate') {
    if (method !== 'POST' || !state.awaitingAuthentication) return { status: 200, html: checkoutPage(session, state.lineItems) };
    const { name } = state.awaitingAuthentication;
    if (field(form, 'action') === 'complete') {
      completePayment(store, source, session, name);
      return successRedirect(session);
    }
    state.awaitingAuthentication = null;
    failPayment(store, source, session, { code: 'payment_intent_authentication_failure', message: AUTH_FAILED });
    return { status: 200, html: checkoutPage(session, state.lineItems, { error: AUTH_FAILED, name }) };
  }

  if (method !== 'POST') return { status: 200, html: checkoutPage(session, state.lineItems) };
  const input = { number: field(form, 'card_number'), expiry: field(form, 'expiry'), cvc: field(form, 'cvc'), name: field(form, 'name') };
  const outcome = cardOutcome(input);
  if (outcome.kind === 'success') {
    completePayment(store, source, session, input.name.trim());
    return successRedirect(session);
  }
  if (outcome.kind === 'authenticate') {
    requireAction(store, session);
    state.awaitingAuthentication = { name: input.name.trim() };
    return { status: 200, html: authenticationPage(session) };
  }
  if (outcome.code === 'card_declined') failPayment(store, source, session, outcome);
  return { status: 200, html: checkoutPage(session, state.lineItems, { error: outcome.message, name: input.name, expiry: input.expiry }) };
}
