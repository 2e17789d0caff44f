import type { z } from 'zod';
import type { createStopBody, createTourBody, ToursQuery, UpdateStopBody, UpdateTourBody } from '../../shared/schemas/tours.js';
import type { updateTourRouteSettingsBody } from '../../shared/schemas/tours.js';
import type { TourStopEntity } from '../db/entities/tour-stop.entity.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ConflictError, NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import { presentTour, presentTourSummary } from '../presenters/tour.presenter.js';
import { renderRichText } from '../richtext/render.js';
import { tourDocument, tourStopDocument } from '../search/tour-document.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import type { ClosureService } from './closure.service.js';
import { staleEditError } from './stale-edit.js';
import { tourContext } from './tour-context.js';
import { assertEditable, writeRevision } from './tour-revision.js';

const TOUR_FIELDS = ['title', 'slug', 'summary', 'audience', 'mode', 'accessibility', 'coverMediaId', 'language'] as const;
const STOP_FIELDS = ['compartmentId', 'artifactIds', 'title', 'textDoc', 'audioMediaId', 'transcript', 'dwellMinutes', 'accessNotes', 'lookFor', 'virtual', 'point'] as const;

type StopInput = Partial<z.output<typeof createStopBody>>;

/** Tours and their stops: the docent's working copy. Every save is kept as a revision. */
export class TourService {
  constructor(private readonly store: Store, private readonly closures: ClosureService) {}

  async tourOrFail(repos: Repositories, id: number): Promise<TourEntity> {
    const tour = await repos.tours.findPlain(id);
    if (!tour) throw new NotFoundError('The tour');
    return tour;
  }

  private async vesselOrFail(vesselId: number) {
    const vessel = await this.store.repos.vessels.findById(vesselId);
    if (!vessel) throw new NotFoundError('The vessel');
    return vessel;
  }

  async list(vesselId: number, query: ToursQuery) {
    await this.vesselOrFail(vesselId);
    const page = await this.store.repos.tours.page(vesselId, query);
    const counts = await this.store.repos.tourStops.counts(page.items.map((i) => i.tour.id));
    return { ...page, items: page.items.map(({ tour, snippet }) => ({ ...presentTourSummary(tour, counts.get(tour.id) ?? 0), snippet })) };
  }

  async get(id: number, viewer: Express.User) {
    const repos = this.store.repos;
    const tour = await repos.tours.findById(id);
    if (!tour) throw new NotFoundError('The tour');
    const stops = await repos.tourStops.listFor(id);
    return presentTour(tour, stops, await tourContext(repos, this.closures, tour, stops), viewer);
  }

  private async checkTourFields(repos: Repositories, vesselId: number, fields: { slug?: string; coverMediaId?: number | null }, tourId: number | null) {
    if (fields.slug !== undefined) {
      const other = await repos.tours.findBySlug(vesselId, fields.slug);
      if (other && other.id !== tourId) throw new ConflictError(`Another tour of this vessel already uses the slug “${fields.slug}”.`, { slug: 'Already used by another tour.' });
    }
    if (fields.coverMediaId) {
      const cover = await repos.media.findById(fields.coverMediaId);
      if (!cover || cover.vesselId !== vesselId || cover.kind !== 'photo') throw new UnprocessableError('The cover must be a photo of this vessel’s records.', { coverMediaId: 'Not a photo of this vessel.' });
    }
  }

  async create(vesselId: number, body: z.output<typeof createTourBody>, viewer: Express.User, actor: Actor) {
    await this.vesselOrFail(vesselId);
    const id = await this.store.transaction(async (repos) => {
      await this.checkTourFields(repos, vesselId, body, null);
      const tour = await repos.tours.create({ vesselId, ...body, createdById: viewer.id });
      await writeRevision(repos, tour, 'Tour created', viewer.id);
      await repos.search.put(tourDocument(tour));
      await recordAudit(repos, actor, { action: 'create', entityType: 'tour', entityId: tour.id, vesselId, summary: `Tour “${tour.title}” created` });
      return tour.id;
    });
    return this.get(id, viewer);
  }

