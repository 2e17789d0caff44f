import { CATEGORY_LABELS } from '../../shared/schemas/artifacts.js';
import type { ArtifactEntity } from '../db/entities/artifact.entity.js';
import type { SearchDocument } from '../search/search-index.js';
import type { ArtifactMoveEntity } from '../db/entities/artifact-move.entity.js';
import { changesBetween } from './audit.service.js';
import { daysAgo } from '../../shared/calc/days.js';

/**
 * What a new artifact record writes besides its row (search document, audit text), shared by a
 * single create and the bulk CSV import so that both leave the same data.
 */

/** The fields that describe an artifact (its place and status change only through moves). */
export const DESCRIBING = [
  'objectNumber',
  'name',
  'category',
  'description',
  'dateOrPeriod',
  'maker',
  'materials',
  'height',
  'width',
  'depth',
  'dimensionUnit',
  'significance',
] as const satisfies readonly (keyof ArtifactEntity)[];

type DocumentFields = Pick<ArtifactEntity, 'id' | 'vesselId' | 'objectNumber' | 'name' | 'description' | 'significance' | 'materials' | 'maker' | 'dateOrPeriod' | 'category'>;

export function searchDocumentOf(artifact: DocumentFields): SearchDocument {
  return {
    kind: 'artifact',
    recordId: artifact.id,
    vesselId: artifact.vesselId,
    number: artifact.objectNumber,
    title: artifact.name,
    body: [artifact.description, artifact.significance].filter(Boolean).join('\n'),
    extra: [artifact.materials, artifact.maker, artifact.dateOrPeriod, CATEGORY_LABELS[artifact.category]].filter(Boolean).join(' · '),
  };
}

type RecordedFields = Pick<ArtifactEntity, (typeof DESCRIBING)[number] | 'status' | 'compartmentId' | 'point'>;

/** The audit summary and changes of a newly recorded artifact. */
export function recordedAudit(artifact: RecordedFields) {
  return {
    summary: `Artifact ${artifact.objectNumber} (${artifact.name}) recorded`,
    changes: changesBetween({} as RecordedFields, artifact, [...DESCRIBING, 'status', 'compartmentId', 'point']),
  };
}

/** The first entry of an artifact's location history, as a single record and the import both write it. */
export function recordedMove(
  to: Pick<ArtifactMoveEntity, 'toStatus' | 'toCompartmentId' | 'toLabel' | 'toPoint'>,
  reason: string,
  actorId: number | null,
): Omit<ArtifactMoveEntity, 'id' | 'artifactId' | 'artifact' | 'actor' | 'createdAt'> {
  return { kind: 'recorded', movedOn: daysAgo(0), fromStatus: null, fromCompartmentId: null, fromLabel: null, fromPoint: null, ...to, reason, actorId };
}
