import { isEmptyRichText } from '../../shared/richtext/plain-text.js';
import {
  AUDIENCE_LABELS,
  AUDIENCES,
  INTERPRETATION_PARTS,
  PART_LABELS,
  type Audience,
  type AudienceParts,
  type Interpretation,
  type InterpretationsQuery,
  type InterpretationSummary,
  type InterpretationRevision,
  type InterpretationSubject,
  type InterpretationTexts,
  type PublicInterpretation,
  type ReturnInterpretationBody,
  type SaveInterpretationBody,
} from '../../shared/schemas/interpretation.js';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import type { Config } from '../config.js';
import type { InterpretationEntity } from '../db/entities/interpretation.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ConflictError, NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import type { Mailer } from '../mail/mailer.js';
import { interpretationReviewMail } from '../mail/templates.js';
import { presentInterpretation, sameTexts } from '../presenters/interpretation.presenter.js';
import { renderRichText } from '../richtext/render.js';
import { recordAudit, type Actor } from './audit.service.js';
import { imageIdsIn, pointImagesAt, withoutImages } from './public-media-html.js';

interface Subject {
  type: InterpretationSubject;
  id: number;
  vesselId: number;
  /** Object number and name, or designation and name: for staff. */
  label: string;
  /** What visitors read as the heading. */
  title: string;
  /** Whether the public may see the subject at all. */
  public: boolean;
  path: string;
}

const EMPTY_TEXTS: InterpretationTexts = { general: null, families: null, technical: null };

/** Renders every label and story of a draft at save; empty documents become none. */
export function renderTexts(body: SaveInterpretationBody): InterpretationTexts {
  const out: InterpretationTexts = { ...EMPTY_TEXTS };
  for (const audience of AUDIENCES) {
    const given = body[audience];
    if (!given) continue;
    const parts: AudienceParts = { label: null, story: null };
    for (const part of INTERPRETATION_PARTS) {
      const doc = given[part];
      if (!doc || isEmptyRichText(doc)) continue;
      const rendered = renderRichText(doc, `${audience}.${part}`);
      parts[part] = { doc, html: rendered.html, text: rendered.text };
    }
    if (parts.label || parts.story) out[audience] = parts;
  }
  return out;
}

/** Where visitors load a photo of a published text: a route that serves only the photos that text shows. */
export function interpretationMediaPath(type: InterpretationSubject, subjectId: number, mediaId: number, variant: 'display' | 'thumb'): string {
  return `/api/v1/visit/${type === 'artifact' ? 'artifacts' : 'compartments'}/${subjectId}/interpretation/media/${mediaId}/${variant}`;
}

/** The texts as published: the same documents, their HTML's images pointed at the public route (staff keep the documents' own paths). */
export function publishedTexts(texts: InterpretationTexts, type: InterpretationSubject, subjectId: number): InterpretationTexts {
  const out = structuredClone(texts);
  for (const audience of AUDIENCES) {
    for (const part of INTERPRETATION_PARTS) {
      const rendered = out[audience]?.[part];
      if (rendered) rendered.html = pointImagesAt(rendered.html, (id, variant) => interpretationMediaPath(type, subjectId, id, variant));
    }
  }
  return out;
}

function publishedHtml(texts: InterpretationTexts): string[] {
  return AUDIENCES.flatMap((a) => INTERPRETATION_PARTS.map((p) => texts[a]?.[p]?.html ?? '')).filter(Boolean);
}

function isEmpty(texts: InterpretationTexts): boolean {
  return AUDIENCES.every((a) => !texts[a]);
}

function imagesOf(doc: RichTextDoc): { mediaId: number; alt: string }[] {
  const out: { mediaId: number; alt: string }[] = [];
  const walk = (node: { type: string; attrs?: Record<string, unknown>; content?: unknown[] }) => {
    if (node.type === 'image') {
      const id = /\/media\/(\d+)\//.exec(String(node.attrs?.src ?? ''))?.[1];
      if (id) out.push({ mediaId: Number(id), alt: String(node.attrs?.alt ?? '').trim() });
    }
    for (const child of (node.content ?? []) as (typeof node)[]) walk(child);
  };
  walk(doc as Parameters<typeof walk>[0]);
  return out;
}

