import { z } from 'zod';
import { listQuery, pageOf } from './common.js';
import { freeText, line, text } from './text.js';

export const DESIGNATION_SCHEMES = ['free-text', 'us-navy-1949'] as const;
export type DesignationScheme = (typeof DESIGNATION_SCHEMES)[number];

export const DESIGNATION_SCHEME_LABELS: Record<DesignationScheme, string> = {
  'free-text': 'Free text (any designation, unique per vessel)',
  'us-navy-1949': 'US Navy numbering since 1949 (deck-frame-position-use)',
};

const currentYear = new Date().getUTCFullYear();

const vesselFields = {
  name: text(120, 'Name'),
  vesselType: text(120, 'Type of vessel'),
  builtYear: z
    .number({ error: 'Year built must be a number.' })
    .int('Year built must be a whole year.')
    .min(1700, 'Year built must be 1700 or later.')
    .max(currentYear, `Year built cannot be after ${currentYear}.`)
    .nullable(),
  berth: line(200, 'Berth'),
  summary: freeText(2000, 'Summary'),
  designationScheme: z.enum(DESIGNATION_SCHEMES, { error: 'Choose a designation scheme.' }),
};

export const vessel = z
  .object({
    id: z.number().int(),
    ...{
      name: z.string(),
      vesselType: z.string(),
      builtYear: z.number().int().nullable(),
      berth: z.string(),
      summary: z.string(),
      designationScheme: z.enum(DESIGNATION_SCHEMES),
    },
    archived: z.boolean(),
    createdAt: z.string(),
    updatedAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), archive: z.boolean() }),
  })
  .meta({ id: 'Vessel' });
export type Vessel = z.infer<typeof vessel>;

export const vesselsQuery = listQuery(['name', 'createdAt'], 'name').extend({
  includeArchived: z
    .enum(['true', 'false'])
    .transform((v) => v === 'true')
    .optional(),
});
export type VesselsQuery = z.infer<typeof vesselsQuery>;

export const vesselPage = pageOf(vessel).meta({ id: 'VesselPage' });

export const createVesselBody = z
  .object({
    ...vesselFields,
    builtYear: vesselFields.builtYear.default(null),
    berth: vesselFields.berth.default(''),
    summary: vesselFields.summary.default(''),
    designationScheme: vesselFields.designationScheme.default('free-text'),
  })
  .meta({ id: 'CreateVesselBody' });
export type CreateVesselBody = z.input<typeof createVesselBody>;

export const updateVesselBody = z
  .object({ ...vesselFields, version: z.number().int().min(1) })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateVesselBody' });
export type UpdateVesselBody = z.infer<typeof updateVesselBody>;

export const publicVessel = z
  .object({ id: z.number().int(), name: z.string(), vesselType: z.string(), builtYear: z.number().int().nullable(), berth: z.string(), summary: z.string() })
  .meta({ id: 'PublicVessel' });
export type PublicVessel = z.infer<typeof publicVessel>;
