import type { Compartment } from '@shared/schemas/compartments';

/** A compartment as the API returns it, with only the parts a test cares about changed. */
export function compartmentFixture(overrides: Partial<Compartment> = {}): Compartment {
  return {
    id: 1,
    vesselId: 1,
    deckId: 1,
    deckName: 'Main deck',
    designation: '1-50-0-L',
    designationExplanation: null,
    designationWarnings: [],
    name: 'Crew berthing',
    description: '',
    accessStatus: 'open',
    virtualVisit: false,
    outline: null,
    floorArea: null,
    perimeter: null,
    hazardKinds: [],
    entryCaution: null,
    hazardCautions: [],
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
    version: 1,
    abilities: { update: false, delete: false, editHazards: false },
    ...overrides,
  };
}
