import { distance, type Point } from './geometry.js';

/** A deck plan's scale: how many metres one plan unit (one pixel of the full image) spans. */
export interface Calibration {
  metresPerUnit: number;
}

export class CalibrationError extends Error {}

/** Scale from two points clicked on the plan and the real distance between them. */
export function calibrateFromPoints(a: Point, b: Point, realMetres: number): Calibration {
  const units = distance(a, b);
  if (!(units > 0)) throw new CalibrationError('Click two different points on the plan.');
  if (!(realMetres > 0) || !Number.isFinite(realMetres)) throw new CalibrationError('The real distance must be more than zero.');
  return { metresPerUnit: realMetres / units };
}

/** Scale from two frames clicked on the plan, the number of frame spaces between them and the frame spacing. */
export function calibrateFromFrames(a: Point, b: Point, frameSpaces: number, frameSpacingMetres: number): Calibration {
  if (!Number.isInteger(frameSpaces) || frameSpaces < 1) throw new CalibrationError('Count at least one frame space between the two frames.');
  if (!(frameSpacingMetres > 0)) throw new CalibrationError('The frame spacing must be more than zero.');
  return calibrateFromPoints(a, b, frameSpaces * frameSpacingMetres);
}

export function lengthInMetres(planUnits: number, calibration: Calibration): number {
  return planUnits * calibration.metresPerUnit;
}

export function areaInSquareMetres(squarePlanUnits: number, calibration: Calibration): number {
  return squarePlanUnits * calibration.metresPerUnit * calibration.metresPerUnit;
}

/** Plan units for a real length (the scale bar, the inverse of lengthInMetres). */
export function metresToPlanUnits(metres: number, calibration: Calibration): number {
  return metres / calibration.metresPerUnit;
}
