import { unlink } from 'node:fs/promises';
import path from 'node:path';
import { fileTypeFromFile } from 'file-type';
import sharp from 'sharp';
import { PLAN_FORMATS, planMaxZoom, planTileCount, type PlanFit } from '../../shared/schemas/plans.js';
import type { Point } from '../../shared/calc/geometry.js';
import type { Config } from '../config.js';
import type { DeckEntity } from '../db/entities/deck.entity.js';
import type { PlanEntity } from '../db/entities/plan.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ApiError, NotFoundError, UnprocessableError, ValidationError } from '../http/errors.js';
import { planVersion, presentPlan } from '../presenters/plan.presenter.js';
import type { FileStore } from '../storage/file-store.js';
import { sha256File } from '../storage/hash-file.js';
import { recordAudit, type Actor } from './audit.service.js';
import { buildPyramid } from './plan-tiler.js';

const EXTENSIONS: Record<string, string> = { 'image/png': 'png', 'image/jpeg': 'jpg', 'image/webp': 'webp', 'image/tiff': 'tif' };
const SAME_ASPECT = 0.01;

export interface UploadedFile {
  path: string;
  originalname: string;
  size: number;
}

/**
 * Deck plans: an upload is checked by content, then a tile pyramid is built as a background job.
 * The deck keeps its previous plan until the new pyramid is complete; a failed or cancelled build
 * leaves no files and no row that points at missing files.
 */
export class PlanService {
  private queue: Promise<unknown> = Promise.resolve();
  /** Plans whose build has been cancelled while it runs. */
  private readonly cancelled = new Set<number>();

  constructor(private readonly store: Store, private readonly files: FileStore, private readonly config: Config) {}

  /** Resolves when every queued build has finished (tests and shutdown wait on it). */
  idle(): Promise<void> {
    return this.queue.then(() => undefined);
  }

  private async deckOrFail(id: number) {
    const deck = await this.store.repos.decks.findById(id);
    if (!deck) throw new NotFoundError('The deck');
    return deck;
  }

  private async currentOf(deck: DeckEntity) {
    return deck.currentPlanId ? this.store.repos.plans.findById(deck.currentPlanId) : null;
  }

  async status(deckId: number) {
    const deck = await this.deckOrFail(deckId);
    const current = await this.currentOf(deck);
    const latest = await this.store.repos.plans.latestFor(deckId);
    return { current: current ? presentPlan(current, null) : null, latest: latest ? presentPlan(latest, current) : null };
  }

  /** Checks the uploaded file and queues the build; the temporary file is always consumed. */
  async upload(deckId: number, file: UploadedFile | undefined, viewer: Express.User, actor: Actor) {
    if (!file) throw new ValidationError({ file: 'Choose a plan image to upload.' });
    let kept = false;
    try {
      const deck = await this.deckOrFail(deckId);
      const type = await fileTypeFromFile(file.path);
      if (!type || !(PLAN_FORMATS as readonly string[]).includes(type.mime)) {
        throw new ApiError(415, 'unsupported_media_type', 'A plan must be a PNG, JPEG, WebP or TIFF image. This file is not one, whatever its name says.', { file: 'Not a PNG, JPEG, WebP or TIFF image.' });
      }
      const meta = await sharp(file.path, { limitInputPixels: false }).metadata().catch(() => null);
      if (!meta?.width || !meta.height) throw new ApiError(415, 'unsupported_media_type', 'The image could not be read. It may be damaged.', { file: 'Unreadable image.' });
      const max = this.config.planMaxSide;
      if (meta.width > max || meta.height > max) {
        throw new ApiError(413, 'payload_too_large', `The plan is ${meta.width} × ${meta.height} pixels; at most ${max} pixels a side are accepted.`, { file: 'Too many pixels.' });
      }
      const contentHash = await sha256File(file.path);
      const plan = await this.store.transaction(async (repos) => {
        const created = await repos.plans.create({
          deckId,
          status: 'building',
          originalName: path.basename(file.originalname).slice(0, 200) || 'plan',
          mimeType: type.mime,
          byteSize: file.size,
          width: meta.width,
          height: meta.height,
          maxZoom: planMaxZoom(meta.width, meta.height),
          tilesTotal: planTileCount(meta.width, meta.height),
          contentHash,
          uploadedById: viewer.id,
        });
        await recordAudit(repos, actor, {
          action: 'create',
          entityType: 'plan',
          entityId: created.id,
          vesselId: deck.vesselId,
          summary: `New plan for ${deck.name} uploaded (${meta.width} × ${meta.height} px); building tiles`,
        });
        return created;
      });
      const work = await this.files.scratch(`plan-${plan.id}`);
      const original = path.join(work, `original.${EXTENSIONS[type.mime]}`);
      await this.files.moveIn(file.path, path.relative(this.files.root, original));
      kept = true;
      this.queue = this.queue.then(() => this.build(plan.id, work, original));
      return presentPlan(plan, await this.currentOf(deck));
    } finally {
      if (!kept) await unlink(file.path).catch(() => undefined);
    }
  }

