import { z } from 'zod';
import { hazardCautions } from './hazard-cautions.js';
import { listQuery, pageOf } from './common.js';
import { freeText, line, text } from './text.js';
import { HAZARD_KINDS } from './hazards.js';

export const ACCESS_STATUSES = ['open', 'guided-only', 'staff-only', 'sealed'] as const;
export type AccessStatus = (typeof ACCESS_STATUSES)[number];

export const ACCESS_LABELS: Record<AccessStatus, string> = {
  open: 'Open',
  'guided-only': 'Guided only',
  'staff-only': 'Staff only',
  sealed: 'Sealed',
};

const point = z.tuple([z.number(), z.number()]);

export const compartment = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    deckId: z.number().int(),
    deckName: z.string(),
    designation: z.string(),
    designationExplanation: z.string().nullable(),
    designationWarnings: z.array(z.string()),
    name: z.string(),
    description: z.string(),
    accessStatus: z.enum(ACCESS_STATUSES),
    virtualVisit: z.boolean(),
    outline: z.array(point).nullable(),
    floorArea: z.object({ squareMetres: z.number(), squareFeet: z.number() }).nullable(),
    perimeter: z.object({ metres: z.number(), feet: z.number() }).nullable(),
    hazardKinds: z.array(z.enum(HAZARD_KINDS)),
    entryCaution: z.string().nullable(),
    /** Every hazard recorded here with its own caution. */
    hazardCautions,
    createdAt: z.string(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), delete: z.boolean(), editHazards: z.boolean() }),
  })
  .meta({ id: 'Compartment' });
export type Compartment = z.infer<typeof compartment>;

export const compartmentsQuery = listQuery(['designation', 'name', 'accessStatus', 'createdAt'], 'designation').extend({
  deckId: z.coerce.number().int().positive().optional(),
  accessStatus: z.enum(ACCESS_STATUSES).optional(),
  hazard: z.enum(HAZARD_KINDS).optional(),
  q: line(100, 'Search').optional(),
});
export type CompartmentsQuery = z.infer<typeof compartmentsQuery>;

export const compartmentPage = pageOf(compartment).meta({ id: 'CompartmentPage' });

const compartmentFields = {
  deckId: z.number({ error: 'Choose a deck.' }).int().positive(),
  designation: text(40, 'Designation'),
  name: text(120, 'Name'),
  description: freeText(4000, 'Description'),
  accessStatus: z.enum(ACCESS_STATUSES, { error: 'Choose who may enter: open, guided only, staff only or sealed.' }),
  virtualVisit: z.boolean(),
  outline: z.array(point, { error: 'An outline is a list of [x, y] corners.' }).max(500, 'An outline has at most 500 corners.').nullable(),
};

export const createCompartmentBody = z
  .object({
    ...compartmentFields,
    description: compartmentFields.description.default(''),
    accessStatus: compartmentFields.accessStatus.default('staff-only'),
    virtualVisit: compartmentFields.virtualVisit.default(false),
    outline: compartmentFields.outline.default(null),
  })
  .meta({ id: 'CreateCompartmentBody' });
export type CreateCompartmentBody = z.input<typeof createCompartmentBody>;

export const updateCompartmentBody = z
  .object({ ...compartmentFields, version: z.number().int().min(1) })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateCompartmentBody' });
export type UpdateCompartmentBody = z.infer<typeof updateCompartmentBody>;
