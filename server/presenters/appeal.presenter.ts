import { can } from '../../shared/permissions.js';
import type { Appeal } from '../../shared/schemas/appeals.js';
import type { AppealEntity } from '../db/entities/appeal.entity.js';
import type { ProjectOfAppeal } from '../db/repositories/appeal.repository.js';

/** An appeal for staff; a project without one yet is presented as an empty draft (id null, version 0). */
export function presentAppeal(appeal: AppealEntity | null, project: ProjectOfAppeal, viewer: Express.User): Appeal {
  return {
    id: appeal?.id ?? null,
    vesselId: project.vesselId,
    repairProjectId: project.id,
    projectTitle: project.title,
    projectSlug: project.slug,
    projectStatus: project.status,
    storyDoc: appeal?.storyDoc ?? null,
    storyHtml: appeal?.storyHtml ?? '',
    goalCents: appeal?.goalCents ?? 0,
    photos: appeal?.photos ?? [],
    publishedAt: appeal?.publishedAt?.toISOString() ?? null,
    raisedCents: appeal?.raisedCents ?? 0,
    refundedCents: appeal?.refundedCents ?? 0,
    giftCount: appeal?.giftCount ?? 0,
    version: appeal?.version ?? 0,
    abilities: { update: can(viewer.role, 'appeal', 'update') },
  };
}
