import { abcRisk, bandRange, isHalfStepScore, scoreA, scoreB, scoreC } from '../../shared/calc/abc-risk.js';
import { parseNavyDesignation } from '../../shared/calc/designation.js';
import { absolutePressure, convert, pressureReadings, PSI_PA, STANDARD_ATMOSPHERE_PA, UNITS, UnitMismatchError, type PressureReading } from '../../shared/calc/quantities.js';
import { rustGrade, rustGradeRange } from '../../shared/calc/rust-grade.js';
import { IF97_SOURCE, saturationPressure, saturationTemperature } from '../../shared/calc/steam.js';
import { abcRiskQuery, abcRiskResponse, convertQuery, convertResponse, designationQuery, designationResponse, rustGradeQuery, rustGradeResponse, saturationQuery, saturationResponse } from '../../shared/schemas/calc.js';
import type { ApiRouter } from '../http/api-router.js';
import { anyone } from '../http/access.js';
import { UnprocessableError } from '../http/errors.js';

const UNITS_SOURCE = 'NIST SP 811 (2008), Appendix B';
const NAVY_SOURCE = 'US Navy compartment numbering for ships built after March 1949 (NAVEDTRA 14325, Basic Military Requirements, ch. 8)';

/** Pure computations of shared/calc, served for integrations; they read no records. */
export function calcRoutes(api: ApiRouter) {
  api.route({
    method: 'get',
    path: '/calc/designation',
    tag: 'Calculations',
    summary: 'Parse a compartment designation and explain it in words, or say which part is wrong',
    access: anyone,
    query: designationQuery,
    response: designationResponse,
    errors: [422],
    handler: ({ query }) => {
      const result = parseNavyDesignation(query.value);
      if (!result.ok) throw new UnprocessableError(result.message, { [result.part]: result.message });
      return { scheme: query.scheme, ...result.designation, source: NAVY_SOURCE };
    },
  });

  api.route({
    method: 'get',
    path: '/calc/rust-grade',
    tag: 'Calculations',
    summary: 'ASTM D610 rust grade of a painted steel surface from its percent rusted (0–100), with the range the grade covers',
    access: anyone,
    query: rustGradeQuery,
    response: rustGradeResponse,
    errors: [422],
    handler: ({ query }) => {
      const grade = within(() => rustGrade(query.percent, query.distribution), 'percent');
      return { percent: query.percent, grade: grade.grade, label: grade.label, above: grade.above, upTo: grade.upTo, range: rustGradeRange(grade), source: grade.source };
    },
  });

  api.route({
    method: 'get',
    path: '/calc/abc-risk',
    tag: 'Calculations',
    summary: 'ABC method magnitude of risk and priority band, from the scores A, B and C (1–5 in half steps) or from yearsBetween, lossPerItemPercent and assetFractionPercent',
    access: anyone,
    query: abcRiskQuery,
    response: abcRiskResponse,
    errors: [422],
    handler: ({ query }) => {
      const pick = (score: number | undefined, plain: number | undefined, toScore: (v: number) => number, name: string, plainName: string) => {
        if (score !== undefined) return score;
        if (plain === undefined) throw new UnprocessableError(`Give ${name} (1–5 in half steps) or ${plainName}.`, { [name]: 'Missing.' });
        return within(() => toScore(plain), plainName);
      };
      const a = pick(query.a, query.yearsBetween, scoreA, 'a', 'yearsBetween');
      const b = pick(query.b, query.lossPerItemPercent, scoreB, 'b', 'lossPerItemPercent');
      const c = pick(query.c, query.assetFractionPercent, scoreC, 'c', 'assetFractionPercent');
      for (const [name, score] of [['a', a], ['b', b], ['c', c]] as const) {
        if (!isHalfStepScore(score)) throw new UnprocessableError(`${name.toUpperCase()} must be between 1 and 5 in steps of 0.5.`, { [name]: 'Between 1 and 5 in steps of 0.5.' });
      }
      const risk = abcRisk(a, b, c);
      return { ...risk, bandRange: bandRange(risk.band) };
    },
  });

  api.route({
    method: 'get',
    path: '/calc/saturation',
    tag: 'Calculations',
    summary: 'Where water boils: the saturation temperature at a pressure (psia, psig, inHgVac, kPa, bar, MPa; psig and vacuum from atmosphere in psia), or the saturation pressure at a temperature (C, F, K), by IAPWS-IF97',
    access: anyone,
    query: saturationQuery,
    response: saturationResponse,
    errors: [422],
    handler: ({ query }) => {
      const atmospherePa = query.atmosphere === undefined ? STANDARD_ATMOSPHERE_PA : query.atmosphere * PSI_PA;
      if (!(atmospherePa > 0)) throw new UnprocessableError('The atmosphere must be more than zero psia.', { atmosphere: 'More than zero psia.' });
      let temperatureK: number;
      let pressurePa: number;
      if (query.unit === 'C' || query.unit === 'F' || query.unit === 'K') {
        if (query.temperature === undefined) throw new UnprocessableError('Give the temperature for a unit of temperature.', { temperature: 'Missing.' });
        temperatureK = convert(query.temperature, query.unit, 'K');
        pressurePa = within(() => saturationPressure(temperatureK), 'temperature');
      } else {
        if (query.pressure === undefined) throw new UnprocessableError('Give the pressure for a unit of pressure.', { pressure: 'Missing.' });
        pressurePa = absolutePressure(query.pressure, query.unit as PressureReading, atmospherePa);
        temperatureK = within(() => saturationTemperature(pressurePa), 'pressure');
      }
      return {
        temperatureC: convert(temperatureK, 'K', 'C'),
        temperatureF: convert(temperatureK, 'K', 'F'),
        temperatureK,
        pressurePa,
        pressure: pressureReadings(pressurePa, atmospherePa),
        atmospherePa,
        source: IF97_SOURCE,
      };
    },
  });

  api.route({
    method: 'get',
    path: '/calc/convert',
    tag: 'Calculations',
    summary: 'A quantity in another unit of the same kind (pressure, temperature, volume, volume per day, mass, power)',
    access: anyone,
    query: convertQuery,
    response: convertResponse,
    errors: [422],
    handler: ({ query }) => {
      try {
        const result = convert(query.value, query.from, query.to);
        return { value: query.value, from: query.from, to: query.to, result, dimension: UNITS[query.from].dimension, source: UNITS_SOURCE };
      } catch (err) {
        if (err instanceof UnitMismatchError) throw new UnprocessableError(err.message, { to: err.message });
        throw err;
      }
    },
  });
}

/** Runs a computation; a value off its scale answers 422 with the valid range. */
function within<T>(compute: () => T, field: string): T {
  try {
    return compute();
  } catch (err) {
    if (err instanceof RangeError) throw new UnprocessableError(err.message, { [field]: err.message });
    throw err;
  }
}
