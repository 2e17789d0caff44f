import type { AccessStatus } from '../../../shared/schemas/compartments.js';
import type { HazardKind } from '../../../shared/schemas/hazards.js';

/** Decks and compartments of the invented demo steamship. Demo only. */
export const DEMO_DECKS: { name: string; levelCode: string }[] = [
  { name: 'Boat deck', levelCode: '01' },
  { name: 'Main deck', levelCode: '1' },
  { name: 'Second deck', levelCode: '2' },
  { name: 'Lower deck', levelCode: '3' },
];

export interface DemoCompartment {
  deck: string;
  /** Foremost and aftmost frame, and where it lies across the ship; drawn on the demo plans. */
  frames: [number, number];
  side: 'centre' | 'starboard' | 'port' | 'narrow';
  designation: string;
  name: string;
  description: string;
  accessStatus: AccessStatus;
  virtualVisit?: boolean;
  hazards?: { kind: HazardKind; notes: string; checkedDaysAgo?: number }[];
}

export const DEMO_COMPARTMENTS: DemoCompartment[] = [
  { deck: 'Boat deck', designation: '01-48-0-C', frames: [44, 54], side: 'centre', name: 'Wheelhouse', description: 'Steering wheel, engine-order telegraphs and voice pipes to the engine room.', accessStatus: 'open' },
  { deck: 'Main deck', designation: '1-20-0-L', frames: [20, 40], side: 'centre', name: 'Forward saloon', description: 'Panelled first-class saloon, now the museum’s welcome room.', accessStatus: 'open' },
  { deck: 'Main deck', designation: '1-45-1-Q', frames: [45, 52], side: 'starboard', name: 'Purser’s office', description: 'Ticket window and mail room.', accessStatus: 'open' },
  {
    deck: 'Second deck',
    designation: '2-40-0-E', frames: [40, 60], side: 'centre',
    name: 'Boiler room',
    description: 'Two single-ended Scotch boilers, converted from coal to oil firing.',
    accessStatus: 'guided-only',
    hazards: [
      { kind: 'asbestos', notes: 'Lagging on the main steam line and boiler fronts; encapsulated, labelled, not to be disturbed.', checkedDaysAgo: 40 },
      { kind: 'low-headroom', notes: 'Beams at 5 ft 9 in between the boilers.', checkedDaysAgo: 40 },
    ],
  },
  {
    deck: 'Second deck',
    designation: '2-62-0-E', frames: [62, 82], side: 'centre',
    name: 'Engine room',
    description: 'Triple-expansion engine, main condenser, air and circulating pumps.',
    accessStatus: 'guided-only',
    virtualVisit: true,
    hazards: [
      { kind: 'steep-ladder', notes: 'Two flights of steel ladder from the upper grating; handrails both sides.', checkedDaysAgo: 12 },
      { kind: 'lead-paint', notes: 'Original paint on the engine columns tested positive; no sanding or scraping.', checkedDaysAgo: 200 },
    ],
  },
  {
    deck: 'Second deck',
    designation: '2-84-2-E', frames: [84, 96], side: 'port',
    name: 'Evaporator flat',
    description: 'Evaporator and distiller that made boiler feed water from sea water.',
    accessStatus: 'staff-only',
    virtualVisit: true,
    hazards: [{ kind: 'asbestos', notes: 'Evaporator shell lagging, partly damaged; area roped off pending a licensed survey.', checkedDaysAgo: 75 }],
  },
  {
    deck: 'Second deck',
    designation: '2-84-1-E', frames: [84, 96], side: 'starboard',
    name: 'Dynamo flat',
    description: 'Two steam-driven dynamos and the main switchboard.',
    accessStatus: 'staff-only',
    hazards: [{ kind: 'electrical', notes: 'Switchboard isolated; museum lighting circuits run through the flat.', checkedDaysAgo: 30 }],
  },
  { deck: 'Second deck', designation: '2-118-0-E', frames: [118, 132], side: 'centre', name: 'Steering gear room', description: 'Steam steering engine and quadrant.', accessStatus: 'guided-only', hazards: [{ kind: 'steep-ladder', notes: 'Vertical ladder through the hatch.' }] },
  { deck: 'Second deck', designation: '2-20-0-A', frames: [8, 20], side: 'narrow', name: 'Forepeak store', description: 'Rope, paint and bosun’s stores.', accessStatus: 'staff-only', hazards: [{ kind: 'trip-hazard', notes: 'Raised coamings and ring bolts.' }] },
  {
    deck: 'Lower deck',
    designation: '3-96-0-E', frames: [96, 118], side: 'narrow',
    name: 'Shaft alley',
    description: 'Propeller shaft, plummer blocks and thrust block.',
    accessStatus: 'staff-only',
    virtualVisit: true,
    hazards: [{ kind: 'low-headroom', notes: 'About 6 ft clear along the walkway.', checkedDaysAgo: 60 }],
  },
  {
    deck: 'Lower deck',
    designation: '3-70-0-W', frames: [70, 80], side: 'centre',
    name: 'Feed water tank',
    description: 'Reserve feed water tank under the engine room.',
    accessStatus: 'sealed',
    hazards: [{ kind: 'confined-space', notes: 'One manhole, no ventilation. Entry only under the site’s confined-space permit.', checkedDaysAgo: 90 }],
  },
  {
    deck: 'Lower deck',
    designation: '3-52-1-F', frames: [52, 60], side: 'starboard',
    name: 'Starboard bunker',
    description: 'Former coal bunker, later an oil tank; cleaned and sealed.',
    accessStatus: 'sealed',
    hazards: [{ kind: 'confined-space', notes: 'Gas-free certificate required before any entry.', checkedDaysAgo: 120 }],
  },
  { deck: 'Lower deck', designation: '3-30-0-AA', frames: [24, 40], side: 'centre', name: 'Forward cargo hold', description: 'Mail and cargo hold; sealed after a break-in.', accessStatus: 'sealed', hazards: [{ kind: 'trip-hazard', notes: 'Uneven ceiling boards.' }] },
];
