import { DEFAULT_GIVING_SETTINGS } from '../../shared/schemas/giving-settings.js';
import type { OrganisationSettings } from '../../shared/schemas/settings.js';
import type { OrganisationSettingsEntity } from '../db/entities/organisation-settings.entity.js';

export function presentSettings(settings: OrganisationSettingsEntity): OrganisationSettings {
  return {
    organisationName: settings.organisationName,
    country: settings.country,
    currency: settings.currency,
    unitSystem: settings.unitSystem,
    contactEmail: settings.contactEmail,
    objectNumberPattern: settings.objectNumberPattern,
    riskScale: settings.riskScale,
    giving: { ...DEFAULT_GIVING_SETTINGS, ...settings.giving },
    updatedAt: settings.updatedAt.toISOString(),
    version: settings.version,
  };
}
