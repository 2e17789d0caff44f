import type { Store } from '../db/store.js';
import type { Mailer } from '../mail/mailer.js';
import { receiptMail } from '../mail/receipt-templates.js';

/** Acknowledgments by e-mail, sent after the ledger's change is committed; a failing mail server is logged. */
export class GivingReceipts {
  constructor(private readonly store: Store, private readonly mailer: Mailer) {}

  async send(donationId: number, kind: 'receipt' | 'corrected'): Promise<void> {
    try {
      const { repos } = this.store;
      const donation = await repos.donations.findById(donationId);
      if (!donation || !donation.succeededAt) return;
      const [settings, found] = await Promise.all([repos.settings.get(), repos.appeals.withProject(donation.appealId)]);
      const giving = settings.giving;
      await this.mailer.send(receiptMail({
        to: donation.donorEmail,
        donorName: donation.donorName,
        organisationName: settings.organisationName,
        legalName: giving.legalName,
        taxId: giving.taxId,
        contactEmail: settings.contactEmail,
        projectTitle: found?.project.title ?? 'our repair work',
        giftNumber: donation.id,
        receivedAt: donation.succeededAt,
        amountCents: donation.amountCents,
        refundedCents: donation.refundedCents,
        currency: donation.currency,
        dedication: donation.dedicationKind ? { kind: donation.dedicationKind, name: donation.dedicationName } : null,
        // The threshold applies to the single contribution as made (IRS Publication 1771: "a single contribution of $250 or more").
        statement: donation.amountCents >= giving.acknowledgmentThresholdCents ? giving.acknowledgmentStatement : null,
      }, kind));
    } catch (err) {
      console.error(`The ${kind === 'receipt' ? 'receipt' : 'corrected acknowledgment'} of gift ${donationId} could not be sent: ${(err as Error).message}`);
    }
  }
}
