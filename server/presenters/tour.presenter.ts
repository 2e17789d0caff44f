import { stopPosition } from '../../shared/calc/tour-route.js';
import { can } from '../../shared/permissions.js';
import { cautionsFor } from '../../shared/schemas/hazard-cautions.js';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import type { Tour, TourComment, TourRevisionSummary, TourStop, TourSummary } from '../../shared/schemas/tours.js';
import { visitorCautions } from '../../shared/tour-cautions.js';
import type { TourCommentEntity } from '../db/entities/tour-comment.entity.js';
import type { TourRevisionEntity } from '../db/entities/tour-revision.entity.js';
import type { TourStopEntity } from '../db/entities/tour-stop.entity.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import { effectivelyVirtual, type TourContext } from '../services/tour-context.js';
import { mediaUrl } from './media.presenter.js';

const person = (u: { id: number; name: string } | null | undefined) => (u ? { id: u.id, name: u.name } : null);

export function presentTourSummary(tour: TourEntity, stopCount: number): TourSummary {
  return {
    id: tour.id,
    vesselId: tour.vesselId,
    title: tour.title,
    slug: tour.slug,
    summary: tour.summary,
    audience: tour.audience,
    mode: tour.mode,
    accessibility: tour.accessibility,
    coverMediaId: tour.coverMediaId,
    language: tour.language,
    state: tour.state,
    stopCount,
    published: tour.publishedSnapshot && tour.state !== 'retired' && tour.publishedRevision !== null && tour.publishedAt ? { revision: tour.publishedRevision, at: tour.publishedAt.toISOString() } : null,
    revision: tour.revision,
    submittedBy: person(tour.submittedBy),
    updatedAt: tour.updatedAt.toISOString(),
    version: tour.version,
  };
}

export function presentStop(tour: TourEntity, stop: TourStopEntity, ctx: TourContext): TourStop {
  const c = ctx.compartments.get(stop.compartmentId);
  const kinds = ctx.hazards.get(stop.compartmentId) ?? [];
  const audio = stop.audioMediaId ? ctx.media.get(stop.audioMediaId) : undefined;
  return {
    id: stop.id,
    tourId: stop.tourId,
    position: stop.position,
    place: {
      compartmentId: stop.compartmentId,
      label: c ? `${c.designation} ${c.name}` : `Compartment ${stop.compartmentId}`,
      deckId: c?.deckId ?? 0,
      deckName: c?.deck?.name ?? '',
      accessStatus: c?.accessStatus ?? 'staff-only',
      closedNow: ctx.closedNow.has(stop.compartmentId),
    },
    artifacts: stop.artifactIds.map((id) => ({ id, label: ctx.artifacts.get(id) ?? `Artifact ${id}` })),
    title: stop.title,
    textDoc: stop.textDoc as RichTextDoc & Record<string, unknown>,
    textHtml: stop.textHtml,
    textPlain: stop.textPlain,
    audio: audio ? { mediaId: audio.id, fileName: audio.fileName, url: mediaUrl(audio.id, 'original') } : null,
    transcript: stop.transcript,
    dwellMinutes: stop.dwellMinutes,
    accessNotes: stop.accessNotes,
    lookFor: stop.lookFor,
    virtual: stop.virtual,
    effectivelyVirtual: effectivelyVirtual(tour, stop, c, ctx.closedNow),
    point: stop.point,
    standsAt: stopPosition(stop.point, c?.outline ?? null),
    visitorCautions: visitorCautions(kinds),
    hazardCautions: cautionsFor(kinds),
    version: stop.version,
  };
}

export function presentTour(tour: TourEntity, stops: TourStopEntity[], ctx: TourContext, viewer: Express.User): Tour {
  const editable = tour.state === 'draft' || tour.state === 'published';
  return {
    ...presentTourSummary(tour, stops.length),
    stops: stops.map((s) => presentStop(tour, s, ctx)),
    route: ctx.route,
    abilities: {
      update: editable && can(viewer.role, 'tour', 'update'),
      submit: tour.state === 'draft' && can(viewer.role, 'tour', 'submit'),
      approve: tour.state === 'in_review' && can(viewer.role, 'tour', 'approve'),
      return: tour.state === 'in_review' && can(viewer.role, 'tour', 'return'),
      retire: tour.state !== 'retired' && tour.publishedSnapshot !== null && can(viewer.role, 'tour', 'retire'),
      comment: tour.state !== 'retired' && can(viewer.role, 'tour', 'comment'),
    },
  };
}

export function presentRevision(revision: TourRevisionEntity, publishedRevision: number | null): TourRevisionSummary {
  return {
    id: revision.id,
    number: revision.number,
    note: revision.note,
    author: person(revision.author),
    createdAt: revision.createdAt.toISOString(),
    stopCount: revision.snapshot.stops.length,
    published: revision.number === publishedRevision,
  };
}

export function presentComment(comment: TourCommentEntity, stopTitles: Map<number, string>): TourComment {
  return {
    id: comment.id,
    tourId: comment.tourId,
    stopId: comment.stopId,
    stopTitle: comment.stopId ? (stopTitles.get(comment.stopId) ?? 'a removed stop') : null,
    body: comment.body,
    author: person(comment.author),
    revision: comment.revision,
    createdAt: comment.createdAt.toISOString(),
  };
}
