import { describe, expect, it } from 'vitest';
import { calibrateFromFrames, calibrateFromPoints, areaInSquareMetres, CalibrationError, lengthInMetres, metresToPlanUnits } from '../../shared/calc/calibration.js';
import { interiorPoint, isSelfIntersecting, pointInPolygon, polygonArea, polygonCentroid, polygonPerimeter, polygonProblem, polylineLength, type Point } from '../../shared/calc/geometry.js';
import { formatFeetAndInches, parseFeetAndInches, squareMetresToSquareFeet } from '../../shared/calc/units.js';

const plan = { width: 1000, height: 800 };

describe('polygon area and perimeter', () => {
  it('a 300 × 200 rectangle: area 60 000, perimeter 1 000 (by hand: 300·200; 2·(300+200))', () => {
    const rect: Point[] = [[100, 100], [400, 100], [400, 300], [100, 300]];
    expect(polygonArea(rect)).toBe(60_000);
    expect(polygonPerimeter(rect)).toBe(1_000);
    expect(polygonCentroid(rect)).toEqual([250, 200]);
  });

  it('a 3-4-5 right triangle: area 6, perimeter 12 (by hand: ½·3·4; 3+4+5)', () => {
    const tri: Point[] = [[0, 0], [3, 0], [0, 4]];
    expect(polygonArea(tri)).toBe(6);
    expect(polygonPerimeter(tri)).toBe(12);
  });

  it('an L-shaped room: area 10·4 + 4·6 = 64, perimeter 10+4+6+6+4+10 = 40 (by hand)', () => {
    const l: Point[] = [[0, 0], [10, 0], [10, 4], [4, 4], [4, 10], [0, 10]];
    expect(polygonArea(l)).toBe(64);
    expect(polygonPerimeter(l)).toBe(40);
  });

  it('does not depend on the winding direction', () => {
    const cw: Point[] = [[0, 0], [0, 5], [5, 5], [5, 0]];
    expect(polygonArea(cw)).toBe(25);
    expect(polygonArea([...cw].reverse())).toBe(25);
  });

  it('measures an open line', () => {
    expect(polylineLength([[0, 0], [3, 4], [3, 10]])).toBe(11);
  });
});

describe('outline problems', () => {
  it('accepts a simple outline on the plan', () => {
    expect(polygonProblem([[10, 10], [200, 10], [200, 100]], plan)).toBeNull();
  });

  it('refuses fewer than three points, corners off the plan, a bow tie, and a flat outline', () => {
    expect(polygonProblem([[10, 10], [20, 20]], plan)).toBe('too-few-points');
    expect(polygonProblem([[10, 10], [2000, 10], [200, 100]], plan)).toBe('outside-plan');
    expect(polygonProblem([[-1, 10], [200, 10], [200, 100]], plan)).toBe('outside-plan');
    expect(polygonProblem([[0, 0], [100, 100], [100, 0], [0, 100]], plan)).toBe('self-intersecting');
    expect(polygonProblem([[0, 0], [50, 50], [100, 100]], plan)).toBe('zero-area');
    expect(polygonProblem([[0, 0], [Number.NaN, 50], [100, 100]], plan)).toBe('not-finite');
  });

  it('finds a crossing in a longer outline but not in a concave one', () => {
    expect(isSelfIntersecting([[0, 0], [10, 0], [10, 4], [4, 4], [4, 10], [0, 10]])).toBe(false);
    expect(isSelfIntersecting([[0, 0], [10, 0], [10, 10], [5, -5], [0, 10]])).toBe(true);
  });
});

