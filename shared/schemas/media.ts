import { z } from 'zod';
import { freeText, line } from './text.js';

/** A treatment's photos are of two kinds, before and after the work: one owner type each. */
export const MEDIA_OWNER_TYPES = ['artifact', 'compartment', 'condition-report', 'incident', 'treatment-before', 'treatment-after', 'tour'] as const;
export type MediaOwnerType = (typeof MEDIA_OWNER_TYPES)[number];

export const MEDIA_KINDS = ['photo', 'document', 'audio'] as const;
export type MediaKind = (typeof MEDIA_KINDS)[number];

export const PHOTO_FORMATS = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const DOCUMENT_FORMATS = ['application/pdf'] as const;
/** A stop's audio clip: MP3, M4A or Ogg, as file-type names them by content. */
export const AUDIO_FORMATS = ['audio/mpeg', 'audio/x-m4a', 'audio/ogg', 'audio/ogg; codecs=opus'] as const;
export const AUDIO_ACCEPT = '.mp3,.m4a,.ogg,.oga,.opus,audio/mpeg,audio/mp4,audio/x-m4a,audio/ogg';
/** What the general upload takes (audio comes only through a tour). */
export const UPLOAD_FORMATS = [...PHOTO_FORMATS, ...DOCUMENT_FORMATS] as const;
export const MEDIA_FORMATS = [...UPLOAD_FORMATS, ...AUDIO_FORMATS] as const;
/** The file picker's accept list. */
export const MEDIA_ACCEPT = '.jpg,.jpeg,.png,.webp,.pdf,image/jpeg,image/png,image/webp,application/pdf';

/** Longest side of each derivative, in pixels. */
export const DERIVATIVE_SIZES = { thumb: 320, display: 1600 } as const;
export type DerivativeName = keyof typeof DERIVATIVE_SIZES;
export const DERIVATIVES = Object.keys(DERIVATIVE_SIZES) as DerivativeName[];

export const media = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    ownerType: z.enum(MEDIA_OWNER_TYPES),
    ownerId: z.number().int(),
    kind: z.enum(MEDIA_KINDS),
    mimeType: z.enum(MEDIA_FORMATS),
    fileName: z.string(),
    byteSize: z.number().int(),
    width: z.number().int().nullable(),
    height: z.number().int().nullable(),
    takenAt: z.string().nullable(),
    caption: z.string(),
    credit: z.string(),
    altText: z.string(),
    rights: z.string(),
    /** Marked by the staff for public pages and summaries. */
    publicUse: z.boolean(),
    /** Whether a public page or a summary may show it: a photo marked for public use, with alt text. */
    publishable: z.boolean(),
    urls: z.object({ thumb: z.string().nullable(), display: z.string().nullable(), original: z.string() }),
    uploadedBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
    createdAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), delete: z.boolean() }),
  })
  .meta({ id: 'Media' });
export type Media = z.infer<typeof media>;
export const mediaList = z.array(media);

export const mediaOwnerQuery = z.object({
  ownerType: z.enum(MEDIA_OWNER_TYPES, { error: 'Say what the file belongs to: artifact, compartment, condition-report, incident, treatment-before, treatment-after or tour.' }),
  ownerId: z.coerce.number({ error: 'Give the id of the record the file belongs to.' }).int().positive(),
});
export type MediaOwnerQuery = z.infer<typeof mediaOwnerQuery>;

export const updateMediaBody = z
  .object({
    caption: freeText(500, 'Caption'),
    credit: line(200, 'Credit'),
    altText: freeText(300, 'Alt text'),
    rights: freeText(500, 'Rights note'),
    publicUse: z.boolean({ error: 'Say whether public pages may show it (true or false).' }),
    version: z.number().int().min(1),
  })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateMediaBody' });
export type UpdateMediaBody = z.infer<typeof updateMediaBody>;

export const mediaFileParams = z.object({
  id: z.coerce.number().int().positive(),
  variant: z.enum(['thumb', 'display', 'original']),
});
