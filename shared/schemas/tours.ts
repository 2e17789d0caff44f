import { z } from 'zod';
import { listQuery, pageOf } from './common.js';
import { hazardCautions } from './hazard-cautions.js';
import { richTextDoc } from './rich-text.js';
import { TOUR_ACCESSIBILITY, TOUR_AUDIENCES, TOUR_MODES } from '../tour-labels.js';
import { freeText, line, refuseInvalidCharacters, text } from './text.js';

export const TOUR_STATES = ['draft', 'in_review', 'published', 'retired'] as const;
export type TourState = (typeof TOUR_STATES)[number];
export const TOUR_STATE_LABELS: Record<TourState, string> = { draft: 'Draft', in_review: 'In review', published: 'Published', retired: 'Retired' };

export { TOUR_ACCESSIBILITY, TOUR_ACCESSIBILITY_LABELS, TOUR_AUDIENCES, TOUR_AUDIENCE_LABELS, TOUR_MODES, TOUR_MODE_LABELS } from '../tour-labels.js';
export type { TourAccessibility, TourAudience, TourMode } from '../tour-labels.js';
/** BCP 47 tags the tours are written in; one per tour for now. */
export const TOUR_LANGUAGES = ['en', 'es', 'fr', 'de', 'nl', 'it', 'pt'] as const;

const point = z.tuple([z.number(), z.number()]);
const person = z.object({ id: z.number().int(), name: z.string() }).nullable();

export const slug = refuseInvalidCharacters(z.string(), 'Slug')
  .trim()
  .min(1, 'Slug is required.')
  .max(80, 'Slug must be at most 80 characters.')
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'Use lower-case letters, digits and single hyphens (e.g. engine-room-tour).');

/** What a stop shows of the space it is in. */
export const stopPlace = z.object({
  compartmentId: z.number().int(),
  label: z.string(),
  deckId: z.number().int(),
  deckName: z.string(),
  accessStatus: z.string(),
  /** Closed to visitors now by an incident. */
  closedNow: z.boolean(),
});

export const tourStop = z
  .object({
    id: z.number().int(),
    tourId: z.number().int(),
    position: z.number().int(),
    place: stopPlace,
    artifacts: z.array(z.object({ id: z.number().int(), label: z.string() })),
    title: z.string(),
    textDoc: z.object({ type: z.literal('doc') }).passthrough(),
    textHtml: z.string(),
    textPlain: z.string(),
    audio: z.object({ mediaId: z.number().int(), fileName: z.string(), url: z.string() }).nullable(),
    transcript: z.string(),
    dwellMinutes: z.number().int(),
    accessNotes: z.string(),
    lookFor: z.string(),
    virtual: z.boolean(),
    /** Shown as virtual: marked so, or in a space closed to visitors (sealed, staff only or closed now). */
    effectivelyVirtual: z.boolean(),
    point: point.nullable(),
    /** Where the route puts the stop: its point, else its space's centre; null when neither is drawn. */
    standsAt: point.nullable(),
    /** Cautions of the space's hazards for visitors, and the staff's own. */
    visitorCautions: z.array(z.object({ kind: z.string(), text: z.string() })),
    hazardCautions,
    version: z.number().int(),
  })
  .meta({ id: 'TourStop' });
export type TourStop = z.infer<typeof tourStop>;

export const tourRouteFigures = z.object({
  distanceMetres: z.number(),
  deckChanges: z.number().int(),
  walkingMinutes: z.number(),
  dwellMinutes: z.number(),
  totalMinutes: z.number(),
  /** Legs on a deck without a scale: not measured, named in `notes`. */
  unmeasuredLegs: z.number().int(),
  notes: z.array(z.string()),
  legs: z.array(z.object({ from: z.number().int(), to: z.number().int(), metres: z.number().nullable(), deckChanges: z.number().int() })),
});
export type TourRouteFigures = z.infer<typeof tourRouteFigures>;

