import type { RevisionCompare, RevisionSnapshot } from '../../shared/schemas/tours.js';
import type { Store } from '../db/store.js';
import { NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import { presentRevision } from '../presenters/tour.presenter.js';
import { reindexTour } from '../search/tour-document.js';
import { recordAudit, type Actor } from './audit.service.js';
import { assertEditable, writeRevision } from './tour-revision.js';
import type { TourService } from './tour.service.js';

type SnapshotStop = RevisionSnapshot['stops'][number];
const STOP_KEYS = ['compartmentId', 'artifactIds', 'title', 'textDoc', 'audioMediaId', 'transcript', 'dwellMinutes', 'accessNotes', 'lookFor', 'virtual', 'point'] as const satisfies readonly (keyof SnapshotStop)[];
const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** What differs between two revisions: the tour's fields, and each stop added, removed, moved or changed. */
export function compareSnapshots(from: RevisionSnapshot, to: RevisionSnapshot): Pick<RevisionCompare, 'tourChanges' | 'stopChanges'> {
  const tourChanges = (Object.keys(to.tour) as (keyof RevisionSnapshot['tour'])[]).filter((k) => !same(from.tour[k], to.tour[k]));
  const stopChanges: RevisionCompare['stopChanges'] = [];
  const before = new Map(from.stops.map((s, i) => [s.id, { s, i }]));
  const after = new Map(to.stops.map((s, i) => [s.id, { s, i }]));
  for (const [id, { s, i }] of after) {
    const old = before.get(id);
    if (!old) stopChanges.push({ stopId: id, title: s.title, change: 'added', fields: [] });
    else {
      const fields = STOP_KEYS.filter((k) => !same(old.s[k], s[k]));
      if (fields.length) stopChanges.push({ stopId: id, title: s.title, change: 'changed', fields });
      else if (old.i !== i) stopChanges.push({ stopId: id, title: s.title, change: 'moved', fields: [] });
    }
  }
  for (const [id, { s }] of before) if (!after.has(id)) stopChanges.push({ stopId: id, title: s.title, change: 'removed', fields: [] });
  return { tourChanges, stopChanges };
}

/** A tour's revisions: listed, compared two by two, and restored as a new revision. */
export class TourRevisionService {
  constructor(private readonly store: Store, private readonly tours: TourService) {}

  async list(id: number) {
    const tour = await this.store.repos.tours.findPlain(id);
    if (!tour) throw new NotFoundError('The tour');
    return (await this.store.repos.tourRevisions.listFor(id)).map((r) => presentRevision(r, tour.publishedRevision));
  }

  private async revisionOrFail(id: number, number: number) {
    const revision = await this.store.repos.tourRevisions.find(id, number);
    if (!revision) throw new NotFoundError(`Revision ${number} of this tour`);
    return revision;
  }

  async compare(id: number, fromNumber: number, toNumber: number): Promise<RevisionCompare> {
    const tour = await this.store.repos.tours.findPlain(id);
    if (!tour) throw new NotFoundError('The tour');
    const from = await this.revisionOrFail(id, fromNumber);
    const to = await this.revisionOrFail(id, toNumber);
    return {
      from: { ...presentRevision(from, tour.publishedRevision), snapshot: from.snapshot },
      to: { ...presentRevision(to, tour.publishedRevision), snapshot: to.snapshot },
      ...compareSnapshots(from.snapshot, to.snapshot),
    };
  }

  /**
   * Makes the tour and its stops as they were in a revision, as a new revision: stops that still
   * exist keep their ids (and their comments), stops added since go, stops removed since return.
   */
  async restore(id: number, number: number, version: number, viewer: Express.User, actor: Actor) {
    const revision = await this.revisionOrFail(id, number);
    await this.store.transaction(async (repos) => {
      const tour = await this.tours.tourOrFail(repos, id);
      if (tour.version !== version) throw new StaleVersionError('this tour', tour.version);
      assertEditable(tour);
      const { tour: fields, stops } = revision.snapshot;
      const slugOwner = await repos.tours.findBySlug(tour.vesselId, fields.slug);
      if (slugOwner && slugOwner.id !== id) throw new UnprocessableError(`Another tour now uses the slug “${fields.slug}”; change that tour’s slug first.`, { slug: 'Used by another tour.' });
      for (const stop of stops) {
        const compartment = await repos.compartments.findById(stop.compartmentId);
        if (!compartment) throw new UnprocessableError(`The space of stop “${stop.title}” no longer exists, so revision ${number} cannot be restored.`);
      }
      Object.assign(tour, fields, { state: tour.state === 'published' ? 'draft' : tour.state });
      const saved = await repos.tours.save(tour);
      const keep = new Set(stops.map((s) => s.id));
      const removed: number[] = [];
      for (const existing of await repos.tourStops.listFor(id)) {
        if (keep.has(existing.id)) continue;
        await repos.tourStops.remove(existing.id);
        removed.push(existing.id);
      }
      for (const [position, s] of stops.entries()) {
        const current = await repos.tourStops.findPlain(s.id);
        if (current && current.tourId === id) {
          Object.assign(current, { ...s, position });
          await repos.tourStops.save(current);
        } else {
          await repos.tourStops.create({ ...s, tourId: id, position, textDoc: s.textDoc as never });
        }
      }
      await reindexTour(repos, saved, removed);
      await writeRevision(repos, saved, `Revision ${number} restored`, viewer.id);
      await recordAudit(repos, actor, { action: 'restore', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Tour “${tour.title}” restored to revision ${number}` });
    });
    return this.tours.get(id, viewer);
  }
}
