import type { RepairProjectStatus } from '../../../shared/schemas/repair-projects.js';

export interface DemoRepair {
  title: string;
  slug: string;
  scope: string[];
  /** Compartment designation of the surveyed subject, or object number of an artifact. */
  findingsOf: string;
  /** Descriptions of the findings of that subject's latest report that the project addresses. */
  findings: string[];
  risks: string[];
  compartments: string[];
  artifacts: string[];
  /** Quantity in thousandths, unit cost in cents. */
  lines: [description: string, quantityMilli: number, unit: string, unitCostCents: number][];
  contingencyBasisPoints: number;
  contractorNotes: string;
  permitNotes: string;
  hotWork?: boolean;
  asbestos?: boolean;
  leadPaint?: boolean;
  /** Each step after the proposal, days ago, by role, with a note. */
  steps: { to: RepairProjectStatus; daysAgo: number; by: 'curator' | 'conservator'; note?: string }[];
  proposedDaysAgo: number;
}

/** Invented repairs of the demo ship, from its demo findings. */
export const DEMO_REPAIRS: DemoRepair[] = [
  {
    title: 'Steering gear room deckhead',
    slug: 'steering-gear-room-deckhead',
    scope: [
      'Stop the condensation that rusts the deckhead of the steering gear room, then treat and repaint it.',
      'Fit a louvred vent to the hatch coaming and a small extract fan on a humidistat. Test the old coating for lead before any preparation; prepare by wet methods only, prime with a surface-tolerant primer and topcoat to match the existing colour.',
      'Lift, dry and refit the duckboards; refix the quadrant guard.',
    ],
    findingsOf: '2-118-0-E',
    findings: ['Hybrid rusting of the deckhead.', 'Mould on the timber duckboards.'],
    risks: ['Condensation rusts the steering gear room deckhead'],
    compartments: ['2-118-0-E'],
    artifacts: [],
    lines: [
      ['Lead test of the existing coating (three samples, laboratory)', 3_000, 'sample', 4_500],
      ['Surface preparation by wet methods', 18_500, 'm²', 3_250],
      ['Surface-tolerant primer and topcoat', 18_500, 'm²', 2_875],
      ['Louvred vent and humidistat extract fan, fitted', 1_000, 'each', 128_000],
      ['Duckboards lifted, dried and refitted', 6_000, 'h', 5_500],
    ],
    contingencyBasisPoints: 1500,
    contractorNotes: 'Quotes asked from two lead-safe certified painting firms; the fan is fitted by the ship’s volunteer electrician under supervision.',
    permitNotes: 'None for wet preparation. If the lead test is positive, the contractor’s lead-safe work plan is filed before work starts.',
    leadPaint: true,
    steps: [
      { to: 'approved', daysAgo: 40, by: 'curator', note: 'Approved at the trustees’ meeting.' },
      { to: 'fundraising', daysAgo: 35, by: 'curator', note: 'Appeal opened.' },
    ],
    proposedDaysAgo: 50,
  },
  {
    title: 'Gauge board glasses',
    slug: 'gauge-board-glasses',
    scope: [
      'Replace the two gauge glasses broken by vandals on the engine-room gauge board with period-correct bevelled glass, bedded as the originals.',
      'Keep the fragments, bagged and labelled, with the object’s file. Fit a clear guard in front of the board on the tour route.',
    ],
    findingsOf: '1998.1.2',
    findings: ['Two gauge glasses cracked.'],
    risks: ['Vandals break gauge glasses in the engine room'],
    compartments: [],
    artifacts: ['1998.1.2'],
    lines: [
      ['Bevelled gauge glass, cut to size', 2_000, 'each', 8_500],
      ['Conservator’s time: remove bezels, clean, refit', 5_500, 'h', 6_000],
      ['Clear guard in front of the board, fitted', 1_000, 'each', 42_000],
    ],
    contingencyBasisPoints: 1000,
    contractorNotes: 'Glass cut by a local clock and instrument glazier; fitting done in house.',
    permitNotes: 'None needed.',
    steps: [
      { to: 'approved', daysAgo: 27, by: 'curator' },
      { to: 'fundraising', daysAgo: 26, by: 'curator', note: 'Small appeal to visitors of the engine room.' },
      { to: 'funded', daysAgo: 18, by: 'curator' },
      { to: 'underway', daysAgo: 14, by: 'conservator' },
      { to: 'complete', daysAgo: 11, by: 'conservator', note: 'Glasses in; guard fitted.' },
    ],
    proposedDaysAgo: 29,
  },
  {
    title: 'Shaft alley water ingress',
    slug: 'shaft-alley-water-ingress',
    scope: [
      'Stop water entering the hull at the after end of the shaft alley.',
      'Ultrasonic thickness survey of the shell frames and plating around the stern tube; a naval architect’s repair specification from its results; crop and renew the wasted frame and plating by welding; repack the stern tube gland.',
      'Nobody enters the after end until the survey is done.',
    ],
    findingsOf: '3-96-0-E',
    findings: ['Section loss on a shell frame near the stern tube; thickness not yet measured.'],
    risks: ['Section loss in the shaft alley lets water into the hull'],
    compartments: ['3-96-0-E'],
    artifacts: ['2008.1.4'],
    lines: [
      ['Ultrasonic thickness survey and report', 1_000, 'survey', 265_000],
      ['Naval architect’s repair specification', 1_000, 'specification', 380_000],
      ['Crop and renew shell frame and plating (steel, welding, testing)', 2_400, 'm²', 1_150_000],
      ['Repack the stern tube gland', 1_000, 'each', 95_000],
      ['Fire watch during hot work', 24_000, 'h', 4_800],
    ],
    contingencyBasisPoints: 2000,
    contractorNotes: 'Ship repair yard with certified welders; the survey firm is independent of the yard.',
    permitNotes: 'Hot-work permit from the harbour authority; marine chemist’s certificate for the shaft alley before any welding; the yard’s method statement on file.',
    hotWork: true,
    steps: [
      { to: 'approved', daysAgo: 80, by: 'curator', note: 'Approved as the trust’s first priority.' },
      { to: 'fundraising', daysAgo: 70, by: 'curator' },
    ],
    proposedDaysAgo: 90,
  },
];

/** The completed project's treatment, and the survey after it. */
export const DEMO_TREATMENT = {
  project: 'gauge-board-glasses',
  daysAgo: 12,
  method: 'Bezels unscrewed; broken glass removed and bagged; seats cleaned with a soft brush; new bevelled glasses bedded in the original way and bezels refitted. Clear guard fixed to the handrail stanchions, not to the board.',
  materials: 'Two bevelled glasses, 4 mm; microcrystalline wax on the bezel threads',
  followUp: { artifact: '1998.1.2', daysAgo: 5, summary: 'Gauge board checked after the new glasses went in: both sound, the guard in place.' },
};
