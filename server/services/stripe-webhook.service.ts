import Stripe from 'stripe';
import type { DonationEntity } from '../db/entities/donation.entity.js';
import type { Store } from '../db/store.js';
import { ApiError } from '../http/errors.js';
import type { StripeClient } from '../payments/stripe-client.js';
import { paymentIntentOf, readStripeTruth } from '../payments/stripe-truth.js';
import { recordAudit, type Actor } from './audit.service.js';
import { applyStripeTruth, type LedgerChange } from './giving-ledger.js';
import type { GivingReceipts } from './giving-receipts.js';

const STRIPE_ACTOR: Actor = { id: null, ip: null };

/** Events that can change a gift; any other event is acknowledged and recorded only. */
const HANDLED = /^(checkout\.session\.|payment_intent\.|charge\.|refund\.)/;

export class StripeWebhookService {
  constructor(
    private readonly store: Store,
    private readonly stripe: StripeClient,
    private readonly receipts: GivingReceipts,
  ) {}

  /** Verifies the signature on the raw body as Stripe sent it; anything else is 400 and nothing is recorded. */
  verify(raw: unknown, signature: string | undefined): Stripe.Event {
    if (!Buffer.isBuffer(raw) || !signature) throw new ApiError(400, 'bad_request', 'A Stripe webhook needs its raw body and a Stripe-Signature header.');
    try {
      return this.stripe.stripe.webhooks.constructEvent(raw, signature, this.stripe.webhookSecret);
    } catch {
      throw new ApiError(400, 'bad_request', 'The webhook signature does not match; the event was not recorded.');
    }
  }

  /** Our gift the event is about, by its checkout session or payment intent (its metadata as Stripe holds it). */
  private async donationOf(event: Stripe.Event): Promise<DonationEntity | null> {
    const { repos } = this.store;
    if (event.type.startsWith('checkout.session.')) {
      return repos.donations.findBySession((event.data.object as Stripe.Checkout.Session).id);
    }
    const intentId = paymentIntentOf(event);
    if (!intentId) return null;
    const known = await repos.donations.findByPaymentIntent(intentId);
    if (known) return known;
    // The first event of a payment may come before the session's: find the gift by our reference.
    const intent = await this.stripe.stripe.paymentIntents.retrieve(intentId);
    const reference = intent.metadata?.donation_reference;
    return reference ? repos.donations.findByReference(reference) : null;
  }

  /**
   * Processes an event once: its id is stored in the same transaction as its effect, so a retry
   * after a crash redoes all of it or finds it done. Stripe unreachable: 503, and Stripe retries.
   */
  async handle(event: Stripe.Event): Promise<{ received: true; duplicate: boolean }> {
    if (await this.store.repos.donations.eventProcessed(event.id)) return { received: true, duplicate: true };
    let donation: DonationEntity | null = null;
    let truth: Awaited<ReturnType<typeof readStripeTruth>> | null = null;
    if (HANDLED.test(event.type)) {
      try {
        donation = await this.donationOf(event);
        if (donation) truth = await readStripeTruth(this.stripe.stripe, donation.checkoutSessionId);
      } catch (err) {
        if (err instanceof Stripe.errors.StripeError) throw new ApiError(503, 'unavailable', `Stripe could not be asked about event ${event.id}; it will be retried.`);
        throw err;
      }
    }
    const outcome = await this.store.transaction(async (repos) => {
      if (await repos.donations.eventProcessed(event.id)) return null;
      let change: LedgerChange | null = null;
      if (donation && truth) {
        const fresh = (await repos.donations.findById(donation.id))!;
        change = await applyStripeTruth(repos, fresh, truth);
        if (change.changed) {
          await recordAudit(repos, STRIPE_ACTOR, {
            action: 'payment', entityType: 'donation', entityId: fresh.id, vesselId: fresh.vesselId,
            summary: `Gift ${fresh.id} is ${change.donation.status} (Stripe event ${event.type})`,
          });
        }
      }
      await repos.donations.recordEvent({ id: event.id, type: event.type, donationId: donation?.id ?? null });
      return change;
    });
    if (outcome === null) return { received: true, duplicate: true };
    await this.afterCommit(outcome);
    return { received: true, duplicate: false };
  }

  /** Brings one gift to Stripe's state now (the thank-you page, a refund just made). */
  async reconcile(donationId: number, audit?: { actor: Actor; summary: string; reason?: string }): Promise<DonationEntity> {
    const donation = await this.store.repos.donations.findById(donationId);
    if (!donation) throw new ApiError(404, 'not_found', 'The gift was not found.');
    const truth = await readStripeTruth(this.stripe.stripe, donation.checkoutSessionId);
    const change = await this.store.transaction(async (repos) => {
      const fresh = (await repos.donations.findById(donationId))!;
      const result = await applyStripeTruth(repos, fresh, truth);
      if (audit) {
        await recordAudit(repos, audit.actor, {
          action: 'refund', entityType: 'donation', entityId: fresh.id, vesselId: fresh.vesselId, summary: audit.summary,
          changes: { reason: { from: null, to: audit.reason ?? '' }, refundedCents: { from: donation.refundedCents, to: result.donation.refundedCents } },
        });
      } else if (result.changed) {
        await recordAudit(repos, STRIPE_ACTOR, { action: 'payment', entityType: 'donation', entityId: fresh.id, vesselId: fresh.vesselId, summary: `Gift ${fresh.id} is ${result.donation.status} (confirmed with Stripe)` });
      }
      return result;
    });
    await this.afterCommit(change);
    return change.donation;
  }

  private async afterCommit(change: LedgerChange | null): Promise<void> {
    if (!change) return;
    if (change.becameReceived) await this.receipts.send(change.donation.id, change.refundedMore ? 'corrected' : 'receipt');
    else if (change.refundedMore) await this.receipts.send(change.donation.id, 'corrected');
  }
}
