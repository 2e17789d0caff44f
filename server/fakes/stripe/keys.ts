/** The fixed test credentials of the local Stripe fake (documented in the README). */
export const FAKE_STRIPE_SECRET_KEY = 'sk_test_shipkeeper_local';
export const FAKE_STRIPE_WEBHOOK_SECRET = 'whsec_shipkeeper_local';
/** Reported in events when a request names no Stripe-Version. */
export const FAKE_STRIPE_API_VERSION = '2026-10-28.endive';
