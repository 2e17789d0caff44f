import { absolutePressure, convert, STANDARD_ATMOSPHERE_PA, type PressureReading } from './quantities.js';
import { saturationTemperature } from './steam.js';

export interface LadderStageInput {
  name: string;
  pressure: number;
  reading: PressureReading;
}

export interface LadderStage {
  name: string;
  pressurePa: number;
  temperatureK: number;
  /** How much cooler this stage boils than the one before it (null for the first). */
  dropK: number | null;
}

export type LadderResult = { ok: true; stages: LadderStage[] } | { ok: false; stage: number; message: string };

/**
 * The stages of a steam or evaporating plant, each boiling at the saturation temperature of its
 * pressure (IAPWS-IF97 region 4); the drop from stage to stage is what drives the heat down the ladder.
 */
export function boilingLadder(stages: readonly LadderStageInput[], atmospherePa = STANDARD_ATMOSPHERE_PA): LadderResult {
  const out: LadderStage[] = [];
  for (const [i, stage] of stages.entries()) {
    const pressurePa = absolutePressure(stage.pressure, stage.reading, atmospherePa);
    let temperatureK: number;
    try {
      temperatureK = saturationTemperature(pressurePa);
    } catch (err) {
      if (err instanceof RangeError) return { ok: false, stage: i, message: `${stage.name}: ${err.message}` };
      throw err;
    }
    const previous = out[i - 1];
    out.push({ name: stage.name, pressurePa, temperatureK, dropK: previous ? previous.temperatureK - temperatureK : null });
  }
  return { ok: true, stages: out };
}

/** One plain sentence per stage for visitors, in °F or °C. */
export function ladderSentences(stages: readonly LadderStage[], unit: 'F' | 'C'): string[] {
  const t = (k: number) => `${Math.round(convert(k, 'K', unit))} °${unit}`;
  const drop = (k: number) => `${Math.round(unit === 'F' ? k * 1.8 : k)} °${unit}`;
  return stages.map((stage, i) => {
    const previous = stages[i - 1];
    if (!previous || stage.dropK === null) return `The ${stage.name.toLowerCase()} boils at ${t(stage.temperatureK)}.`;
    if (stage.dropK > 0) {
      return `The ${stage.name.toLowerCase()} boils at ${t(stage.temperatureK)} because its pressure is lower, so the steam from the ${previous.name.toLowerCase()}, ${drop(stage.dropK)} hotter, can boil it.`;
    }
    return `The ${stage.name.toLowerCase()} boils at ${t(stage.temperatureK)}, no cooler than the ${previous.name.toLowerCase()}, so heat cannot flow down to it: its pressure must be lower.`;
  });
}
