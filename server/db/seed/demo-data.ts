import type { Role } from '../../../shared/roles.js';

/** The demo scenario: an invented steamship at an invented museum pier. Demo only. */
export const DEMO_PASSWORD = 'brass-gauge-harbour-lamp';

export const DEMO_ORGANISATION = {
  organisationName: 'Halbrook Maritime Heritage Trust',
  country: 'US',
  currency: 'USD',
  unitSystem: 'us-customary' as const,
  contactEmail: 'office@shipkeeper.test',
};

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@shipkeeper.test', name: 'Rosalind Okafor-Vey', role: 'admin' },
  { email: 'curator@shipkeeper.test', name: 'Tomasz Ellery', role: 'curator' },
  { email: 'conservator@shipkeeper.test', name: 'Ingrid Palomares', role: 'conservator' },
  { email: 'docent@shipkeeper.test', name: 'Walt Dunmore', role: 'docent' },
  { email: 'fundraiser@shipkeeper.test', name: 'Priya Castellane', role: 'fundraiser' },
];

export const DEMO_VESSELS = [
  {
    name: 'SS Tessaly Ardmore',
    vesselType: 'Coastal passenger steamer, triple-expansion engine',
    builtYear: 1924,
    berth: 'Pier 7, Fennick Quay, Port Halbrook',
    summary:
      'A coal-fired, later oil-fired, coastal passenger steamer that carried mail and passengers between the islands for forty years. Her engine room, boiler room, evaporator flat and steering gear survive almost complete and are the heart of the museum.',
    designationScheme: 'us-navy-1949' as const,
  },
  {
    name: 'Steam tug Brannock',
    vesselType: 'Harbour tug, compound engine',
    builtYear: 1911,
    berth: 'Pier 7 inner berth, Fennick Quay, Port Halbrook',
    summary: 'A small riveted harbour tug that worked the Halbrook roads until 1968; open for guided visits on weekends.',
    designationScheme: 'free-text' as const,
  },
];
