import { can } from '../../shared/permissions.js';
import type { Media } from '../../shared/schemas/media.js';
import type { Treatment } from '../../shared/schemas/treatments.js';
import type { TreatmentEntity } from '../db/entities/treatment.entity.js';
import { canChangeMediaOf } from './media.presenter.js';

export function performerLabel(t: Pick<TreatmentEntity, 'performedBy' | 'contractorName'>): string {
  return t.performedBy ? t.performedBy.name : t.contractorName || 'Not recorded';
}

export function presentTreatment(t: TreatmentEntity, findings: { id: number; label: string }[], findingCount: number, photos: { before: Media[]; after: Media[] }, viewer: Express.User): Treatment {
  return {
    id: t.id,
    vesselId: t.vesselId,
    projectId: t.projectId,
    performedOn: t.performedOn,
    performedBy: t.performedBy ? { id: t.performedBy.id, name: t.performedBy.name } : null,
    contractorName: t.contractorName,
    performerLabel: performerLabel(t),
    method: t.method,
    materials: t.materials,
    findings,
    findingCount,
    beforePhotos: photos.before,
    afterPhotos: photos.after,
    createdAt: t.createdAt.toISOString(),
    updatedAt: t.updatedAt.toISOString(),
    version: t.version,
    abilities: { update: can(viewer.role, 'treatment', 'update'), addPhotos: canChangeMediaOf(viewer.role, 'treatment-before', 'create') },
  };
}
