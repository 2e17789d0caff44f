import { z } from 'zod';
import { HAZARD_CAUTIONS } from '../hazard-cautions.js';
import { HAZARD_KINDS, HAZARD_LABELS, type HazardKind } from './hazards.js';

/** The hazards recorded in a space, each with its own caution. */
export const hazardCautions = z.array(z.object({ kind: z.enum(HAZARD_KINDS), label: z.string(), caution: z.string() }));
export type HazardCautions = z.infer<typeof hazardCautions>;

export function cautionsFor(kinds: readonly HazardKind[]): HazardCautions {
  return kinds.map((kind) => ({ kind, label: HAZARD_LABELS[kind], caution: HAZARD_CAUTIONS[kind] }));
}
