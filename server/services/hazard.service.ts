import { HAZARD_LABELS, type UpdateHazardBody } from '../../shared/schemas/hazards.js';
import type { createHazardBody } from '../../shared/schemas/hazards.js';
import type { z } from 'zod';
import type { HazardEntity } from '../db/entities/hazard.entity.js';
import type { Repositories, Store } from '../db/store.js';
import { NotFoundError } from '../http/errors.js';
import { presentHazard } from '../presenters/hazard.presenter.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';
import { staleEditError } from './stale-edit.js';

/** The hazard register of a compartment. The product records and reminds; it never declares a space safe. */
export class HazardService {
  constructor(private readonly store: Store) {}

  private async compartmentOrFail(id: number) {
    const compartment = await this.store.repos.compartments.findById(id);
    if (!compartment) throw new NotFoundError('The compartment');
    return compartment;
  }

  private async hazardOf(repos: Repositories, compartmentId: number, hazardId: number) {
    const hazard = await repos.hazards.findPlain(hazardId);
    if (!hazard || hazard.compartmentId !== compartmentId) throw new NotFoundError('The hazard');
    return hazard;
  }

  async list(compartmentId: number, viewer: Express.User) {
    await this.compartmentOrFail(compartmentId);
    return (await this.store.repos.hazards.listFor(compartmentId)).map((h) => presentHazard(h, viewer));
  }

  async create(compartmentId: number, body: z.output<typeof createHazardBody>, viewer: Express.User, actor: Actor) {
    const compartment = await this.compartmentOrFail(compartmentId);
    const id = await this.store.transaction(async (repos) => {
      const hazard = await repos.hazards.create({ compartmentId, ...body, verifiedById: body.lastVerifiedOn ? viewer.id : null });
      await recordAudit(repos, actor, {
        action: 'create',
        entityType: 'hazard',
        entityId: hazard.id,
        vesselId: compartment.vesselId,
        summary: `${HAZARD_LABELS[hazard.kind]} recorded in ${compartment.designation}`,
      });
      return hazard.id;
    });
    return presentHazard((await this.store.repos.hazards.findById(id))!, viewer);
  }

  async update(compartmentId: number, hazardId: number, body: UpdateHazardBody, viewer: Express.User, actor: Actor) {
    const compartment = await this.compartmentOrFail(compartmentId);
    await this.store.transaction(async (repos) => {
      const hazard = await this.hazardOf(repos, compartmentId, hazardId);
      if (hazard.version !== body.version) throw await staleEditError(repos, 'hazard', hazardId, 'this hazard', hazard.version, body.version);
      const { version: _version, ...fields } = body;
      const changes = changesBetween<HazardEntity>(hazard, fields, ['kind', 'notes', 'lastVerifiedOn']);
      if (!changes) return;
      Object.assign(hazard, fields);
      if (changes.lastVerifiedOn) hazard.verifiedById = hazard.lastVerifiedOn ? viewer.id : null;
      await repos.hazards.save(hazard);
      await recordAudit(repos, actor, {
        action: 'update',
        entityType: 'hazard',
        entityId: hazardId,
        vesselId: compartment.vesselId,
        summary: `${HAZARD_LABELS[hazard.kind]} in ${compartment.designation} changed`,
        changes,
      });
    });
    return presentHazard((await this.store.repos.hazards.findById(hazardId))!, viewer);
  }

  async remove(compartmentId: number, hazardId: number, actor: Actor) {
    const compartment = await this.compartmentOrFail(compartmentId);
    await this.store.transaction(async (repos) => {
      const hazard = await this.hazardOf(repos, compartmentId, hazardId);
      await repos.hazards.remove(hazardId);
      await recordAudit(repos, actor, {
        action: 'delete',
        entityType: 'hazard',
        entityId: hazardId,
        vesselId: compartment.vesselId,
        summary: `${HAZARD_LABELS[hazard.kind]} removed from ${compartment.designation}`,
      });
    });
  }
}
