import { z } from 'zod';
import { richTextDoc } from './rich-text.js';
import { line } from './text.js';

export const appealPhoto = z.object({
  mediaId: z.number().int().positive(),
  altText: line(300, 'Alt text'),
  caption: line(300, 'Caption'),
});

/** An appeal as staff read it. */
export const appeal = z
  .object({
    id: z.number().int().nullable(),
    vesselId: z.number().int(),
    repairProjectId: z.number().int(),
    projectTitle: z.string(),
    projectSlug: z.string(),
    projectStatus: z.string(),
    storyDoc: z.unknown().nullable(),
    storyHtml: z.string(),
    goalCents: z.number().int(),
    photos: z.array(z.object({ mediaId: z.number().int(), altText: z.string(), caption: z.string() })),
    publishedAt: z.string().nullable(),
    raisedCents: z.number().int(),
    refundedCents: z.number().int(),
    giftCount: z.number().int(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean() }),
  })
  .meta({ id: 'Appeal' });
export type Appeal = z.infer<typeof appeal>;

export const saveAppealBody = z
  .object({
    storyDoc: richTextDoc('Story'),
    goalCents: z.number({ error: 'Give the goal.' }).int('Give the goal in whole cents.').min(100, 'The goal must be at least 1.00.').max(100_000_000_00, 'The goal is too large.'),
    photos: z.array(appealPhoto).max(12, 'At most twelve photos.').default([]),
    published: z.boolean().default(false),
    /** 0 for an appeal not yet written. */
    version: z.number().int().min(0),
  })
  .meta({ id: 'SaveAppealBody' });
export type SaveAppealBody = z.input<typeof saveAppealBody>;

export const repairProjectIdParam = z.object({ repairProjectId: z.coerce.number().int().positive() });
