import type { RevisionSnapshot } from '../../shared/schemas/tours.js';
import type { TourStopEntity } from '../db/entities/tour-stop.entity.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import type { Repositories } from '../db/store.js';
import { ConflictError } from '../http/errors.js';

export function snapshotOf(tour: TourEntity, stops: TourStopEntity[]): RevisionSnapshot {
  return {
    tour: { title: tour.title, slug: tour.slug, summary: tour.summary, audience: tour.audience, mode: tour.mode, accessibility: tour.accessibility, coverMediaId: tour.coverMediaId, language: tour.language },
    stops: stops.map((s) => ({
      id: s.id,
      compartmentId: s.compartmentId,
      artifactIds: s.artifactIds,
      title: s.title,
      textDoc: s.textDoc as RevisionSnapshot['stops'][number]['textDoc'],
      textHtml: s.textHtml,
      textPlain: s.textPlain,
      audioMediaId: s.audioMediaId,
      transcript: s.transcript,
      dwellMinutes: s.dwellMinutes,
      accessNotes: s.accessNotes,
      lookFor: s.lookFor,
      virtual: s.virtual,
      point: s.point,
    })),
  };
}

/**
 * Keeps the tour and its stops as they are now as its next revision, inside the change's own
 * transaction. A tour being edited after publishing goes back to draft; the published snapshot
 * stays as it was. The revision number is written without a new version of the tour, so that
 * saving a stop does not make the tour's own form stale.
 */
export async function writeRevision(repos: Repositories, tour: TourEntity, note: string, authorId: number | null): Promise<number> {
  const stops = await repos.tourStops.listFor(tour.id);
  const number = tour.revision + 1;
  await repos.tourRevisions.add({ tourId: tour.id, number, note: note.slice(0, 300), snapshot: snapshotOf(tour, stops), authorId });
  tour.revision = number;
  if (tour.state === 'published') {
    tour.state = 'draft';
    await repos.tours.save(tour);
  } else {
    await repos.tours.setRevision(tour.id, number, tour.version);
  }
  return number;
}

/** Only drafts change (a published tour's working copy is a draft too); review and retirement freeze the tour. */
export function assertEditable(tour: TourEntity): void {
  if (tour.state === 'in_review') throw new ConflictError('This tour is in review, so it does not change until a curator returns it.');
  if (tour.state === 'retired') throw new ConflictError('This tour is retired and no longer changes.');
}
