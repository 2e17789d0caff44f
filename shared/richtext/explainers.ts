import { boilingLadder, ladderSentences, type LadderStageInput } from '../calc/boiling-ladder.js';
import { convert, PRESSURE_READINGS, UNIT_CODES, UNITS, type UnitCode } from '../calc/quantities.js';

export const EXPLAINER_KINDS = ['boiling-ladder', 'unit-card'] as const;
export type ExplainerKind = (typeof EXPLAINER_KINDS)[number];

export interface BoilingLadderConfig {
  title: string;
  stages: LadderStageInput[];
  /** Local atmospheric pressure for psig readings, Pa. */
  atmospherePa?: number;
  unit: 'F' | 'C';
}

export interface UnitCardConfig {
  label: string;
  value: number;
  from: UnitCode;
  to: UnitCode;
}

export type ExplainerConfig = BoilingLadderConfig | UnitCardConfig;

export const EXPLAINER_LABELS: Record<ExplainerKind, string> = {
  'boiling-ladder': 'Boiling ladder',
  'unit-card': 'Unit card',
};

export function defaultExplainerConfig(kind: ExplainerKind): ExplainerConfig {
  if (kind === 'unit-card') return { label: 'Working pressure', value: 150, from: 'psi', to: 'kPa' };
  return {
    title: 'Stages of the plant',
    unit: 'F',
    stages: [
      { name: 'First stage', pressure: 14.7, reading: 'psia' },
      { name: 'Second stage', pressure: 7, reading: 'psia' },
    ],
  };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function shortText(value: unknown, fallback: string): string {
  return typeof value === 'string' && value.trim() ? value.trim().slice(0, 80) : fallback;
}

/** The settings of an explainer as stored in its `config` attribute, or the defaults where unreadable. */
export function parseExplainerConfig(kind: ExplainerKind, raw: string | null | undefined): ExplainerConfig {
  const fallback = defaultExplainerConfig(kind);
  let data: unknown;
  try {
    data = raw ? JSON.parse(raw) : null;
  } catch {
    return fallback;
  }
  if (!isRecord(data)) return fallback;
  if (kind === 'unit-card') {
    const base = fallback as UnitCardConfig;
    const from = UNIT_CODES.includes(data.from as UnitCode) ? (data.from as UnitCode) : base.from;
    const to = UNIT_CODES.includes(data.to as UnitCode) ? (data.to as UnitCode) : base.to;
    const value = typeof data.value === 'number' && Number.isFinite(data.value) ? data.value : base.value;
    return { label: shortText(data.label, base.label), value, from, to };
  }
  const base = fallback as BoilingLadderConfig;
  const stages = Array.isArray(data.stages)
    ? data.stages
        .filter(isRecord)
        .slice(0, 8)
        .map((s, i) => ({
          name: shortText(s.name, `Stage ${i + 1}`),
          pressure: typeof s.pressure === 'number' && Number.isFinite(s.pressure) ? s.pressure : 0,
          reading: PRESSURE_READINGS.includes(s.reading as LadderStageInput['reading']) ? (s.reading as LadderStageInput['reading']) : 'psia',
        }))
    : base.stages;
  const atmospherePa = typeof data.atmospherePa === 'number' && Number.isFinite(data.atmospherePa) ? data.atmospherePa : undefined;
  return { title: shortText(data.title, base.title), unit: data.unit === 'C' ? 'C' : 'F', stages, ...(atmospherePa ? { atmospherePa } : {}) };
}

function formatNumber(value: number): string {
  return new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 }).format(value);
}

/** A plain-text reading of the explainer: its text alternative wherever it cannot be played with. */
export function explainerSummary(kind: ExplainerKind, config: ExplainerConfig): string {
  if (kind === 'unit-card') {
    const c = config as UnitCardConfig;
    try {
      return `${c.label}: ${formatNumber(c.value)} ${UNITS[c.from].label} = ${formatNumber(convert(c.value, c.from, c.to))} ${UNITS[c.to].label}.`;
    } catch {
      return `${c.label}: ${formatNumber(c.value)} ${UNITS[c.from].label}.`;
    }
  }
  const c = config as BoilingLadderConfig;
  const result = boilingLadder(c.stages, c.atmospherePa);
  if (!result.ok) return `${c.title}: ${result.message}`;
  return `${c.title}. ${ladderSentences(result.stages, c.unit).join(' ')}`;
}
