import { z } from 'zod';
import { media } from './media.js';
import { freeText, line } from './text.js';

export const treatment = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    projectId: z.number().int(),
    performedOn: z.string(),
    performedBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
    contractorName: z.string(),
    /** Who did the work, in words: the user's name or the contractor's. */
    performerLabel: z.string(),
    method: z.string(),
    materials: z.string(),
    /** Empty for a role that does not read condition findings; `findingCount` says how many. */
    findings: z.array(z.object({ id: z.number().int(), label: z.string() })),
    findingCount: z.number().int(),
    /** Empty for a role that may not see the photos of treatments. */
    beforePhotos: z.array(media),
    afterPhotos: z.array(media),
    createdAt: z.string(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), addPhotos: z.boolean() }),
  })
  .meta({ id: 'Treatment' });
export type Treatment = z.infer<typeof treatment>;
export const treatmentList = z.array(treatment).meta({ id: 'TreatmentList' });

const ids = z.array(z.number().int().positive()).max(100, 'At most 100.');

const treatmentFields = {
  performedOn: z.iso.date('Enter the date as YYYY-MM-DD.'),
  performedById: z.number().int().positive().nullable(),
  contractorName: line(200, 'Contractor'),
  method: freeText(4000, 'Method'),
  materials: line(1000, 'Materials'),
  findingIds: ids,
};

/** Who did the work is a user of ours or a named contractor; the service checks that one is given. */
export const createTreatmentBody = z
  .object({
    ...treatmentFields,
    performedById: treatmentFields.performedById.default(null),
    contractorName: treatmentFields.contractorName.default(''),
    materials: treatmentFields.materials.default(''),
    findingIds: treatmentFields.findingIds.default([]),
  })
  .meta({ id: 'CreateTreatmentBody' });
export type CreateTreatmentBody = z.input<typeof createTreatmentBody>;

export const updateTreatmentBody = z
  .object({ ...treatmentFields, version: z.number({ error: 'Version is required.' }).int().min(1) })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateTreatmentBody' });
export type UpdateTreatmentBody = z.infer<typeof updateTreatmentBody>;
