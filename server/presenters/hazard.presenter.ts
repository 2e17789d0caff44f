import { can } from '../../shared/permissions.js';
import type { Hazard } from '../../shared/schemas/hazards.js';
import type { HazardEntity } from '../db/entities/hazard.entity.js';

export function presentHazard(hazard: HazardEntity, viewer: Express.User): Hazard {
  return {
    id: hazard.id,
    compartmentId: hazard.compartmentId,
    kind: hazard.kind,
    notes: hazard.notes,
    lastVerifiedOn: hazard.lastVerifiedOn,
    verifiedBy: hazard.verifiedBy ? { id: hazard.verifiedBy.id, name: hazard.verifiedBy.name } : null,
    updatedAt: hazard.updatedAt.toISOString(),
    version: hazard.version,
    abilities: { update: can(viewer.role, 'hazard', 'update'), delete: can(viewer.role, 'hazard', 'delete') },
  };
}