function searchBody(texts: InterpretationTexts): string {
  return AUDIENCES.flatMap((a) => INTERPRETATION_PARTS.map((p) => texts[a]?.[p]?.text ?? ''))
    .filter(Boolean)
    .join('\n');
}

/**
 * Interpretive text on artifacts and compartments: docents and curators write drafts (each save a
 * revision), a docent submits, a curator approves (publishing a snapshot later drafts leave alone)
 * or returns it with a comment. Mail goes after the commit; a failing mail server is only logged.
 */
export class InterpretationService {
  constructor(
    private readonly store: Store,
    private readonly mailer: Mailer,
    private readonly config: Config,
  ) {}

  private async subject(repos: Repositories, type: InterpretationSubject, id: number): Promise<Subject> {
    if (type === 'artifact') {
      const a = await repos.artifacts.findById(id);
      if (!a) throw new NotFoundError('The artifact');
      const vessel = await repos.vessels.findById(a.vesselId);
      return { type, id, vesselId: a.vesselId, label: `${a.objectNumber} ${a.name}`, title: a.name, public: a.status !== 'deaccessioned' && !vessel?.archivedAt, path: `/app/collection/${id}` };
    }
    const c = await repos.compartments.findById(id);
    if (!c) throw new NotFoundError('The compartment');
    const vessel = await repos.vessels.findById(c.vesselId);
    return { type, id, vesselId: c.vesselId, label: `${c.designation} ${c.name}`, title: c.name, public: !vessel?.archivedAt, path: `/app/compartments/${id}` };
  }

  private async present(subject: Subject, record: InterpretationEntity | null, viewer: Express.User): Promise<Interpretation> {
    const repos = this.store.repos;
    const targets = (await repos.settings.get()).interpretationTargets;
    const revisions = record ? await repos.interpretations.revisionCount(record.id) : 0;
    return presentInterpretation({ subject, record, viewer, targets, revisions });
  }

  async get(type: InterpretationSubject, id: number, viewer: Express.User) {
    const subject = await this.subject(this.store.repos, type, id);
    return this.present(subject, await this.store.repos.interpretations.findFor(type, id), viewer);
  }

  private async load(repos: Repositories, type: InterpretationSubject, id: number, version: number) {
    const subject = await this.subject(repos, type, id);
    const record = await repos.interpretations.findForChange(type, id);
    if (!record) throw new ConflictError('Nothing has been written here yet: save a draft first.');
    if (record.version !== version) throw new StaleVersionError('this interpretation', record.version);
    return { subject, record };
  }

  async save(type: InterpretationSubject, id: number, body: SaveInterpretationBody, viewer: Express.User, actor: Actor) {
    // Rendering (and its 422) happens before the write lock is taken.
    const texts = renderTexts(body);
    await this.store.transaction(async (repos) => {
      const subject = await this.subject(repos, type, id);
      let record = await repos.interpretations.findForChange(type, id);
      const current = record?.version ?? 0;
      if (current !== body.version) throw new StaleVersionError('this interpretation', current);
      if (record && sameTexts(record.draft, texts)) return;
      const wasInReview = record?.state === 'in-review';
      if (!record) {
        record = await repos.interpretations.create({ vesselId: subject.vesselId, subjectType: type, subjectId: id, state: 'draft', draft: texts, published: null, lastEditedById: viewer.id });
      } else {
        record.draft = texts;
        // A change takes the text out of review (the reviewer would approve what they did not read), and starts a new draft after publishing.
        record.state = 'draft';
        record.lastEditedById = viewer.id;
        record = await repos.interpretations.save(record);
      }
      const number = await this.keepRevision(repos, subject, record, texts, viewer);
      await recordAudit(repos, actor, {
        action: 'update',
        entityType: 'interpretation',
        entityId: record.id,
        vesselId: subject.vesselId,
        summary: `Interpretation of ${subject.label} saved (revision ${number})${wasInReview ? ', taken out of review' : ''}`,
      });
    });
    return this.get(type, id, viewer);
  }

