import { describe, expect, it } from 'vitest';
import { ledgerDelta, receivedStatus, shareOf } from '../../shared/calc/giving-ledger.js';

describe('the giving ledger', () => {
  it('counts only received money, gross, with refunds beside it', () => {
    expect(shareOf({ status: 'pending', amountCents: 5000, refundedCents: 0 })).toEqual({ raisedCents: 0, refundedCents: 0, giftCount: 0 });
    expect(shareOf({ status: 'succeeded', amountCents: 5000, refundedCents: 0 })).toEqual({ raisedCents: 5000, refundedCents: 0, giftCount: 1 });
    expect(shareOf({ status: 'partially_refunded', amountCents: 5000, refundedCents: 1250 })).toEqual({ raisedCents: 5000, refundedCents: 1250, giftCount: 1 });
    expect(shareOf({ status: 'refunded', amountCents: 5000, refundedCents: 5000 })).toEqual({ raisedCents: 5000, refundedCents: 5000, giftCount: 0 });
  });

  it('moves by the difference, so applying a state twice adds nothing', () => {
    const paid = { status: 'succeeded' as const, amountCents: 25_000, refundedCents: 0 };
    expect(ledgerDelta({ status: 'pending', amountCents: 25_000, refundedCents: 0 }, paid)).toEqual({ raisedCents: 25_000, refundedCents: 0, giftCount: 1 });
    expect(ledgerDelta(paid, paid)).toEqual({ raisedCents: 0, refundedCents: 0, giftCount: 0 });
    // straight from pending to wholly refunded (the refund's event came first)
    expect(ledgerDelta({ status: 'pending', amountCents: 25_000, refundedCents: 0 }, { status: 'refunded', amountCents: 25_000, refundedCents: 25_000 }))
      .toEqual({ raisedCents: 25_000, refundedCents: 25_000, giftCount: 0 });
  });

  it('names the state of received money after refunds', () => {
    expect(receivedStatus(1000, 0)).toBe('succeeded');
    expect(receivedStatus(1000, 1)).toBe('partially_refunded');
    expect(receivedStatus(1000, 1000)).toBe('refunded');
  });
});
