import type { CheckoutSession, LineItem } from './store.js';

/** Everything echoed into the page goes through this. */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

export function formatAmount(minor: number, currency: string): string {
  const code = currency.toUpperCase();
  try {
    const digits = new Intl.NumberFormat('en-US', { style: 'currency', currency: code }).resolvedOptions().maximumFractionDigits ?? 2;
    return new Intl.NumberFormat('en-US', { style: 'currency', currency: code }).format(minor / 10 ** digits);
  } catch {
    return `${minor} ${code}`;
  }
}

const STYLE = `body{font-family:system-ui,sans-serif;max-width:28rem;margin:2rem auto;padding:0 1rem;color:#1a1a1a}
label{display:block;margin-top:1rem;font-weight:600}input{display:block;width:100%;box-sizing:border-box;padding:.5rem;font-size:1rem;margin-top:.25rem}
button{margin-top:1.5rem;padding:.6rem 1.4rem;font-size:1rem}.error{color:#a00;border:1px solid #a00;padding:.5rem;margin-top:1rem}
.note{color:#555;font-size:.9rem}.row{display:flex;gap:1rem}.row>div{flex:1}`;

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLE}</style></head><body><main>${body}</main></body></html>`;
}

function summary(session: CheckoutSession, items: readonly LineItem[]): string {
  const rows = items.map((i) => `<li>${escapeHtml(i.description)}${i.quantity > 1 ? ` × ${i.quantity}` : ''}: ${escapeHtml(formatAmount(i.amount_total, i.currency))}</li>`).join('');
  return `<p class="note">Test mode — local payment fake. No real card is charged.</p>
<ul>${rows}</ul><p><strong>Total: ${escapeHtml(formatAmount(session.amount_total, session.currency))}</strong></p>`;
}

export interface FormState {
  error?: string;
  name?: string;
  expiry?: string;
}

export function checkoutPage(session: CheckoutSession, items: readonly LineItem[], state: FormState = {}): string {
  const action = `/pay/${encodeURIComponent(session.id)}`;
  const error = state.error ? `<div class="error" role="alert" id="card-error">${escapeHtml(state.error)}</div>` : '';
  const described = state.error ? ' aria-describedby="card-error" aria-invalid="true"' : '';
  const cancel = session.cancel_url ? `<p><a href="${escapeHtml(session.cancel_url)}">Cancel</a></p>` : '';
  return page('Pay', `<h1>Pay</h1>${summary(session, items)}${error}
<form method="post" action="${escapeHtml(action)}" novalidate>
<label for="card-number">Card number</label><input id="card-number" name="card_number" inputmode="numeric" autocomplete="cc-number" required${described}>
<div class="row"><div><label for="card-expiry">Expiry</label><input id="card-expiry" name="expiry" placeholder="MM / YY" autocomplete="cc-exp" required value="${escapeHtml(state.expiry ?? '')}"></div>
<div><label for="card-cvc">CVC</label><input id="card-cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" required></div></div>
<label for="card-name">Name on card</label><input id="card-name" name="name" autocomplete="cc-name" required value="${escapeHtml(state.name ?? '')}">
<button type="submit">Pay</button>
</form>${cancel}`);
}

export function authenticationPage(session: CheckoutSession): string {
  const action = escapeHtml(`/pay/${encodeURIComponent(session.id)}/authenticate`);
  return page('Confirm your payment', `<h1>Confirm your payment</h1>
<p>Your bank asks you to confirm this payment of ${escapeHtml(formatAmount(session.amount_total, session.currency))}. (Test mode: choose an outcome.)</p>
<form method="post" action="${action}"><button type="submit" name="action" value="complete">Complete</button>
<button type="submit" name="action" value="fail">Fail</button></form>`);
}

export function closedPage(session: CheckoutSession): string {
  const text = session.status === 'complete' ? 'This payment is complete.' : 'This checkout session has expired.';
  return page('Checkout', `<h1>Checkout</h1><p role="status">${text}</p>`);
}
