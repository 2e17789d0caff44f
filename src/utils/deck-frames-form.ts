import { formatFeetAndInches, parseFeetAndInches } from '@shared/calc/units';
import type { Deck } from '@shared/schemas/decks';
import type { UnitSystem } from '@shared/schemas/settings';

/** The deck settings' frame numbering as typed: the spacing in the organisation's units, as text. */
export interface FramesForm {
  numbered: boolean;
  referenceFrame: number | null;
  referenceX: number | null;
  spacing: string;
  lastFrame: number | null;
}

const spacingText = (metres: number, units: UnitSystem) =>
  units === 'metric' ? String(Number(metres.toFixed(4))) : formatFeetAndInches(metres).replace('′', "'").replace('″', '"');

export function framesForm(deck: Pick<Deck, 'frames' | 'calibration'>, units: UnitSystem): FramesForm {
  const f = deck.frames;
  const spacing = f?.spacingMetres ?? deck.calibration?.frameSpacingMetres ?? null;
  return {
    numbered: f !== null,
    referenceFrame: f?.referenceFrame ?? null,
    referenceX: f?.referenceX ?? null,
    spacing: spacing === null ? '' : spacingText(spacing, units),
    lastFrame: f?.lastFrame ?? null,
  };
}

/** The spacing typed, in metres; NaN when it cannot be read. */
export function spacingMetres(text: string, units: UnitSystem): number {
  const t = text.trim();
  if (!t) return Number.NaN;
  if (units === 'metric') {
    const value = Number(t.replace(/\s*m$/i, '').replace(',', '.'));
    return Number.isFinite(value) ? value : Number.NaN;
  }
  return parseFeetAndInches(t) ?? Number.NaN;
}

/**
 * The `frames` of an update body from the form: null to stop numbering, undefined for no change
 * (never numbered, still not), and the messages for what is missing or cannot be read (the schema
 * gives the others). The spacing shown unchanged is sent as stored, not as rounded for display.
 */
export function framesFromForm(
  form: FramesForm,
  deck: Pick<Deck, 'frames' | 'calibration'>,
  units: UnitSystem,
  planWidth: number | null,
): { frames: Record<string, number> | null | undefined; problems: Record<string, string> } {
  if (!form.numbered) return { frames: deck.frames ? null : undefined, problems: {} };
  const problems: Record<string, string> = {};
  const initial = framesForm(deck, units);
  const stored = deck.frames?.spacingMetres ?? deck.calibration?.frameSpacingMetres;
  const spacing = form.spacing.trim() === initial.spacing && stored !== undefined ? stored : spacingMetres(form.spacing, units);
  if (form.referenceFrame === null) problems['frames.referenceFrame'] = 'Give the number of a frame you can find on the plan.';
  if (form.referenceX === null) problems['frames.referenceX'] = 'Give where that frame is on the plan, in plan pixels from the left edge.';
  else if (planWidth !== null && form.referenceX > planWidth) problems['frames.referenceX'] = `The plan is ${planWidth} pixels wide: the frame must lie on it.`;
  if (Number.isNaN(spacing)) problems['frames.spacingMetres'] = units === 'metric' ? 'Write the frame spacing in metres, e.g. 0.61.' : `Write the frame spacing in feet and inches, e.g. 2' or 24".`;
  if (form.lastFrame === null) problems['frames.lastFrame'] = 'Give the aftmost frame the plan shows.';
  // The schema says so too, but only once every other field of the frames reads.
  else if (form.referenceFrame !== null && form.lastFrame < form.referenceFrame) problems['frames.lastFrame'] = 'The last frame cannot be forward of the reference frame.';
  return {
    frames: { referenceFrame: form.referenceFrame ?? Number.NaN, referenceX: form.referenceX ?? Number.NaN, spacingMetres: spacing, lastFrame: form.lastFrame ?? Number.NaN },
    problems,
  };
}

/**
 * Where the last frame falls on the plan with these numbers, when the deck has a scale: a frame
 * number grows aft from the bow (NAVEDTRA 14325, ch. 8), so it lies aft of the reference frame.
 */
export function lastFrameX(frames: { referenceFrame: number; referenceX: number; spacingMetres: number; lastFrame: number }, deck: Pick<Deck, 'calibration' | 'bowTo'>): number | null {
  const perUnit = deck.calibration?.metresPerUnit;
  if (!perUnit || !(frames.spacingMetres > 0)) return null;
  const aft = ((frames.lastFrame - frames.referenceFrame) * frames.spacingMetres) / perUnit;
  return deck.bowTo === 'right' ? frames.referenceX - aft : frames.referenceX + aft;
}
