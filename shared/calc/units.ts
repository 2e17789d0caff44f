/** Exact by definition: NIST SP 811 (2008), Appendix B. */
export const METRES_PER_FOOT = 0.3048;
export const METRES_PER_INCH = 0.0254;
export const SQUARE_FEET_PER_SQUARE_METRE = 1 / (METRES_PER_FOOT * METRES_PER_FOOT);

export function feetToMetres(feet: number): number {
  return feet * METRES_PER_FOOT;
}

export function metresToFeet(metres: number): number {
  return metres / METRES_PER_FOOT;
}

export function squareMetresToSquareFeet(squareMetres: number): number {
  return squareMetres * SQUARE_FEET_PER_SQUARE_METRE;
}

/**
 * Reads a length in feet and inches as people write it: `12' 6"`, `12 ft 6 in`, `12ft`, `6in`,
 * `12.5'`. Returns metres, or null when the text is not such a length.
 */
export function parseFeetAndInches(text: string): number | null {
  const match = /^\s*(?:(\d+(?:\.\d+)?)\s*(?:'|ft|feet|foot)\s*)?(?:(\d+(?:\.\d+)?)\s*(?:"|''|in|inch|inches)\s*)?$/i.exec(text);
  if (!match || (match[1] === undefined && match[2] === undefined)) return null;
  const feet = Number(match[1] ?? 0);
  const inches = Number(match[2] ?? 0);
  return feet * METRES_PER_FOOT + inches * METRES_PER_INCH;
}

/** A length in metres written as feet and inches to the nearest inch, e.g. `12′ 6″`. */
export function formatFeetAndInches(metres: number): string {
  const totalInches = Math.round(metres / METRES_PER_INCH);
  const feet = Math.floor(totalInches / 12);
  const inches = totalInches - feet * 12;
  return inches === 0 ? `${feet}′` : feet === 0 ? `${inches}″` : `${feet}′ ${inches}″`;
}
