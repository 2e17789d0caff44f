/** A point on a deck plan in plan units (pixels of the full-resolution plan image). */
export type Point = [x: number, y: number];

export function distance(a: Point, b: Point): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1]);
}

/** Area of a simple polygon by the shoelace formula, in square plan units. */
export function polygonArea(points: readonly Point[]): number {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i]!;
    const [x2, y2] = points[(i + 1) % points.length]!;
    twice += x1 * y2 - x2 * y1;
  }
  return Math.abs(twice) / 2;
}

/** Length of the closed outline, in plan units. */
export function polygonPerimeter(points: readonly Point[]): number {
  let total = 0;
  for (let i = 0; i < points.length; i++) total += distance(points[i]!, points[(i + 1) % points.length]!);
  return total;
}

/** Length of an open line (the measure tool), in plan units. */
export function polylineLength(points: readonly Point[]): number {
  let total = 0;
  for (let i = 1; i < points.length; i++) total += distance(points[i - 1]!, points[i]!);
  return total;
}

function orientation(a: Point, b: Point, c: Point): number {
  const value = (b[1] - a[1]) * (c[0] - b[0]) - (b[0] - a[0]) * (c[1] - b[1]);
  return Math.abs(value) < 1e-12 ? 0 : value > 0 ? 1 : 2;
}

function onSegment(a: Point, b: Point, c: Point): boolean {
  return Math.min(a[0], c[0]) <= b[0] && b[0] <= Math.max(a[0], c[0]) && Math.min(a[1], c[1]) <= b[1] && b[1] <= Math.max(a[1], c[1]);
}

/** Whether segments p1–q1 and p2–q2 meet (touching counts). */
export function segmentsIntersect(p1: Point, q1: Point, p2: Point, q2: Point): boolean {
  const o1 = orientation(p1, q1, p2);
  const o2 = orientation(p1, q1, q2);
  const o3 = orientation(p2, q2, p1);
  const o4 = orientation(p2, q2, q1);
  if (o1 !== o2 && o3 !== o4) return true;
  return (o1 === 0 && onSegment(p1, p2, q1)) || (o2 === 0 && onSegment(p1, q2, q1)) || (o3 === 0 && onSegment(p2, p1, q2)) || (o4 === 0 && onSegment(p2, q1, q2));
}

/** Whether any two edges that are not neighbours cross or touch (a figure-of-eight, a bow tie). */
export function isSelfIntersecting(points: readonly Point[]): boolean {
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const a1 = points[i]!;
    const a2 = points[(i + 1) % n]!;
    for (let j = i + 1; j < n; j++) {
      if (j === i || (j + 1) % n === i || (i + 1) % n === j) continue;
      if (segmentsIntersect(a1, a2, points[j]!, points[(j + 1) % n]!)) return true;
    }
  }
  return false;
}

export interface PlanSize {
  width: number;
  height: number;
}

export type PolygonProblem = 'too-few-points' | 'not-finite' | 'outside-plan' | 'self-intersecting' | 'zero-area';

export const POLYGON_PROBLEM_MESSAGES: Record<PolygonProblem, string> = {
  'too-few-points': 'A compartment needs at least three corners.',
  'not-finite': 'Every corner needs two numeric coordinates.',
  'outside-plan': 'Every corner must lie on the plan.',
  'self-intersecting': 'The outline crosses itself. Move the corners so that no two edges cross.',
  'zero-area': 'The outline has no area: its corners lie on one line.',
};

/** What is wrong with a compartment outline, or null when it can be kept. */
export function polygonProblem(points: readonly Point[], plan: PlanSize): PolygonProblem | null {
  if (points.length < 3) return 'too-few-points';
  if (points.some((p) => p.length !== 2 || !Number.isFinite(p[0]) || !Number.isFinite(p[1]))) return 'not-finite';
  if (points.some(([x, y]) => x < 0 || y < 0 || x > plan.width || y > plan.height)) return 'outside-plan';
  if (isSelfIntersecting(points)) return 'self-intersecting';
  if (polygonArea(points) === 0) return 'zero-area';
  return null;
}

/** Centre of mass of a simple polygon (for labels and the side-of-centreline check). */
export function polygonCentroid(points: readonly Point[]): Point {
  let twiceArea = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i]!;
    const [x2, y2] = points[(i + 1) % points.length]!;
    const cross = x1 * y2 - x2 * y1;
    twiceArea += cross;
    cx += (x1 + x2) * cross;
    cy += (y1 + y2) * cross;
  }
  if (twiceArea === 0) {
    const n = points.length || 1;
    return [points.reduce((s, p) => s + p[0], 0) / n, points.reduce((s, p) => s + p[1], 0) / n];
  }
  return [cx / (3 * twiceArea), cy / (3 * twiceArea)];
}

/** Whether a point lies inside a simple polygon (even-odd ray casting; points on an edge may fall either way). */
export function pointInPolygon([px, py]: Point, polygon: readonly Point[]): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const [xi, yi] = polygon[i]!;
    const [xj, yj] = polygon[j]!;
    if (yi > py !== yj > py && px < ((xj - xi) * (py - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/**
 * A point inside a simple polygon: its centroid when that lies inside, else (an L- or U-shaped
 * outline) the middle of the widest inside stretch of the horizontal line through the centroid.
 * Common practice, no published source.
 */
export function interiorPoint(polygon: readonly Point[]): Point {
  const centre = polygonCentroid(polygon);
  if (pointInPolygon(centre, polygon)) return centre;
  const y = centre[1];
  const xs: number[] = [];
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const [xi, yi] = polygon[i]!;
    const [xj, yj] = polygon[j]!;
    if (yi > y !== yj > y) xs.push(((xj - xi) * (y - yi)) / (yj - yi) + xi);
  }
  xs.sort((a, b) => a - b);
  let best: Point = centre;
  let widest = -1;
  for (let k = 0; k + 1 < xs.length; k += 2) {
    if (xs[k + 1]! - xs[k]! > widest) {
      widest = xs[k + 1]! - xs[k]!;
      best = [(xs[k]! + xs[k + 1]!) / 2, y];
    }
  }
  return best;
}
