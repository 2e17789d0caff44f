import type { HazardKind } from './schemas/hazards.js';

/**
 * What a visitor is told at a stop where a hazard is recorded, in visitors' words: what to do, not
 * the trade's rule behind it (those are HAZARD_CAUTIONS, for the staff). Wording is common
 * practice, no published source; the guide follows the site's safety plan.
 */
export const VISITOR_CAUTIONS: Record<HazardKind, string> = {
  asbestos: 'Some old pipe coverings here contain asbestos. Please do not touch pipe coverings or insulation.',
  'lead-paint': 'Old paint here contains lead. Please do not touch painted surfaces, and wash your hands after the visit.',
  'confined-space': 'This space is seen from outside only: it is a confined space and no visitor goes in.',
  'low-headroom': 'Low headroom: mind your head.',
  'steep-ladder': 'Steep ladder: face the ladder, hold the rails with both hands and carry nothing in them.',
  'trip-hazard': 'Raised door sills and deck plates: watch your step and keep to the lit walkway.',
  electrical: 'Please do not touch switchboards, cables or fittings.',
  other: 'Follow your guide’s directions here.',
};

/** The line every caution list ends with: the product reminds, the ship's own plan decides. */
export const VISITOR_CAUTION_DEFER = 'Your guide follows the ship’s safety plan; ask if you are unsure.';

export function visitorCautions(kinds: readonly HazardKind[]): { kind: HazardKind; text: string }[] {
  return kinds.map((kind) => ({ kind, text: VISITOR_CAUTIONS[kind] }));
}
