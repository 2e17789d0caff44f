import type { Store } from '../db/store.js';
import { NotFoundError } from '../http/errors.js';
import type { MediaService } from './media.service.js';
import { publicSummaryOf, publicTourOf } from './tour-snapshot.js';

/** The public read side: only published tours, as they were published, with today's closures laid over them. */
export class TourPublicService {
  constructor(private readonly store: Store, private readonly media: MediaService) {}

  async list() {
    return (await this.store.repos.tours.listPublished()).map((t) => publicSummaryOf(t.publishedSnapshot!));
  }

  private async published(slug: string) {
    const tour = await this.store.repos.tours.publishedBySlug(slug);
    if (!tour?.publishedSnapshot) throw new NotFoundError('The tour');
    return tour.publishedSnapshot;
  }

  async get(slug: string) {
    const snapshot = await this.published(slug);
    const access = await this.store.repos.compartments.accessOf(snapshot.stops.map((s) => s.compartmentId));
    return publicTourOf(snapshot, access);
  }

  /** A photo or clip of a published tour; any other file is not found here. */
  async file(slug: string, mediaId: number, variant: 'thumb' | 'display' | 'audio') {
    const snapshot = await this.published(slug);
    if (!snapshot.mediaIds.includes(mediaId)) throw new NotFoundError('The file');
    return this.media.publicFile(mediaId, variant);
  }
}
