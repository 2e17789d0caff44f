import { z } from 'zod';
import { listQuery, pageOf } from './common.js';
import { richTextDoc, type RichTextDoc } from './rich-text.js';
import { line, text } from './text.js';

/** Interpretive text on an artifact or a compartment: a placard label and a story, per audience. */
export const INTERPRETATION_SUBJECTS = ['artifact', 'compartment'] as const;
export type InterpretationSubject = (typeof INTERPRETATION_SUBJECTS)[number];

export const AUDIENCES = ['general', 'families', 'technical'] as const;
export type Audience = (typeof AUDIENCES)[number];
export const AUDIENCE_LABELS: Record<Audience, string> = { general: 'General', families: 'Families', technical: 'Technical' };

export const INTERPRETATION_PARTS = ['label', 'story'] as const;
export type InterpretationPart = (typeof INTERPRETATION_PARTS)[number];
export const PART_LABELS: Record<InterpretationPart, string> = { label: 'Label', story: 'Story' };

/** draft → in review → published; a save after publishing starts a new draft beside the published snapshot. */
export const INTERPRETATION_STATES = ['draft', 'in-review', 'published'] as const;
export type InterpretationState = (typeof INTERPRETATION_STATES)[number];
export const INTERPRETATION_STATE_LABELS: Record<InterpretationState, string> = { draft: 'Draft', 'in-review': 'In review', published: 'Published' };

const grade = z.number({ error: 'Give a grade (a number).' }).min(1, 'A grade target is at least 1.').max(18, 'A grade target is at most 18.');

/**
 * Targets of the live figures, from the organisation's settings. The defaults (a label of at most
 * 75 words, grade 8 or below for general and family readers) are common practice, no published source.
 */
export const interpretationTargets = z
  .object({
    labelMaxWords: z.number({ error: 'Give the most words of a label.' }).int('Give a whole number of words.').min(5, 'A label may have at least 5 words.').max(500, 'A label may have at most 500 words.'),
    maxGrade: z.object({ general: grade.nullable(), families: grade.nullable(), technical: grade.nullable() }),
  })
  .meta({ id: 'InterpretationTargets' });
export type InterpretationTargets = z.infer<typeof interpretationTargets>;
export const DEFAULT_INTERPRETATION_TARGETS: InterpretationTargets = { labelMaxWords: 75, maxGrade: { general: 8, families: 8, technical: null } };
export const TARGETS_SOURCE = 'Targets from the organisation’s settings; the defaults are common practice, no published source.';

/** One label or story as stored: the editor's document and what the server rendered from it at save. */
export interface RenderedPart {
  doc: RichTextDoc;
  html: string;
  text: string;
}
export type AudienceParts = Record<InterpretationPart, RenderedPart | null>;
export type InterpretationTexts = Record<Audience, AudienceParts | null>;

// The response describes a document loosely (its shape is tiptap's); requests are checked by richTextDoc.
const docShape = z.object({ type: z.literal('doc'), content: z.array(z.record(z.string(), z.unknown())).optional() }) as unknown as z.ZodType<RichTextDoc>;
const renderedPart = z.object({ doc: docShape, html: z.string(), text: z.string() }).meta({ id: 'InterpretationPart' });
const audienceParts = z.object({ label: renderedPart.nullable(), story: renderedPart.nullable() });
export const interpretationTexts = z
  .object({ general: audienceParts.nullable(), families: audienceParts.nullable(), technical: audienceParts.nullable() })
  .meta({ id: 'InterpretationTexts' });

const person = z.object({ id: z.number().int(), name: z.string() }).nullable();

export const interpretation = z
  .object({
    subjectType: z.enum(INTERPRETATION_SUBJECTS),
    subjectId: z.number().int(),
    vesselId: z.number().int(),
    subjectLabel: z.string(),
    state: z.enum(INTERPRETATION_STATES),
    draft: interpretationTexts,
    /** The approved snapshot the public site serves; later drafts do not change it. */
    published: interpretationTexts.nullable(),
    /** Whether the draft holds changes the published snapshot does not. */
    differsFromPublished: z.boolean(),
    publishedAt: z.string().nullable(),
    publishedBy: person,
    submittedAt: z.string().nullable(),
    submittedBy: person,
    lastEditedBy: person,
    /** The curator's comment when the text was last returned (cleared when it is submitted again). */
    returnComment: z.string().nullable(),
    returnedBy: person,
    returnedAt: z.string().nullable(),
    revisions: z.number().int(),
    targets: interpretationTargets,
    updatedAt: z.string().nullable(),
    /** 0 until the first save. */
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), submit: z.boolean(), approve: z.boolean(), return: z.boolean() }),
  })
  .meta({ id: 'Interpretation' });