export const tourSummary = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    title: z.string(),
    slug: z.string(),
    summary: z.string(),
    audience: z.enum(TOUR_AUDIENCES),
    mode: z.enum(TOUR_MODES),
    accessibility: z.enum(TOUR_ACCESSIBILITY),
    coverMediaId: z.number().int().nullable(),
    language: z.string(),
    state: z.enum(TOUR_STATES),
    stopCount: z.number().int(),
    /** The revision the public sees, or null when never published (or retired). */
    published: z.object({ revision: z.number().int(), at: z.string() }).nullable(),
    revision: z.number().int(),
    submittedBy: person,
    updatedAt: z.string(),
    version: z.number().int(),
  })
  .meta({ id: 'TourSummary' });
export type TourSummary = z.infer<typeof tourSummary>;

export const tour = tourSummary
  .extend({
    stops: z.array(tourStop),
    route: tourRouteFigures,
    abilities: z.object({ update: z.boolean(), submit: z.boolean(), approve: z.boolean(), return: z.boolean(), retire: z.boolean(), comment: z.boolean() }),
  })
  .meta({ id: 'Tour' });
export type Tour = z.infer<typeof tour>;

export const toursQuery = listQuery(['title', 'updatedAt', 'state'], 'title').extend({
  state: z.enum(TOUR_STATES).optional(),
  /** Words of the tour's title or summary, or of its stops' titles and text. */
  q: line(200, 'Search').optional(),
});
export type ToursQuery = z.infer<typeof toursQuery>;
/** A tour of the list; with `q`, a snippet of where the words were found (marked as the collection search marks them). */
export const tourListItem = tourSummary.extend({ snippet: z.string().nullable() }).meta({ id: 'TourListItem' });
export type TourListItem = z.infer<typeof tourListItem>;
export const tourPage = pageOf(tourListItem).meta({ id: 'TourPage' });

const tourFields = {
  title: text(160, 'Title'),
  slug,
  summary: freeText(1000, 'Summary'),
  audience: z.enum(TOUR_AUDIENCES, { error: 'Choose the audience: general, families or technical.' }),
  mode: z.enum(TOUR_MODES, { error: 'Choose how the tour is taken: on board, virtual, or both.' }),
  accessibility: z.enum(TOUR_ACCESSIBILITY, { error: 'Choose the access of the route: step-free, some stairs, or ladders.' }),
  coverMediaId: z.number().int().positive().nullable(),
  language: z.enum(TOUR_LANGUAGES, { error: 'Choose a language of the list.' }),
};

export const createTourBody = z
  .object({
    ...tourFields,
    summary: tourFields.summary.default(''),
    audience: tourFields.audience.default('general'),
    mode: tourFields.mode.default('on-board'),
    accessibility: tourFields.accessibility.default('some-stairs'),
    coverMediaId: tourFields.coverMediaId.default(null),
    language: tourFields.language.default('en'),
  })
  .meta({ id: 'CreateTourBody' });
export type CreateTourBody = z.input<typeof createTourBody>;

export const updateTourBody = z.object({ ...tourFields, version: z.number().int().min(1) }).partial().required({ version: true }).meta({ id: 'UpdateTourBody' });
export type UpdateTourBody = z.infer<typeof updateTourBody>;

const stopFields = {
  compartmentId: z.number({ error: 'Choose the space of the stop.' }).int().positive(),
  artifactIds: z.array(z.number().int().positive()).max(20, 'At most 20 artifacts per stop.'),
  title: text(160, 'Title'),
  textDoc: richTextDoc('Text'),
  audioMediaId: z.number().int().positive().nullable(),
  transcript: freeText(20000, 'Transcript'),
  dwellMinutes: z.number({ error: 'Give the minutes spent at the stop.' }).int('Give whole minutes.').min(0, 'Minutes cannot be negative.').max(120, 'At most 120 minutes at one stop.'),
  accessNotes: freeText(1000, 'Access notes'),
  lookFor: freeText(500, 'Look for'),
  virtual: z.boolean(),
  point: point.nullable(),
};

