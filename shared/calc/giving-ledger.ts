import type { DonationStatus } from '../schemas/donations.js';

/** What one gift adds to its appeal's totals in a given state. */
export interface LedgerShare {
  raisedCents: number;
  refundedCents: number;
  giftCount: number;
}

export interface GiftState {
  status: DonationStatus;
  amountCents: number;
  refundedCents: number;
}

/**
 * A gift's share of the totals: received money counts in `raisedCents` (gross), refunds in
 * `refundedCents`, and a gift counts once unless it was wholly refunded. Pending, failed and
 * expired gifts add nothing. Integer cents throughout.
 */
export function shareOf(gift: GiftState): LedgerShare {
  if (gift.status !== 'succeeded' && gift.status !== 'partially_refunded' && gift.status !== 'refunded') {
    return { raisedCents: 0, refundedCents: 0, giftCount: 0 };
  }
  return { raisedCents: gift.amountCents, refundedCents: gift.refundedCents, giftCount: gift.status === 'refunded' ? 0 : 1 };
}

/** What the totals must change by when a gift moves from one state to another. */
export function ledgerDelta(before: GiftState, after: GiftState): LedgerShare {
  const a = shareOf(before);
  const b = shareOf(after);
  return { raisedCents: b.raisedCents - a.raisedCents, refundedCents: b.refundedCents - a.refundedCents, giftCount: b.giftCount - a.giftCount };
}

/** The status of received money after refunds. */
export function receivedStatus(amountCents: number, refundedCents: number): DonationStatus {
  if (refundedCents <= 0) return 'succeeded';
  return refundedCents >= amountCents ? 'refunded' : 'partially_refunded';
}

/** Net of a gift or of totals: what stays with the project. */
export const netCents = (share: { raisedCents: number; refundedCents: number }) => share.raisedCents - share.refundedCents;
