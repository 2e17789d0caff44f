import { z } from 'zod';
import { PRIORITY_BANDS } from '../calc/abc-risk.js';
import { listQuery, pageOf } from './common.js';
import { freeText, text } from './text.js';
import { AGENTS } from './condition.js';

export const RISK_STATUSES = ['open', 'treated'] as const;
export const RISK_STATUS_LABELS: Record<(typeof RISK_STATUSES)[number], string> = { open: 'Open', treated: 'Treated' };

export const risk = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    statement: z.string(),
    agent: z.enum(AGENTS),
    status: z.enum(RISK_STATUSES),
    a: z.number(),
    b: z.number(),
    c: z.number(),
    yearsBetween: z.number().nullable(),
    lossPerItemPercent: z.number().nullable(),
    assetFractionPercent: z.number().nullable(),
    magnitude: z.number(),
    band: z.enum(PRIORITY_BANDS),
    bandLabel: z.string(),
    artifacts: z.array(z.object({ id: z.number().int(), label: z.string() })),
    compartments: z.array(z.object({ id: z.number().int(), label: z.string(), deckId: z.number().int() })),
    notes: z.string(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), delete: z.boolean() }),
  })
  .meta({ id: 'Risk' });
export type Risk = z.infer<typeof risk>;

export const risksQuery = listQuery(['magnitude', 'updatedAt', 'agent'], '-magnitude').extend({
  vesselId: z.coerce.number().int().positive(),
  agent: z.enum(AGENTS).optional(),
  status: z.enum(RISK_STATUSES).optional(),
  deckId: z.coerce.number().int().positive().optional(),
  compartmentId: z.coerce.number().int().positive().optional(),
  band: z.enum(PRIORITY_BANDS).optional(),
});
export type RisksQuery = z.infer<typeof risksQuery>;
export const riskPage = pageOf(risk).meta({ id: 'RiskPage' });

const positive = (label: string) => z.number({ error: `${label} must be a number.` });
const ids = z.array(z.number().int().positive()).max(100, 'At most 100.');

/** Each score is given directly (1–5 in half steps) or from its plain input; the server converts and checks. */
const riskFields = {
  statement: text(300, 'Risk', 'free'),
  agent: z.enum(AGENTS, { error: 'Choose the agent of deterioration.' }),
  status: z.enum(RISK_STATUSES),
  a: positive('A').nullable(),
  b: positive('B').nullable(),
  c: positive('C').nullable(),
  yearsBetween: positive('Years between events').nullable(),
  lossPerItemPercent: positive('Loss of value to each item').nullable(),
  assetFractionPercent: positive('Share of the heritage value').nullable(),
  artifactIds: ids,
  compartmentIds: ids,
  notes: freeText(4000, 'Notes'),
};

export const createRiskBody = z
  .object({
    vesselId: z.number().int().positive(),
    ...riskFields,
    status: riskFields.status.default('open'),
    a: riskFields.a.default(null),
    b: riskFields.b.default(null),
    c: riskFields.c.default(null),
    yearsBetween: riskFields.yearsBetween.default(null),
    lossPerItemPercent: riskFields.lossPerItemPercent.default(null),
    assetFractionPercent: riskFields.assetFractionPercent.default(null),
    artifactIds: riskFields.artifactIds.default([]),
    compartmentIds: riskFields.compartmentIds.default([]),
    notes: riskFields.notes.default(''),
  })
  .meta({ id: 'CreateRiskBody' });
export type CreateRiskBody = z.input<typeof createRiskBody>;

export const updateRiskBody = z.object({ ...riskFields, version: z.number().int().min(1) }).partial().required({ version: true }).meta({ id: 'UpdateRiskBody' });
export type UpdateRiskBody = z.infer<typeof updateRiskBody>;

/** Per compartment of a deck: its current condition and its open risks, for the map's overlays. */
export const deckConditionOverlay = z
  .object({
    compartments: z.array(
      z.object({
        compartmentId: z.number().int(),
        grade: z.enum(['good', 'fair', 'poor', 'critical']).nullable(),
        reportId: z.number().int().nullable(),
        inspectedOn: z.string().nullable(),
        openRisks: z.number().int(),
        maxMagnitude: z.number().nullable(),
        band: z.enum(PRIORITY_BANDS).nullable(),
      }),
    ),
  })
  .meta({ id: 'DeckConditionOverlay' });
export type DeckConditionOverlay = z.infer<typeof deckConditionOverlay>;
