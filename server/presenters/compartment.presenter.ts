import { compartmentFigures, designationWarnings } from '../../shared/calc/compartment-figures.js';
import { parseNavyDesignation } from '../../shared/calc/designation.js';
import { can } from '../../shared/permissions.js';
import type { Compartment } from '../../shared/schemas/compartments.js';
import { cautionsFor } from '../../shared/schemas/hazard-cautions.js';
import { ENTRY_CAUTION, ENTRY_CAUTION_KINDS, type HazardKind } from '../../shared/schemas/hazards.js';
import type { DesignationScheme } from '../../shared/schemas/vessels.js';
import type { CompartmentEntity } from '../db/entities/compartment.entity.js';
import type { DeckEntity } from '../db/entities/deck.entity.js';

export function presentCompartment(
  compartment: CompartmentEntity,
  deck: DeckEntity,
  scheme: DesignationScheme,
  hazardKinds: HazardKind[],
  viewer: Express.User,
): Compartment {
  const parsed = scheme === 'us-navy-1949' ? parseNavyDesignation(compartment.designation) : null;
  const figures = compartmentFigures(compartment.outline, deck.metresPerUnit);
  return {
    id: compartment.id,
    vesselId: compartment.vesselId,
    deckId: compartment.deckId,
    deckName: deck.name,
    designation: compartment.designation,
    designationExplanation: parsed?.ok ? parsed.designation.explanation : null,
    designationWarnings: parsed?.ok ? designationWarnings(parsed.designation, deck, compartment.outline) : [],
    name: compartment.name,
    description: compartment.description,
    accessStatus: compartment.accessStatus,
    virtualVisit: compartment.virtualVisit,
    outline: compartment.outline,
    ...figures,
    hazardKinds,
    entryCaution: hazardKinds.some((k) => ENTRY_CAUTION_KINDS.includes(k)) ? ENTRY_CAUTION : null,
    hazardCautions: cautionsFor(hazardKinds),
    createdAt: compartment.createdAt.toISOString(),
    updatedAt: compartment.updatedAt.toISOString(),
    version: compartment.version,
    abilities: {
      update: can(viewer.role, 'compartment', 'update'),
      delete: can(viewer.role, 'compartment', 'delete'),
      editHazards: can(viewer.role, 'hazard', 'update'),
    },
  };
}