describe('calibration', () => {
  it('two points 500 units apart that are 25 ft apart give 0.01524 m a unit (1 ft = 0.3048 m, NIST SP 811)', () => {
    const cal = calibrateFromPoints([100, 100], [400, 500], 25 * 0.3048);
    expect(cal.metresPerUnit).toBeCloseTo(0.01524, 12);
    expect(lengthInMetres(500, cal)).toBeCloseTo(7.62, 12);
  });

  it('round-trips a length through plan units', () => {
    const cal = calibrateFromPoints([0, 0], [1234, 0], 17.3);
    for (const metres of [0.5, 3, 17.3, 120]) expect(lengthInMetres(metresToPlanUnits(metres, cal), cal)).toBeCloseTo(metres, 10);
  });

  it('scales areas by the square of the scale: 100 × 100 units at 0.05 m = 25 m² = 269.1 ft²', () => {
    const cal = { metresPerUnit: 0.05 };
    const m2 = areaInSquareMetres(10_000, cal);
    expect(m2).toBeCloseTo(25, 12);
    // 1 ft² = 0.09290304 m² exactly (NIST SP 811, Appendix B): 25 / 0.09290304 = 269.0978…
    expect(squareMetresToSquareFeet(m2)).toBeCloseTo(269.0978, 3);
  });

  it('from frames: 10 frame spaces of 24 in between two frames 800 units apart', () => {
    const cal = calibrateFromFrames([100, 50], [900, 50], 10, 24 * 0.0254);
    expect(cal.metresPerUnit).toBeCloseTo((10 * 0.6096) / 800, 12);
  });

  it('refuses a zero distance or a non-positive length', () => {
    expect(() => calibrateFromPoints([5, 5], [5, 5], 3)).toThrow(CalibrationError);
    expect(() => calibrateFromPoints([0, 0], [5, 5], 0)).toThrow('at least 1 mm');
    expect(() => calibrateFromPoints([0, 0], [5, 5], 1e308)).toThrow('at most 1000 m');
    expect(() => calibrateFromPoints([0, 0], [1e308, 1e308], 10)).toThrow('no usable scale');
    expect(() => calibrateFromPoints([0, 0], [5, 5], Number.NaN)).toThrow(CalibrationError);
    expect(() => calibrateFromFrames([0, 0], [5, 0], 1e9, 0.6)).toThrow('at most 1000 m');
    expect(() => calibrateFromFrames([0, 0], [5, 0], 10, 50)).toThrow('frame spacing must be at most');
    expect(() => calibrateFromFrames([0, 0], [5, 5], 0, 0.6)).toThrow('at least one frame');
  });
});

describe('feet and inches', () => {
  it.each([
    [`12' 6"`, 3.81],
    ['12 ft 6 in', 3.81],
    ['12ft', 3.6576],
    ['6 in', 0.1524],
    ["12.5'", 3.81],
  ])('reads %s as %f m (1 ft = 0.3048 m, 1 in = 0.0254 m, NIST SP 811)', (text, metres) => {
    expect(parseFeetAndInches(text)).toBeCloseTo(metres, 10);
  });

  it('refuses what is not a length', () => {
    expect(parseFeetAndInches('twelve feet')).toBeNull();
    expect(parseFeetAndInches('')).toBeNull();
  });

  it('writes to the nearest inch', () => {
    expect(formatFeetAndInches(3.81)).toBe('12′ 6″');
    expect(formatFeetAndInches(3.6576)).toBe('12′');
    expect(formatFeetAndInches(0.1524)).toBe('6″');
  });
});

describe('a point inside an outline (where a moved artifact waits until placed)', () => {
  it('is the centroid of a rectangle', () => {
    expect(interiorPoint([[1000, 100], [1900, 100], [1900, 900], [1000, 900]])).toEqual([1450, 500]);
  });

  it('falls back to the middle of an inside stretch when a U-shaped outline has its centroid in the gap (common practice, no published source)', () => {
    // By hand: a 300 × 100 base (centroid y 50) and two 100 × 200 legs (centroid y 200): centroid (150, 135.7), in the gap.
    const u: Point[] = [[0, 0], [300, 0], [300, 300], [200, 300], [200, 100], [100, 100], [100, 300], [0, 300]];
    const centre = polygonCentroid(u);
    expect(pointInPolygon(centre, u)).toBe(false);
    const inside = interiorPoint(u);
    expect(pointInPolygon(inside, u)).toBe(true);
    expect(inside[0]).toBe(50);
    expect(inside[1]).toBeCloseTo(135.714, 3);
  });
});
