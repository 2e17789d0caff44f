import { z } from 'zod';
import { publicClosure } from './incidents.js';
import { publicVessel } from './vessels.js';

export const visitSite = z
  .object({ organisationName: z.string(), vessels: z.array(publicVessel.extend({ closures: z.array(publicClosure) })) })
  .meta({ id: 'VisitSite' });
export type VisitSite = z.infer<typeof visitSite>;

export const publicAppealSummary = z
  .object({
    slug: z.string(),
    title: z.string(),
    vesselName: z.string(),
    summary: z.string(),
    coverPhoto: z.object({ url: z.string(), altText: z.string() }).nullable(),
    currency: z.string(),
    goalCents: z.number().int(),
    raisedCents: z.number().int(),
    giftCount: z.number().int(),
  })
  .meta({ id: 'PublicAppealSummary' });
export type PublicAppealSummary = z.infer<typeof publicAppealSummary>;

export const publicAppeal = publicAppealSummary
  .extend({
    storyHtml: z.string(),
    photos: z.array(z.object({ url: z.string(), altText: z.string(), caption: z.string() })),
    /** First names of donors who agreed to it, otherwise "Anonymous"; newest first. */
    recentGifts: z.array(z.object({ name: z.string(), at: z.string() })),
    giving: z.object({ minimumCents: z.number().int(), maximumCents: z.number().int(), presetCents: z.array(z.number().int()) }),
  })
  .meta({ id: 'PublicAppeal' });
export type PublicAppeal = z.infer<typeof publicAppeal>;

export const publicAppealList = z.object({ items: z.array(publicAppealSummary) }).meta({ id: 'PublicAppealList' });

/** What the thank-you page may say about a gift, by its checkout session. */
export const publicGiftStatus = z
  .object({
    status: z.enum(['pending', 'received', 'failed', 'expired', 'refunded']),
    amountCents: z.number().int(),
    currency: z.string(),
    projectTitle: z.string(),
    slug: z.string(),
    failureMessage: z.string(),
  })
  .meta({ id: 'PublicGiftStatus' });
export type PublicGiftStatus = z.infer<typeof publicGiftStatus>;
