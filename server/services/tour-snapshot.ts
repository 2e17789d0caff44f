import type { PublicTour, PublicTourStop } from '../../shared/schemas/tours.js';

/** A stop as published; `compartmentId` stays on the server, to show the stop as virtual while its space is closed. */
export interface PublishedStop extends Omit<PublicTourStop, 'notice'> {
  compartmentId: number;
}

/** What approval freezes: the public answer, rendered and sanitized once. */
export interface PublishedTour extends Omit<PublicTour, 'stops'> {
  vesselId: number;
  revision: number;
  /** Files the public may fetch through this tour (its images and audio). */
  mediaIds: number[];
  stops: PublishedStop[];
}