  private async build(planId: number, work: string, original: string): Promise<void> {
    const pyramid = path.join(work, 'pyramid');
    const progress = setInterval(() => {
      void this.files.countFiles(pyramid).then((n) => this.store.transaction((repos) => repos.plans.setProgress(planId, n)));
    }, 500);
    let storageKey: string | null = null;
    try {
      if (this.cancelled.has(planId)) return;
      await buildPyramid(original, pyramid);
      clearInterval(progress);
      if (this.cancelled.has(planId)) return;
      const plan = (await this.store.repos.plans.findById(planId))!;
      storageKey = `plans/deck-${plan.deckId}/${planVersion(plan)}`;
      // The key holds this new row's id, so anything already there is an orphan (e.g. the database was reset but not the uploads)
      await this.files.remove(storageKey);
      await this.files.moveIn(work, storageKey);
      const key = storageKey;
      const outcome = await this.store.transaction(async (repos) => {
        const fresh = await repos.plans.findById(planId);
        const deck = fresh && (await repos.decks.findById(fresh.deckId));
        if (!fresh || !deck || fresh.status !== 'building') return { replaced: null, keep: false };
        fresh.storageKey = key;
        fresh.tilesDone = fresh.tilesTotal;
        fresh.finishedAt = new Date();
        const current = deck.currentPlanId ? await repos.plans.findById(deck.currentPlanId) : null;
        const drawn = current ? (await repos.compartments.outlinesOnDeck(deck.id)).length > 0 : false;
        const aspectDiffers = current ? Math.abs(current.width / current.height / (fresh.width / fresh.height) - 1) > SAME_ASPECT : false;
        if (drawn && aspectDiffers) {
          fresh.status = 'awaiting-choice';
          await repos.plans.save(fresh);
          return { replaced: null, keep: true };
        }
        const replaced = await this.activateIn(repos, deck, fresh, 'stretch', { id: fresh.uploadedById, ip: null });
        return { replaced, keep: true };
      });
      if (!outcome.keep) await this.files.remove(key);
      if (outcome.replaced) await this.files.remove(outcome.replaced);
    } catch (err) {
      clearInterval(progress);
      if (storageKey) await this.files.remove(storageKey);
      await this.store.transaction(async (repos) => {
        const plan = await repos.plans.findById(planId);
        if (!plan || plan.status !== 'building') return;
        plan.status = 'failed';
        plan.error = `The tiles could not be built: ${err instanceof Error ? err.message : String(err)}`.slice(0, 500);
        plan.finishedAt = new Date();
        await repos.plans.save(plan);
      });
    } finally {
      clearInterval(progress);
      this.cancelled.delete(planId);
      await this.files.removePath(work);
    }
  }

