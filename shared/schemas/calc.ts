import { z } from 'zod';
import { PRESSURE_READINGS, UNIT_CODES, type PressureReading } from '../calc/quantities.js';
import { refuseInvalidCharacters } from './text.js';

export const designationQuery = z.object({
  value: refuseInvalidCharacters(z.string({ error: 'Give a designation, e.g. 3-110-2-E.' }), 'Designation').trim().min(1, 'Give a designation, e.g. 3-110-2-E.').max(40, 'A designation is at most 40 characters.'),
  scheme: z.enum(['us-navy-1949'], { error: 'The only scheme that can be parsed is us-navy-1949.' }).default('us-navy-1949'),
});
export type DesignationQuery = z.infer<typeof designationQuery>;

const meaning = z.string();

export const designationResponse = z
  .object({
    scheme: z.literal('us-navy-1949'),
    value: z.string(),
    deck: z.object({ text: z.string(), level: z.number().int(), aboveMainDeck: z.boolean(), meaning }),
    frame: z.object({ number: z.number().int(), meaning }),
    position: z.object({ number: z.number().int(), side: z.enum(['centerline', 'starboard', 'port']), ordinal: z.number().int(), meaning }),
    use: z.object({ letters: z.string(), meaning }),
    explanation: z.string(),
    source: z.string(),
  })
  .meta({ id: 'Designation' });
export type DesignationResponse = z.infer<typeof designationResponse>;

const number = (label: string) => z.coerce.number({ error: `${label} must be a number.` }).refine(Number.isFinite, `${label} must be a number.`);

export const rustGradeQuery = z.object({
  percent: number('percent'),
  distribution: z.enum(['S', 'G', 'P', 'H'], { error: 'Distribution is S (spot), G (general), P (pinpoint) or H (hybrid).' }).optional(),
});

export const rustGradeResponse = z
  .object({
    percent: z.number(),
    grade: z.number().int(),
    label: z.string(),
    above: z.number().nullable(),
    upTo: z.number().nullable(),
    range: z.string(),
    source: z.string(),
  })
  .meta({ id: 'RustGrade' });
export type RustGradeResponse = z.infer<typeof rustGradeResponse>;

/** Either the three scores, or the plain inputs they come from (any score may be given directly). */
export const abcRiskQuery = z.object({
  a: number('a').optional(),
  b: number('b').optional(),
  c: number('c').optional(),
  yearsBetween: number('yearsBetween').optional(),
  lossPerItemPercent: number('lossPerItemPercent').optional(),
  assetFractionPercent: number('assetFractionPercent').optional(),
});
export type AbcRiskQuery = z.infer<typeof abcRiskQuery>;

export const abcRiskResponse = z
  .object({
    a: z.number(),
    b: z.number(),
    c: z.number(),
    magnitude: z.number(),
    band: z.enum(['extreme', 'very-high', 'high', 'medium', 'low']),
    label: z.string(),
    meaning: z.string(),
    bandRange: z.string(),
    source: z.string(),
  })
  .meta({ id: 'AbcRisk' });
export type AbcRiskResponse = z.infer<typeof abcRiskResponse>;

const SATURATION_UNITS = [...PRESSURE_READINGS, 'C', 'F', 'K'] as const;

export const saturationQuery = z.object({
  pressure: number('pressure').optional(),
  temperature: number('temperature').optional(),
  unit: z.enum(SATURATION_UNITS, { error: `The unit is one of ${SATURATION_UNITS.join(', ')}.` }),
  /** The local atmosphere in psia, for psig and inches of mercury vacuum (default: the standard atmosphere). */
  atmosphere: number('atmosphere').optional(),
});
export type SaturationQuery = z.infer<typeof saturationQuery>;

export const saturationResponse = z
  .object({
    temperatureC: z.number(),
    temperatureF: z.number(),
    temperatureK: z.number(),
    pressurePa: z.number(),
    pressure: z.object(Object.fromEntries(PRESSURE_READINGS.map((r) => [r, z.number()])) as Record<PressureReading, z.ZodNumber>),
    atmospherePa: z.number(),
    source: z.string(),
  })
  .meta({ id: 'Saturation' });
export type SaturationResponse = z.infer<typeof saturationResponse>;

export const convertQuery = z.object({
  value: number('value'),
  from: z.enum(UNIT_CODES, { error: `from is one of ${UNIT_CODES.join(', ')}.` }),
  to: z.enum(UNIT_CODES, { error: `to is one of ${UNIT_CODES.join(', ')}.` }),
});

export const convertResponse = z
  .object({ value: z.number(), from: z.string(), to: z.string(), result: z.number(), dimension: z.string(), source: z.string() })
  .meta({ id: 'Conversion' });
