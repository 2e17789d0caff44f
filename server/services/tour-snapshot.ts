import type { AccessStatus } from '../../shared/schemas/compartments.js';
import type { PublicTour, PublicTourStop, TourAccessibility, TourAudience, TourMode } from '../../shared/schemas/tours.js';
import { VISITOR_CAUTION_DEFER, visitorCautions } from '../../shared/tour-cautions.js';
import type { TourStopEntity } from '../db/entities/tour-stop.entity.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import { withoutImages, pointImagesAt } from './public-media-html.js';
import type { TourContext } from './tour-context.js';

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

export const CLOSED_NOTICE = 'This space is closed to visitors today, so the stop is shown here as a virtual stop.';

export function publicMediaPath(slug: string, mediaId: number, variant: 'thumb' | 'display' | 'audio'): string {
  return `/api/v1/visit/tours/${slug}/media/${mediaId}/${variant}`;
}

/** The published form of a tour: the sanitized HTML stored at save, images pointed at the tour's public file route. */
export function buildPublishedTour(tour: TourEntity, stops: TourStopEntity[], ctx: TourContext, vesselName: string, at: Date): PublishedTour {
  const mediaIds = new Set<number>();
  const published: PublishedStop[] = stops.map((stop, i) => {
    const c = ctx.compartments.get(stop.compartmentId);
    const html = pointImagesAt(stop.textHtml, (id, variant) => publicMediaPath(tour.slug, id, variant), mediaIds);
    if (stop.audioMediaId) mediaIds.add(stop.audioMediaId);
    const cautions = visitorCautions(ctx.hazards.get(stop.compartmentId) ?? []).map((c) => c.text);
    return {
      number: i + 1,
      title: stop.title,
      html,
      space: c?.name ?? '',
      deck: c?.deck?.name ?? '',
      compartmentId: stop.compartmentId,
      virtual: stop.virtual || tour.mode === 'virtual',
      audio: stop.audioMediaId ? { src: publicMediaPath(tour.slug, stop.audioMediaId, 'audio'), transcript: stop.transcript } : null,
      dwellMinutes: stop.dwellMinutes,
      accessNotes: stop.accessNotes,
      lookFor: stop.lookFor,
      cautions: cautions.length ? [...cautions, VISITOR_CAUTION_DEFER] : [],
    };
  });
  const cover = tour.coverMediaId ? ctx.media.get(tour.coverMediaId) : undefined;
  if (cover) mediaIds.add(cover.id);
  return {
    slug: tour.slug,
    title: tour.title,
    summary: tour.summary,
    audience: tour.audience as TourAudience,
    mode: tour.mode as TourMode,
    accessibility: tour.accessibility as TourAccessibility,
    language: tour.language,
    vessel: vesselName,
    stopCount: stops.length,
    distanceMetres: ctx.route.distanceMetres,
    durationMinutes: ctx.route.totalMinutes,
    cover: cover ? { src: publicMediaPath(tour.slug, cover.id, 'display'), alt: cover.altText } : null,
    publishedAt: at.toISOString(),
    vesselId: tour.vesselId,
    revision: tour.revision,
    mediaIds: [...mediaIds],
    stops: published,
  };
}

/**
 * The public answer from a published snapshot: nothing is rendered or sanitized here. A stop
 * published on board is shown as virtual, with a notice, while visitors may not enter its space.
 * Photos since withdrawn from the public (`hidden`) are left out rather than shown broken.
 */
export function publicTourOf(snapshot: PublishedTour, access: Map<number, AccessStatus>, hidden: ReadonlySet<number> = new Set()): PublicTour {
  const { vesselId: _v, revision: _r, mediaIds: _m, stops, cover, ...rest } = snapshot;
  return {
    ...rest,
    cover: shownCover(cover, hidden),
    stops: stops.map(({ compartmentId, html, ...stop }) => {
      const status = access.get(compartmentId);
      const closed = !stop.virtual && (status === undefined || status === 'staff-only' || status === 'sealed');
      return { ...stop, html: withoutImages(html, hidden), virtual: stop.virtual || closed, notice: closed ? CLOSED_NOTICE : null };
    }),
  };
}

/** The media id of a published tour's cover, read from its public path. */
export function coverIdOf(snapshot: Pick<PublishedTour, 'cover'>): number | null {
  const id = snapshot.cover ? /\/media\/(\d+)\//.exec(snapshot.cover.src)?.[1] : undefined;
  return id ? Number(id) : null;
}

function shownCover(cover: PublishedTour['cover'], hidden: ReadonlySet<number>): PublishedTour['cover'] {
  const id = coverIdOf({ cover });
  return id !== null && hidden.has(id) ? null : cover;
}

export function publicSummaryOf(snapshot: PublishedTour, hidden: ReadonlySet<number> = new Set()) {
  const { vesselId: _v, revision: _r, mediaIds: _m, stops: _s, cover, ...rest } = snapshot;
  return { ...rest, cover: shownCover(cover, hidden) };
}