export type Interpretation = z.infer<typeof interpretation>;

const partInput = (label: string) => richTextDoc(label).nullable();
const audienceInput = (audience: Audience) =>
  z.object({ label: partInput(`${AUDIENCE_LABELS[audience]} label`), story: partInput(`${AUDIENCE_LABELS[audience]} story`) }).nullable();

/** The whole draft: every audience (null or absent: none). An empty document counts as none. */
export const saveInterpretationBody = z
  .object({
    version: z.number({ error: 'Give the version you opened (0 for a first save).' }).int().min(0),
    general: audienceInput('general').optional(),
    families: audienceInput('families').optional(),
    technical: audienceInput('technical').optional(),
  })
  .meta({ id: 'SaveInterpretationBody' });
export type SaveInterpretationBody = z.infer<typeof saveInterpretationBody>;

export const interpretationActionBody = z.object({ version: z.number({ error: 'Give the version you opened.' }).int().min(1) }).meta({ id: 'InterpretationActionBody' });
export type InterpretationActionBody = z.infer<typeof interpretationActionBody>;

export const returnInterpretationBody = z
  .object({ version: z.number({ error: 'Give the version you opened.' }).int().min(1), comment: text(2000, 'Comment', 'free') })
  .meta({ id: 'ReturnInterpretationBody' });
export type ReturnInterpretationBody = z.infer<typeof returnInterpretationBody>;

/** What visitors get: the published html of each audience, nothing of drafts or reviewers. */
const publicParts = z.object({ label: z.string().nullable(), story: z.string().nullable() });
export const publicInterpretation = z
  .object({
    subjectType: z.enum(INTERPRETATION_SUBJECTS),
    subjectId: z.number().int(),
    title: z.string(),
    publishedAt: z.string(),
    audiences: z.object({ general: publicParts.nullable(), families: publicParts.nullable(), technical: publicParts.nullable() }),
  })
  .meta({ id: 'PublicInterpretation' });
export type PublicInterpretation = z.infer<typeof publicInterpretation>;

/** A vessel's interpretive texts: the review queue (state), or a search of their words (q). */
export const interpretationsQuery = listQuery(['updatedAt', 'state'], '-updatedAt').extend({
  state: z.enum(INTERPRETATION_STATES, { error: 'Choose draft, in-review or published.' }).optional(),
  subjectType: z.enum(INTERPRETATION_SUBJECTS, { error: 'Choose artifact or compartment.' }).optional(),
  q: line(200, 'Search').optional(),
});
export type InterpretationsQuery = z.infer<typeof interpretationsQuery>;

export const interpretationSummary = z
  .object({
    subjectType: z.enum(INTERPRETATION_SUBJECTS),
    subjectId: z.number().int(),
    subjectLabel: z.string(),
    state: z.enum(INTERPRETATION_STATES),
    audiences: z.array(z.enum(AUDIENCES)),
    differsFromPublished: z.boolean(),
    hasPublished: z.boolean(),
    submittedBy: person,
    lastEditedBy: person,
    updatedAt: z.string(),
    /** With `q`: the matching words in context, marked as in the collection search. */
    snippet: z.string().nullable(),
  })
  .meta({ id: 'InterpretationSummary' });
export type InterpretationSummary = z.infer<typeof interpretationSummary>;
export const interpretationPage = pageOf(interpretationSummary).meta({ id: 'InterpretationPage' });
export type InterpretationPage = z.infer<typeof interpretationPage>;

/** One kept save of the draft, newest first in lists. */
export const interpretationRevision = z
  .object({ number: z.number().int(), savedAt: z.string(), savedBy: person, texts: interpretationTexts })
  .meta({ id: 'InterpretationRevision' });
export type InterpretationRevision = z.infer<typeof interpretationRevision>;
export const interpretationRevisions = z.array(interpretationRevision);
/** A subject and one of its revisions, by the revision's number (as listed). */
export const interpretationRevisionParams = z.object({ id: z.coerce.number().int().positive(), number: z.coerce.number().int().positive() });