export const createStopBody = z
  .object({
    ...stopFields,
    artifactIds: stopFields.artifactIds.default([]),
    textDoc: stopFields.textDoc.default({ type: 'doc', content: [{ type: 'paragraph' }] }),
    audioMediaId: stopFields.audioMediaId.default(null),
    transcript: stopFields.transcript.default(''),
    dwellMinutes: stopFields.dwellMinutes.default(3),
    accessNotes: stopFields.accessNotes.default(''),
    lookFor: stopFields.lookFor.default(''),
    virtual: stopFields.virtual.default(false),
    point: stopFields.point.default(null),
  })
  .meta({ id: 'CreateTourStopBody' });
export type CreateStopBody = z.input<typeof createStopBody>;

export const updateStopBody = z.object({ ...stopFields, version: z.number().int().min(1) }).partial().required({ version: true }).meta({ id: 'UpdateTourStopBody' });
export type UpdateStopBody = z.infer<typeof updateStopBody>;

/** The new order: every stop id of the tour once (409 when the stops changed meanwhile). */
export const reorderStopsBody = z.object({ stopIds: z.array(z.number().int().positive()).min(1).max(200) }).meta({ id: 'ReorderStopsBody' });
export const versionBody = z.object({ version: z.number().int().min(1) }).meta({ id: 'VersionBody' });
export const returnTourBody = z.object({ version: z.number().int().min(1), comment: text(4000, 'Comment', 'free') }).meta({ id: 'ReturnTourBody' });
export const approveTourBody = z.object({ version: z.number().int().min(1), comment: freeText(4000, 'Comment').default('') }).meta({ id: 'ApproveTourBody' });

export const tourStopParams = z.object({ id: z.coerce.number().int().positive(), stopId: z.coerce.number().int().positive() });
export const vesselToursParams = z.object({ vesselId: z.coerce.number().int().positive() });

export const publishCheck = z
  .object({
    /** Each stops publishing (422 lists them all). */
    problems: z.array(z.object({ stop: z.number().int().nullable(), field: z.string(), message: z.string() })),
    /** Said before publishing; they do not stop it. */
    warnings: z.array(z.object({ stop: z.number().int().nullable(), message: z.string() })),
  })
  .meta({ id: 'TourPublishCheck' });
export type PublishCheck = z.infer<typeof publishCheck>;

export const tourComment = z
  .object({ id: z.number().int(), tourId: z.number().int(), stopId: z.number().int().nullable(), stopTitle: z.string().nullable(), body: z.string(), author: person, revision: z.number().int(), createdAt: z.string() })
  .meta({ id: 'TourComment' });
export type TourComment = z.infer<typeof tourComment>;
export const createCommentBody = z.object({ stopId: z.number().int().positive().nullable().default(null), body: text(4000, 'Comment', 'free') }).meta({ id: 'CreateTourCommentBody' });

export const tourRevisionSummary = z
  .object({ id: z.number().int(), number: z.number().int(), note: z.string(), author: person, createdAt: z.string(), stopCount: z.number().int(), published: z.boolean() })
  .meta({ id: 'TourRevisionSummary' });
export type TourRevisionSummary = z.infer<typeof tourRevisionSummary>;

