import { areaInSquareMetres, lengthInMetres } from './calibration.js';
import type { ParsedDesignation } from './designation.js';
import { polygonArea, polygonPerimeter, type Point } from './geometry.js';
import { metresToFeet, squareMetresToSquareFeet } from './units.js';

export interface CompartmentFigures {
  floorArea: { squareMetres: number; squareFeet: number } | null;
  perimeter: { metres: number; feet: number } | null;
}

/** Floor area and perimeter of an outline on a calibrated deck; null where either is missing. */
export function compartmentFigures(outline: readonly Point[] | null, metresPerUnit: number | null): CompartmentFigures {
  if (!outline || outline.length < 3 || !metresPerUnit) return { floorArea: null, perimeter: null };
  const calibration = { metresPerUnit };
  const squareMetres = areaInSquareMetres(polygonArea(outline), calibration);
  const metres = lengthInMetres(polygonPerimeter(outline), calibration);
  return {
    floorArea: { squareMetres, squareFeet: squareMetresToSquareFeet(squareMetres) },
    perimeter: { metres, feet: metresToFeet(metres) },
  };
}

export interface DeckPlacement {
  name: string;
  levelCode: string | null;
  centerlineY: number | null;
  bowTo: 'right' | 'left';
}

/**
 * Where a designation disagrees with the drawing: the wrong deck, or the wrong side of the
 * centerline. Plans are images (y grows downward); with the bow to the right, starboard is below
 * the centerline.
 */
export function designationWarnings(designation: ParsedDesignation, deck: DeckPlacement, outline: readonly Point[] | null): string[] {
  const warnings: string[] = [];
  if (deck.levelCode && designation.deck.text !== deck.levelCode) {
    warnings.push(`The designation says ${designation.deck.meaning}, but the compartment is on ${deck.name} (deck ${deck.levelCode}).`);
  }
  if (outline && outline.length >= 3 && deck.centerlineY !== null) {
    const c = deck.centerlineY;
    const ys = outline.map((p) => p[1]);
    const starboardIsBelow = deck.bowTo === 'right';
    const allStarboard = ys.every((y) => (starboardIsBelow ? y >= c : y <= c));
    const allPort = ys.every((y) => (starboardIsBelow ? y <= c : y >= c));
    const { side } = designation.position;
    if (side === 'centerline' && (allStarboard || allPort)) {
      warnings.push(`Position 0 means the centerline passes through the compartment, but the outline lies wholly to ${allStarboard ? 'starboard' : 'port'}.`);
    } else if (side === 'starboard' && !allStarboard) {
      warnings.push('An odd position means a compartment to starboard, but the outline reaches to port of the centerline.');
    } else if (side === 'port' && !allPort) {
      warnings.push('An even position means a compartment to port, but the outline reaches to starboard of the centerline.');
    }
  }
  return warnings;
}
