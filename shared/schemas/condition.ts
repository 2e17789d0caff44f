import { z } from 'zod';
import { hazardCautions } from './hazard-cautions.js';
import { GRADES, SEVERITIES } from '../calc/condition-grade.js';
import { RUST_DISTRIBUTIONS } from '../calc/rust-grade.js';
import { listQuery, pageOf } from './common.js';
import { freeText, line } from './text.js';
import { INCIDENT_KINDS } from './incidents.js';

/** The Canadian Conservation Institute's ten agents of deterioration. */
export const AGENTS = [
  'physical-forces',
  'thieves-and-vandals',
  'fire',
  'water',
  'pests',
  'pollutants',
  'light-uv-ir',
  'incorrect-temperature',
  'incorrect-relative-humidity',
  'dissociation',
] as const;
export type Agent = (typeof AGENTS)[number];

export const AGENT_LABELS: Record<Agent, string> = {
  'physical-forces': 'Physical forces',
  'thieves-and-vandals': 'Thieves and vandals',
  fire: 'Fire',
  water: 'Water',
  pests: 'Pests',
  pollutants: 'Pollutants',
  'light-uv-ir': 'Light, ultraviolet and infrared',
  'incorrect-temperature': 'Incorrect temperature',
  'incorrect-relative-humidity': 'Incorrect relative humidity',
  dissociation: 'Dissociation',
};

/** Our list of damage types, with the agents each may come from. */
export const DAMAGE_TYPES = {
  'coating-failure': { label: 'Coating failure', agents: ['water', 'incorrect-relative-humidity', 'light-uv-ir', 'pollutants'] },
  'general-corrosion': { label: 'General corrosion', agents: ['water', 'incorrect-relative-humidity', 'pollutants'] },
  pitting: { label: 'Pitting', agents: ['water', 'incorrect-relative-humidity', 'pollutants'] },
  'section-loss': { label: 'Section loss', agents: ['water', 'incorrect-relative-humidity'] },
  'lagging-damage': { label: 'Lagging damage', agents: ['physical-forces', 'water', 'thieves-and-vandals'] },
  'broken-glass-or-dial': { label: 'Broken glass or dial', agents: ['physical-forces', 'thieves-and-vandals'] },
  'missing-part': { label: 'Missing part', agents: ['thieves-and-vandals', 'dissociation', 'physical-forces'] },
  graffiti: { label: 'Graffiti', agents: ['thieves-and-vandals'] },
  'water-staining': { label: 'Water staining', agents: ['water'] },
  'biological-growth': { label: 'Biological growth', agents: ['pests', 'incorrect-relative-humidity', 'water'] },
  'impact-damage': { label: 'Impact damage, dents', agents: ['physical-forces', 'thieves-and-vandals'] },
  cracking: { label: 'Cracking', agents: ['physical-forces', 'incorrect-temperature', 'incorrect-relative-humidity'] },
  'loose-or-detached': { label: 'Loose or detached', agents: ['physical-forces'] },
  'scorching-or-soot': { label: 'Scorching or soot', agents: ['fire'] },
  'pest-damage': { label: 'Insect or rodent damage', agents: ['pests'] },
  'salt-or-dirt-deposits': { label: 'Salt or dirt deposits', agents: ['pollutants'] },
  fading: { label: 'Fading or chalking', agents: ['light-uv-ir'] },
  'lost-records': { label: 'Lost records or labels', agents: ['dissociation'] },
  other: { label: 'Other', agents: [...AGENTS] },
} as const satisfies Record<string, { label: string; agents: readonly Agent[] }>;
export type DamageType = keyof typeof DAMAGE_TYPES;
export const DAMAGE_TYPE_KEYS = Object.keys(DAMAGE_TYPES) as [DamageType, ...DamageType[]];
/** Damage types for which the surveyor gives percent rusted and its distribution (coatings on steel). */
export const RUST_DAMAGE_TYPES: readonly DamageType[] = ['coating-failure'];

export const METHODS = ['visual', 'close-visual', 'raking-light', 'uv-fluorescence', 'magnification', 'ultrasonic-thickness', 'other'] as const;
export type SurveyMethod = (typeof METHODS)[number];
export const METHOD_LABELS: Record<SurveyMethod, string> = {
  visual: 'Visual',
  'close-visual': 'Close visual',
  'raking-light': 'Raking light',
  'uv-fluorescence': 'UV fluorescence',
  magnification: 'Magnification (loupe or microscope)',
  'ultrasonic-thickness': 'Ultrasonic thickness',
  other: 'Other',
};

export const URGENCIES = ['routine', 'within-a-year', 'within-a-month', 'immediate'] as const;
export const URGENCY_LABELS: Record<(typeof URGENCIES)[number], string> = {
  routine: 'Routine care',
  'within-a-year': 'Within a year',
  'within-a-month': 'Within a month',
  immediate: 'Immediately',
};

