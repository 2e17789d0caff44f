import type { TourStopEntity } from '../db/entities/tour-stop.entity.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import type { Repositories } from '../db/store.js';
import type { SearchDocument } from './search-index.js';

/** A tour as the search sees it: its title and summary (its stops are documents of their own). */
export function tourDocument(tour: TourEntity): SearchDocument {
  return { kind: 'tour', recordId: tour.id, vesselId: tour.vesselId, number: tour.slug, title: tour.title, body: tour.summary, extra: '' };
}

/** A stop: its title and the plain text of its rendered interpretive text. */
export function tourStopDocument(stop: TourStopEntity, vesselId: number): SearchDocument {
  return { kind: 'tour-stop', recordId: stop.id, vesselId, number: '', title: stop.title, body: stop.textPlain, extra: stop.lookFor };
}

/** Rewrites the documents of a tour and all its stops (a revision restored), removing those of stops that went. */
export async function reindexTour(repos: Repositories, tour: TourEntity, removedStopIds: number[]): Promise<void> {
  await repos.search.put(tourDocument(tour));
  for (const stop of await repos.tourStops.listFor(tour.id)) await repos.search.put(tourStopDocument(stop, tour.vesselId));
  for (const id of removedStopIds) await repos.search.remove('tour-stop', id);
}
