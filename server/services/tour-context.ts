import { stopPosition, tourRoute, type RouteFigures, type RouteStop } from '../../shared/calc/tour-route.js';
import type { HazardKind } from '../../shared/schemas/hazards.js';
import type { CompartmentEntity } from '../db/entities/compartment.entity.js';
import type { MediaEntity } from '../db/entities/media.entity.js';
import type { TourStopEntity } from '../db/entities/tour-stop.entity.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import type { Repositories } from '../db/store.js';
import type { ClosureService } from './closure.service.js';

/** Everything a tour's stops are shown with: their spaces and decks, hazards, closures, artifacts, audio and the route. */
export interface TourContext {
  compartments: Map<number, CompartmentEntity>;
  hazards: Map<number, HazardKind[]>;
  /** Spaces closed to visitors now by an incident. */
  closedNow: Set<number>;
  closureSince: Map<number, string>;
  artifacts: Map<number, string>;
  media: Map<number, MediaEntity>;
  route: RouteFigures;
}

export async function tourContext(repos: Repositories, closures: ClosureService, tour: TourEntity, stops: TourStopEntity[]): Promise<TourContext> {
  const compartmentIds = [...new Set(stops.map((s) => s.compartmentId))];
  const compartments = new Map((await repos.compartments.withDecks(compartmentIds)).map((c) => [c.id, c]));
  const hazards = await repos.hazards.kindsFor(compartmentIds);
  const closed = await closures.current(tour.vesselId);
  const artifacts = await repos.artifacts.labels(stops.flatMap((s) => s.artifactIds));
  const mediaIds = [...stops.map((s) => s.audioMediaId).filter((id): id is number => id !== null), ...(tour.coverMediaId ? [tour.coverMediaId] : [])];
  const mediaRows = await repos.media.findByIds(mediaIds);
  const settings = await repos.tourRouteSettings.get(tour.vesselId);
  return {
    compartments,
    hazards,
    closedNow: new Set(closed.map((c) => c.compartmentId)),
    closureSince: new Map(closed.map((c) => [c.compartmentId, c.since])),
    artifacts,
    media: new Map(mediaRows.map((m) => [m.id, m])),
    route: routeOf(stops, compartments, settings),
  };
}

function routeOf(stops: TourStopEntity[], compartments: Map<number, CompartmentEntity>, settings: { walkingPaceMetresPerSecond: number; deckChangeMetres: number }): RouteFigures {
  const routeStops: RouteStop[] = [];
  for (const stop of stops) {
    const c = compartments.get(stop.compartmentId);
    if (!c) continue;
    const d = c.deck;
    routeStops.push({
      deck: { id: d.id, name: d.name, position: d.position, metresPerUnit: d.metresPerUnit, centerlineY: d.centerlineY, bowTo: d.bowTo, frames: d.frames },
      point: stopPosition(stop.point, c.outline),
      dwellMinutes: stop.dwellMinutes,
    });
  }
  return tourRoute(routeStops, settings);
}

/** Whether visitors meet the stop as virtual now: marked so, a virtual tour, or a space they may not enter. */
export function effectivelyVirtual(tour: TourEntity, stop: TourStopEntity, compartment: CompartmentEntity | undefined, closedNow: Set<number>): boolean {
  if (stop.virtual || tour.mode === 'virtual') return true;
  if (!compartment) return true;
  return compartment.accessStatus === 'sealed' || compartment.accessStatus === 'staff-only' || closedNow.has(compartment.id);
}
