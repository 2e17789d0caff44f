import { daysAgo, latestPastDay } from '../../shared/calc/days.js';
import { interiorPoint, type Point } from '../../shared/calc/geometry.js';
import { checkObjectNumber, objectNumberSortKey } from '../../shared/calc/object-number.js';
import { type ArtifactsQuery, type UpdateArtifactBody, type archiveArtifactBody, type createArtifactBody, type moveArtifactBody } from '../../shared/schemas/artifacts.js';
import type { z } from 'zod';
import type { ArtifactEntity } from '../db/entities/artifact.entity.js';
import type { CompartmentEntity } from '../db/entities/compartment.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ConflictError, NotFoundError, UnprocessableError } from '../http/errors.js';
import { compartmentLabel, presentArtifact, presentMarker, presentMove } from '../presenters/artifact.presenter.js';
import { reindexReportsOf } from '../search/condition-report-document.js';
import { checkPlace } from './artifact-place.js';
import { DESCRIBING, recordedAudit, recordedMove, searchDocumentOf } from './artifact-record.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import { staleEditError } from './stale-edit.js';

export type CreateArtifactInput = z.output<typeof createArtifactBody>;

const PLACE: (keyof ArtifactEntity)[] = ['status', 'compartmentId', 'point', 'deaccessionReason'];

/** The date of a move: today when not given; never after tomorrow (UTC), whatever the time zone. */
function moveDate(movedOn: string | undefined): string {
  if (!movedOn) return daysAgo(0);
  if (movedOn > latestPastDay()) {
    throw new UnprocessableError('A move cannot be dated in the future.', { movedOn: 'This date is in the future.' });
  }
  return movedOn;
}

/**
 * The point kept when a move gives none: in another compartment, a point inside its outline (its
 * centre) so that it stays on the plan until placed; none within the same compartment, as asked.
 */
function pointIn(compartment: CompartmentEntity | null, artifact: ArtifactEntity): Point | null {
  if (!compartment) return null;
  if (compartment.id === artifact.compartmentId) return null;
  const deck = compartment.deck;
  if (!compartment.outline || compartment.outline.length < 3 || deck.planWidth === null || deck.planHeight === null) return null;
  return interiorPoint(compartment.outline);
}

/** Checks an object number against the organisation's pattern and the vessel's other numbers. */
export async function checkNumber(repos: Repositories, vesselId: number, input: string, exceptId?: number): Promise<string> {
  const settings = await repos.settings.get();
  const checked = checkObjectNumber(input, settings.objectNumberPattern);
  if (!checked.ok) throw new UnprocessableError(checked.message, { objectNumber: checked.message });
  const existing = await repos.artifacts.findByNumber(vesselId, checked.value);
  if (existing && existing.id !== exceptId) {
    throw new ConflictError(`Object number ${checked.value} is already used on this vessel, by ${existing.name}.`, { objectNumber: 'Already in use on this vessel.' });
  }
  return checked.value;
}

/**
 * Writes a new artifact with its first location-history entry, search document and audit event;
 * used by create and by CSV import, inside the caller's transaction.
 */
export async function insertArtifact(repos: Repositories, vesselId: number, input: CreateArtifactInput, objectNumber: string, compartment: CompartmentEntity | null, actor: Actor, reason: string) {
  const artifact = await repos.artifacts.create({
    ...input,
    vesselId,
    objectNumber,
    objectNumberSort: objectNumberSortKey(objectNumber),
    deaccessionReason: null,
    coverMediaId: null,
  });
  await repos.artifactMoves.create({
    artifactId: artifact.id,
    ...recordedMove({ toStatus: artifact.status, toCompartmentId: artifact.compartmentId, toLabel: compartmentLabel(compartment), toPoint: artifact.point }, reason, actor.id),
  });
  await repos.search.put(searchDocumentOf(artifact));
  await recordAudit(repos, actor, {
    action: 'create',
    entityType: 'artifact',
    entityId: artifact.id,
    vesselId,
    ...recordedAudit(artifact),
  });
  return artifact;
}

