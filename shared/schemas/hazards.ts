import { z } from 'zod';
import { freeText } from './text.js';

export const HAZARD_KINDS = ['asbestos', 'lead-paint', 'confined-space', 'low-headroom', 'steep-ladder', 'trip-hazard', 'electrical', 'other'] as const;
export type HazardKind = (typeof HAZARD_KINDS)[number];

export const HAZARD_LABELS: Record<HazardKind, string> = {
  asbestos: 'Asbestos-containing material',
  'lead-paint': 'Lead-based paint',
  'confined-space': 'Confined space',
  'low-headroom': 'Low headroom',
  'steep-ladder': 'Steep ladder',
  'trip-hazard': 'Trip hazards',
  electrical: 'Electrical',
  other: 'Other',
};

/** Kinds whose presence puts the entry caution on a compartment. */
export const ENTRY_CAUTION_KINDS: readonly HazardKind[] = ['confined-space', 'asbestos'];

export const ENTRY_CAUTION =
  'Entry follows the site safety plan. A confined space needs a confined-space entry permit and, where required, a certified marine chemist’s gas-free certificate before anyone goes in. Asbestos-containing material must not be disturbed: removal and repair are for licensed abatement contractors. Shipkeeper records and reminds; it never declares a space safe.';

export const hazard = z
  .object({
    id: z.number().int(),
    compartmentId: z.number().int(),
    kind: z.enum(HAZARD_KINDS),
    notes: z.string(),
    lastVerifiedOn: z.string().nullable(),
    verifiedBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), delete: z.boolean() }),
  })
  .meta({ id: 'Hazard' });
export type Hazard = z.infer<typeof hazard>;

const today = () => new Date().toISOString().slice(0, 10);

const hazardFields = {
  kind: z.enum(HAZARD_KINDS, { error: 'Choose the kind of hazard.' }),
  notes: freeText(4000, 'Notes'),
  lastVerifiedOn: z.iso
    .date('Use a date as YYYY-MM-DD.')
    .refine((d) => d <= today(), 'The date of the last check cannot be in the future.')
    .nullable(),
};

export const createHazardBody = z
  .object({ ...hazardFields, notes: hazardFields.notes.default(''), lastVerifiedOn: hazardFields.lastVerifiedOn.default(null) })
  .meta({ id: 'CreateHazardBody' });
export type CreateHazardBody = z.input<typeof createHazardBody>;

export const updateHazardBody = z
  .object({ ...hazardFields, version: z.number().int().min(1) })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateHazardBody' });
export type UpdateHazardBody = z.infer<typeof updateHazardBody>;

export const hazardParams = z.object({ id: z.coerce.number().int().positive(), hazardId: z.coerce.number().int().positive() });
