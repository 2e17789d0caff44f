import { parseNavyDesignation, USE_LETTERS, type ParsedDesignation } from './designation.js';
import type { Point } from './geometry.js';
import { outlineFrames, outlineSide, type DeckGeometry } from './plan-location.js';

/**
 * A 1949-scheme designation (shared/calc/designation.ts) checked against where its outline was
 * drawn: deck level, side of the centerline and the outline's frames. Errors refuse the save
 * (a frame beyond the plan's last frame); warnings are hints the person may overrule.
 */
export interface DeckPlacement extends DeckGeometry {
  name: string;
  levelCode: string | null;
}

export interface DesignationProblem {
  part: 'deck' | 'frame' | 'position';
  message: string;
}

export function designationErrors(designation: ParsedDesignation, deck: DeckPlacement): DesignationProblem[] {
  const last = deck.frames?.lastFrame;
  if (deck.metresPerUnit && last !== undefined && designation.frame.number > last) {
    return [{ part: 'frame', message: `Frame ${designation.frame.number} is beyond the last frame of ${deck.name}'s plan (frame ${last}).` }];
  }
  return [];
}

export function designationWarnings(designation: ParsedDesignation, deck: DeckPlacement, outline: readonly Point[] | null): string[] {
  const warnings: string[] = [];
  if (deck.levelCode && designation.deck.text !== deck.levelCode) {
    warnings.push(`The designation says ${designation.deck.meaning}, but the compartment is on ${deck.name} (deck ${deck.levelCode}).`);
  }
  if (!outline) return warnings;
  const side = outlineSide(outline, deck);
  const wanted = designation.position.side;
  if (side && wanted === 'centerline' && side !== 'centerline') {
    warnings.push(`Position 0 means the centerline passes through the compartment, but the outline lies wholly to ${side}.`);
  } else if (side && wanted === 'starboard' && side !== 'starboard') {
    warnings.push('An odd position means a compartment to starboard, but the outline reaches to port of the centerline.');
  } else if (side && wanted === 'port' && side !== 'port') {
    warnings.push('An even position means a compartment to port, but the outline reaches to starboard of the centerline.');
  }
  const frames = outlineFrames(outline, deck);
  const frame = designation.frame.number;
  const beyondPlan = designationErrors(designation, deck).length > 0;
  if (frames && !beyondPlan && (frame < frames.foremost || frame > frames.aftmost)) {
    warnings.push(`The designation says frame ${frame}, but the outline spans frames ${frames.foremost}–${frames.aftmost}; designations use the foremost, ${frames.foremost}.`);
  }
  return warnings;
}

/**
 * A designation from where the outline was drawn: the deck's level, the outline's foremost frame
 * and its side (0 across the centerline, the first odd number to starboard, the first even to port,
 * or the typed number when it is on the right side). The use letters are kept from what was typed,
 * or left for the person to add. Null when the drawing says nothing the typed value does not.
 */
export function suggestDesignation(typed: string, deck: DeckPlacement, outline: readonly Point[] | null): string | null {
  if (!outline) return null;
  const parts = typed.trim().toUpperCase().split('-');
  const parsed = parseNavyDesignation(typed);
  const frames = outlineFrames(outline, deck);
  const side = outlineSide(outline, deck);
  if (!deck.levelCode && !frames && !side) return null;
  const deckText = deck.levelCode ?? (parsed.ok ? parsed.designation.deck.text : null);
  const frame = frames?.foremost ?? (parsed.ok ? parsed.designation.frame.number : null);
  const typedPosition = parsed.ok ? parsed.designation.position : null;
  let position: number | null = typedPosition?.number ?? null;
  if (side === 'centerline') position = 0;
  else if (side && typedPosition?.side !== side) position = side === 'starboard' ? 1 : 2;
  if (deckText === null || frame === null || position === null) return null;
  const use = parts.length === 4 && USE_LETTERS[parts[3]!] ? parts[3]! : '';
  const suggestion = `${deckText}-${frame}-${position}-${use}`;
  return parsed.ok && parsed.designation.value === suggestion ? null : suggestion;
}
