import { can } from '../../shared/permissions.js';
import type { Donation } from '../../shared/schemas/donations.js';
import type { DonationEntity } from '../db/entities/donation.entity.js';
import type { ProjectOfAppeal } from '../db/repositories/appeal.repository.js';

/** A gift for staff; the donor's e-mail only for the roles that may read donors' details. */
export function presentDonation(donation: DonationEntity, project: ProjectOfAppeal | undefined, viewer: Express.User): Donation {
  const received = donation.status === 'succeeded' || donation.status === 'partially_refunded';
  return {
    id: donation.id,
    vesselId: donation.vesselId,
    appealId: donation.appealId,
    repairProjectId: project?.id ?? 0,
    projectTitle: project?.title ?? '',
    amountCents: donation.amountCents,
    refundedCents: donation.refundedCents,
    currency: donation.currency,
    status: donation.status,
    donorName: donation.donorName,
    donorEmail: can(viewer.role, 'donation', 'readDonor') ? donation.donorEmail : null,
    anonymous: donation.anonymous,
    showFirstName: donation.showFirstName,
    dedicationKind: donation.dedicationKind,
    dedicationName: donation.dedicationName,
    failureMessage: donation.failureMessage,
    succeededAt: donation.succeededAt?.toISOString() ?? null,
    createdAt: donation.createdAt.toISOString(),
    updatedAt: donation.updatedAt.toISOString(),
    version: donation.version,
    abilities: { refund: received && can(viewer.role, 'donation', 'refund') },
  };
}
