/**
 * Water at saturation by IAPWS-IF97 region 4: IAPWS R7-97(2012), "Revised Release on the IAPWS
 * Industrial Formulation 1997 for the Thermodynamic Properties of Water and Steam", equations 30
 * and 31 with the coefficients of Table 34. Our own code: no well-kept npm package implements IF97.
 */
const n = [
  0, 0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7, 0.14915108613530e2,
  -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
] as const;

export const IF97_SOURCE = 'IAPWS R7-97(2012), IAPWS-IF97 region 4 (equations 30 and 31)';
/** The triple point's temperature and the critical point, the ends of the saturation line (IAPWS-IF97, section 8). */
export const SATURATION_MIN_K = 273.15;
export const SATURATION_MAX_K = 647.096;
export const SATURATION_MAX_PA = 22.064e6;
/** The saturation pressure at 273.15 K by equation 30 (IAPWS-IF97 gives 611.213 Pa). */
export const SATURATION_MIN_PA = 611.213;

/** Saturation pressure in pascals at a temperature in kelvins (equation 30). */
export function saturationPressure(temperatureK: number): number {
  if (!Number.isFinite(temperatureK) || temperatureK < SATURATION_MIN_K || temperatureK > SATURATION_MAX_K) {
    throw new RangeError(`Water boils at a pressure only between ${SATURATION_MIN_K} K and ${SATURATION_MAX_K} K (0.01 °C below the triple point to the critical point, 0 °C to 373.946 °C).`);
  }
  const theta = temperatureK + n[9] / (temperatureK - n[10]);
  const a = theta * theta + n[1] * theta + n[2];
  const b = n[3] * theta * theta + n[4] * theta + n[5];
  const c = n[6] * theta * theta + n[7] * theta + n[8];
  return ((2 * c) / (-b + Math.sqrt(b * b - 4 * a * c))) ** 4 * 1e6;
}

/** Saturation temperature in kelvins at a pressure in pascals (equation 31). */
export function saturationTemperature(pressurePa: number): number {
  // equation 30 at 273.15 K gives 611.2127 Pa; the release rounds it to 611.213 Pa
  if (!Number.isFinite(pressurePa) || pressurePa < SATURATION_MIN_PA - 0.001 || pressurePa > SATURATION_MAX_PA) {
    throw new RangeError(`Water boils at a temperature only between ${SATURATION_MIN_PA} Pa and ${SATURATION_MAX_PA / 1e6} MPa absolute (the triple point to the critical point).`);
  }
  const beta = (pressurePa / 1e6) ** 0.25;
  const e = beta * beta + n[3] * beta + n[6];
  const f = n[1] * beta * beta + n[4] * beta + n[7];
  const g = n[2] * beta * beta + n[5] * beta + n[8];
  const d = (2 * g) / (-f - Math.sqrt(f * f - 4 * e * g));
  return (n[10] + d - Math.sqrt((n[10] + d) ** 2 - 4 * (n[9] + n[10] * d))) / 2;
}
