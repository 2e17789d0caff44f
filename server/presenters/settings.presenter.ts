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
    interpretationTargets: settings.interpretationTargets,
    updatedAt: settings.updatedAt.toISOString(),
    version: settings.version,
  };
}