  /** Keeps the draft as it now is as the next revision, and puts its words in the search index (inside the change's transaction). */
  private async keepRevision(repos: Repositories, subject: Subject, record: InterpretationEntity, texts: InterpretationTexts, viewer: Express.User): Promise<number> {
    const number = (await repos.interpretations.revisionCount(record.id)) + 1;
    await repos.interpretations.addRevision({ interpretationId: record.id, number, content: texts, savedById: viewer.id, savedAt: new Date() });
    await repos.search.put({ kind: 'interpretation', recordId: record.id, vesselId: subject.vesselId, number: '', title: subject.label, body: searchBody(texts), extra: AUDIENCES.filter((a) => texts[a]).map((a) => AUDIENCE_LABELS[a]).join(' ') });
    return number;
  }

  /**
   * Makes the draft what it was in an earlier revision, kept as a new revision; like any save it
   * takes the text out of review or starts a new draft beside what is published. Restoring a
   * revision equal to the draft changes nothing.
   */
  async restore(type: InterpretationSubject, id: number, revisionNumber: number, version: number, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const { subject, record } = await this.load(repos, type, id, version);
      const revision = await repos.interpretations.findRevision(record.id, revisionNumber);
      if (!revision) throw new NotFoundError(`Revision ${revisionNumber} of this interpretation`);
      if (sameTexts(record.draft, revision.content)) return;
      const wasInReview = record.state === 'in-review';
      record.draft = structuredClone(revision.content);
      record.state = 'draft';
      record.lastEditedById = viewer.id;
      const saved = await repos.interpretations.save(record);
      const number = await this.keepRevision(repos, subject, saved, saved.draft, viewer);
      await recordAudit(repos, actor, {
        action: 'restore',
        entityType: 'interpretation',
        entityId: record.id,
        vesselId: subject.vesselId,
        summary: `Interpretation of ${subject.label}: revision ${revisionNumber} restored as revision ${number}${wasInReview ? ', taken out of review' : ''}`,
      });
    });
    return this.get(type, id, viewer);
  }

  /** Problems that keep a text from being published, all at once: nothing written, photos without alt text or not cleared for public use. */
  private async publishProblems(repos: Repositories, subject: Subject, texts: InterpretationTexts): Promise<string[]> {
    if (isEmpty(texts)) return ['Write a label or a story for at least one audience first.'];
    const problems: string[] = [];
    for (const audience of AUDIENCES) {
      for (const part of INTERPRETATION_PARTS) {
        const doc = texts[audience]?.[part]?.doc;
        if (!doc) continue;
        const where = `${AUDIENCE_LABELS[audience]} ${PART_LABELS[part].toLowerCase()}`;
        for (const image of imagesOf(doc)) {
          const media = await repos.media.findById(image.mediaId);
          if (!media || media.vesselId !== subject.vesselId) problems.push(`${where}: photo ${image.mediaId} is not in this vessel’s collection.`);
          else if (!image.alt) problems.push(`${where}: the photo “${media.caption || media.fileName}” has no alt text.`);
          else if (!media.publicUse) problems.push(`${where}: the photo “${media.caption || media.fileName}” is not marked for public use.`);
        }
      }
    }
    return problems;
  }

  async submit(type: InterpretationSubject, id: number, version: number, viewer: Express.User, actor: Actor) {
    const subject = await this.store.transaction(async (repos) => {
      const { subject, record } = await this.load(repos, type, id, version);
      if (record.state === 'in-review') throw new ConflictError('This interpretation is already in review.');
      if (record.state === 'published') throw new ConflictError('Nothing has changed since it was published: edit it first.');
      const problems = await this.publishProblems(repos, subject, record.draft);
      if (problems.length) throw new UnprocessableError(problems.join(' '), { draft: problems.join('\n') });
      record.state = 'in-review';
      record.submittedAt = new Date();
      record.submittedById = viewer.id;
      record.returnComment = null;
      record.returnedAt = null;
      record.returnedById = null;
      await repos.interpretations.save(record);
      await recordAudit(repos, actor, { action: 'update', entityType: 'interpretation', entityId: record.id, vesselId: subject.vesselId, summary: `Interpretation of ${subject.label} submitted for review` });
      return subject;
    });
    const curators = (await this.store.repos.users.activeWithRole('curator')).filter((u) => u.id !== viewer.id);
    await this.tell(
      curators,
      `Interpretation to review: ${subject.label}`,
      [`${viewer.name} submitted the interpretive text of ${subject.label} for review.`, 'Approve it to publish it, or return it with a comment.'],
      subject.path,
    );
    return this.get(type, id, viewer);
  }

  async approve(type: InterpretationSubject, id: number, version: number, viewer: Express.User, actor: Actor) {
    const { subject, authorId } = await this.store.transaction(async (repos) => {
      const { subject, record } = await this.load(repos, type, id, version);
      if (record.state === 'published') throw new ConflictError('This interpretation is already published.');
      // Curators may publish their own work; anyone else's comes to them through review.
      if (record.state === 'draft' && record.lastEditedById !== viewer.id) {
        throw new ConflictError('This draft has not been submitted for review. Its author submits it first, or you save your own changes and publish them.');
      }
      const problems = await this.publishProblems(repos, subject, record.draft);
      if (problems.length) throw new UnprocessableError(problems.join(' '), { draft: problems.join('\n') });
      const authorId = record.state === 'in-review' ? record.submittedById : null;
      record.published = publishedTexts(record.draft, type, id);
      record.publishedAt = new Date();
      record.publishedById = viewer.id;
      record.state = 'published';
      record.returnComment = null;
      await repos.interpretations.save(record);
      await recordAudit(repos, actor, { action: 'update', entityType: 'interpretation', entityId: record.id, vesselId: subject.vesselId, summary: `Interpretation of ${subject.label} approved and published` });
      return { subject, authorId };
    });
    const author = authorId && authorId !== viewer.id ? await this.store.repos.users.findById(authorId) : null;
    if (author?.status === 'active') {
      await this.tell([author], `Published: ${subject.label}`, [`${viewer.name} approved your interpretive text of ${subject.label}. Visitors now read it.`], subject.path);
    }
    return this.get(type, id, viewer);
  }

  async returnToAuthor(type: InterpretationSubject, id: number, body: ReturnInterpretationBody, viewer: Express.User, actor: Actor) {
    const { subject, authorId } = await this.store.transaction(async (repos) => {
      const { subject, record } = await this.load(repos, type, id, body.version);
      if (record.state !== 'in-review') throw new ConflictError('Only text in review can be returned.');
      const authorId = record.submittedById;
      record.state = 'draft';
      record.returnComment = body.comment;
      record.returnedAt = new Date();
      record.returnedById = viewer.id;
      await repos.interpretations.save(record);
      await recordAudit(repos, actor, { action: 'update', entityType: 'interpretation', entityId: record.id, vesselId: subject.vesselId, summary: `Interpretation of ${subject.label} returned with a comment` });
      return { subject, authorId };
    });
    const author = authorId && authorId !== viewer.id ? await this.store.repos.users.findById(authorId) : null;
    if (author?.status === 'active') {
      await this.tell([author], `Returned with a comment: ${subject.label}`, [`${viewer.name} returned your interpretive text of ${subject.label}:`, body.comment, 'Change it and submit it again.'], subject.path);
    }
    return this.get(type, id, viewer);
  }

  /** Every kept save of the draft, newest first. */
  async revisions(type: InterpretationSubject, id: number): Promise<InterpretationRevision[]> {
    const repos = this.store.repos;
    await this.subject(repos, type, id);
    const record = await repos.interpretations.findFor(type, id);
    if (!record) return [];
    return (await repos.interpretations.revisionsOf(record.id)).map((r) => ({
      number: r.number,
      savedAt: r.savedAt.toISOString(),
      savedBy: r.savedBy ? { id: r.savedBy.id, name: r.savedBy.name } : null,
      texts: r.content,
    }));
  }

  /** The vessel's texts as a list: the review queue (state in-review), or a search of their words. */
  async list(vesselId: number, query: InterpretationsQuery) {
    const repos = this.store.repos;
    if (!(await repos.vessels.findById(vesselId))) throw new NotFoundError('The vessel');
    const page = await repos.interpretations.page(vesselId, query);
    const ids = (type: InterpretationSubject) => page.items.filter((i) => i.record.subjectType === type).map((i) => i.record.subjectId);
    const artifacts = await repos.artifacts.labels(ids('artifact'));
    const compartments = await repos.compartments.labels(ids('compartment'));
    const items: InterpretationSummary[] = page.items.map(({ record, snippet }) => ({
      subjectType: record.subjectType,
      subjectId: record.subjectId,
      subjectLabel: (record.subjectType === 'artifact' ? artifacts.get(record.subjectId) : compartments.get(record.subjectId)?.label) ?? `${record.subjectType} ${record.subjectId}`,
      state: record.state,
      audiences: AUDIENCES.filter((a) => record.draft[a]),
      differsFromPublished: Boolean(record.published) && !sameTexts(record.draft, record.published),
      hasPublished: Boolean(record.published),
      submittedBy: record.submittedBy ? { id: record.submittedBy.id, name: record.submittedBy.name } : null,
      lastEditedBy: record.lastEditedBy ? { id: record.lastEditedBy.id, name: record.lastEditedBy.name } : null,
      updatedAt: record.updatedAt.toISOString(),
      snippet,
    }));
    return { ...page, items };
  }

  private async publishedRecord(type: InterpretationSubject, id: number) {
    const repos = this.store.repos;
    const subject = await this.subject(repos, type, id).catch(() => null);
    const record = subject?.public ? await repos.interpretations.findFor(type, id) : null;
    if (!subject || !record?.published || !record.publishedAt) throw new NotFoundError('Published interpretation');
    // Texts published before images pointed at the public route are pointed there as they are read.
    return { subject, publishedAt: record.publishedAt, published: publishedTexts(record.published, type, id) };
  }

  /**
   * The published snapshot only, for visitors; 404 when nothing is published. Photos since
   * withdrawn from public use (or left without alt text) are left out rather than shown broken.
   */
  async publicRead(type: InterpretationSubject, id: number): Promise<PublicInterpretation> {
    const { subject, publishedAt, published } = await this.publishedRecord(type, id);
    const hidden = await this.store.repos.media.hiddenPhotos(publishedHtml(published).flatMap(imageIdsIn));
    const html = (part: { html: string } | null | undefined) => (part ? withoutImages(part.html, hidden) : null);
    const audiences = Object.fromEntries(
      AUDIENCES.map((a) => [a, published[a] ? { label: html(published[a].label), story: html(published[a].story) } : null]),
    ) as PublicInterpretation['audiences'];
    return { subjectType: type, subjectId: id, title: subject.title, publishedAt: publishedAt.toISOString(), audiences };
  }

  /** Whether a published text shows this photo (the public file route serves only those); 404 otherwise. */
  async assertPublishedPhoto(type: InterpretationSubject, id: number, mediaId: number): Promise<void> {
    const { published } = await this.publishedRecord(type, id);
    if (!publishedHtml(published).some((html) => imageIdsIn(html).includes(mediaId))) throw new NotFoundError('The file');
  }

  private async tell(people: { email: string; name: string }[], subject: string, lines: string[], path: string) {
    const organisationName = (await this.store.repos.settings.get()).organisationName;
    for (const person of people) {
      const mail = interpretationReviewMail({ to: person.email, name: person.name, subject, lines, url: `${this.config.publicUrl}${path}`, organisationName });
      await this.mailer.send(mail).catch((err: unknown) => console.error(`Could not send "${subject}" to ${person.email}:`, err instanceof Error ? err.message : err));
    }
  }
}
