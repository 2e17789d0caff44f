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

  /** The one settings row (openDatabase makes it). */
  get(): Promise<OrganisationSettingsEntity> {
    return this.repo.findOneByOrFail({ id: 1 });
  }

  /** Makes the settings row with defaults if there is none; run at start, before any request. */
  async ensure(): Promise<void> {
    await this.repo.createQueryBuilder().insert().values({ id: 1, ...DEFAULT_SETTINGS }).orIgnore().execute();
  }

  save(settings: OrganisationSettingsEntity) {
    return this.repo.save(settings);
  }
}
