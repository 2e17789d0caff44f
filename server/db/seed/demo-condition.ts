import type { Severity } from '../../../shared/calc/condition-grade.js';
import type { RustDistribution } from '../../../shared/calc/rust-grade.js';
import type { Agent, DamageType } from '../../../shared/schemas/condition.js';
import type { IncidentKind } from '../../../shared/schemas/incidents.js';

export interface DemoFinding {
  agent: Agent;
  damageType: DamageType;
  severity: Severity;
  extent?: number;
  rust?: [number, RustDistribution];
  description: string;
  action: string;
  urgency?: 'routine' | 'within-a-year' | 'within-a-month' | 'immediate';
  /** Object number of an artifact in the surveyed compartment. */
  artifact?: string;
}

export interface DemoReport {
  /** Compartment designation, or object number of an artifact. */
  subject: string;
  daysAgo: number;
  summary: string;
  findings: DemoFinding[];
  temperature?: number;
  humidity?: number;
  /** Left as a draft. */
  draft?: boolean;
  /** Amended afterwards: the finding at index 0 gets this severity in revision 2. */
  amendTo?: Severity;
}

/** Invented surveys of the demo ship over four years, so histories and comparisons have something to show. */
export const DEMO_REPORTS: DemoReport[] = [
  { subject: '2-40-0-E', daysAgo: 1300, temperature: 14, humidity: 71, summary: 'First full survey of the boiler room after the ship came to the trust.', findings: [{ agent: 'incorrect-relative-humidity', damageType: 'coating-failure', severity: 'moderate', extent: 20, rust: [0.8, 'S'], description: 'Spot rusting on the boiler casings and floor plates.', action: 'Wire-brush, prime and overcoat the worst areas.', urgency: 'within-a-year' }] },
  { subject: '2-40-0-E', daysAgo: 930, temperature: 12, humidity: 78, summary: 'Rusting has spread after a wet winter; lagging damaged at the port boiler front.', findings: [{ agent: 'incorrect-relative-humidity', damageType: 'coating-failure', severity: 'severe', extent: 35, rust: [8, 'G'], description: 'General rusting of the casings and the ladder.', action: 'Blast and repaint the casings; dehumidify over winter.', urgency: 'within-a-month' }, { agent: 'physical-forces', damageType: 'lagging-damage', severity: 'moderate', extent: 5, description: 'Lagging cracked on the main steam line. Presumed asbestos-containing: do not disturb.', action: 'Licensed abatement contractor to encapsulate.', urgency: 'within-a-month' }] },
  { subject: '2-40-0-E', daysAgo: 200, temperature: 13, humidity: 62, summary: 'After repainting and a dehumidifier: rusting much reduced.', findings: [{ agent: 'incorrect-relative-humidity', damageType: 'coating-failure', severity: 'slight', extent: 6, rust: [0.2, 'P'], description: 'Pinpoint rusting at plate edges.', action: 'Touch up at the next routine care.', urgency: 'routine' }, { agent: 'physical-forces', damageType: 'lagging-damage', severity: 'moderate', extent: 5, description: 'Encapsulated lagging holding; keep under watch.', action: 'Check every six months.', urgency: 'within-a-year' }] },
  { subject: '2-62-0-E', daysAgo: 880, humidity: 68, summary: 'Engine room in good order; bright work tarnished.', findings: [{ agent: 'pollutants', damageType: 'salt-or-dirt-deposits', severity: 'slight', extent: 4, description: 'Salt bloom on the brass of the gauge board.', action: 'Clean with a mild solvent; no polish on lacquered brass.', artifact: '1998.1.2' }] },
  { subject: '2-62-0-E', daysAgo: 120, humidity: 74, summary: 'Leak from the skylight over the starting platform.', findings: [{ agent: 'water', damageType: 'water-staining', severity: 'moderate', extent: 8, description: 'Water staining and fresh rust under the skylight.', action: 'Reseal the skylight; dry and treat the plates.', urgency: 'within-a-month' }, { agent: 'incorrect-relative-humidity', damageType: 'coating-failure', severity: 'moderate', extent: 12, rust: [2, 'G'], description: 'Coating breaking down on the condenser feet.', action: 'Prime and overcoat.' }], amendTo: 'severe' },
  { subject: '3-96-0-E', daysAgo: 400, temperature: 9, humidity: 88, summary: 'Shaft alley wet; heavy corrosion at the stern tube.', findings: [{ agent: 'water', damageType: 'section-loss', severity: 'critical', extent: 3, description: 'Section loss on a shell frame near the stern tube; thickness not yet measured.', action: 'Ultrasonic thickness survey and naval architect’s advice before anyone enters the aft end.', urgency: 'immediate' }] },
  { subject: '2-118-0-E', daysAgo: 60, humidity: 80, summary: 'Steering gear room: condensation on the deckhead.', findings: [{ agent: 'incorrect-relative-humidity', damageType: 'coating-failure', severity: 'moderate', extent: 25, rust: [5, 'H'], description: 'Hybrid rusting of the deckhead.', action: 'Ventilate; treat and repaint.' }, { agent: 'incorrect-relative-humidity', damageType: 'biological-growth', severity: 'moderate', extent: 2, description: 'Mould on the timber duckboards.', action: 'Remove and dry the duckboards.' }, { agent: 'physical-forces', damageType: 'loose-or-detached', severity: 'moderate', description: 'Quadrant guard loose.', action: 'Refix the guard.' }] },
  { subject: '1-20-0-L', daysAgo: 300, humidity: 55, summary: 'Saloon panelling and furniture in good condition.', findings: [{ agent: 'light-uv-ir', damageType: 'fading', severity: 'slight', extent: 10, description: 'Fading of the leather on the chairs by the windows.', action: 'Fit UV film to the saloon windows.', artifact: '2003.1.1' }] },
  { subject: '1998.1.2', daysAgo: 30, summary: 'Gauge board inspected after two glasses were found cracked.', findings: [{ agent: 'thieves-and-vandals', damageType: 'broken-glass-or-dial', severity: 'severe', description: 'Two gauge glasses cracked.', action: 'Replace the glasses with period-correct ones; keep the fragments.', urgency: 'within-a-month' }] },
  { subject: '01-48-0-C', daysAgo: 10, draft: true, summary: 'Wheelhouse survey in progress.', findings: [{ agent: 'light-uv-ir', damageType: 'fading', severity: 'slight', extent: 15, description: 'Varnish on the wheel weathered.', action: 'Revarnish in spring.' }] },
];

