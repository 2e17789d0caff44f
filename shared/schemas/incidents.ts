import { z } from 'zod';
import { SEVERITIES } from '../calc/condition-grade.js';
import { listQuery, pageOf } from './common.js';
import { freeText, line, text } from './text.js';

export const INCIDENT_KINDS = ['vandalism', 'theft', 'water-ingress', 'fire', 'accident', 'other'] as const;
export type IncidentKind = (typeof INCIDENT_KINDS)[number];
export const INCIDENT_KIND_LABELS: Record<IncidentKind, string> = {
  vandalism: 'Vandalism',
  theft: 'Theft',
  'water-ingress': 'Water ingress',
  fire: 'Fire',
  accident: 'Accident',
  other: 'Other',
};

const isoDate = z.iso.date('Enter the date as YYYY-MM-DD.');
const ids = (label: string) => z.array(z.number().int().positive(), { error: `${label} is a list of ids.` }).max(100, `At most 100 ${label.toLowerCase()}.`);

export const incident = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    kind: z.enum(INCIDENT_KINDS),
    title: z.string(),
    foundOn: z.string(),
    occurredOn: z.string().nullable(),
    description: z.string(),
    reportedTo: z.string(),
    policeReference: z.string(),
    actionsTaken: z.string(),
    artifacts: z.array(z.object({ id: z.number().int(), label: z.string() })),
    compartments: z.array(z.object({ id: z.number().int(), label: z.string() })),
    closedCompartmentIds: z.array(z.number().int()),
    /** Why the closed spaces are closed, in one line the public may read. */
    publicNote: z.string(),
    /** Draft condition reports the incident opened, one per affected item, each with its finding. */
    reportIds: z.array(z.number().int()),
    loggedBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
    createdAt: z.string(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean() }),
  })
  .meta({ id: 'Incident' });
export type Incident = z.infer<typeof incident>;

export const incidentsQuery = listQuery(['foundOn', 'kind', 'createdAt'], '-foundOn').extend({
  vesselId: z.coerce.number().int().positive(),
  kind: z.enum(INCIDENT_KINDS).optional(),
  artifactId: z.coerce.number().int().positive().optional(),
  compartmentId: z.coerce.number().int().positive().optional(),
});
export type IncidentsQuery = z.infer<typeof incidentsQuery>;
export const incidentPage = pageOf(incident).meta({ id: 'IncidentPage' });

export const createIncidentBody = z
  .object({
    vesselId: z.number({ error: 'Choose the vessel.' }).int().positive(),
    kind: z.enum(INCIDENT_KINDS, { error: 'Choose what happened.' }),
    title: text(200, 'Title'),
    foundOn: isoDate,
    occurredOn: isoDate.nullable().default(null),
    description: freeText(8000, 'Description').default(''),
    reportedTo: line(300, 'Reported to').default(''),
    policeReference: line(100, 'Police reference').default(''),
    actionsTaken: freeText(4000, 'Actions taken').default(''),
    artifactIds: ids('Artifacts').default([]),
    compartmentIds: ids('Compartments').default([]),
    /** Affected compartments to close to visitors now (their access becomes staff only). */
    closeCompartmentIds: ids('Compartments to close').default([]),
    /** Shown to visitors while the spaces are closed; without it, a plain default line. */
    publicNote: line(200, 'Public note').default(''),
    /** Severity of the finding written on each affected item. */
    severity: z.enum(SEVERITIES, { error: 'Choose slight, moderate, severe or critical.' }).default('moderate'),
  })
  .meta({ id: 'CreateIncidentBody' });
export type CreateIncidentBody = z.input<typeof createIncidentBody>;

export const updateIncidentBody = z
  .object({
    title: text(200, 'Title'),
    occurredOn: isoDate.nullable(),
    description: freeText(8000, 'Description'),
    reportedTo: line(300, 'Reported to'),
    policeReference: line(100, 'Police reference'),
    actionsTaken: freeText(4000, 'Actions taken'),
    publicNote: line(200, 'Public note'),
    version: z.number().int().min(1),
  })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateIncidentBody' });
export type UpdateIncidentBody = z.infer<typeof updateIncidentBody>;

/** A space closed to visitors now, and why, as the staff see it. */
export const closure = z
  .object({ compartmentId: z.number().int(), label: z.string(), since: z.string(), reason: z.string(), incidentId: z.number().int() })
  .meta({ id: 'Closure' });
export type Closure = z.infer<typeof closure>;

/** The same as the public may read it: the space's name, since when, and the public line only. */
export const publicClosure = z.object({ space: z.string(), since: z.string(), reason: z.string() }).meta({ id: 'PublicClosure' });
export type PublicClosure = z.infer<typeof publicClosure>;

export const DEFAULT_CLOSURE_NOTE = 'Closed for now while the crew deal with damage found here.';
