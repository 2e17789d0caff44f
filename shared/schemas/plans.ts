import { z } from 'zod';

export const PLAN_STATUSES = ['building', 'awaiting-choice', 'ready', 'failed', 'cancelled', 'replaced'] as const;
export type PlanStatus = (typeof PLAN_STATUSES)[number];

export const PLAN_TILE_SIZE = 256;
export const PLAN_FORMATS = ['image/png', 'image/jpeg', 'image/webp', 'image/tiff'] as const;

/** Zoom levels of a pyramid whose top level is one tile: the full image is at maxZoom. */
export function planMaxZoom(width: number, height: number, tileSize = PLAN_TILE_SIZE): number {
  return Math.max(0, Math.ceil(Math.log2(Math.max(width, height) / tileSize)));
}

/** Tiles in the pyramid: at each level the image is halved, and only tiles it covers are written. */
export function planTileCount(width: number, height: number, tileSize = PLAN_TILE_SIZE): number {
  const maxZoom = planMaxZoom(width, height, tileSize);
  let total = 0;
  for (let z = 0; z <= maxZoom; z++) {
    const scale = 2 ** (maxZoom - z);
    total += Math.ceil(width / scale / tileSize) * Math.ceil(height / scale / tileSize);
  }
  return total;
}

export const plan = z
  .object({
    id: z.number().int(),
    deckId: z.number().int(),
    status: z.enum(PLAN_STATUSES),
    originalName: z.string(),
    width: z.number().int(),
    height: z.number().int(),
    maxZoom: z.number().int(),
    tileSize: z.number().int(),
    tilesTotal: z.number().int(),
    tilesDone: z.number().int(),
    /** `{z}/{y}/{x}` template of the tiles, with the content hash in the path; null until ready. */
    tileUrl: z.string().nullable(),
    error: z.string().nullable(),
    createdAt: z.string(),
    finishedAt: z.string().nullable(),
    /** Set when the new plan's proportions differ from the current one and compartments must be fitted. */
    aspectChange: z.object({ from: z.number(), to: z.number() }).nullable(),
  })
  .meta({ id: 'Plan' });
export type Plan = z.infer<typeof plan>;

export const deckPlans = z
  .object({ current: plan.nullable(), latest: plan.nullable() })
  .meta({ id: 'DeckPlans' });
export type DeckPlans = z.infer<typeof deckPlans>;

export const PLAN_FITS = ['stretch', 'keep-proportions'] as const;
export type PlanFit = (typeof PLAN_FITS)[number];

export const activatePlanBody = z
  .object({ fit: z.enum(PLAN_FITS, { error: 'Choose how to fit the compartments: stretch or keep-proportions.' }) })
  .meta({ id: 'ActivatePlanBody' });
export type ActivatePlanBody = z.infer<typeof activatePlanBody>;

export const planParams = z.object({ id: z.coerce.number().int().positive(), planId: z.coerce.number().int().positive() });
export const tileParams = z.object({
  id: z.coerce.number().int().positive(),
  version: z.string().regex(/^\d+-[0-9a-f]{12}$/, 'Not a plan version.'),
  z: z.coerce.number().int().min(0).max(30),
  y: z.coerce.number().int().min(0),
  x: z.string().regex(/^\d+\.png$/, 'Tiles are PNG.'),
});
