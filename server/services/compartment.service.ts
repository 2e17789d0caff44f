import { designationErrors } from '../../shared/calc/designation-check.js';
import { parseNavyDesignation } from '../../shared/calc/designation.js';
import { POLYGON_PROBLEM_MESSAGES, polygonProblem, type Point } from '../../shared/calc/geometry.js';
import type { CompartmentsQuery, CreateCompartmentBody, UpdateCompartmentBody } from '../../shared/schemas/compartments.js';
import type { createCompartmentBody } from '../../shared/schemas/compartments.js';
import type { z } from 'zod';
import type { CompartmentEntity } from '../db/entities/compartment.entity.js';
import type { DeckEntity } from '../db/entities/deck.entity.js';
import type { VesselEntity } from '../db/entities/vessel.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { ConflictError, NotFoundError, StaleVersionError, UnprocessableError } from '../http/errors.js';
import { presentCompartment } from '../presenters/compartment.presenter.js';
import { reindexReportsOf } from '../search/condition-report-document.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';

const EDITABLE: (keyof CompartmentEntity & keyof CreateCompartmentBody)[] = ['deckId', 'designation', 'name', 'description', 'accessStatus', 'virtualVisit', 'outline'];

export function designationKey(designation: string): string {
  return designation.trim().toUpperCase();
}

export class CompartmentService {
  constructor(private readonly store: Store) {}

  private async deckOf(repos: Repositories, vessel: VesselEntity, deckId: number): Promise<DeckEntity> {
    const deck = await repos.decks.findById(deckId);
    if (!deck || deck.vesselId !== vessel.id) throw new UnprocessableError('Choose a deck of this vessel.', { deckId: 'Not a deck of this vessel.' });
    return deck;
  }

  /** Checks the designation against the vessel's scheme and its uniqueness; returns the stored form. */
  private async checkDesignation(repos: Repositories, vessel: VesselEntity, deck: DeckEntity, designation: string, exceptId?: number): Promise<string> {
    let value = designation.trim();
    if (vessel.designationScheme === 'us-navy-1949') {
      const parsed = parseNavyDesignation(value);
      if (!parsed.ok) throw new UnprocessableError(parsed.message, { designation: parsed.message, [`designation.${parsed.part}`]: parsed.message });
      // The same checks the dialog makes while typing; only errors refuse, warnings are shown with the record.
      const [error] = designationErrors(parsed.designation, deck);
      if (error) throw new UnprocessableError(error.message, { designation: error.message, [`designation.${error.part}`]: error.message });
      value = parsed.designation.value;
    }
    const existing = await repos.compartments.findByDesignation(vessel.id, designationKey(value));
    if (existing && existing.id !== exceptId) {
      throw new ConflictError(`Another compartment of this vessel is already designated ${value}.`, { designation: 'Already in use on this vessel.' });
    }
    return value;
  }

  private checkOutline(deck: DeckEntity, outline: Point[] | null) {
    if (!outline) return;
    if (deck.planWidth === null || deck.planHeight === null) {
      throw new UnprocessableError(`${deck.name} has no plan yet. Upload a plan before drawing on it.`, { outline: 'No plan to draw on.' });
    }
    const problem = polygonProblem(outline, { width: deck.planWidth, height: deck.planHeight });
    if (problem) throw new UnprocessableError(POLYGON_PROBLEM_MESSAGES[problem], { outline: POLYGON_PROBLEM_MESSAGES[problem] });
  }

  private async present(compartment: CompartmentEntity, viewer: Express.User) {
    const repos = this.store.repos;
    const [vessel, deck, kinds] = await Promise.all([repos.vessels.findById(compartment.vesselId), repos.decks.findById(compartment.deckId), repos.hazards.kindsFor([compartment.id])]);
    return presentCompartment(compartment, deck!, vessel!.designationScheme, kinds.get(compartment.id) ?? [], viewer);
  }

  async list(vesselId: number, query: CompartmentsQuery, viewer: Express.User) {
    const vessel = await this.store.repos.vessels.findById(vesselId);
    if (!vessel) throw new NotFoundError('The vessel');
    const page = await this.store.repos.compartments.page(vesselId, query);
    const kinds = await this.store.repos.hazards.kindsFor(page.items.map((c) => c.id));
    return { ...page, items: page.items.map((c) => presentCompartment(c, c.deck, vessel.designationScheme, kinds.get(c.id) ?? [], viewer)) };
  }

  async get(id: number, viewer: Express.User) {
    const compartment = await this.store.repos.compartments.findById(id);
    if (!compartment) throw new NotFoundError('The compartment');
    return this.present(compartment, viewer);
  }