export const REPORT_SUBJECTS = ['artifact', 'compartment'] as const;
export type ReportSubject = (typeof REPORT_SUBJECTS)[number];
export const REPORT_STATUSES = ['draft', 'submitted'] as const;

const point = z.tuple([z.number(), z.number()]);
/** Where a finding is: a point or an area (x, y, width, height as fractions 0–1) on a photo, or a point on the deck plan. */
export const findingLocation = z.discriminatedUnion('on', [
  z.object({ on: z.literal('photo'), mediaId: z.number().int().positive(), area: z.tuple([z.number().min(0).max(1), z.number().min(0).max(1), z.number().min(0).max(1), z.number().min(0).max(1)]) }),
  z.object({ on: z.literal('plan'), point }),
]);
export type FindingLocation = z.infer<typeof findingLocation>;

/** A percentage; its range (0–100) is checked by the server, which answers 422 outside it. */
const percent = (label: string) => z.number({ error: `${label} must be a number.` });

/** The percentages of a report and of a finding, with how they are named in messages. */
export const PERCENT_FIELDS = { extentPercent: 'Extent', percentRusted: 'Percent rusted', relativeHumidity: 'Relative humidity' } as const;

export const finding = z
  .object({
    id: z.number().int(),
    reportId: z.number().int(),
    artifactId: z.number().int().nullable(),
    artifactLabel: z.string().nullable(),
    agent: z.enum(AGENTS),
    damageType: z.enum(DAMAGE_TYPE_KEYS),
    location: findingLocation.nullable(),
    /** The location in words: frame and offset from the centerline for a plan point, the photo and part of it for a mark. */
    locationText: z.string().nullable(),
    extentPercent: z.number().nullable(),
    severity: z.enum(SEVERITIES),
    percentRusted: z.number().nullable(),
    rustDistribution: z.enum(RUST_DISTRIBUTIONS).nullable(),
    rustGrade: z.string().nullable(),
    description: z.string(),
    recommendedAction: z.string(),
    urgency: z.enum(URGENCIES),
    position: z.number().int(),
    version: z.number().int(),
  })
  .meta({ id: 'Finding' });
export type Finding = z.infer<typeof finding>;

const findingFields = {
  artifactId: z.number().int().positive().nullable(),
  agent: z.enum(AGENTS, { error: 'Choose the agent of deterioration.' }),
  damageType: z.enum(DAMAGE_TYPE_KEYS, { error: 'Choose the type of damage.' }),
  location: findingLocation.nullable(),
  extentPercent: percent('Extent').nullable(),
  severity: z.enum(SEVERITIES, { error: 'Choose slight, moderate, severe or critical.' }),
  percentRusted: percent('Percent rusted').nullable(),
  rustDistribution: z.enum(RUST_DISTRIBUTIONS, { error: 'Distribution is S, G, P or H.' }).nullable(),
  description: freeText(4000, 'Description'),
  recommendedAction: freeText(2000, 'Recommended action'),
  urgency: z.enum(URGENCIES, { error: 'Choose how urgent the action is.' }),
};

export const createFindingBody = z
  .object({
    ...findingFields,
    artifactId: findingFields.artifactId.default(null),
    location: findingFields.location.default(null),
    extentPercent: findingFields.extentPercent.default(null),
    percentRusted: findingFields.percentRusted.default(null),
    rustDistribution: findingFields.rustDistribution.default(null),
    description: findingFields.description.default(''),
    recommendedAction: findingFields.recommendedAction.default(''),
    urgency: findingFields.urgency.default('routine'),
  })
  .meta({ id: 'CreateFindingBody' });
export type CreateFindingBody = z.input<typeof createFindingBody>;

export const updateFindingBody = z.object({ ...findingFields, version: z.number().int().min(1) }).partial().required({ version: true }).meta({ id: 'UpdateFindingBody' });
export type UpdateFindingBody = z.infer<typeof updateFindingBody>;

const person = z.object({ id: z.number().int(), name: z.string() }).nullable();

/** What every staff role may read of a report. */
export const conditionReportSummary = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    subjectType: z.enum(REPORT_SUBJECTS),
    subjectId: z.number().int(),
    subjectLabel: z.string(),
    revision: z.number().int(),
    supersedesId: z.number().int().nullable(),
    supersededById: z.number().int().nullable(),
    /** The revision that amends this one, draft or submitted. */
    amendmentId: z.number().int().nullable(),
    status: z.enum(REPORT_STATUSES),
    inspectedOn: z.string(),
    surveyor: person,
    method: z.enum(METHODS),
    summary: z.string(),
    grade: z.enum(GRADES),
    findingCount: z.number().int(),
    submittedAt: z.string().nullable(),
    signedBy: z.string().nullable(),
    updatedAt: z.string(),
  })
  .meta({ id: 'ConditionReportSummary' });
export type ConditionReportSummary = z.infer<typeof conditionReportSummary>;

