import type { DamageType } from './schemas/condition.js';
import type { HazardKind } from './schemas/hazards.js';

const DEFER = 'Follow the site safety plan and local codes.';

/**
 * One caution per hazard kind, in the trade's usual words (common practice; the regulations behind
 * them, from memory: US EPA lead Renovation, Repair and Painting rule, 40 CFR 745; OSHA asbestos in
 * construction, 29 CFR 1926.1101; OSHA shipyard confined spaces, 29 CFR 1915 subpart B).
 */
export const HAZARD_CAUTIONS: Record<HazardKind, string> = {
  asbestos: `Do not disturb, cut, drill, sand or remove it; repair and removal are for a licensed asbestos abatement contractor. ${DEFER}`,
  'lead-paint': `No dry sanding, scraping, wire-brushing, grinding, blasting or heat: work that disturbs it is for trained, certified workers using lead-safe methods. ${DEFER}`,
  'confined-space': `No entry without a confined-space entry permit, a tested atmosphere (a marine chemist’s certificate where required), an attendant outside and a rescue plan. ${DEFER}`,
  'low-headroom': `Wear a hard hat and watch overhead. ${DEFER}`,
  'steep-ladder': `Face the ladder, keep three points of contact and carry nothing in your hands. ${DEFER}`,
  'trip-hazard': `Coamings, deck plates and gratings: keep to the lit walkway. ${DEFER}`,
  electrical: `Treat every circuit as live until a qualified person has isolated, locked and tagged it out. ${DEFER}`,
  other: `Read the hazard’s notes before any work. ${DEFER}`,
};

export interface WorkCaution {
  kind: HazardKind;
  message: string;
}

const DISTURBS_PAINT = /\b(sand(ing|ed)?|scrap(e|es|ed|ing)|wire[\s-]?brush(ing|ed)?|grind(ing)?|abrasive|abrad(e|ing)|blast(ing)?|needle[\s-]?gun|chip(ping)?|strip(ping)?|heat[\s-]?gun|torch|burn(ing)?[\s-]?off|weld(ing)?|hot[\s-]?work|flame|cut(ting)?)\b/i;
const TOUCHES_LAGGING = /\b(lagging|insulation|insulate|re-?lag|cladding)\b/i;
const HOT_WORK = /\b(weld(ing)?|braz(e|ing)|solder(ing)?|torch|flame|hot[\s-]?work|cutting torch|burn(ing)?)\b/i;

/**
 * Cautions for the work a finding proposes, where it would disturb a recorded hazard: abrasion,
 * scraping or heat on lead paint, any work on lagging where asbestos is recorded, entry into a
 * confined space, and hot work near lagging.
 */
export function workCautions(hazards: readonly HazardKind[], damageType: DamageType | null, action: string): WorkCaution[] {
  const has = (kind: HazardKind) => hazards.includes(kind);
  const out: WorkCaution[] = [];
  if (has('lead-paint') && DISTURBS_PAINT.test(action)) {
    out.push({ kind: 'lead-paint', message: `This action would disturb the lead-based paint recorded here. ${HAZARD_CAUTIONS['lead-paint']}` });
  }
  if (has('asbestos') && (damageType === 'lagging-damage' || TOUCHES_LAGGING.test(action) || HOT_WORK.test(action))) {
    out.push({ kind: 'asbestos', message: `Work on or near lagging where asbestos-containing material is recorded. ${HAZARD_CAUTIONS.asbestos}` });
  }
  if (has('confined-space')) {
    out.push({ kind: 'confined-space', message: `Any work here means entering a confined space. ${HAZARD_CAUTIONS['confined-space']}` });
  }
  return out;
}

/** The example action a finding form suggests: never abrasive work where lead is recorded, never touching lagging where asbestos is. */
export function exampleAction(hazards: readonly HazardKind[], damageType: DamageType | null): string {
  if (damageType === 'lagging-damage' && hazards.includes('asbestos')) return 'e.g. Keep the area closed and ask a licensed abatement contractor to encapsulate or remove the damaged lagging';
  if (hazards.includes('lead-paint')) return 'e.g. Clean with a damp cloth, record the extent, and ask a certified lead-safe contractor to stabilise the coating';
  if (damageType === 'lagging-damage') return 'e.g. Have the lagging tested for asbestos before any repair';
  return 'e.g. Wire-brush, prime and topcoat the affected area';
}

/** Work a repair's scope may involve, each with its caution (common practice; the rules behind them, from memory: OSHA shipyard hot work, 29 CFR 1915 subpart B and 1915.14; the lead and asbestos rules above). */
export const REPAIR_WORK_CAUTIONS = {
  hotWork: {
    label: 'Hot work',
    caution: `Welding, cutting, brazing or grinding needs a hot-work permit, a fire watch and, in or next to a space that held fuel or has coated or lagged surfaces, a marine chemist’s certificate first. Have it done by licensed contractors. ${DEFER}`,
  },
  asbestos: { label: 'Asbestos-containing material', caution: HAZARD_CAUTIONS.asbestos },
  leadPaint: { label: 'Lead-based paint', caution: HAZARD_CAUTIONS['lead-paint'] },
} as const;
export type RepairWorkKind = keyof typeof REPAIR_WORK_CAUTIONS;

/** What every cautioned repair says: we record the plan, licensed people make the work safe. */
export const REPAIR_DEFERRAL =
  'Shipkeeper records the plan; it never declares work safe. Hazardous work is for licensed contractors, under the site safety plan and local codes.';

export function repairWorkCautions(flags: Partial<Record<RepairWorkKind, boolean>>): { kind: RepairWorkKind; label: string; caution: string }[] {
  return (Object.keys(REPAIR_WORK_CAUTIONS) as RepairWorkKind[]).filter((k) => flags[k]).map((kind) => ({ kind, ...REPAIR_WORK_CAUTIONS[kind] }));
}
