import type { Store } from '../db/store.js';
import { NotFoundError } from '../http/errors.js';
import type { MediaService } from './media.service.js';
import { coverIdOf, publicSummaryOf, publicTourOf, type PublishedTour } from './tour-snapshot.js';

interface Cached {
  publishedAt: number;
  snapshot: PublishedTour;
  compartmentIds: number[];
  /** The answer as JSON, by the access of its spaces (today's closures change it) and which of its photos are no longer public. */
  bodies: Map<string, string>;
}

/**
 * The public read side: only published tours, as they were published, with today's closures laid
 * over them. A snapshot is read and its answer serialized once per publication, closure state and
 * set of withdrawn photos; each request then asks only which tour the slug names, whether its
 * spaces are open and whether its files are still public.
 */
export class TourPublicService {
  private readonly cache = new Map<number, Cached>();

  constructor(private readonly store: Store, private readonly media: MediaService) {}

  async list() {
    const snapshots = (await this.store.repos.tours.listPublished()).map((t) => t.publishedSnapshot!);
    const hidden = await this.store.repos.media.hiddenPhotos(snapshots.map(coverIdOf).filter((id) => id !== null));
    return snapshots.map((s) => publicSummaryOf(s, hidden));
  }

  private async published(slug: string): Promise<Cached> {
    const head = await this.store.repos.tours.publishedHead(slug);
    if (!head) throw new NotFoundError('The tour');
    const cached = this.cache.get(head.id);
    if (cached && cached.publishedAt === head.publishedAt.getTime()) return cached;
    const tour = await this.store.repos.tours.findPlain(head.id);
    if (!tour?.publishedSnapshot || !tour.publishedAt) throw new NotFoundError('The tour');
    const fresh: Cached = { publishedAt: tour.publishedAt.getTime(), snapshot: tour.publishedSnapshot, compartmentIds: [...new Set(tour.publishedSnapshot.stops.map((s) => s.compartmentId))], bodies: new Map() };
    this.cache.set(head.id, fresh);
    return fresh;
  }

  /** The public tour as JSON text. */
  async get(slug: string): Promise<string> {
    const entry = await this.published(slug);
    const access = await this.store.repos.compartments.accessOf(entry.compartmentIds);
    const hidden = await this.store.repos.media.hiddenPhotos(entry.snapshot.mediaIds);
    const key = `${entry.compartmentIds.map((id) => access.get(id) ?? '-').join(',')}|${[...hidden].sort((a, b) => a - b).join(',')}`;
    let body = entry.bodies.get(key);
    if (!body) {
      body = JSON.stringify(publicTourOf(entry.snapshot, access, hidden));
      if (entry.bodies.size > 16) entry.bodies.clear();
      entry.bodies.set(key, body);
    }
    return body;
  }

  /** A photo or clip of a published tour; any other file is not found here. */
  async file(slug: string, mediaId: number, variant: 'thumb' | 'display' | 'audio') {
    const { snapshot } = await this.published(slug);
    if (!snapshot.mediaIds.includes(mediaId)) throw new NotFoundError('The file');
    return this.media.publicFile(mediaId, variant);
  }
}