/**
 * The collection: artifact records, their place and its history. Place and status change only
 * through a recorded move; an artifact is never deleted, only deaccessioned with a reason.
 */
export class ArtifactService {
  constructor(private readonly store: Store) {}

  private async present(id: number, viewer: Express.User) {
    const artifact = await this.store.repos.artifacts.findById(id);
    if (!artifact) throw new NotFoundError('The artifact');
    const alt = artifact.coverMediaId ? (await this.store.repos.media.altTexts([artifact.coverMediaId])).get(artifact.coverMediaId) : null;
    return presentArtifact(artifact, alt ?? null, viewer);
  }

  private async loadForChange(repos: Repositories, id: number, version: number) {
    const artifact = await repos.artifacts.findById(id);
    if (!artifact) throw new NotFoundError('The artifact');
    if (artifact.version !== version) throw await staleEditError(repos, 'artifact', id, 'this artifact', artifact.version, version);
    return artifact;
  }

  async list(vesselId: number, query: ArtifactsQuery, viewer: Express.User) {
    const vessel = await this.store.repos.vessels.findById(vesselId);
    if (!vessel) throw new NotFoundError('The vessel');
    const page = await this.store.repos.artifacts.page(vesselId, query);
    const alts = await this.store.repos.media.altTexts(page.items.flatMap((hit) => (hit.artifact.coverMediaId ? [hit.artifact.coverMediaId] : [])));
    return {
      ...page,
      items: page.items.map(({ artifact, highlight }) => ({
        ...presentArtifact(artifact, artifact.coverMediaId ? (alts.get(artifact.coverMediaId) ?? null) : null, viewer),
        highlight,
      })),
    };
  }

  async markers(deckId: number) {
    const deck = await this.store.repos.decks.findById(deckId);
    if (!deck) throw new NotFoundError('The deck');
    return (await this.store.repos.artifacts.placedOnDeck(deckId)).map(presentMarker);
  }

  get(id: number, viewer: Express.User) {
    return this.present(id, viewer);
  }

  async moves(id: number) {
    const artifact = await this.store.repos.artifacts.findById(id);
    if (!artifact) throw new NotFoundError('The artifact');
    return (await this.store.repos.artifactMoves.forArtifact(id)).map(presentMove);
  }

  async create(vesselId: number, body: CreateArtifactInput, viewer: Express.User, actor: Actor) {
    const created = await this.store.transaction(async (repos) => {
      const vessel = await repos.vessels.findById(vesselId);
      if (!vessel) throw new NotFoundError('The vessel');
      const objectNumber = await checkNumber(repos, vesselId, body.objectNumber);
      const compartment = await checkPlace(repos, vesselId, body.compartmentId, body.point, body.status);
      return insertArtifact(repos, vesselId, body, objectNumber, compartment, actor, 'Recorded in the collection');
    });
    return this.present(created.id, viewer);
  }

