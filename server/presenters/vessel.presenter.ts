import { can } from '../../shared/permissions.js';
import type { PublicVessel, Vessel } from '../../shared/schemas/vessels.js';
import type { VesselEntity } from '../db/entities/vessel.entity.js';

export function presentVessel(vessel: VesselEntity, viewer: Express.User): Vessel {
  return {
    id: vessel.id,
    name: vessel.name,
    vesselType: vessel.vesselType,
    builtYear: vessel.builtYear,
    berth: vessel.berth,
    summary: vessel.summary,
    designationScheme: vessel.designationScheme,
    archived: vessel.archivedAt !== null,
    createdAt: vessel.createdAt.toISOString(),
    updatedAt: vessel.updatedAt.toISOString(),
    version: vessel.version,
    abilities: {
      update: can(viewer.role, 'vessel', 'update'),
      archive: can(viewer.role, 'vessel', 'archive'),
    },
  };
}

export function presentPublicVessel(vessel: VesselEntity): PublicVessel {
  return { id: vessel.id, name: vessel.name, vesselType: vessel.vesselType, builtYear: vessel.builtYear, berth: vessel.berth, summary: vessel.summary };
}
