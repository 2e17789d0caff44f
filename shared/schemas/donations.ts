import { z } from 'zod';
import { email, listQuery, pageOf } from './common.js';
import { line, text } from './text.js';

export const DONATION_STATUSES = ['pending', 'succeeded', 'failed', 'expired', 'refunded', 'partially_refunded'] as const;
export type DonationStatus = (typeof DONATION_STATUSES)[number];
export const DONATION_STATUS_LABELS: Record<DonationStatus, string> = {
  pending: 'Awaiting payment',
  succeeded: 'Received',
  failed: 'Payment failed',
  expired: 'Checkout expired',
  refunded: 'Refunded',
  partially_refunded: 'Partly refunded',
};
/** Statuses whose money was received (and counts in the ledger). */
export const RECEIVED_STATUSES: readonly DonationStatus[] = ['succeeded', 'partially_refunded', 'refunded'];

export const DEDICATION_KINDS = ['honour', 'memory'] as const;
export type DedicationKind = (typeof DEDICATION_KINDS)[number];
export const DEDICATION_LABELS: Record<DedicationKind, string> = { honour: 'In honour of', memory: 'In memory of' };

/**
 * The visitor's gift. The amount is checked against the settings' bounds by the service (422),
 * before any checkout session is made; here only its type.
 */
export const checkoutBody = z
  .object({
    amountCents: z.unknown(),
    name: text(120, 'Name'),
    email,
    anonymous: z.boolean({ error: 'Say whether the gift is anonymous.' }).default(true),
    dedication: z
      .object({
        kind: z.enum(DEDICATION_KINDS, { error: 'Choose in honour or in memory of.' }),
        name: text(120, 'Dedicated to'),
      })
      .nullable()
      .default(null),
  })
  .meta({ id: 'CheckoutBody' });
export type CheckoutBody = z.input<typeof checkoutBody>;

export const checkoutAnswer = z.object({ url: z.string() }).meta({ id: 'CheckoutAnswer' });

export const donation = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    appealId: z.number().int(),
    repairProjectId: z.number().int(),
    projectTitle: z.string(),
    amountCents: z.number().int(),
    refundedCents: z.number().int(),
    currency: z.string(),
    status: z.enum(DONATION_STATUSES),
    donorName: z.string(),
    /** Only for the roles that may read donors' details; otherwise null. */
    donorEmail: z.string().nullable(),
    anonymous: z.boolean(),
    showFirstName: z.boolean(),
    dedicationKind: z.enum(DEDICATION_KINDS).nullable(),
    dedicationName: z.string(),
    failureMessage: z.string(),
    succeededAt: z.string().nullable(),
    createdAt: z.string(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ refund: z.boolean() }),
  })
  .meta({ id: 'Donation' });
export type Donation = z.infer<typeof donation>;

const dateOnly = z.iso.date('Use a date as YYYY-MM-DD.');

export const donationsQuery = listQuery(['createdAt', 'amountCents', 'status', 'donorName'] as const, '-createdAt').extend({
  vesselId: z.coerce.number().int().positive(),
  q: line(120, 'Search').optional(),
  status: z.enum(DONATION_STATUSES).optional(),
  repairProjectId: z.coerce.number().int().positive().optional(),
  from: dateOnly.optional(),
  to: dateOnly.optional(),
});
export type DonationsQuery = z.infer<typeof donationsQuery>;
export const donationsExportQuery = donationsQuery.omit({ page: true, pageSize: true, sort: true });
export type DonationsExportQuery = z.infer<typeof donationsExportQuery>;

export const donationPage = pageOf(donation).meta({ id: 'DonationPage' });

export const refundBody = z
  .object({
    /** Cents to refund; the whole rest when left out. */
    amountCents: z.number({ error: 'Give the amount in cents.' }).int('Give the amount in whole cents.').positive('The refund must be more than zero.').optional(),
    reason: text(300, 'Reason', 'free'),
    version: z.number().int().min(1),
  })
  .meta({ id: 'RefundBody' });
export type RefundBody = z.infer<typeof refundBody>;

export const givingTotals = z
  .object({
    currency: z.string(),
    byProject: z.array(z.object({
      appealId: z.number().int(),
      repairProjectId: z.number().int(),
      projectTitle: z.string(),
      goalCents: z.number().int(),
      raisedCents: z.number().int(),
      refundedCents: z.number().int(),
      giftCount: z.number().int(),
    })),
    byMonth: z.array(z.object({ month: z.string(), raisedCents: z.number().int(), refundedCents: z.number().int(), giftCount: z.number().int() })),
  })
  .meta({ id: 'GivingTotals' });
export type GivingTotals = z.infer<typeof givingTotals>;