  async create(vesselId: number, body: z.output<typeof createCompartmentBody>, viewer: Express.User, actor: Actor) {
    const created = await this.store.transaction(async (repos) => {
      const vessel = await repos.vessels.findById(vesselId);
      if (!vessel) throw new NotFoundError('The vessel');
      const deck = await this.deckOf(repos, vessel, body.deckId);
      const designation = await this.checkDesignation(repos, vessel, deck, body.designation);
      this.checkOutline(deck, body.outline);
      const compartment = await repos.compartments.create({ ...body, vesselId, designation, designationKey: designationKey(designation) });
      await recordAudit(repos, actor, {
        action: 'create',
        entityType: 'compartment',
        entityId: compartment.id,
        vesselId,
        summary: `Compartment ${designation} (${compartment.name}) added on ${deck.name}`,
        changes: changesBetween({} as CompartmentEntity, compartment, EDITABLE),
      });
      return compartment;
    });
    return this.present(created, viewer);
  }

  async update(id: number, body: UpdateCompartmentBody, viewer: Express.User, actor: Actor) {
    const saved = await this.store.transaction(async (repos) => {
      const compartment = await repos.compartments.findById(id);
      if (!compartment) throw new NotFoundError('The compartment');
      if (compartment.version !== body.version) {
        throw new StaleVersionError('this compartment', compartment.version);
      }
      const vessel = (await repos.vessels.findById(compartment.vesselId))!;
      const { version: _version, ...fields } = body;
      const deck = await this.deckOf(repos, vessel, fields.deckId ?? compartment.deckId);
      if (fields.designation !== undefined) fields.designation = await this.checkDesignation(repos, vessel, deck, fields.designation, id);
      if (fields.outline !== undefined) this.checkOutline(deck, fields.outline);
      else if (fields.deckId !== undefined && fields.deckId !== compartment.deckId) fields.outline = null; // an outline belongs to its deck's plan
      const changes = changesBetween(compartment, fields, EDITABLE);
      if (!changes) return compartment;
      Object.assign(compartment, fields);
      // TypeORM saves a loaded relation over its id column: move the relation with the id.
      compartment.deck = deck;
      compartment.designationKey = designationKey(compartment.designation);
      const result = await repos.compartments.save(compartment);
      if ('deckId' in changes) {
        // Points on the old deck's plan mean nothing on the new one; risks follow the compartment's deck.
        await repos.artifacts.clearPointsIn(id);
        await repos.risks.setDeckOf('compartment', id, result.deckId);
      }
      if ('designation' in changes || 'name' in changes) await reindexReportsOf(repos, 'compartment', id, `${result.designation} ${result.name}`);
      const what = Object.keys(changes).join(', ');
      await recordAudit(repos, actor, { action: 'update', entityType: 'compartment', entityId: id, vesselId: vessel.id, summary: `Compartment ${compartment.designation} changed (${what})`, changes });
      return result;
    });
    return this.present(saved, viewer);
  }

  async remove(id: number, actor: Actor) {
    await this.store.transaction(async (repos) => {
      const compartment = await repos.compartments.findById(id);
      if (!compartment) throw new NotFoundError('The compartment');
      const artifacts = await repos.artifacts.countInCompartment(id);
      if (artifacts > 0) {
        throw new ConflictError(`${compartment.designation} holds ${artifacts === 1 ? 'an artifact' : `${artifacts} artifacts`}. Move ${artifacts === 1 ? 'it' : 'them'} elsewhere first, so that no object loses its place.`);
      }
      const files = await repos.media.countForOwner('compartment', id);
      if (files > 0) throw new ConflictError(`${compartment.designation} has ${files === 1 ? 'a photo or document' : `${files} photos or documents`}. Delete ${files === 1 ? 'it' : 'them'} first.`);
      // Condition records are kept for good; a compartment they speak of stays too.
      const reports = (await repos.conditionReports.forSubject('compartment', id)).length;
      const incidents = (await repos.incidents.forSubject('compartment', id)).length;
      const risks = await repos.risks.countLinkedTo('compartment', id);
      if (reports + incidents + risks > 0) {
        const what = [reports && `${reports} condition report${reports > 1 ? 's' : ''}`, incidents && `${incidents} incident${incidents > 1 ? 's' : ''}`, risks && `${risks} risk${risks > 1 ? 's' : ''}`].filter(Boolean).join(', ');
        throw new ConflictError(`${compartment.designation} is named in ${what}. Condition records are kept, so the compartment stays; change its access status instead.`);
      }
      const interpretation = await repos.interpretations.findFor('compartment', id);
      if (interpretation?.published) throw new ConflictError(`${compartment.designation} has published interpretive text that visitors read. The compartment stays; change its access status instead.`);
      if (interpretation) await repos.search.remove('interpretation', interpretation.id);
      await repos.interpretations.removeFor('compartment', id);
      await repos.compartments.remove(id);
      await recordAudit(repos, actor, {
        action: 'delete',
        entityType: 'compartment',
        entityId: id,
        vesselId: compartment.vesselId,
        summary: `Compartment ${compartment.designation} (${compartment.name}) deleted`,
      });
    });
  }
}
