import { calibrateFromFrames, calibrateFromPoints, CalibrationError } from '../../shared/calc/calibration.js';
import type { CalibrateDeckBody, CreateDeckBody, UpdateDeckBody } from '../../shared/schemas/decks.js';
import type { DeckCalibrationRecord, DeckEntity } from '../db/entities/deck.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ConflictError, NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import { presentDeck } from '../presenters/deck.presenter.js';
import type { FileStore } from '../storage/file-store.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';

export class DeckService {
  constructor(private readonly store: Store, private readonly files: FileStore) {}

  private async vesselOrFail(repos: Repositories, vesselId: number) {
    const vessel = await repos.vessels.findById(vesselId);
    if (!vessel) throw new NotFoundError('The vessel');
    return vessel;
  }

  async list(vesselId: number, viewer: Express.User) {
    await this.vesselOrFail(this.store.repos, vesselId);
    const [decks, counts] = await Promise.all([this.store.repos.decks.listForVessel(vesselId), this.store.repos.decks.compartmentCounts(vesselId)]);
    return decks.map((d) => presentDeck(d, counts.get(d.id) ?? 0, viewer));
  }

  async get(id: number, viewer: Express.User) {
    const deck = await this.store.repos.decks.findById(id);
    if (!deck) throw new NotFoundError('The deck');
    return presentDeck(deck, await this.store.repos.compartments.countOnDeck(id), viewer);
  }

  async create(vesselId: number, body: CreateDeckBody, viewer: Express.User, actor: Actor) {
    const deck = await this.store.transaction(async (repos) => {
      await this.vesselOrFail(repos, vesselId);
      const existing = await repos.decks.listForVessel(vesselId);
      if (existing.some((d) => d.name.toLowerCase() === body.name.trim().toLowerCase())) {
        throw new ConflictError('This vessel already has a deck with this name.', { name: 'Already in use.' });
      }
      const created = await repos.decks.create({ vesselId, name: body.name, levelCode: body.levelCode ?? null, position: existing.length });
      await recordAudit(repos, actor, { action: 'create', entityType: 'deck', entityId: created.id, vesselId, summary: `Deck ${created.name} added` });
      return created;
    });
    return presentDeck(deck, 0, viewer);
  }

  async update(id: number, body: UpdateDeckBody, viewer: Express.User, actor: Actor) {
    const deck = await this.store.transaction(async (repos) => {
      const deck = await repos.decks.findById(id);
      if (!deck) throw new NotFoundError('The deck');
      if (deck.version !== body.version) throw new StaleVersionError('this deck', deck.version);
      const { version: _version, position, ...fields } = body;
      if (fields.centerlineY != null && deck.planHeight !== null && fields.centerlineY > deck.planHeight) {
        throw new UnprocessableError('The centerline must lie on the plan.', { centerlineY: `The plan is ${deck.planHeight} units high.` });
      }
      if (fields.frames && deck.planWidth !== null && fields.frames.referenceX > deck.planWidth) {
        throw new UnprocessableError('The reference frame must lie on the plan.', { 'frames.referenceX': `The plan is ${deck.planWidth} units wide.` });
      }
      const changes = changesBetween(deck, { ...fields, ...(position !== undefined && { position }) }, ['name', 'levelCode', 'centerlineY', 'bowTo', 'frames', 'position']);
      if (!changes) return deck;
      Object.assign(deck, fields);
      if (position !== undefined && position !== deck.position) await this.move(repos, deck, position);
      const saved = await repos.decks.save(deck);
      await recordAudit(repos, actor, { action: 'update', entityType: 'deck', entityId: id, vesselId: deck.vesselId, summary: `Deck ${deck.name} changed`, changes });
      return saved;
    });
    return presentDeck(deck, await this.store.repos.compartments.countOnDeck(id), viewer);
  }

  /** Moves a deck to a new place in the vessel's order, shifting the others. */
  private async move(repos: Repositories, deck: DeckEntity, position: number) {
    const others = (await repos.decks.listForVessel(deck.vesselId)).filter((d) => d.id !== deck.id);
    const target = Math.min(position, others.length);
    others.splice(target, 0, deck);
    others.forEach((d, index) => (d.position = index));
    await repos.decks.saveAll(others.filter((d) => d.id !== deck.id));
  }

  async calibrate(id: number, body: CalibrateDeckBody, viewer: Express.User, actor: Actor) {
    const deck = await this.store.transaction(async (repos) => {
      const deck = await repos.decks.findById(id);
      if (!deck) throw new NotFoundError('The deck');
      if (deck.version !== body.version) throw new StaleVersionError('this deck', deck.version);
      if (deck.planWidth !== null && deck.planHeight !== null) {
        const off = [body.a, body.b].some(([x, y]) => x < 0 || y < 0 || x > deck.planWidth! || y > deck.planHeight!);
        if (off) throw new UnprocessableError('Both calibration points must lie on the plan.', { a: 'Click on the plan.', b: 'Click on the plan.' });
      }
      let record: DeckCalibrationRecord;
      let metresPerUnit: number;
      try {
        if (body.method === 'points') {
          metresPerUnit = calibrateFromPoints(body.a, body.b, body.realMetres).metresPerUnit;
          record = { method: 'points', a: body.a, b: body.b, realMetres: body.realMetres };
        } else {
          metresPerUnit = calibrateFromFrames(body.a, body.b, body.frameSpaces, body.frameSpacingMetres).metresPerUnit;
          record = { method: 'frames', a: body.a, b: body.b, realMetres: body.frameSpaces * body.frameSpacingMetres, frameSpaces: body.frameSpaces, frameSpacingMetres: body.frameSpacingMetres };
        }
      } catch (err) {
        if (err instanceof CalibrationError) throw new UnprocessableError(err.message, { [err.field]: err.message });
        throw err;
      }
      const changes = { metresPerUnit: { from: deck.metresPerUnit, to: metresPerUnit } };
      deck.metresPerUnit = metresPerUnit;
      deck.calibration = record;
      const saved = await repos.decks.save(deck);
      await recordAudit(repos, actor, { action: 'update', entityType: 'deck', entityId: id, vesselId: deck.vesselId, summary: `Deck ${deck.name} calibrated`, changes });
      return saved;
    });
    return presentDeck(deck, await this.store.repos.compartments.countOnDeck(id), viewer);
  }

  async remove(id: number, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const deck = await repos.decks.findById(id);
      if (!deck) throw new NotFoundError('The deck');
      const count = await repos.compartments.countOnDeck(id);
      if (count > 0) throw new ConflictError(`This deck still has ${count} compartment${count === 1 ? '' : 's'}. Move or delete them first.`);
      await repos.decks.remove(deck);
      const rest = await repos.decks.listForVessel(deck.vesselId);
      rest.forEach((d, index) => (d.position = index));
      await repos.decks.saveAll(rest);
      await recordAudit(repos, actor, { action: 'delete', entityType: 'deck', entityId: id, vesselId: deck.vesselId, summary: `Deck ${deck.name} deleted` });
    });
    // Its plan rows went with it (cascade); their files go now, after the commit.
    await this.files.remove(`plans/deck-${id}`);
  }
}
