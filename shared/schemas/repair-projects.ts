import { z } from 'zod';
import { hazardCautions } from './hazard-cautions.js';
import { listQuery, pageOf } from './common.js';
import { EMPTY_DOC, richTextDoc } from './rich-text.js';
import { freeText, line, refuseInvalidCharacters, text } from './text.js';

export const REPAIR_PROJECT_STATUSES = ['proposed', 'approved', 'fundraising', 'funded', 'underway', 'complete', 'cancelled'] as const;
export type RepairProjectStatus = (typeof REPAIR_PROJECT_STATUSES)[number];
export const REPAIR_PROJECT_STATUS_LABELS: Record<RepairProjectStatus, string> = {
  proposed: 'Proposed',
  approved: 'Approved',
  fundraising: 'Fundraising',
  funded: 'Funded',
  underway: 'Underway',
  complete: 'Complete',
  cancelled: 'Cancelled',
};

/** The road a project travels; cancelling is open from any status before complete. */
export const REPAIR_PROJECT_FLOW: readonly RepairProjectStatus[] = ['proposed', 'approved', 'fundraising', 'funded', 'underway', 'complete'];

/** The statuses a project may move to from `status`, whoever asks. */
export function statusesAfter(status: RepairProjectStatus): RepairProjectStatus[] {
  if (status === 'complete' || status === 'cancelled') return [];
  const next = REPAIR_PROJECT_FLOW[REPAIR_PROJECT_FLOW.indexOf(status) + 1];
  return next ? [next, 'cancelled'] : ['cancelled'];
}

/** The work flags a scope may raise, beside the hazards recorded in the spaces it touches. */
export const REPAIR_WORK_FLAGS = ['hotWork', 'asbestos', 'leadPaint'] as const;
export type RepairWorkFlag = (typeof REPAIR_WORK_FLAGS)[number];
export const REPAIR_WORK_FLAG_LABELS: Record<RepairWorkFlag, string> = {
  hotWork: 'Hot work (welding, cutting, grinding, brazing)',
  asbestos: 'Asbestos-containing material may be disturbed',
  leadPaint: 'Lead paint may be disturbed',
};

/** A slug: lowercase letters, digits and single hyphens, unique within the vessel. */
export const SLUG_PATTERN = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;
export const slug = refuseInvalidCharacters(z.string(), 'Slug')
  .trim()
  .min(1, 'Slug is required.')
  .max(80, 'Slug must be at most 80 characters.')
  .regex(SLUG_PATTERN, 'Slug may hold only lowercase letters, digits and single hyphens between them.');

/** Quantities are stored in thousandths of a unit (integers, QUANTITY_SCALE of shared/calc/estimate.ts), so 2.5 m² is 2500. */
export const QUANTITY_MILLI_MAX = 1_000_000_000; // 1,000,000 units
export const UNIT_COST_CENTS_MAX = 1_000_000_000; // 10,000,000.00 per unit
/** The largest estimate total kept (1,000,000,000.00), far inside exact integers. */
export const ESTIMATE_TOTAL_CENTS_MAX = 100_000_000_000;
export const CONTINGENCY_BASIS_POINTS_MAX = 10_000; // 100 %

export const estimateLine = z.object({
  id: z.number().int(),
  position: z.number().int(),
  description: z.string(),
  quantityMilli: z.number().int(),
  unit: z.string(),
  unitCostCents: z.number().int(),
  totalCents: z.number().int(),
});
export type EstimateLine = z.infer<typeof estimateLine>;

export const statusChange = z.object({
  id: z.number().int(),
  fromStatus: z.enum(REPAIR_PROJECT_STATUSES).nullable(),
  toStatus: z.enum(REPAIR_PROJECT_STATUSES),
  at: z.string(),
  by: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  note: z.string(),
});
export type StatusChange = z.infer<typeof statusChange>;

const linked = z.object({ id: z.number().int(), label: z.string() });

const workCaution = z.object({ kind: z.string(), label: z.string(), caution: z.string() });

/** A finding the project or its treatments address, as reported, beside what the next survey of its subject recorded. */
export const findingOutcome = z.object({
  finding: z.object({
    id: z.number().int(),
    reportId: z.number().int(),
    inspectedOn: z.string(),
    subjectLabel: z.string(),
    artifactLabel: z.string().nullable(),
    agentLabel: z.string(),
    damageLabel: z.string(),
    severity: z.string(),
    severityLabel: z.string(),
    description: z.string(),
    recommendedAction: z.string(),
  }),
  /** The date of the last treatment addressing it, if any. */
  treatedOn: z.string().nullable(),
  next: z
    .object({
      reportId: z.number().int(),
      inspectedOn: z.string(),
      grade: z.string(),
      gradeLabel: z.string(),
      summary: z.string(),
      /** Findings of the same agent and damage on the same object in that report; none means it was not found again. */
      findings: z.array(z.object({ id: z.number().int(), severityLabel: z.string(), description: z.string() })),
    })
    .nullable(),
});
export type FindingOutcome = z.infer<typeof findingOutcome>;

export const repairProjectSummary = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    title: z.string(),
    slug: z.string(),
    status: z.enum(REPAIR_PROJECT_STATUSES),
    statusLabel: z.string(),
    /** The total including contingency, in cents. */
    estimateCents: z.number().int(),
    contingencyBasisPoints: z.number().int(),
    updatedAt: z.string(),
    version: z.number().int(),
  })
  .meta({ id: 'RepairProjectSummary' });
export type RepairProjectSummary = z.infer<typeof repairProjectSummary>;

