import type { Config } from '../config.js';
import type { TourEntity } from '../db/entities/tour.entity.js';
import type { Store } from '../db/store.js';
import { ConflictError, NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import type { Mailer } from '../mail/mailer.js';
import { tourReviewMail } from '../mail/tour-mail.js';
import { presentComment } from '../presenters/tour.presenter.js';
import { recordAudit, type Actor } from './audit.service.js';
import type { ClosureService } from './closure.service.js';
import { assertPublishable, publishCheck } from './tour-checks.js';
import { tourContext } from './tour-context.js';
import { placardSheetPdf, placardsPdf } from './tour-placards-pdf.js';
import { buildPublishedTour } from './tour-snapshot.js';
import type { TourService } from './tour.service.js';

interface Notice {
  to: { email: string; name: string }[];
  subject: string;
  lines: string[];
  tourId: number;
}

/**
 * Review and publishing: a docent submits, a curator approves (which freezes the published
 * snapshot the public API serves) or returns the tour with comments. E-mail goes both ways,
 * after the commit; a failing mail server is logged and undoes nothing.
 */
export class TourReviewService {
  constructor(private readonly store: Store, private readonly tours: TourService, private readonly closures: ClosureService, private readonly mailer: Mailer, private readonly config: Config) {}

  private async load(id: number) {
    const repos = this.store.repos;
    const tour = await repos.tours.findPlain(id);
    if (!tour) throw new NotFoundError('The tour');
    const stops = await repos.tourStops.listFor(id);
    const ctx = await tourContext(repos, this.closures, tour, stops);
    return { tour, stops, ctx, slugTaken: (await repos.tours.publishedElsewhere(tour.slug, id)) > 0 };
  }

  async check(id: number) {
    const { tour, stops, ctx, slugTaken } = await this.load(id);
    return publishCheck(tour, stops, ctx, slugTaken);
  }

  private fresh(tour: TourEntity, version: number) {
    if (tour.version !== version) throw new StaleVersionError('this tour', tour.version);
  }

  private async send(notice: Notice) {
    const settings = await this.store.repos.settings.get();
    const url = `${this.config.publicUrl}/app/tours/${notice.tourId}`;
    for (const person of notice.to) {
      const mail = tourReviewMail({ to: person.email, name: person.name, subject: notice.subject, lines: notice.lines, url, organisationName: settings.organisationName });
      await this.mailer.send(mail).catch((err: unknown) => console.error(`Could not send "${notice.subject}" to ${person.email}:`, err instanceof Error ? err.message : err));
    }
  }

  async submit(id: number, version: number, viewer: Express.User, actor: Actor) {
    const { tour, stops, ctx, slugTaken } = await this.load(id);
    if (tour.state !== 'draft') throw new ConflictError(tour.state === 'in_review' ? 'This tour is already in review.' : 'Only a draft is submitted for review.');
    this.fresh(tour, version);
    assertPublishable(publishCheck(tour, stops, ctx, slugTaken), 'submitted');
    await this.store.transaction(async (repos) => {
      const current = await this.tours.tourOrFail(repos, id);
      this.fresh(current, version);
      Object.assign(current, { state: 'in_review', submittedById: viewer.id, submittedAt: new Date() });
      await repos.tours.save(current);
      await recordAudit(repos, actor, { action: 'submit', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Tour “${tour.title}” submitted for review (revision ${tour.revision})` });
    });
    const curators = (await this.store.repos.users.activeWithRole('curator')).filter((u) => u.id !== viewer.id);
    await this.send({
      to: curators,
      tourId: id,
      subject: `Tour for review: ${tour.title}`,
      lines: [`${viewer.name} submitted the tour “${tour.title}” (${stops.length} stops, revision ${tour.revision}) for review.`, 'Compare it with the published version, comment on its stops, then approve or return it.'],
    });
    return this.tours.get(id, viewer);
  }

  async approve(id: number, version: number, comment: string, viewer: Express.User, actor: Actor) {
    const { tour, stops, ctx, slugTaken } = await this.load(id);
    if (tour.state !== 'in_review') throw new ConflictError('Only a tour in review is approved; submit it first.');
    this.fresh(tour, version);
    const check = publishCheck(tour, stops, ctx, slugTaken);
    assertPublishable(check, 'published');
    const vessel = await this.store.repos.vessels.findById(tour.vesselId);
    const at = new Date();
    const snapshot = buildPublishedTour(tour, stops, ctx, vessel?.name ?? '', at);
    await this.store.transaction(async (repos) => {
      const current = await this.tours.tourOrFail(repos, id);
      this.fresh(current, version);
      if (comment) await repos.tourRevisions.addComment({ tourId: id, stopId: null, body: comment, revision: current.revision, authorId: viewer.id });
      Object.assign(current, { state: 'published', publishedSnapshot: snapshot, publishedRevision: current.revision, publishedAt: at });
      await repos.tours.save(current);
      await recordAudit(repos, actor, { action: 'approve', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Tour “${tour.title}” approved and published (revision ${tour.revision})` });
    });
    await this.tellSubmitter(tour, viewer, `Tour published: ${tour.title}`, [
      `${viewer.name} approved the tour “${tour.title}”. Revision ${tour.revision} is now on the public site.`,
      ...(comment ? [`Comment: ${comment}`] : []),
      ...check.warnings.map((w) => w.message),
    ]);
    return { tour: await this.tours.get(id, viewer), warnings: check.warnings };
  }

  async return(id: number, version: number, comment: string, viewer: Express.User, actor: Actor) {
    const tour = await this.store.repos.tours.findPlain(id);
    if (!tour) throw new NotFoundError('The tour');
    if (tour.state !== 'in_review') throw new ConflictError('Only a tour in review is returned.');
    this.fresh(tour, version);
    const stopComments = await this.store.transaction(async (repos) => {
      const current = await this.tours.tourOrFail(repos, id);
      this.fresh(current, version);
      await repos.tourRevisions.addComment({ tourId: id, stopId: null, body: comment, revision: current.revision, authorId: viewer.id });
      current.state = 'draft';
      await repos.tours.save(current);
      await recordAudit(repos, actor, { action: 'return', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Tour “${tour.title}” returned for changes` });
      return repos.tourRevisions.commentsOn(id, current.revision);
    });
    const titles = new Map((await this.store.repos.tourStops.listFor(id)).map((s, i) => [s.id, `Stop ${i + 1} “${s.title}”`]));
    const lines = stopComments.filter((c) => c.stopId !== null).map((c) => `${titles.get(c.stopId!) ?? 'A removed stop'}: ${c.body}`);
    await this.tellSubmitter(tour, viewer, `Tour returned: ${tour.title}`, [`${viewer.name} returned the tour “${tour.title}” for changes.`, `Comment: ${comment}`, ...lines]);
    return this.tours.get(id, viewer);
  }

  async retire(id: number, version: number, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const tour = await this.tours.tourOrFail(repos, id);
      this.fresh(tour, version);
      if (tour.state === 'retired') throw new ConflictError('This tour is already retired.');
      if (!tour.publishedSnapshot) throw new UnprocessableError('Only a published tour is retired; a draft that was never published can simply be left.');
      tour.state = 'retired';
      await repos.tours.save(tour);
      await recordAudit(repos, actor, { action: 'retire', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Tour “${tour.title}” retired from the public site` });
    });
    return this.tours.get(id, viewer);
  }

  private async tellSubmitter(tour: TourEntity, viewer: Express.User, subject: string, lines: string[]) {
    if (!tour.submittedById || tour.submittedById === viewer.id) return;
    const submitter = await this.store.repos.users.findById(tour.submittedById);
    if (!submitter || submitter.status !== 'active') return;
    await this.send({ to: [submitter], tourId: tour.id, subject, lines });
  }

  /** Placards from the published version (their codes lead to its public pages): one stop, every stop, or the sheet of all. */
  async placards(id: number, stop: number | undefined, sheet: boolean) {
    const tour = await this.store.repos.tours.findPlain(id);
    if (!tour) throw new NotFoundError('The tour');
    const published = tour.state !== 'retired' ? tour.publishedSnapshot : null;
    if (!published) throw new UnprocessableError('Placards are printed from the published tour, whose pages their codes open: publish it first.');
    if (stop !== undefined && !published.stops.some((s) => s.number === stop)) throw new NotFoundError(`Stop ${stop} of the published tour`);
    const pdf = sheet ? await placardSheetPdf(published, this.config.publicUrl) : await placardsPdf(published, this.config.publicUrl, stop ?? null);
    return { pdf, fileName: `${tour.slug}-${sheet ? 'all-stops' : stop ? `stop-${stop}` : 'placards'}.pdf` };
  }

  async comments(id: number) {
    const repos = this.store.repos;
    if (!(await repos.tours.findPlain(id))) throw new NotFoundError('The tour');
    const titles = new Map((await repos.tourStops.listFor(id)).map((s) => [s.id, s.title]));
    return (await repos.tourRevisions.commentsFor(id)).map((c) => presentComment(c, titles));
  }

  async comment(id: number, body: { stopId: number | null; body: string }, viewer: Express.User, actor: Actor) {
    const saved = await this.store.transaction(async (repos) => {
      const tour = await this.tours.tourOrFail(repos, id);
      if (tour.state === 'retired') throw new ConflictError('This tour is retired; it takes no more comments.');
      if (body.stopId) {
        const stop = await repos.tourStops.findPlain(body.stopId);
        if (!stop || stop.tourId !== id) throw new UnprocessableError('The stop commented on is not a stop of this tour.', { stopId: 'Not a stop of this tour.' });
      }
      const comment = await repos.tourRevisions.addComment({ tourId: id, stopId: body.stopId, body: body.body, revision: tour.revision, authorId: viewer.id });
      await recordAudit(repos, actor, { action: 'comment', entityType: 'tour', entityId: id, vesselId: tour.vesselId, summary: `Comment on tour “${tour.title}”` });
      return comment.id;
    });
    return (await this.comments(id)).find((c) => c.id === saved)!;
  }
}