/** A tour and its stops as one revision keeps them. */
export const revisionSnapshot = z.object({
  tour: z.object({ title: z.string(), slug: z.string(), summary: z.string(), audience: z.string(), mode: z.string(), accessibility: z.string(), coverMediaId: z.number().int().nullable(), language: z.string() }),
  stops: z.array(
    z.object({
      id: z.number().int(),
      compartmentId: z.number().int(),
      artifactIds: z.array(z.number().int()),
      title: z.string(),
      textDoc: z.object({ type: z.literal('doc') }).passthrough(),
      textHtml: z.string(),
      textPlain: z.string(),
      audioMediaId: z.number().int().nullable(),
      transcript: z.string(),
      dwellMinutes: z.number().int(),
      accessNotes: z.string(),
      lookFor: z.string(),
      virtual: z.boolean(),
      point: point.nullable(),
    }),
  ),
});
export type RevisionSnapshot = z.infer<typeof revisionSnapshot>;

export const revisionCompare = z
  .object({
    from: tourRevisionSummary.extend({ snapshot: revisionSnapshot }),
    to: tourRevisionSummary.extend({ snapshot: revisionSnapshot }),
    /** Tour fields that differ, and stops added, removed, moved or changed (by field). */
    tourChanges: z.array(z.string()),
    stopChanges: z.array(z.object({ stopId: z.number().int(), title: z.string(), change: z.enum(['added', 'removed', 'changed', 'moved']), fields: z.array(z.string()) })),
  })
  .meta({ id: 'TourRevisionCompare' });
export type RevisionCompare = z.infer<typeof revisionCompare>;
export const compareQuery = z.object({ from: z.coerce.number().int().positive(), to: z.coerce.number().int().positive() });
export const revisionParams = z.object({ id: z.coerce.number().int().positive(), number: z.coerce.number().int().positive() });

export const tourRouteSettings = z
  .object({ walkingPaceMetresPerSecond: z.number(), deckChangeMetres: z.number(), version: z.number().int() })
  .meta({ id: 'TourRouteSettings' });
export const updateTourRouteSettingsBody = z
  .object({
    walkingPaceMetresPerSecond: z.number({ error: 'Give the walking pace in metres per second.' }).min(0.1, 'At least 0.1 m/s.').max(2, 'At most 2 m/s.'),
    deckChangeMetres: z.number({ error: 'Give the allowance per deck change in metres.' }).min(0, 'Cannot be negative.').max(200, 'At most 200 m.'),
    /** 0 while the vessel uses the defaults. */
    version: z.number().int().min(0),
  })
  .meta({ id: 'UpdateTourRouteSettingsBody' });

// The public read API: only what a curator published, as it was published.

export const publicTourStop = z.object({
  number: z.number().int(),
  title: z.string(),
  html: z.string(),
  space: z.string(),
  deck: z.string(),
  virtual: z.boolean(),
  /** Why the stop is virtual today when it was published on board. */
  notice: z.string().nullable(),
  audio: z.object({ src: z.string(), transcript: z.string() }).nullable(),
  dwellMinutes: z.number().int(),
  accessNotes: z.string(),
  lookFor: z.string(),
  cautions: z.array(z.string()),
});
export type PublicTourStop = z.infer<typeof publicTourStop>;

export const publicTourSummary = z.object({
  slug: z.string(),
  title: z.string(),
  summary: z.string(),
  audience: z.enum(TOUR_AUDIENCES),
  mode: z.enum(TOUR_MODES),
  accessibility: z.enum(TOUR_ACCESSIBILITY),
  language: z.string(),
  vessel: z.string(),
  stopCount: z.number().int(),
  distanceMetres: z.number(),
  durationMinutes: z.number(),
  cover: z.object({ src: z.string(), alt: z.string() }).nullable(),
  publishedAt: z.string(),
});
export const publicTour = publicTourSummary.extend({ stops: z.array(publicTourStop) }).meta({ id: 'PublicTour' });
export type PublicTour = z.infer<typeof publicTour>;
export const publicTourList = z.array(publicTourSummary).meta({ id: 'PublicTourList' });
export const slugParam = z.object({ slug: z.string().max(80) });
export type TourRouteSettings = z.infer<typeof tourRouteSettings>;
export type UpdateTourRouteSettingsBody = z.infer<typeof updateTourRouteSettingsBody>;