  async update(id: number, body: UpdateTourBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const tour = await this.tourOrFail(repos, id);
      if (tour.version !== body.version) throw await staleEditError(repos, 'tour', id, 'this tour', tour.version, body.version);
      assertEditable(tour);
      const { version: _v, ...fields } = body;
      const changes = changesBetween<TourEntity>(tour, fields, [...TOUR_FIELDS]);
      if (!changes) return;
      await this.checkTourFields(repos, tour.vesselId, fields, id);
      Object.assign(tour, fields);
      if (tour.state === 'published') tour.state = 'draft';
      const saved = await repos.tours.save(tour);
      await repos.search.put(tourDocument(saved));
      await writeRevision(repos, saved, `Tour details changed: ${Object.keys(changes).join(', ')}`, viewer.id);
      await recordAudit(repos, actor, { action: 'update', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Tour “${tour.title}” changed`, changes });
    });
    return this.get(id, viewer);
  }

  /** The stop's space must be on the tour's vessel, its artifacts in that space, its audio a clip of this tour. */
  private async checkStop(repos: Repositories, tour: TourEntity, stop: StopInput & { compartmentId: number; artifactIds: number[] }) {
    const compartment = await repos.compartments.findById(stop.compartmentId);
    if (!compartment) throw new UnprocessableError('The space of the stop was not found.', { compartmentId: 'Not found.' });
    if (compartment.vesselId !== tour.vesselId) throw new UnprocessableError('The space of a stop must be on the tour’s vessel.', { compartmentId: 'On another vessel.' });
    for (const artifactId of stop.artifactIds) {
      const artifact = await repos.artifacts.findById(artifactId);
      if (!artifact || artifact.compartmentId !== compartment.id) {
        throw new UnprocessableError(`Artifact ${artifactId} is not in ${compartment.designation} ${compartment.name}; a stop shows only what is in its space.`, { artifactIds: `Artifact ${artifactId} is not in this space.` });
      }
    }
    if (stop.audioMediaId) {
      const audio = await repos.media.findById(stop.audioMediaId);
      if (!audio || audio.kind !== 'audio' || audio.ownerType !== 'tour' || audio.ownerId !== tour.id) {
        throw new UnprocessableError('The audio must be a clip uploaded to this tour.', { audioMediaId: 'Not an audio clip of this tour.' });
      }
    }
  }

  private rendered(stop: StopInput) {
    if (!stop.textDoc) return {};
    const out = renderRichText(stop.textDoc, 'textDoc');
    return { textHtml: out.html, textPlain: out.text };
  }

  async createStop(id: number, body: z.output<typeof createStopBody>, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const tour = await this.tourOrFail(repos, id);
      assertEditable(tour);
      await this.checkStop(repos, tour, body);
      const position = (await repos.tourStops.listFor(id)).length;
      const stop = await repos.tourStops.create({ tourId: id, position, ...body, ...{ textHtml: '', textPlain: '' }, ...this.rendered(body) });
      await repos.search.put(tourStopDocument(stop, tour.vesselId));
      await writeRevision(repos, tour, `Stop ${position + 1} “${stop.title}” added`, viewer.id);
      await recordAudit(repos, actor, { action: 'create', entityType: 'tour-stop', entityId: stop.id, vesselId: tour.vesselId, summary: `Stop “${stop.title}” added to tour “${tour.title}”` });
    });
    return this.get(id, viewer);
  }

  private async stopOf(repos: Repositories, tourId: number, stopId: number): Promise<TourStopEntity> {
    const stop = await repos.tourStops.findPlain(stopId);
    if (!stop || stop.tourId !== tourId) throw new NotFoundError('The stop');
    return stop;
  }

  async updateStop(id: number, stopId: number, body: UpdateStopBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const tour = await this.tourOrFail(repos, id);
      const stop = await this.stopOf(repos, id, stopId);
      if (stop.version !== body.version) throw await staleEditError(repos, 'tour-stop', stopId, 'this stop', stop.version, body.version);
      assertEditable(tour);
      const { version: _v, ...fields } = body;
      const changes = changesBetween<TourStopEntity>(stop, fields, [...STOP_FIELDS]);
      if (!changes) return;
      // A new space leaves behind the artifacts of the old one unless the body names new ones.
      const artifactIds = fields.artifactIds ?? (fields.compartmentId && fields.compartmentId !== stop.compartmentId ? [] : stop.artifactIds);
      await this.checkStop(repos, tour, { ...stop, ...fields, artifactIds });
      Object.assign(stop, fields, { artifactIds }, this.rendered(fields));
      await repos.tourStops.save(stop);
      await repos.search.put(tourStopDocument(stop, tour.vesselId));
      // The audit keeps what changed, not whole documents.
      if (changes.textDoc) changes.textDoc = { from: '(previous text)', to: stop.textPlain.slice(0, 200) };
      await writeRevision(repos, tour, `Stop ${stop.position + 1} “${stop.title}” changed: ${Object.keys(changes).join(', ')}`, viewer.id);
      await recordAudit(repos, actor, { action: 'update', entityType: 'tour-stop', entityId: stopId, vesselId: tour.vesselId, summary: `Stop “${stop.title}” of tour “${tour.title}” changed`, changes });
    });
    return this.get(id, viewer);
  }

  async removeStop(id: number, stopId: number, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const tour = await this.tourOrFail(repos, id);
      const stop = await this.stopOf(repos, id, stopId);
      assertEditable(tour);
      await repos.tourStops.remove(stopId);
      await repos.search.remove('tour-stop', stopId);
      const rest = await repos.tourStops.listFor(id);
      for (const [i, s] of rest.entries()) if (s.position !== i) await repos.tourStops.setPosition(s.id, i);
      await writeRevision(repos, tour, `Stop “${stop.title}” removed`, viewer.id);
      await recordAudit(repos, actor, { action: 'delete', entityType: 'tour-stop', entityId: stopId, vesselId: tour.vesselId, summary: `Stop “${stop.title}” removed from tour “${tour.title}”` });
    });
    return this.get(id, viewer);
  }

  /** A new order of every stop; 409 when the stops changed since the caller loaded them. */
  async reorder(id: number, stopIds: number[], viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const tour = await this.tourOrFail(repos, id);
      assertEditable(tour);
      const stops = await repos.tourStops.listFor(id);
      const current = stops.map((s) => s.id);
      if (stopIds.length !== current.length || new Set(stopIds).size !== stopIds.length || !stopIds.every((s) => current.includes(s))) {
        throw new ConflictError('The stops of this tour changed since you opened it. Reload to see them; the order is not saved.');
      }
      if (stopIds.every((s, i) => current[i] === s)) return;
      for (const [i, stopId] of stopIds.entries()) await repos.tourStops.setPosition(stopId, i);
      await writeRevision(repos, tour, 'Stops reordered', viewer.id);
      await recordAudit(repos, actor, { action: 'update', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Stops of tour “${tour.title}” reordered`, changes: { stopOrder: { from: current, to: stopIds } } });
    });
    return this.get(id, viewer);
  }

  async routeSettings(vesselId: number) {
    await this.vesselOrFail(vesselId);
    const s = await this.store.repos.tourRouteSettings.get(vesselId);
    return { walkingPaceMetresPerSecond: s.walkingPaceMetresPerSecond, deckChangeMetres: s.deckChangeMetres, version: s.version };
  }

  async updateRouteSettings(vesselId: number, body: z.output<typeof updateTourRouteSettingsBody>, actor: Actor) {
    await this.vesselOrFail(vesselId);
    await this.store.transaction(async (repos) => {
      const s = await repos.tourRouteSettings.get(vesselId);
      // Never saved: version 0, which the first save makes 1.
      if (s.version !== body.version) throw new StaleVersionError('the route settings', s.version, 'them');
      const changes = changesBetween(s, body, ['walkingPaceMetresPerSecond', 'deckChangeMetres']);
      if (!changes) return;
      s.walkingPaceMetresPerSecond = body.walkingPaceMetresPerSecond;
      s.deckChangeMetres = body.deckChangeMetres;
      await repos.tourRouteSettings.save(s);
      await recordAudit(repos, actor, { action: 'update', entityType: 'tour-route-settings', entityId: vesselId, vesselId, summary: 'Tour route settings changed', changes });
    });
    return this.routeSettings(vesselId);
  }
}
