import { ledgerDelta, shareOf } from '../../shared/calc/giving-ledger.js';
import type { DonationEntity } from '../db/entities/donation.entity.js';
import type { Repositories } from '../db/store.js';
import type { StripeTruth } from '../payments/stripe-truth.js';

export interface LedgerChange {
  donation: DonationEntity;
  /** The gift's money arrived with this change: send the receipt. */
  becameReceived: boolean;
  /** More was refunded with this change: send the corrected acknowledgment. */
  refundedMore: boolean;
  changed: boolean;
}

const monthOf = (date: Date) => date.toISOString().slice(0, 7);

/**
 * Brings one donation to Stripe's state and moves its appeal's totals (and the month's) by the
 * difference, inside the caller's transaction. Applying the same state twice changes nothing.
 */
export async function applyStripeTruth(repos: Repositories, donation: DonationEntity, truth: StripeTruth, now = new Date()): Promise<LedgerChange> {
  const before = { status: donation.status, amountCents: donation.amountCents, refundedCents: donation.refundedCents };
  const after = { status: truth.status, amountCents: truth.amountCents || donation.amountCents, refundedCents: truth.refundedCents };
  const wasReceived = shareOf(before).raisedCents > 0;
  const isReceived = shareOf(after).raisedCents > 0;
  // A received gift never goes back to pending in Stripe; a stale answer must not undo it.
  if (wasReceived && !isReceived) return { donation, becameReceived: false, refundedMore: false, changed: false };
  const changed = before.status !== after.status || before.refundedCents !== after.refundedCents || before.amountCents !== after.amountCents ||
    donation.paymentIntentId !== truth.paymentIntentId || donation.failureMessage !== truth.failureMessage;
  if (!changed) return { donation, becameReceived: false, refundedMore: false, changed: false };
  if (isReceived && !donation.succeededAt) donation.succeededAt = now;
  const delta = ledgerDelta(before, after);
  Object.assign(donation, {
    status: after.status,
    amountCents: after.amountCents,
    refundedCents: after.refundedCents,
    paymentIntentId: truth.paymentIntentId ?? donation.paymentIntentId,
    failureMessage: isReceived ? '' : truth.failureMessage,
  });
  const saved = await repos.donations.save(donation);
  await repos.appeals.addToTotals(donation.appealId, monthOf(donation.succeededAt ?? donation.createdAt ?? now), delta);
  return { donation: saved, becameReceived: !wasReceived && isReceived, refundedMore: after.refundedCents > before.refundedCents, changed: true };
}