export interface DemoIncident {
  kind: IncidentKind;
  title: string;
  daysAgo: number;
  description: string;
  artifacts: string[];
  compartments: string[];
  close: string[];
  /** Why the closed spaces are closed, for visitors. */
  publicNote: string;
  severity: Severity;
  reportedTo: string;
  policeReference: string;
  actions: string;
}

export const DEMO_INCIDENTS: DemoIncident[] = [
  {
    kind: 'vandalism',
    title: 'Clock glass smashed and graffiti in the purser’s office',
    daysAgo: 21,
    description: 'Found at opening: the glass of the bulkhead clock broken, initials cut into the ticket counter.',
    artifacts: ['2003.1.3'],
    compartments: ['1-45-1-Q'],
    close: ['1-45-1-Q'],
    publicNote: 'Closed while the office’s clock and counter are repaired.',
    severity: 'severe',
    reportedTo: 'Harbour security; the police',
    policeReference: 'DEMO-2026-0412',
    actions: 'Office closed to visitors; fragments bagged and kept; camera footage requested.',
  },
  {
    kind: 'water-ingress',
    title: 'Water in the shaft alley after the storm',
    daysAgo: 95,
    description: 'About 10 cm of water in the after end of the shaft alley; bilge pump tripped.',
    artifacts: [],
    compartments: ['3-96-0-E'],
    close: [],
    publicNote: '',
    severity: 'moderate',
    reportedTo: 'Duty engineer',
    policeReference: '',
    actions: 'Pumped out; pump breaker reset; the stern gland to be repacked.',
  },
];

export interface DemoRisk {
  statement: string;
  agent: Agent;
  compartments: string[];
  artifacts?: string[];
  scores: { a?: number; yearsBetween?: number; b?: number; lossPerItemPercent?: number; c?: number; assetFractionPercent?: number };
  status?: 'open' | 'treated';
}

export const DEMO_RISKS: DemoRisk[] = [
  { statement: 'Vandals break gauge glasses in the engine room', agent: 'thieves-and-vandals', compartments: ['2-62-0-E'], artifacts: ['1998.1.2'], scores: { yearsBetween: 3, lossPerItemPercent: 10, assetFractionPercent: 0.3 } },
  { statement: 'Condensation rusts the steering gear room deckhead', agent: 'incorrect-relative-humidity', compartments: ['2-118-0-E'], scores: { a: 5, lossPerItemPercent: 3, assetFractionPercent: 1 } },
  { statement: 'Section loss in the shaft alley lets water into the hull', agent: 'water', compartments: ['3-96-0-E'], scores: { yearsBetween: 30, lossPerItemPercent: 100, assetFractionPercent: 30 } },
  { statement: 'Fire in the galley spreads to the saloon panelling', agent: 'fire', compartments: ['1-20-0-L'], scores: { yearsBetween: 300, lossPerItemPercent: 100, assetFractionPercent: 30 } },
  { statement: 'Sunlight fades the saloon upholstery', agent: 'light-uv-ir', compartments: ['1-20-0-L'], artifacts: ['2003.1.1'], scores: { a: 5, b: 2, assetFractionPercent: 0.3 } },
  { statement: 'Small brass fittings stolen from the wheelhouse', agent: 'thieves-and-vandals', compartments: ['01-48-0-C'], artifacts: ['2001.1.3'], scores: { yearsBetween: 10, lossPerItemPercent: 100, assetFractionPercent: 0.1 } },
  { statement: 'Boiler room lagging disturbed, releasing asbestos fibres', agent: 'physical-forces', compartments: ['2-40-0-E'], scores: { yearsBetween: 30, lossPerItemPercent: 10, assetFractionPercent: 3 } },
  { statement: 'Leaking skylight wets the engine-room plates', agent: 'water', compartments: ['2-62-0-E'], scores: { yearsBetween: 1, lossPerItemPercent: 1, assetFractionPercent: 1 } },
  { statement: 'Rodents nest in the forepeak store', agent: 'pests', compartments: ['2-20-0-A'], scores: { yearsBetween: 3, lossPerItemPercent: 3, assetFractionPercent: 0.1 } },
  { statement: 'Records of the engine overhaul lost in a move', agent: 'dissociation', compartments: [], artifacts: ['2005.1.2'], scores: { yearsBetween: 100, lossPerItemPercent: 30, assetFractionPercent: 1 } },
  { statement: 'Visitors knock valve handwheels on the boiler tour', agent: 'physical-forces', compartments: ['2-40-0-E'], artifacts: ['1998.1.5'], scores: { yearsBetween: 1, lossPerItemPercent: 0.3, assetFractionPercent: 0.3 } },
  { statement: 'Dehumidifier failure in winter', agent: 'incorrect-relative-humidity', compartments: ['2-40-0-E', '2-62-0-E'], scores: { yearsBetween: 10, lossPerItemPercent: 3, assetFractionPercent: 10 }, status: 'treated' },
];
