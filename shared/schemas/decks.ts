import { z } from 'zod';
import { MAX_FRAME_SPACING_METRES } from '../calc/calibration.js';
import type { DeckGeometry } from '../calc/plan-location.js';
import { refuseInvalidCharacters, text } from './text.js';

const point = z.tuple([z.number(), z.number()]);
const levelCode = refuseInvalidCharacters(z.string(), 'Deck number')
  .trim()
  .regex(/^(0[1-9]|[1-9])\d?$/, 'Write the deck as designations do: 1 for the main deck, 2, 3, … below it, 01, 02, … above it.')
  .nullable();

const frameNumber = (label: string) => z.number({ error: `${label} must be a number.` }).int(`${label} is a whole frame number.`).min(0, `${label} cannot be below 0.`).max(999, `${label} is at most 999.`);

/** How the plan's frames are numbered: numbers grow aft from the bow. */
export const deckFrames = z
  .object({
    referenceFrame: frameNumber('The reference frame'),
    referenceX: z.number({ error: 'Mark where the reference frame is on the plan.' }).min(0, 'The reference frame must lie on the plan.'),
    spacingMetres: z.number({ error: 'The frame spacing must be a number.' }).positive('The frame spacing must be more than zero.').max(MAX_FRAME_SPACING_METRES, `The frame spacing must be at most ${MAX_FRAME_SPACING_METRES} m.`),
    lastFrame: frameNumber('The last frame'),
  })
  .refine((f) => f.lastFrame >= f.referenceFrame, { message: 'The last frame cannot be forward of the reference frame.', path: ['lastFrame'] })
  .meta({ id: 'DeckFrames' });

export const deck = z
  .object({
    id: z.number().int(),
    vesselId: z.number().int(),
    name: z.string(),
    position: z.number().int(),
    levelCode: z.string().nullable(),
    calibration: z
      .object({
        metresPerUnit: z.number(),
        method: z.enum(['points', 'frames']),
        a: point,
        b: point,
        realMetres: z.number(),
        frameSpaces: z.number().int().optional(),
        frameSpacingMetres: z.number().optional(),
      })
      .nullable(),
    centerlineY: z.number().nullable(),
    frames: deckFrames.nullable(),
    bowTo: z.enum(['right', 'left']),
    compartmentCount: z.number().int(),
    version: z.number().int(),
    abilities: z.object({ update: z.boolean(), delete: z.boolean() }),
  })
  .meta({ id: 'Deck' });
export type Deck = z.infer<typeof deck>;

export const createDeckBody = z
  .object({ name: text(80, 'Name'), levelCode: levelCode.default(null) })
  .meta({ id: 'CreateDeckBody' });
export type CreateDeckBody = z.input<typeof createDeckBody>;

/** A deck as the plan-location computations need it. */
export function deckGeometry(deck: Pick<Deck, 'calibration' | 'centerlineY' | 'bowTo' | 'frames'>): DeckGeometry {
  return { metresPerUnit: deck.calibration?.metresPerUnit ?? null, centerlineY: deck.centerlineY, bowTo: deck.bowTo, frames: deck.frames };
}

export const updateDeckBody = z
  .object({
    name: text(80, 'Name'),
    levelCode,
    position: z.number().int().min(0, 'Position starts at 0 (the top deck).'),
    centerlineY: z.number().min(0, 'The centerline must lie on the plan.').nullable(),
    bowTo: z.enum(['right', 'left'], { error: 'The bow points right or left on the plan.' }),
    frames: deckFrames.nullable(),
    version: z.number().int().min(1),
  })
  .partial()
  .required({ version: true })
  .meta({ id: 'UpdateDeckBody' });
export type UpdateDeckBody = z.infer<typeof updateDeckBody>;

const positive = (label: string) => z.number({ error: `${label} must be a number.` }).positive(`${label} must be more than zero.`);

export const calibrateDeckBody = z
  .discriminatedUnion('method', [
    z.object({ method: z.literal('points'), a: point, b: point, realMetres: positive('The real distance'), version: z.number().int().min(1) }),
    z.object({
      method: z.literal('frames'),
      a: point,
      b: point,
      frameSpaces: z.number().int('Count whole frame spaces.').min(1, 'Count at least one frame space.'),
      frameSpacingMetres: positive('The frame spacing'),
      version: z.number().int().min(1),
    }),
  ])
  .meta({ id: 'CalibrateDeckBody' });
export type CalibrateDeckBody = z.infer<typeof calibrateDeckBody>;

export const vesselParam = z.object({ vesselId: z.coerce.number().int().positive() });
