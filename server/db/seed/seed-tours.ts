import type { DataSource } from 'typeorm';
import type { RichTextDoc } from '../../../shared/schemas/rich-text.js';
import { mediaSrc } from '../../../shared/richtext/extensions.js';
import type { Config } from '../../config.js';
import type { Mailer } from '../../mail/mailer.js';
import { ClosureService } from '../../services/closure.service.js';
import { TourReviewService } from '../../services/tour-review.service.js';
import { TourService } from '../../services/tour.service.js';
import { Store } from '../store.js';
import { DEMO_TOURS, type DemoStop } from './demo-tours.js';

const quietMail = { send: async () => undefined } as unknown as Mailer;

/**
 * The demo's tours, written through the same services as the screens: a docent writes each, a
 * curator publishes three and comments on the fourth, which stays in review. Runs after the collection.
 */
export async function seedDemoTours(dataSource: DataSource, config: Config): Promise<void> {
  const store = new Store(dataSource);
  const closures = new ClosureService(store);
  const tours = new TourService(store, closures);
  const review = new TourReviewService(store, tours, closures, quietMail, config);
  const person = async (email: string) => {
    const user = (await store.repos.users.findByEmail(email))!;
    return { user: { id: user.id, email: user.email, name: user.name, role: user.role } as Express.User, actor: { id: user.id, ip: null } };
  };
  const docent = await person('docent@shipkeeper.test');
  const curator = await person('curator@shipkeeper.test');
  const [vessel] = await store.repos.vessels.listActive();
  if (!vessel) return;
  const rooms = new Map((await store.repos.compartments.page(vessel.id, { page: 1, pageSize: 100, sort: 'designation' })).items.map((c) => [c.designation, c.id]));
  const artifactId = async (number: string) => (await store.repos.artifacts.findByNumber(vessel.id, number))?.id ?? null;

  async function docOf(stop: DemoStop, artifactIds: number[]): Promise<RichTextDoc> {
    const content: NonNullable<RichTextDoc['content']> = stop.paragraphs.map((text) => ({ type: 'paragraph', content: [{ type: 'text', text }] }));
    if (stop.photo) {
      for (const id of artifactIds) {
        const photo = (await store.repos.media.forOwner('artifact', id)).find((m) => m.kind === 'photo' && m.altText.trim());
        if (photo) {
          content.splice(1, 0, { type: 'image', attrs: { src: mediaSrc(photo.id), alt: photo.altText } });
          break;
        }
      }
    }
    if (stop.ladder) content.push({ type: 'explainer', attrs: { kind: 'boiling-ladder', config: JSON.stringify({ title: stop.ladder.title, unit: 'F', stages: stop.ladder.stages }) } });
    return { type: 'doc', content };
  }

  for (const demo of DEMO_TOURS) {
    let tour = await tours.create(vessel.id, { title: demo.title, slug: demo.slug, summary: demo.summary, audience: demo.audience, mode: demo.mode, accessibility: demo.accessibility, coverMediaId: null, language: 'en' }, docent.user, docent.actor);
    for (const stop of demo.stops) {
      const artifactIds = (await Promise.all((stop.artifacts ?? []).map(artifactId))).filter((id): id is number => id !== null);
      tour = await tours.createStop(
        tour.id,
        {
          compartmentId: rooms.get(stop.room)!,
          artifactIds,
          title: stop.title,
          textDoc: await docOf(stop, artifactIds),
          audioMediaId: null,
          transcript: '',
          dwellMinutes: stop.dwellMinutes,
          accessNotes: stop.accessNotes ?? '',
          lookFor: stop.lookFor ?? '',
          virtual: stop.virtual ?? false,
          point: null,
        },
        docent.user,
        docent.actor,
      );
    }
    tour = await review.submit(tour.id, tour.version, docent.user, docent.actor);
    if (demo.comment) await review.comment(tour.id, { stopId: tour.stops[demo.comment.stop - 1]!.id, body: demo.comment.text }, curator.user, curator.actor);
    if (demo.end === 'published') await review.approve(tour.id, tour.version, '', curator.user, curator.actor);
  }
}
