import { z } from 'zod';
import { listQuery, pageOf } from './common.js';
import { freeText, line, refuseInvalidCharacters, text } from './text.js';

export const ARTIFACT_CATEGORIES = [
  'propulsion',
  'boilers-and-steam',
  'auxiliary-machinery',
  'pumps-and-piping',
  'valves-and-fittings',
  'electrical',
  'instruments-and-gauges',
  'tools',
  'furnishings',
  'documents-and-signage',
  'other',
] as const;
export type ArtifactCategory = (typeof ARTIFACT_CATEGORIES)[number];

export const CATEGORY_LABELS: Record<ArtifactCategory, string> = {
  propulsion: 'Propulsion',
  'boilers-and-steam': 'Boilers and steam',
  'auxiliary-machinery': 'Auxiliary machinery',
  'pumps-and-piping': 'Pumps and piping',
  'valves-and-fittings': 'Valves and fittings',
  electrical: 'Electrical',
  'instruments-and-gauges': 'Instruments and gauges',
  tools: 'Tools',
  furnishings: 'Furnishings',
  'documents-and-signage': 'Documents and signage',
  other: 'Other',
};

export const ARTIFACT_STATUSES = ['in-place', 'on-display', 'under-treatment', 'in-store', 'on-loan', 'missing', 'deaccessioned'] as const;
export type ArtifactStatus = (typeof ARTIFACT_STATUSES)[number];
/** Statuses a move may set; deaccessioning is its own step with a reason. */
export const MOVABLE_STATUSES = ['in-place', 'on-display', 'under-treatment', 'in-store', 'on-loan', 'missing'] as const;
/** Statuses of an object aboard, which therefore needs its compartment. */
export const ABOARD_STATUSES: readonly ArtifactStatus[] = ['in-place', 'on-display'];

export const STATUS_LABELS: Record<ArtifactStatus, string> = {
  'in-place': 'In situ',
  'on-display': 'On display',
  'under-treatment': 'Under treatment',
  'in-store': 'In store',
  'on-loan': 'On loan',
  missing: 'Missing',
  deaccessioned: 'Deaccessioned',
};

export const DIMENSION_UNITS = ['mm', 'cm', 'm', 'in', 'ft'] as const;
export type DimensionUnit = (typeof DIMENSION_UNITS)[number];

const point = z.tuple([z.number(), z.number()]);

/** Where an artifact is: a compartment and a point on its deck's plan (plan units). */
export const artifactLocation = z.object({
  compartmentId: z.number().int().nullable(),
  compartmentDesignation: z.string().nullable(),
  compartmentName: z.string().nullable(),
  deckId: z.number().int().nullable(),
  deckName: z.string().nullable(),
  point: point.nullable(),
});
export type ArtifactLocation = z.infer<typeof artifactLocation>;

export const mediaThumb = z.object({ mediaId: z.number().int(), url: z.string(), altText: z.string() });

export const artifact = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    objectNumber: z.string(),
    name: z.string(),
    category: z.enum(ARTIFACT_CATEGORIES),
    description: z.string(),
    dateOrPeriod: z.string(),
    maker: z.string(),
    materials: z.string(),
    height: z.number().nullable(),
    width: z.number().nullable(),
    depth: z.number().nullable(),
    dimensionUnit: z.enum(DIMENSION_UNITS),
    significance: z.string(),
    status: z.enum(ARTIFACT_STATUSES),
    deaccessionReason: z.string().nullable(),
    location: artifactLocation,
    cover: mediaThumb.nullable(),
    createdAt: z.string(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), move: z.boolean(), archive: z.boolean() }),
  })
  .meta({ id: 'Artifact' });
export type Artifact = z.infer<typeof artifact>;

/**
 * A search hit's matched text, with each match between U+E000 and U+E001 so that the client can
 * mark it without ever rendering HTML from the server.
 */
export const HIGHLIGHT_START = '\uE000';
export const HIGHLIGHT_END = '\uE001';

export const artifactListItem = artifact
  .extend({ highlight: z.object({ name: z.string(), snippet: z.string() }).nullable() })
  .meta({ id: 'ArtifactListItem' });
export type ArtifactListItem = z.infer<typeof artifactListItem>;

export const ARTIFACT_SORTS = ['objectNumber', 'name', 'category', 'status', 'updatedAt', 'relevance'] as const;

export const artifactFilters = z.object({
  q: refuseInvalidCharacters(z.string(), 'Search').trim().max(200, 'Search at most 200 characters.').optional(),
  category: z.enum(ARTIFACT_CATEGORIES).optional(),
  status: z.enum(ARTIFACT_STATUSES).optional(),
  deckId: z.coerce.number().int().positive().optional(),
  compartmentId: z.coerce.number().int().positive().optional(),
});
export type ArtifactFilters = z.infer<typeof artifactFilters>;

const sortValues = [...ARTIFACT_SORTS, ...ARTIFACT_SORTS.map((s) => `-${s}` as const)] as const;
/** Without `sort`: best match first when searching, else by object number. */
export const artifactsQuery = listQuery(ARTIFACT_SORTS, 'objectNumber')
  .extend(artifactFilters.shape)
  .extend({ sort: z.enum(sortValues).optional() });