  /**
   * Makes a built plan the deck's current one: outlines, calibration points and the centerline are
   * carried over to the new image's pixels. Returns the storage key of the plan it replaced.
   */
  private async activateIn(repos: Repositories, deck: DeckEntity, plan: PlanEntity, fit: PlanFit, actor: Actor): Promise<string | null> {
    const previous = deck.currentPlanId ? await repos.plans.findById(deck.currentPlanId) : null;
    let note = '';
    if (previous) {
      const sx = plan.width / previous.width;
      const sy = fit === 'stretch' ? plan.height / previous.height : sx;
      const scale = ([x, y]: Point): Point => [x * sx, y * sy];
      const off = (p: Point) => p[0] < 0 || p[1] < 0 || p[0] > plan.width || p[1] > plan.height;
      for (const compartment of await repos.compartments.outlinesOnDeck(deck.id)) {
        const outline = compartment.outline!.map(scale);
        if (outline.some(off)) {
          throw new UnprocessableError(`Kept in proportion, ${compartment.designation} would fall off the new plan. Choose to stretch instead.`);
        }
        compartment.outline = outline;
        await repos.compartments.save(compartment);
      }
      // The artifacts stay where they are on board; only the plan's pixels under them change.
      for (const artifact of await repos.artifacts.placedOnDeck(deck.id)) {
        const point = scale(artifact.point!);
        await repos.artifacts.setPoint(artifact.id, off(point) ? [Math.min(Math.max(point[0], 0), plan.width), Math.min(Math.max(point[1], 0), plan.height)] : point);
      }
      if (deck.centerlineY !== null) deck.centerlineY *= sy;
      if (deck.frames) deck.frames = { ...deck.frames, referenceX: deck.frames.referenceX * sx };
      if (deck.calibration && deck.metresPerUnit) {
        if (Math.abs(sx / sy - 1) <= SAME_ASPECT) {
          deck.calibration = { ...deck.calibration, a: scale(deck.calibration.a), b: scale(deck.calibration.b) };
          deck.metresPerUnit /= sx;
        } else {
          deck.calibration = null;
          deck.metresPerUnit = null;
          note = '; the scale was cleared because the plan was stretched';
        }
      }
      previous.status = 'replaced';
      await repos.plans.save(previous);
    }
    deck.currentPlanId = plan.id;
    deck.planWidth = plan.width;
    deck.planHeight = plan.height;
    await repos.decks.save(deck);
    plan.status = 'ready';
    await repos.plans.save(plan);
    await recordAudit(repos, actor, {
      action: 'update',
      entityType: 'deck',
      entityId: deck.id,
      vesselId: deck.vesselId,
      summary: `${deck.name} now shows plan ${plan.originalName} (${plan.width} × ${plan.height} px)${note}`,
      changes: { currentPlanId: { from: previous?.id ?? null, to: plan.id } },
    });
    return previous?.storageKey ?? null;
  }

  /** Finishes a replacement whose proportions differ, once the curator has chosen how to fit. */
  async activate(deckId: number, planId: number, fit: PlanFit, actor: Actor) {
    const replaced = await this.store.transaction(async (repos) => {
      const deck = await repos.decks.findById(deckId);
      const plan = await repos.plans.findById(planId);
      if (!deck || !plan || plan.deckId !== deckId) throw new NotFoundError('The plan');
      if (plan.status !== 'awaiting-choice') throw new UnprocessableError('Only a plan waiting for a choice of fit can be put in place this way.');
      return this.activateIn(repos, deck, plan, fit, actor);
    });
    if (replaced) await this.files.remove(replaced);
    return this.status(deckId);
  }

  /** Stops a build or drops a plan waiting for a choice; the deck keeps its current plan. */
  async cancel(deckId: number, planId: number, actor: Actor) {
    const dropped = await this.store.transaction(async (repos) => {
      const plan = await repos.plans.findById(planId);
      if (!plan || plan.deckId !== deckId) throw new NotFoundError('The plan');
      if (plan.status !== 'building' && plan.status !== 'awaiting-choice') throw new UnprocessableError('Only a plan that is being built or waits for a choice can be cancelled.');
      const key = plan.storageKey;
      plan.status = 'cancelled';
      plan.storageKey = null;
      plan.finishedAt = new Date();
      await repos.plans.save(plan);
      const deck = await repos.decks.findById(deckId);
      await recordAudit(repos, actor, { action: 'update', entityType: 'plan', entityId: planId, vesselId: deck?.vesselId ?? null, summary: `Plan ${plan.originalName} cancelled` });
      this.cancelled.add(planId);
      return key;
    });
    if (dropped) await this.files.remove(dropped);
    return this.status(deckId);
  }

  /** After a restart, builds that were running are failed and their leftovers removed. */
  async recoverInterrupted(): Promise<void> {
    await this.files.clearScratch();
    await this.store.transaction(async (repos) => {
      for (const plan of await repos.plans.withStatus(['building'])) {
        plan.status = 'failed';
        plan.error = 'The build was interrupted by a restart. Upload the plan again.';
        plan.finishedAt = new Date();
        await repos.plans.save(plan);
      }
    });
  }

  /** The file of one tile, if the version names a built plan of this deck. */
  async tilePath(deckId: number, version: string, z: number, y: number, xFile: string): Promise<string> {
    const plan = await this.store.repos.plans.findById(Number(version.split('-')[0]));
    if (!plan || plan.deckId !== deckId || planVersion(plan) !== version || !plan.storageKey) throw new NotFoundError('The tile');
    if (plan.status !== 'ready' && plan.status !== 'awaiting-choice' && plan.status !== 'replaced') throw new NotFoundError('The tile');
    const key = `${plan.storageKey}/pyramid/${z}/${y}/${xFile}`;
    if (!(await this.files.exists(key))) throw new NotFoundError('The tile');
    return this.files.path(key);
  }
}
