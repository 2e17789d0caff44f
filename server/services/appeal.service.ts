import type { z } from 'zod';
import type { saveAppealBody } from '../../shared/schemas/appeals.js';
import type { Store } from '../db/store.js';
import { NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import { presentAppeal } from '../presenters/appeal.presenter.js';
import { renderRichText } from '../richtext/render.js';
import { recordAudit, type Actor } from './audit.service.js';

type Body = z.output<typeof saveAppealBody>;

/** The staff side of an appeal: one per repair project, written by fundraisers (and curators). */
export class AppealService {
  constructor(private readonly store: Store) {}

  private async projectOf(repairProjectId: number) {
    const project = await this.store.repos.appeals.project(repairProjectId);
    if (!project) throw new NotFoundError('The repair project');
    return project;
  }

  async get(repairProjectId: number, viewer: Express.User) {
    const project = await this.projectOf(repairProjectId);
    return presentAppeal(await this.store.repos.appeals.findByProject(repairProjectId), project, viewer);
  }

  async save(repairProjectId: number, body: Body, viewer: Express.User, actor: Actor) {
    const project = await this.projectOf(repairProjectId);
    const rendered = renderRichText(body.storyDoc, 'storyDoc');
    if (body.published) {
      const problems: Record<string, string> = {};
      if (!rendered.text.trim()) problems.storyDoc = 'Write the story before publishing.';
      body.photos.forEach((p, i) => { if (!p.altText.trim()) problems[`photos.${i}.altText`] = 'Describe the photo for people who cannot see it (alt text) before publishing.'; });
      if (Object.keys(problems).length) throw new UnprocessableError('The appeal is not ready to publish.', problems);
    }
    const saved = await this.store.transaction(async (repos) => {
      for (const [i, photo] of body.photos.entries()) {
        const media = await repos.media.findById(photo.mediaId);
        if (!media || media.kind !== 'photo' || media.vesselId !== project.vesselId) {
          throw new UnprocessableError('A photo of the appeal is not a photo of this vessel.', { [`photos.${i}.mediaId`]: 'Choose a photo of this vessel.' });
        }
      }
      const existing = await repos.appeals.findByProject(repairProjectId);
      if ((existing?.version ?? 0) !== body.version) throw new StaleVersionError('the appeal', existing?.version ?? 0);
      const fields = {
        storyDoc: body.storyDoc,
        storyHtml: rendered.html,
        storyText: rendered.text,
        goalCents: body.goalCents,
        photos: body.photos,
        publishedAt: body.published ? (existing?.publishedAt ?? new Date()) : null,
      };
      const wasPublished = !!existing?.publishedAt;
      const appeal = existing ? await repos.appeals.save(Object.assign(existing, fields)) : await repos.appeals.create({ ...fields, vesselId: project.vesselId, repairProjectId });
      const action = body.published && !wasPublished ? 'publish' : !body.published && wasPublished ? 'unpublish' : existing ? 'update' : 'create';
      await recordAudit(repos, actor, { action, entityType: 'appeal', entityId: appeal.id, vesselId: project.vesselId, summary: `Appeal for ${project.title}: ${action}` });
      return appeal;
    });
    return presentAppeal(saved, project, viewer);
  }

  /** Each repair project of the vessel with its appeal, or an empty draft where none is written. */
  async ofVessel(vesselId: number, viewer: Express.User) {
    const [projects, rows] = await Promise.all([this.store.repos.appeals.projectsOfVessel(vesselId), this.store.repos.appeals.ofVessel(vesselId)]);
    const byProject = new Map(rows.map(({ appeal }) => [appeal.repairProjectId, appeal]));
    return projects.filter((p) => p.status !== 'cancelled').map((project) => presentAppeal(byProject.get(project.id) ?? null, project, viewer));
  }
}
