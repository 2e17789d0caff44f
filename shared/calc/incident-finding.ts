import { DAMAGE_TYPES, type Agent, type DamageType } from '../schemas/condition.js';
import type { IncidentKind } from '../schemas/incidents.js';

/** The agent and the usual damage of each kind of incident, when the words say nothing more. */
export const INCIDENT_FINDING: Record<IncidentKind, { agent: Agent; damageType: DamageType }> = {
  vandalism: { agent: 'thieves-and-vandals', damageType: 'impact-damage' },
  theft: { agent: 'thieves-and-vandals', damageType: 'missing-part' },
  'water-ingress': { agent: 'water', damageType: 'water-staining' },
  fire: { agent: 'fire', damageType: 'scorching-or-soot' },
  accident: { agent: 'physical-forces', damageType: 'impact-damage' },
  other: { agent: 'physical-forces', damageType: 'other' },
};

// Words a finder uses, first match wins (common practice, no published source).
const WORDS: [RegExp, DamageType][] = [
  [/\b(graffiti|spray[- ]?paint(ed)?|tagged|initials|scratched|carved|marker|scrawl(ed)?)\b/i, 'graffiti'],
  [/\b(glass(es)?|dial|gauge face|window|smashed|shattered|broken lens)\b/i, 'broken-glass-or-dial'],
  [/\b(missing|stolen|gone|taken|removed)\b/i, 'missing-part'],
  [/\b(dent(ed)?|bent|knocked|struck|hit)\b/i, 'impact-damage'],
  [/\b(loose|detached|fallen|came off)\b/i, 'loose-or-detached'],
  [/\b(soot|scorch(ed)?|burnt|burned|charred)\b/i, 'scorching-or-soot'],
];

/** The damage a line of an incident's text implies, with an agent that can cause it. */
export function impliedFinding(kind: IncidentKind, text: string): { agent: Agent; damageType: DamageType } {
  const usual = INCIDENT_FINDING[kind];
  for (const [words, damageType] of WORDS) {
    if (!words.test(text)) continue;
    const agents = DAMAGE_TYPES[damageType].agents as readonly Agent[];
    if (agents.includes(usual.agent)) return { agent: usual.agent, damageType };
  }
  return usual;
}

/** The lines (sentences, or clauses of one) of the incident's text that name an item (its number, or a word of its name), or null when none does. */
export function linesAbout(text: string, names: readonly string[]): string | null {
  const lines = text.split(/(?<=[.!?])\s+|\n+|(?<=[,;:])\s+/).map((l) => l.trim().replace(/[,;:]$/, '')).filter(Boolean);
  const words = names.flatMap((n) => [n, ...n.split(/[\s,;:()]+/).filter((w) => w.length >= 4)]).map((w) => w.toLowerCase());
  const about = lines.filter((l) => words.some((w) => l.toLowerCase().includes(w)));
  return about.length ? about.join(' ') : null;
}
