import type { EntityManager } from 'typeorm';
import { OrganisationSettingsEntity } from '../entities/organisation-settings.entity.js';

export const DEFAULT_SETTINGS = {
  organisationName: 'Our museum ship',
  country: 'US',
  currency: 'USD',
  unitSystem: 'us-customary' as const,
  contactEmail: '',
};

export class SettingsRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(OrganisationSettingsEntity);
  }

  /** The one settings row, made with defaults the first time it is asked for. */
  async get(): Promise<OrganisationSettingsEntity> {
    const row = await this.repo.findOneBy({ id: 1 });
    if (row) return row;
    await this.repo.createQueryBuilder().insert().values({ id: 1, ...DEFAULT_SETTINGS }).orIgnore().execute();
    return this.repo.findOneByOrFail({ id: 1 });
  }

  save(settings: OrganisationSettingsEntity) {
    return this.repo.save(settings);
  }
}