export const conditionReport = conditionReportSummary
  .extend({
    temperatureC: z.number().nullable(),
    relativeHumidity: z.number().nullable(),
    computedGrade: z.enum(GRADES),
    /** The grade's reasoning (from the findings) and the override's: null for roles that read summaries only. */
    gradeBecause: z.string().nullable(),
    gradeOverride: z.enum(GRADES).nullable(),
    overrideReason: z.string().nullable(),
    /** Null for roles that read summaries only. */
    findings: z.array(finding).nullable(),
    /** The hazards recorded where the subject is (an artifact's are its compartment's), each with its caution. */
    subjectHazards: hazardCautions,
    /** The incident that opened this report as a draft, whose photos the report shows. */
    openedByIncidentId: z.number().int().nullable(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), submit: z.boolean(), amend: z.boolean(), delete: z.boolean(), readFindings: z.boolean() }),
  })
  .meta({ id: 'ConditionReport' });
export type ConditionReport = z.infer<typeof conditionReport>;

export const conditionReportsQuery = listQuery(['inspectedOn', 'updatedAt', 'grade'], '-inspectedOn').extend({
  vesselId: z.coerce.number().int().positive().optional(),
  subjectType: z.enum(REPORT_SUBJECTS).optional(),
  subjectId: z.coerce.number().int().positive().optional(),
  status: z.enum(REPORT_STATUSES).optional(),
  grade: z.enum(GRADES).optional(),
  q: line(200, 'Search').optional(),
});
export type ConditionReportsQuery = z.infer<typeof conditionReportsQuery>;
export const conditionReportPage = pageOf(conditionReportSummary).meta({ id: 'ConditionReportPage' });

const isoDate = z.iso.date('Enter the date as YYYY-MM-DD.');
const reportFields = {
  inspectedOn: isoDate,
  method: z.enum(METHODS, { error: 'Choose how the survey was made.' }),
  temperatureC: z.number({ error: 'Temperature must be a number.' }).min(-50, 'Temperature must be between −50 and 60 °C.').max(60, 'Temperature must be between −50 and 60 °C.').nullable(),
  relativeHumidity: percent('Relative humidity').nullable(),
  summary: freeText(8000, 'Summary'),
  gradeOverride: z.enum(GRADES).nullable(),
  overrideReason: freeText(1000, 'Reason').nullable(),
};

export const createConditionReportBody = z
  .object({
    subjectType: z.enum(REPORT_SUBJECTS, { error: 'Say what is surveyed: an artifact or a compartment.' }),
    subjectId: z.number({ error: 'Choose what is surveyed.' }).int().positive(),
    inspectedOn: reportFields.inspectedOn,
    method: reportFields.method.default('visual'),
    temperatureC: reportFields.temperatureC.default(null),
    relativeHumidity: reportFields.relativeHumidity.default(null),
    summary: reportFields.summary.default(''),
  })
  .meta({ id: 'CreateConditionReportBody' });
export type CreateConditionReportBody = z.input<typeof createConditionReportBody>;

export const updateConditionReportBody = z.object({ ...reportFields, version: z.number().int().min(1) }).partial().required({ version: true }).meta({ id: 'UpdateConditionReportBody' });
export type UpdateConditionReportBody = z.infer<typeof updateConditionReportBody>;

export const versionBody = z.object({ version: z.number().int().min(1) }).meta({ id: 'VersionBody' });
export const reportFindingParams = z.object({ id: z.coerce.number().int().positive(), findingId: z.coerce.number().int().positive() });

export const historyQuery = z.object({
  subjectType: z.enum(REPORT_SUBJECTS, { error: 'Say whose history: artifact or compartment.' }),
  subjectId: z.coerce.number().int().positive(),
});

/** A subject's condition over time: its reports and incidents, newest first, and its photos by date. */
export const conditionHistory = z
  .object({
    subjectLabel: z.string(),
    entries: z.array(
      z.discriminatedUnion('kind', [
        z.object({ kind: z.literal('report'), id: z.number().int(), date: z.string(), grade: z.enum(GRADES), status: z.enum(REPORT_STATUSES), revision: z.number().int(), supersededById: z.number().int().nullable(), summary: z.string(), findingCount: z.number().int() }),
        z.object({ kind: z.literal('incident'), id: z.number().int(), date: z.string(), title: z.string(), incidentKind: z.enum(INCIDENT_KINDS) }),
      ]),
    ),
    photos: z.array(
      z.object({
        mediaId: z.number().int(),
        /** The day it shows: taken on (EXIF), else the report's inspection date, else the upload date. */
        date: z.string(),
        thumbUrl: z.string(),
        displayUrl: z.string(),
        caption: z.string(),
        altText: z.string(),
        reportId: z.number().int().nullable(),
      }),
    ),
  })
  .meta({ id: 'ConditionHistory' });
export type ConditionHistory = z.infer<typeof conditionHistory>;
