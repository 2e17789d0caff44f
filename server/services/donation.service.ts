import { setImmediate as yieldToLoop } from 'node:timers/promises';
import Stripe from 'stripe';
import { centsToAmount, formatCents } from '../../shared/calc/money.js';
import { can } from '../../shared/permissions.js';
import { DEDICATION_LABELS, DONATION_STATUS_LABELS, type DonationsExportQuery, type DonationsQuery, type GivingTotals, type RefundBody } from '../../shared/schemas/donations.js';
import type { ProjectOfAppeal } from '../db/repositories/appeal.repository.js';
import type { Store } from '../db/store.js';
import { NotFoundError, ServiceUnavailableError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import type { StripeClient } from '../payments/stripe-client.js';
import { presentDonation } from '../presenters/donation.presenter.js';
import { recordAudit, type Actor } from './audit.service.js';
import type { StripeWebhookService } from './stripe-webhook.service.js';

/** A CSV cell (RFC 4180), with a leading = + - @ neutralised so a spreadsheet does not run it (OWASP CSV injection). */
export function csvCell(value: string | number | null): string {
  let text = value === null ? '' : String(value);
  if (/^[=+\-@\t\r]/.test(text) && typeof value === 'string') text = `'${text}`;
  return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

const EXPORT_SLICE = 50;

/** The fundraiser's side of giving: the gifts, their totals, refunds and the donor export. */
export class DonationService {
  constructor(
    private readonly store: Store,
    private readonly stripe: StripeClient,
    private readonly webhooks: StripeWebhookService,
  ) {}

  private async projects(vesselId: number): Promise<Map<number, ProjectOfAppeal>> {
    const rows = await this.store.repos.appeals.ofVessel(vesselId);
    return new Map(rows.map(({ appeal, project }) => [appeal.id, project]));
  }

  async page(query: DonationsQuery, viewer: Express.User) {
    const [page, projects] = await Promise.all([this.store.repos.donations.page(query), this.projects(query.vesselId)]);
    return { ...page, items: page.items.map((d) => presentDonation(d, projects.get(d.appealId), viewer)) };
  }

  /** Totals by project and by month, read from the kept ledger (never summed from the gifts). */
  async totals(vesselId: number): Promise<GivingTotals> {
    const [settings, rows, months] = await Promise.all([this.store.repos.settings.get(), this.store.repos.appeals.ofVessel(vesselId), this.store.repos.appeals.monthsOfVessel(vesselId)]);
    return {
      currency: settings.currency,
      byProject: rows.map(({ appeal, project }) => ({
        appealId: appeal.id, repairProjectId: project.id, projectTitle: project.title, goalCents: appeal.goalCents,
        raisedCents: appeal.raisedCents, refundedCents: appeal.refundedCents, giftCount: appeal.giftCount,
      })),
      byMonth: months.map((m) => ({ month: m.month, raisedCents: Number(m.raisedCents), refundedCents: Number(m.refundedCents), giftCount: Number(m.giftCount) })),
    };
  }

  /** The same totals summed from every gift on read: what the kept ledger saves (the bench compares them). */
  async totalsSummed(vesselId: number) {
    return this.store.repos.donations.sumByAppeal(vesselId);
  }

  async refund(id: number, body: RefundBody, viewer: Express.User, actor: Actor) {
    const donation = await this.store.repos.donations.findById(id);
    if (!donation) throw new NotFoundError('The gift');
    if (donation.version !== body.version) throw new StaleVersionError('the gift', donation.version);
    if (donation.status !== 'succeeded' && donation.status !== 'partially_refunded') {
      throw new UnprocessableError(`Only a received gift can be refunded; this one is ${DONATION_STATUS_LABELS[donation.status].toLowerCase()}.`);
    }
    const remaining = donation.amountCents - donation.refundedCents;
    const amount = body.amountCents ?? remaining;
    if (amount > remaining) {
      const message = `At most ${formatCents(remaining, donation.currency)} of this gift can still be refunded.`;
      throw new UnprocessableError(message, { amountCents: message });
    }
    try {
      await this.stripe.stripe.refunds.create(
        { payment_intent: donation.paymentIntentId!, amount, reason: 'requested_by_customer', metadata: { donation_reference: donation.reference, reason: body.reason.slice(0, 450) } },
        { idempotencyKey: `refund-${donation.reference}-${donation.version}` },
      );
    } catch (err) {
      if (err instanceof Stripe.errors.StripeConnectionError || err instanceof Stripe.errors.StripeAPIError) throw new ServiceUnavailableError('Stripe cannot be reached; nothing was refunded. Try again later.');
      if (err instanceof Stripe.errors.StripeError) throw new UnprocessableError(`Stripe refused the refund: ${err.message}`);
      throw err;
    }
    const summary = `Refunded ${formatCents(amount, donation.currency)} of gift ${donation.id}`;
    const updated = await this.webhooks.reconcile(donation.id, { actor, summary, reason: body.reason });
    const projects = await this.projects(donation.vesselId);
    return presentDonation(updated, projects.get(updated.appealId), viewer);
  }

  /**
   * The gifts the filters select as CSV, read in short slices so other requests are not held up;
   * the export itself is written to the audit trail first, with its filters.
   */
  async export(query: DonationsExportQuery, viewer: Express.User, actor: Actor, write: (chunk: string) => void): Promise<void> {
    const projects = await this.projects(query.vesselId);
    const withEmail = can(viewer.role, 'donation', 'readDonor');
    await this.store.transaction((repos) => recordAudit(repos, actor, {
      action: 'export', entityType: 'donation', entityId: null, vesselId: query.vesselId,
      summary: `Gifts exported as CSV${withEmail ? ' with donors’ e-mail addresses' : ''}`,
      changes: { filters: { from: null, to: query } },
    }));
    const header = ['Gift', 'Date', 'Project', 'Amount', 'Refunded', 'Currency', 'Status', 'Donor', ...(withEmail ? ['E-mail'] : []), 'Anonymous', 'Dedication'];
    write(`${header.join(',')}\r\n`);
    let after = 0;
    for (;;) {
      const slice = await this.store.repos.donations.exportSlice(query, after, EXPORT_SLICE);
      if (!slice.length) break;
      write(slice.map((d) => [
        d.id, d.createdAt.toISOString(), projects.get(d.appealId)?.title ?? '', centsToAmount(d.amountCents, d.currency), centsToAmount(d.refundedCents, d.currency),
        d.currency, DONATION_STATUS_LABELS[d.status], d.donorName, ...(withEmail ? [d.donorEmail] : []), d.anonymous ? 'yes' : 'no',
        d.dedicationKind ? `${DEDICATION_LABELS[d.dedicationKind]} ${d.dedicationName}` : '',
      ].map(csvCell).join(',')).join('\r\n') + '\r\n');
      after = slice[slice.length - 1]!.id;
      await yieldToLoop();
    }
  }
}