export const repairProject = repairProjectSummary
  .extend({
    scope: richTextDoc('Scope'),
    scopeHtml: z.string(),
    scopeText: z.string(),
    lines: z.array(estimateLine),
    /** Sum of the line totals, before contingency. */
    subtotalCents: z.number().int(),
    contingencyCents: z.number().int(),
    contractorNotes: z.string(),
    permitNotes: z.string(),
    hotWork: z.boolean(),
    asbestos: z.boolean(),
    leadPaint: z.boolean(),
    /** Cautions of the work flags (hot work, asbestos, lead paint). */
    workCautions: z.array(workCaution),
    /** Cautions of the hazards recorded in the linked compartments and the compartments of the linked artifacts. */
    spaceCautions: hazardCautions,
    /** Whether this reader may see condition findings (the roles that read findings); otherwise `findings` is empty. */
    findingsVisible: z.boolean(),
    findingCount: z.number().int(),
    findings: z.array(linked.extend({ reportId: z.number().int() })),
    findingOutcomes: z.array(findingOutcome),
    risks: z.array(linked),
    artifacts: z.array(linked),
    compartments: z.array(linked.extend({ deckId: z.number().int() })),
    statusChanges: z.array(statusChange),
    /** The statuses this user may move the project to now. */
    nextStatuses: z.array(z.enum(REPAIR_PROJECT_STATUSES)),
    createdAt: z.string(),
    abilities: z.object({ update: z.boolean(), changeStatus: z.boolean(), addTreatment: z.boolean() }),
  })
  .meta({ id: 'RepairProject' });
export type RepairProject = z.infer<typeof repairProject>;

export const repairProjectsQuery = listQuery(['updatedAt', 'title', 'estimateCents', 'createdAt'], '-updatedAt').extend({
  status: z.enum(REPAIR_PROJECT_STATUSES, { error: `Status must be one of ${REPAIR_PROJECT_STATUSES.join(', ')}.` }).optional(),
});
export type RepairProjectsQuery = z.infer<typeof repairProjectsQuery>;
export const repairProjectPage = pageOf(repairProjectSummary).meta({ id: 'RepairProjectPage' });

export const estimateLineBody = z.object({
  description: text(300, 'Line description'),
  quantityMilli: z
    .number({ error: 'Quantity must be a number.' })
    .int('Quantity must be whole thousandths of a unit.')
    .min(1, 'Quantity must be more than zero.')
    .max(QUANTITY_MILLI_MAX, 'Quantity must be at most 1,000,000 units.'),
  unit: line(30, 'Unit'),
  unitCostCents: z
    .number({ error: 'Unit cost must be a number of cents.' })
    .int('Unit cost must be a whole number of cents.')
    .min(0, 'Unit cost may not be negative.')
    .max(UNIT_COST_CENTS_MAX, 'Unit cost must be at most 10,000,000.00.'),
});
export type EstimateLineBody = z.infer<typeof estimateLineBody>;

const ids = z.array(z.number().int().positive()).max(100, 'At most 100.');

const projectFields = {
  title: text(200, 'Title'),
  slug,
  scope: richTextDoc('Scope'),
  lines: z.array(estimateLineBody).max(200, 'At most 200 estimate lines.'),
  contingencyBasisPoints: z
    .number({ error: 'Contingency must be a number.' })
    .int('Contingency must be whole hundredths of a percent.')
    .min(0, 'Contingency may not be negative.')
    .max(CONTINGENCY_BASIS_POINTS_MAX, 'Contingency must be at most 100 %.'),
  contractorNotes: freeText(4000, 'Contractor notes'),
  permitNotes: freeText(4000, 'Permit notes'),
  hotWork: z.boolean(),
  asbestos: z.boolean(),
  leadPaint: z.boolean(),
  findingIds: ids,
  riskIds: ids,
  artifactIds: ids,
  compartmentIds: ids,
};

export const createRepairProjectBody = z
  .object({
    ...projectFields,
    scope: projectFields.scope.default(EMPTY_DOC),
    lines: projectFields.lines.default([]),
    contingencyBasisPoints: projectFields.contingencyBasisPoints.default(1000),
    contractorNotes: projectFields.contractorNotes.default(''),
    permitNotes: projectFields.permitNotes.default(''),
    hotWork: projectFields.hotWork.default(false),
    asbestos: projectFields.asbestos.default(false),
    leadPaint: projectFields.leadPaint.default(false),
    findingIds: projectFields.findingIds.default([]),
    riskIds: projectFields.riskIds.default([]),
    artifactIds: projectFields.artifactIds.default([]),
    compartmentIds: projectFields.compartmentIds.default([]),
  })
  .meta({ id: 'CreateRepairProjectBody' });
export type CreateRepairProjectBody = z.input<typeof createRepairProjectBody>;

export const updateRepairProjectBody = z
  .object({ ...projectFields, version: z.number({ error: 'Version is required.' }).int().min(1) })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateRepairProjectBody' });
export type UpdateRepairProjectBody = z.infer<typeof updateRepairProjectBody>;

export const changeRepairProjectStatusBody = z
  .object({
    status: z.enum(REPAIR_PROJECT_STATUSES, { error: `Status must be one of ${REPAIR_PROJECT_STATUSES.join(', ')}.` }),
    note: freeText(1000, 'Note').default(''),
    version: z.number({ error: 'Version is required.' }).int().min(1),
  })
  .meta({ id: 'ChangeRepairProjectStatusBody' });
export type ChangeRepairProjectStatusBody = z.input<typeof changeRepairProjectStatusBody>;
