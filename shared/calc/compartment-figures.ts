import { areaInSquareMetres, lengthInMetres } from './calibration.js';
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

export { designationWarnings, type DeckPlacement } from './designation-check.js';
