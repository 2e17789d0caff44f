import { z } from 'zod';
import { riskScaleProblems } from '../calc/abc-risk.js';
import { PATTERN_PROBLEM_MESSAGES, patternProblem } from '../calc/object-number.js';
import { givingSettings } from './giving-settings.js';
import { refuseInvalidCharacters, text } from './text.js';

export const UNIT_SYSTEMS = ['us-customary', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

const floor = (label: string) => z.number({ error: `${label} needs a number (MR).` });

export const riskScale = z
  .object({
    aYearsAtFive: z.number({ error: 'Give the years between events at A = 5.' }),
    stepFactor: z.number({ error: 'Give the factor of one point.' }),
    bandFloors: z.object({
      low: floor('Low priority'),
      medium: floor('Medium priority'),
      high: floor('High priority'),
      'very-high': floor('Very high priority'),
      extreme: floor('Extreme priority'),
    }),
  })
  .superRefine((value, ctx) => {
    for (const problem of riskScaleProblems(value)) ctx.addIssue({ code: 'custom', message: problem.message, path: problem.field.split('.') });
  })
  .meta({ id: 'RiskScale' });

export const organisationSettings = z
  .object({
    organisationName: z.string(),
    country: z.string(),
    currency: z.string(),
    unitSystem: z.enum(UNIT_SYSTEMS),
    contactEmail: z.string(),
    objectNumberPattern: z.string(),
    riskScale,
    giving: givingSettings,
    updatedAt: z.string(),
    version: z.number().int(),
  })
  .meta({ id: 'OrganisationSettings' });
export type OrganisationSettings = z.infer<typeof organisationSettings>;

export const updateSettingsBody = z
  .object({
    organisationName: text(160, 'Organisation name'),
    country: refuseInvalidCharacters(z.string(), 'Country').trim().toUpperCase().regex(/^[A-Z]{2}$/, 'Use the two-letter country code of ISO 3166-1 (e.g. US, GB).'),
    currency: refuseInvalidCharacters(z.string(), 'Currency').trim().toUpperCase().regex(/^[A-Z]{3}$/, 'Use the three-letter currency code of ISO 4217 (e.g. USD).'),
    unitSystem: z.enum(UNIT_SYSTEMS, { error: 'Choose US customary or metric units.' }),
    contactEmail: refuseInvalidCharacters(z.string(), 'Contact e-mail').pipe(z.union([z.literal(''), z.email('Enter a valid e-mail address.')])),
    objectNumberPattern: refuseInvalidCharacters(z.string(), 'Pattern')
      .trim()
      // patternProblem also caps the length and refuses adjacent numbers (NN), which no one could read apart.
      .superRefine((value, ctx) => {
        const problem = patternProblem(value);
        if (problem) ctx.addIssue({ code: 'custom', message: PATTERN_PROBLEM_MESSAGES[problem] });
      }),
    riskScale,
    giving: givingSettings,
    version: z.number().int().min(1),
  })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateSettingsBody' });
export type UpdateSettingsBody = z.infer<typeof updateSettingsBody>;
