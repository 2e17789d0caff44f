/**
 * What a card entered on the hosted page does, after Stripe's published test cards
 * (https://docs.stripe.com/testing): 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is
 * declined (generic_decline), 4000 0000 0000 9995 has insufficient funds, and
 * 4000 0025 0000 3155 asks for an extra authentication step. Other well-formed numbers are
 * refused as Stripe refuses real cards in test mode.
 */
export type CardOutcome =
  | { kind: 'success' }
  | { kind: 'authenticate' }
  | { kind: 'error'; code: string; declineCode?: string; message: string; field: 'number' | 'expiry' | 'cvc' | 'name' };

export interface CardInput {
  number: string;
  expiry: string;
  cvc: string;
  name: string;
}

function luhn(digits: string): boolean {
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let d = Number(digits[digits.length - 1 - i]);
    if (i % 2 === 1) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return sum % 10 === 0;
}

const declined = (declineCode: string, message: string): CardOutcome =>
  ({ kind: 'error', code: 'card_declined', declineCode, message, field: 'number' });

export function cardOutcome(input: CardInput, now = new Date()): CardOutcome {
  const number = input.number.replace(/[\s-]/g, '');
  if (!/^\d{12,19}$/.test(number) || !luhn(number)) {
    return { kind: 'error', code: 'incorrect_number', message: 'Your card number is invalid.', field: 'number' };
  }
  const exp = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(input.expiry);
  const month = exp ? Number(exp[1]) : 0;
  if (!exp || month < 1 || month > 12) {
    return { kind: 'error', code: 'invalid_expiry_month', message: "Your card's expiration date is incomplete or invalid.", field: 'expiry' };
  }
  const year = exp[2]!.length === 2 ? 2000 + Number(exp[2]) : Number(exp[2]);
  if (year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1)) {
    return { kind: 'error', code: 'invalid_expiry_year', message: "Your card's expiration date is in the past.", field: 'expiry' };
  }
  if (!/^\d{3,4}$/.test(input.cvc.trim())) {
    return { kind: 'error', code: 'invalid_cvc', message: "Your card's security code is invalid.", field: 'cvc' };
  }
  if (input.name.trim() === '') {
    return { kind: 'error', code: 'incomplete_name', message: 'Enter the name on the card.', field: 'name' };
  }
  switch (number) {
    case '4242424242424242':
      return { kind: 'success' };
    case '4000000000000002':
      return declined('generic_decline', 'Your card was declined.');
    case '4000000000009995':
      return declined('insufficient_funds', 'Your card has insufficient funds.');
    case '4000002500003155':
      return { kind: 'authenticate' };
    default:
      return declined('test_mode_live_card', 'Your card was declined. Your request was in test mode, but used a non test card.');
  }
}
