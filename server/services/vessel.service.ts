import type { CreateVesselBody, UpdateVesselBody, VesselsQuery } from '../../shared/schemas/vessels.js';
import type { createVesselBody } from '../../shared/schemas/vessels.js';
import type { z } from 'zod';
import type { Store } from '../db/store.js';
import type { VesselEntity } from '../db/entities/vessel.entity.js';
import { ConflictError, NotFoundError, StaleVersionError } from '../http/errors.js';
import { presentPublicVessel, presentVessel } from '../presenters/vessel.presenter.js';
import { changesBetween, recordAudit, type Actor } from './audit.service.js';

const EDITABLE: (keyof VesselEntity & keyof CreateVesselBody)[] = ['name', 'vesselType', 'builtYear', 'berth', 'summary', 'designationScheme'];

export class VesselService {
  constructor(private readonly store: Store) {}

  async list(query: VesselsQuery, viewer: Express.User) {
    const page = await this.store.repos.vessels.page(query);
    return { ...page, items: page.items.map((v) => presentVessel(v, viewer)) };
  }

  async get(id: number, viewer: Express.User) {
    const vessel = await this.store.repos.vessels.findById(id);
    if (!vessel) throw new NotFoundError('The vessel');
    return presentVessel(vessel, viewer);
  }

  async listPublic() {
    return (await this.store.repos.vessels.listActive()).map(presentPublicVessel);
  }

  async create(body: z.output<typeof createVesselBody>, viewer: Express.User, actor: Actor) {
    const vessel = await this.store.transaction(async (repos) => {
      if (await repos.vessels.findByName(body.name)) throw new ConflictError('A vessel with this name already exists.', { name: 'Already in use.' });
      const created = await repos.vessels.create(body);
      await recordAudit(repos, actor, {
        action: 'create',
        entityType: 'vessel',
        entityId: created.id,
        vesselId: created.id,
        summary: `Vessel ${created.name} added`,
        changes: changesBetween({} as VesselEntity, created, EDITABLE),
      });
      return created;
    });
    return presentVessel(vessel, viewer);
  }

  async update(id: number, body: UpdateVesselBody, viewer: Express.User, actor: Actor) {
    const vessel = await this.store.transaction(async (repos) => {
      const vessel = await repos.vessels.findById(id);
      if (!vessel) throw new NotFoundError('The vessel');
      if (vessel.version !== body.version) {
        throw new StaleVersionError('this vessel', vessel.version);
      }
      const { version: _version, ...fields } = body;
      if (fields.name && fields.name.toLowerCase() !== vessel.name.toLowerCase() && (await repos.vessels.findByName(fields.name))) {
        throw new ConflictError('A vessel with this name already exists.', { name: 'Already in use.' });
      }
      const changes = changesBetween(vessel, fields, EDITABLE);
      if (!changes) return vessel;
      Object.assign(vessel, fields);
      const saved = await repos.vessels.save(vessel);
      await recordAudit(repos, actor, { action: 'update', entityType: 'vessel', entityId: id, vesselId: id, summary: `Vessel ${vessel.name} updated`, changes });
      return saved;
    });
    return presentVessel(vessel, viewer);
  }

  async setArchived(id: number, archived: boolean, viewer: Express.User, actor: Actor) {
    const vessel = await this.store.transaction(async (repos) => {
      const vessel = await repos.vessels.findById(id);
      if (!vessel) throw new NotFoundError('The vessel');
      if ((vessel.archivedAt !== null) === archived) return vessel;
      vessel.archivedAt = archived ? new Date() : null;
      const saved = await repos.vessels.save(vessel);
      await recordAudit(repos, actor, {
        action: archived ? 'archive' : 'restore',
        entityType: 'vessel',
        entityId: id,
        vesselId: id,
        summary: `Vessel ${vessel.name} ${archived ? 'archived' : 'restored'}`,
      });
      return saved;
    });
    return presentVessel(vessel, viewer);
  }
}
