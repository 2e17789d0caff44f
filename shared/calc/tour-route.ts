import { distance, interiorPoint, type Point } from './geometry.js';
import { frameAt, type DeckGeometry } from './plan-location.js';

/** How a route is timed; one per vessel. */
export interface RouteSettings {
  /** A guided group's pace aboard, stopping and starting, in metres per second. */
  walkingPaceMetresPerSecond: number;
  /** Walking-equivalent metres added for each deck climbed or descended by ladder or stair. */
  deckChangeMetres: number;
}

/**
 * 0.5 m/s for a group aboard (about a third of an adult's free walking pace, for doorways,
 * coamings and waiting at the foot of ladders) and 10 m per deck change: common practice,
 * no published source. Each vessel may set its own.
 */
export const DEFAULT_ROUTE_SETTINGS: RouteSettings = { walkingPaceMetresPerSecond: 0.5, deckChangeMetres: 10 };

export interface RouteDeck extends DeckGeometry {
  id: number;
  name: string;
  /** Order from the top of the ship down. */
  position: number;
}

export interface RouteStop {
  deck: RouteDeck;
  /** The stop's point on its deck plan, or null when neither it nor its space is drawn. */
  point: Point | null;
  dwellMinutes: number;
}

export interface RouteLeg {
  /** Stop numbers, from 1. */
  from: number;
  to: number;
  /** Metres walked on the decks (not the deck-change allowance); null when the plans cannot measure it. */
  metres: number | null;
  deckChanges: number;
}

export interface RouteFigures {
  distanceMetres: number;
  deckChanges: number;
  walkingMinutes: number;
  dwellMinutes: number;
  totalMinutes: number;
  unmeasuredLegs: number;
  notes: string[];
  legs: RouteLeg[];
}

/** Where a stop stands: its own point, else the centre of its compartment's outline (inside it for an L-shape). */
export function stopPosition(point: Point | null, outline: readonly Point[] | null): Point | null {
  if (point) return point;
  return outline && outline.length >= 3 ? interiorPoint(outline) : null;
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/**
 * Walking metres between two stops. On one deck: the straight line between them at the plan's
 * scale (a lower bound: the real walk goes round machinery). Across decks, where no plan shows the
 * way: the fore-and-aft distance between their frames, when both plans number their frames.
 */
function legMetres(a: RouteStop, b: RouteStop): number | null {
  if (!a.point || !b.point) return null;
  if (a.deck.id === b.deck.id) return a.deck.metresPerUnit ? distance(a.point, b.point) * a.deck.metresPerUnit : null;
  const fa = frameAt(a.point[0], a.deck);
  const fb = frameAt(b.point[0], b.deck);
  if (fa === null || fb === null) return null;
  return Math.abs(fa - fb) * a.deck.frames!.spacingMetres;
}

/** The route in the stops' order: distance with the deck-change allowance, and its duration with the dwell at each stop. */
export function tourRoute(stops: readonly RouteStop[], settings: RouteSettings): RouteFigures {
  const legs: RouteLeg[] = [];
  const notes: string[] = [];
  let walked = 0;
  let deckChanges = 0;
  for (let i = 0; i + 1 < stops.length; i++) {
    const a = stops[i]!;
    const b = stops[i + 1]!;
    const metres = legMetres(a, b);
    const changes = Math.abs(a.deck.position - b.deck.position);
    legs.push({ from: i + 1, to: i + 2, metres: metres === null ? null : round1(metres), deckChanges: changes });
    deckChanges += changes;
    if (metres === null) {
      const why = !a.point || !b.point ? 'a stop’s space is not drawn on its plan' : a.deck.id === b.deck.id ? `${a.deck.name} has no scale` : 'the decks’ frames are not numbered';
      notes.push(`Stops ${i + 1} to ${i + 2} not measured: ${why}.`);
    } else walked += metres;
  }
  const distanceMetres = walked + deckChanges * settings.deckChangeMetres;
  const walkingMinutes = distanceMetres / settings.walkingPaceMetresPerSecond / 60;
  const dwellMinutes = stops.reduce((sum, s) => sum + s.dwellMinutes, 0);
  return {
    distanceMetres: round1(distanceMetres),
    deckChanges,
    walkingMinutes: round1(walkingMinutes),
    dwellMinutes,
    totalMinutes: round1(walkingMinutes + dwellMinutes),
    unmeasuredLegs: legs.filter((l) => l.metres === null).length,
    notes,
    legs,
  };
}
