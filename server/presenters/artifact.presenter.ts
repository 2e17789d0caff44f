import { can } from '../../shared/permissions.js';
import type { Artifact, ArtifactLocation, ArtifactMarker, ArtifactMove } from '../../shared/schemas/artifacts.js';
import type { ArtifactMoveEntity } from '../db/entities/artifact-move.entity.js';
import type { ArtifactEntity } from '../db/entities/artifact.entity.js';
import type { CompartmentEntity } from '../db/entities/compartment.entity.js';
import { mediaUrl } from './media.presenter.js';

/** How a place is written in the location history. */
export function compartmentLabel(compartment: Pick<CompartmentEntity, 'designation' | 'name'> | null): string | null {
  return compartment ? `${compartment.designation} ${compartment.name}` : null;
}

function locationOf(artifact: ArtifactEntity): ArtifactLocation {
  const compartment = artifact.compartment ?? null;
  return {
    compartmentId: artifact.compartmentId,
    compartmentDesignation: compartment?.designation ?? null,
    compartmentName: compartment?.name ?? null,
    deckId: compartment?.deckId ?? null,
    deckName: compartment?.deck?.name ?? null,
    point: artifact.point,
  };
}

/** `artifact.compartment.deck` must be loaded; `coverAlt` is the cover photo's alt text. */
export function presentArtifact(artifact: ArtifactEntity, coverAlt: string | null, viewer: Express.User): Artifact {
  const archived = artifact.status === 'deaccessioned';
  return {
    id: artifact.id,
    vesselId: artifact.vesselId,
    objectNumber: artifact.objectNumber,
    name: artifact.name,
    category: artifact.category,
    description: artifact.description,
    dateOrPeriod: artifact.dateOrPeriod,
    maker: artifact.maker,
    materials: artifact.materials,
    height: artifact.height,
    width: artifact.width,
    depth: artifact.depth,
    dimensionUnit: artifact.dimensionUnit,
    significance: artifact.significance,
    status: artifact.status,
    deaccessionReason: artifact.deaccessionReason,
    location: locationOf(artifact),
    cover: artifact.coverMediaId ? { mediaId: artifact.coverMediaId, url: mediaUrl(artifact.coverMediaId, 'thumb'), altText: coverAlt ?? '' } : null,
    createdAt: artifact.createdAt.toISOString(),
    updatedAt: artifact.updatedAt.toISOString(),
    version: artifact.version,
    abilities: {
      update: can(viewer.role, 'artifact', 'update'),
      move: !archived && can(viewer.role, 'artifact', 'move'),
      archive: !archived && can(viewer.role, 'artifact', 'archive'),
    },
  };
}

export function presentMarker(artifact: ArtifactEntity): ArtifactMarker {
  return {
    id: artifact.id,
    objectNumber: artifact.objectNumber,
    name: artifact.name,
    category: artifact.category,
    status: artifact.status,
    compartmentId: artifact.compartmentId!,
    point: artifact.point!,
    thumbUrl: artifact.coverMediaId ? mediaUrl(artifact.coverMediaId, 'thumb') : null,
    version: artifact.version,
  };
}

export function presentMove(move: ArtifactMoveEntity): ArtifactMove {
  return {
    id: move.id,
    artifactId: move.artifactId,
    kind: move.kind,
    movedOn: move.movedOn,
    from: move.fromStatus ? { status: move.fromStatus, compartmentId: move.fromCompartmentId, compartmentLabel: move.fromLabel, point: move.fromPoint } : null,
    to: { status: move.toStatus, compartmentId: move.toCompartmentId, compartmentLabel: move.toLabel, point: move.toPoint },
    reason: move.reason,
    by: move.actor ? { id: move.actor.id, name: move.actor.name } : null,
    recordedAt: move.createdAt.toISOString(),
  };
}
