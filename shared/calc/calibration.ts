import { distance, type Point } from './geometry.js';

/** A deck plan's scale: how many metres one plan unit (one pixel of the full image) spans. */
export interface Calibration {
  metresPerUnit: number;
}

/** The longest distance one calibration may span: longer than any ship's hull (the largest ever built were under 460 m). */
export const MAX_CALIBRATION_METRES = 1000;
/** The shortest: one millimetre, below which a plan's scale means nothing. */
export const MIN_CALIBRATION_METRES = 0.001;
export const MAX_FRAME_SPACING_METRES = 10;

export class CalibrationError extends Error {
  constructor(message: string, readonly field: string) {
    super(message);
  }
}

/** Scale from two points clicked on the plan and the real distance between them. */
export function calibrateFromPoints(a: Point, b: Point, realMetres: number, field = 'realMetres'): Calibration {
  const units = distance(a, b);
  if (!(units > 0) || !Number.isFinite(units)) throw new CalibrationError('Click two different points on the plan.', 'b');
  if (!Number.isFinite(realMetres) || !(realMetres >= MIN_CALIBRATION_METRES)) throw new CalibrationError('The real distance must be at least 1 mm.', field);
  if (realMetres > MAX_CALIBRATION_METRES) throw new CalibrationError(`The real distance must be at most ${MAX_CALIBRATION_METRES} m; no deck is longer.`, field);
  const metresPerUnit = realMetres / units;
  if (!Number.isFinite(metresPerUnit) || !(metresPerUnit > 0) || !(metresPerUnit * metresPerUnit > 0) || !Number.isFinite(metresPerUnit * metresPerUnit)) {
    throw new CalibrationError('These points and this distance give no usable scale.', field);
  }
  return { metresPerUnit };
}

/** Scale from two frames clicked on the plan, the number of frame spaces between them and the frame spacing. */
export function calibrateFromFrames(a: Point, b: Point, frameSpaces: number, frameSpacingMetres: number): Calibration {
  if (!Number.isInteger(frameSpaces) || frameSpaces < 1) throw new CalibrationError('Count at least one frame space between the two frames.', 'frameSpaces');
  if (!Number.isFinite(frameSpacingMetres) || !(frameSpacingMetres > 0)) throw new CalibrationError('The frame spacing must be more than zero.', 'frameSpacingMetres');
  if (frameSpacingMetres > MAX_FRAME_SPACING_METRES) throw new CalibrationError(`The frame spacing must be at most ${MAX_FRAME_SPACING_METRES} m.`, 'frameSpacingMetres');
  return calibrateFromPoints(a, b, frameSpaces * frameSpacingMetres, 'frameSpaces');
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