  async update(id: number, body: UpdateArtifactBody, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const artifact = await this.loadForChange(repos, id, body.version);
      const { version: _version, ...fields } = body;
      // A number kept as it was is not checked again: it may predate a change of the pattern.
      if (fields.objectNumber !== undefined && fields.objectNumber.trim().toUpperCase() !== artifact.objectNumber) {
        fields.objectNumber = await checkNumber(repos, artifact.vesselId, fields.objectNumber, id);
      } else delete fields.objectNumber;
      const changes = changesBetween(artifact, fields, [...DESCRIBING]);
      if (!changes) return;
      Object.assign(artifact, fields);
      artifact.objectNumberSort = objectNumberSortKey(artifact.objectNumber);
      const saved = await repos.artifacts.save(artifact);
      await repos.search.put(searchDocumentOf(saved));
      if ('name' in changes || 'objectNumber' in changes) await reindexReportsOf(repos, 'artifact', id, `${saved.objectNumber} ${saved.name}`);
      await recordAudit(repos, actor, {
        action: 'update',
        entityType: 'artifact',
        entityId: id,
        vesselId: artifact.vesselId,
        summary: `Artifact ${artifact.objectNumber} changed (${Object.keys(changes).join(', ')})`,
        changes,
      });
    });
    return this.present(id, viewer);
  }

  async move(id: number, body: z.output<typeof moveArtifactBody>, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const artifact = await this.loadForChange(repos, id, body.version);
      if (artifact.status === 'deaccessioned') throw new UnprocessableError('This artifact has been deaccessioned; its place no longer changes.');
      const compartment = await checkPlace(repos, artifact.vesselId, body.compartmentId, body.point, body.status);
      const next = { status: body.status, compartmentId: body.compartmentId, point: body.point ?? pointIn(compartment, artifact) };
      const changes = changesBetween(artifact, next, ['status', 'compartmentId', 'point']);
      if (!changes) throw new UnprocessableError('That is where the artifact already is, with the same status.', { compartmentId: 'Unchanged.' });
      // Putting an artifact on the plan in the compartment it is recorded in adds what was missing; nothing moved.
      const placement = artifact.compartmentId !== null && artifact.point === null && next.compartmentId === artifact.compartmentId && body.point !== null && next.status === artifact.status;
      if (!placement && !body.reason) throw new UnprocessableError('Give the reason for the move.', { reason: 'Reason is required.' });
      const reason = body.reason ?? '';
      const placeChanged = 'compartmentId' in changes || 'point' in changes;
      const kind = placement ? 'placed' : placeChanged ? 'moved' : 'status';
      await this.recordMove(repos, artifact, kind, next, compartment, reason, moveDate(body.movedOn), actor);
      const where = compartmentLabel(compartment) ?? 'off the ship';
      await recordAudit(repos, actor, {
        action: 'move',
        entityType: 'artifact',
        entityId: id,
        vesselId: artifact.vesselId,
        summary: placement
          ? `Artifact ${artifact.objectNumber} placed on the plan in ${where}${reason ? `: ${reason}` : ''}`
          : `Artifact ${artifact.objectNumber} ${placeChanged ? `moved to ${where}` : `now ${body.status}`}: ${reason}`,
        changes,
      });
    });
    return this.present(id, viewer);
  }

  async archive(id: number, body: z.output<typeof archiveArtifactBody>, viewer: Express.User, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const artifact = await this.loadForChange(repos, id, body.version);
      if (artifact.status === 'deaccessioned') throw new UnprocessableError('This artifact is already deaccessioned.');
      const next = { status: 'deaccessioned' as const, compartmentId: null, point: null };
      const changes = changesBetween(artifact, { ...next, deaccessionReason: body.reason }, PLACE);
      artifact.deaccessionReason = body.reason;
      await this.recordMove(repos, artifact, 'deaccessioned', next, null, body.reason, moveDate(body.movedOn), actor);
      await recordAudit(repos, actor, {
        action: 'archive',
        entityType: 'artifact',
        entityId: id,
        vesselId: artifact.vesselId,
        summary: `Artifact ${artifact.objectNumber} deaccessioned: ${body.reason}`,
        changes,
      });
    });
    return this.present(id, viewer);
  }

  private async recordMove(
    repos: Repositories,
    artifact: ArtifactEntity,
    kind: 'placed' | 'moved' | 'status' | 'deaccessioned',
    next: Pick<ArtifactEntity, 'status' | 'compartmentId' | 'point'>,
    compartment: CompartmentEntity | null,
    reason: string,
    movedOn: string,
    actor: Actor,
  ) {
    await repos.artifactMoves.create({
      artifactId: artifact.id,
      kind,
      movedOn,
      fromStatus: artifact.status,
      fromCompartmentId: artifact.compartmentId,
      fromLabel: compartmentLabel(artifact.compartment ?? null),
      fromPoint: artifact.point,
      toStatus: next.status,
      toCompartmentId: next.compartmentId,
      toLabel: compartmentLabel(compartment),
      toPoint: next.point,
      reason,
      actorId: actor.id,
    });
    Object.assign(artifact, next);
    artifact.compartment = compartment;
    await repos.artifacts.save(artifact);
    await repos.risks.setDeckOf('artifact', artifact.id, compartment?.deckId ?? null);
  }
}
