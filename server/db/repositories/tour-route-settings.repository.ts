import type { EntityManager } from 'typeorm';
import { DEFAULT_ROUTE_SETTINGS } from '../../../shared/calc/tour-route.js';
import { TourRouteSettingsEntity } from '../entities/tour-route-settings.entity.js';

export class TourRouteSettingsRepository {
  constructor(private readonly manager: EntityManager) {}

  private get repo() {
    return this.manager.getRepository(TourRouteSettingsEntity);
  }

  /** The vessel's route settings; the defaults (unsaved, version 0) when never set. */
  async get(vesselId: number): Promise<TourRouteSettingsEntity> {
    return (await this.repo.findOneBy({ vesselId })) ?? this.repo.create({ vesselId, ...DEFAULT_ROUTE_SETTINGS, version: 0 });
  }

  async save(settings: TourRouteSettingsEntity) {
    if (settings.version === 0) {
      const { version: _v, ...fields } = settings;
      return this.repo.save(this.repo.create(fields));
    }
    return this.repo.save(settings);
  }
}