export type ArtifactsQuery = z.infer<typeof artifactsQuery>;

export const artifactPage = pageOf(artifactListItem).meta({ id: 'ArtifactPage' });
export type ArtifactPage = z.infer<typeof artifactPage>;

/** An artifact as a marker on its deck's plan. */
export const artifactMarker = z
  .object({
    id: z.number().int(),
    objectNumber: z.string(),
    name: z.string(),
    category: z.enum(ARTIFACT_CATEGORIES),
    status: z.enum(ARTIFACT_STATUSES),
    compartmentId: z.number().int(),
    point: point,
    thumbUrl: z.string().nullable(),
    version: z.number().int(),
  })
  .meta({ id: 'ArtifactMarker' });
export type ArtifactMarker = z.infer<typeof artifactMarker>;
export const artifactMarkers = z.array(artifactMarker);

const measure = (label: string) =>
  z
    .number({ error: `${label} must be a number.` })
    .positive(`${label} must be more than 0.`)
    .max(100_000, `${label} must be at most 100000.`)
    .nullable();

const describingFields = {
  objectNumber: refuseInvalidCharacters(z.string({ error: 'Object number is required.' }), 'Object number').trim().min(1, 'Object number is required.').max(40, 'Object number must be at most 40 characters.'),
  name: text(160, 'Name'),
  category: z.enum(ARTIFACT_CATEGORIES, { error: 'Choose a category.' }),
  description: freeText(8000, 'Description'),
  dateOrPeriod: line(80, 'Date or period'),
  maker: line(200, 'Maker'),
  materials: line(400, 'Materials'),
  height: measure('Height'),
  width: measure('Width'),
  depth: measure('Depth'),
  dimensionUnit: z.enum(DIMENSION_UNITS, { error: 'Choose mm, cm, m, in or ft.' }),
  significance: freeText(8000, 'Significance'),
};

const placeFields = {
  compartmentId: z.number({ error: 'Choose a compartment.' }).int().positive().nullable(),
  point: point.nullable(),
};

export const createArtifactBody = z
  .object({
    ...describingFields,
    description: describingFields.description.default(''),
    dateOrPeriod: describingFields.dateOrPeriod.default(''),
    maker: describingFields.maker.default(''),
    materials: describingFields.materials.default(''),
    height: describingFields.height.default(null),
    width: describingFields.width.default(null),
    depth: describingFields.depth.default(null),
    dimensionUnit: describingFields.dimensionUnit.default('cm'),
    significance: describingFields.significance.default(''),
    status: z.enum(MOVABLE_STATUSES, { error: 'Choose in place, in store, on loan or missing.' }).default('in-place'),
    compartmentId: placeFields.compartmentId.default(null),
    point: placeFields.point.default(null),
  })
  .meta({ id: 'CreateArtifactBody' });
export type CreateArtifactBody = z.input<typeof createArtifactBody>;

/** Describing fields only: place and status change through a recorded move. */
export const updateArtifactBody = z
  .object({ ...describingFields, version: z.number().int().min(1) })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateArtifactBody' });
export type UpdateArtifactBody = z.infer<typeof updateArtifactBody>;

const isoDate = z.iso.date('Enter the date as YYYY-MM-DD.');

export const moveArtifactBody = z
  .object({
    ...placeFields,
    status: z.enum(MOVABLE_STATUSES, { error: 'Choose in place, in store, on loan or missing.' }),
    /** Required for a move; a first placement on the plan (same compartment, no point yet) needs none. */
    reason: text(500, 'Reason', 'free').optional(),
    movedOn: isoDate.optional(),
    version: z.number().int().min(1),
  })
  .meta({ id: 'MoveArtifactBody' });
export type MoveArtifactBody = z.input<typeof moveArtifactBody>;

export const archiveArtifactBody = z
  .object({ reason: text(1000, 'Reason', 'free'), movedOn: isoDate.optional(), version: z.number().int().min(1) })
  .meta({ id: 'ArchiveArtifactBody' });
export type ArchiveArtifactBody = z.input<typeof archiveArtifactBody>;

export const MOVE_KINDS = ['recorded', 'placed', 'moved', 'status', 'deaccessioned'] as const;
export type MoveKind = (typeof MOVE_KINDS)[number];

const placeSnapshot = z.object({
  status: z.enum(ARTIFACT_STATUSES),
  compartmentId: z.number().int().nullable(),
  compartmentLabel: z.string().nullable(),
  point: point.nullable(),
});

export const artifactMove = z
  .object({
    id: z.number().int(),
    artifactId: z.number().int(),
    kind: z.enum(MOVE_KINDS),
    movedOn: z.string(),
    from: placeSnapshot.nullable(),
    to: placeSnapshot,
    reason: z.string(),
    by: z.object({ id: z.number().int(), name: z.string() }).nullable(),
    recordedAt: z.string(),
  })
  .meta({ id: 'ArtifactMove' });
export type ArtifactMove = z.infer<typeof artifactMove>;
export const artifactMoves = z.array(artifactMove);
