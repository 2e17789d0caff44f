/**
 * Money as integer cents (minor units). Parsing works on the digits of the string, never through
 * a float, so "19.99" is 1999 exactly and "0.1" + "0.2" cannot drift.
 */

/** ISO 4217 currencies without a minor unit (common ones; Stripe lists the same as zero-decimal). */
const ZERO_DECIMAL = new Set(['JPY', 'KRW', 'VND', 'CLP', 'ISK', 'PYG', 'UGX', 'XAF', 'XOF', 'RWF']);

export function minorDigits(currency: string): 0 | 2 {
  return ZERO_DECIMAL.has(currency.toUpperCase()) ? 0 : 2;
}

/**
 * "25,000.00", "25000", "12.5", "$ 40" → cents; null when it is not an amount. Grouping commas
 * (or spaces) are allowed between groups of three digits; at most the currency's minor digits.
 */
export function parseAmountToCents(input: string, currency = 'USD'): number | null {
  const digits = minorDigits(currency);
  const cleaned = input.trim().replace(/^[^\d.]{1,3}\s?/, '').replace(/\s/g, '');
  const match = /^(\d{1,3}(?:,\d{3})+|\d+)?(?:\.(\d*))?$/.exec(cleaned);
  if (!match || (!match[1] && !match[2])) return null;
  const whole = (match[1] ?? '0').replace(/,/g, '');
  const fraction = match[2] ?? '';
  if (fraction.length > digits) return null;
  if (whole.length > 12) return null;
  const cents = Number(whole) * 10 ** digits + (fraction ? Number(fraction.padEnd(digits, '0')) : 0);
  return Number.isSafeInteger(cents) ? cents : null;
}

/** Cents as the plain amount without a symbol: 2500000 → "25,000.00". */
export function centsToAmount(cents: number, currency = 'USD'): string {
  const digits = minorDigits(currency);
  const negative = cents < 0;
  const abs = Math.abs(Math.trunc(cents));
  const whole = digits ? Math.floor(abs / 100) : abs;
  const grouped = String(whole).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  const text = digits ? `${grouped}.${String(abs % 100).padStart(2, '0')}` : grouped;
  return negative ? `-${text}` : text;
}

/** Cents with the currency, as a reader expects it: "$25,000.00" in USD, "EUR 40.00" otherwise. */
export function formatCents(cents: number, currency = 'USD'): string {
  const code = currency.toUpperCase();
  const symbol = ({ USD: '$', GBP: '£', EUR: '€' } as Record<string, string>)[code];
  const amount = centsToAmount(cents, code);
  if (!symbol) return `${code} ${amount}`;
  return amount.startsWith('-') ? `-${symbol}${amount.slice(1)}` : `${symbol}${amount}`;
}

/** Whole percent of a goal reached, 0–100 (integer arithmetic; a goal of 0 reads as 0). */
export function percentOf(raisedCents: number, goalCents: number): number {
  if (goalCents <= 0) return 0;
  return Math.min(100, Math.floor((Math.max(0, raisedCents) * 100) / goalCents));
}
