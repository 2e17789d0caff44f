import type { TourAccessibility, TourMode } from '../../../shared/schemas/tours.js';

/** A stop of a demo tour: its space by designation, artifacts by object number, paragraphs of invented text. */
export interface DemoStop {
  room: string;
  title: string;
  paragraphs: string[];
  artifacts?: string[];
  /** Put the first photo of the stop's first artifact (with its alt text) after the first paragraph. */
  photo?: boolean;
  /** A boiling-ladder explainer after the text: stage names and pressures. */
  ladder?: { title: string; stages: { name: string; pressure: number; reading: 'psia' | 'psig' | 'inHgVac' }[] };
  dwellMinutes: number;
  accessNotes?: string;
  lookFor?: string;
  virtual?: boolean;
}

export interface DemoTour {
  title: string;
  slug: string;
  summary: string;
  mode: TourMode;
  accessibility: TourAccessibility;
  audience: 'general' | 'families' | 'technical';
  /** published: through review; in-review: submitted, with a curator's comment on a stop. */
  end: 'published' | 'in-review';
  comment?: { stop: number; text: string };
  stops: DemoStop[];
}

// Invented text throughout; the ship, its makers and its people are fictional.
export const DEMO_TOURS: DemoTour[] = [
  {
    title: 'Fire and steam: the boiler and engine rooms',
    slug: 'fire-and-steam',
    summary: 'Down the ladders to the boilers, the engine and the evaporator that made fresh water from the sea.',
    mode: 'on-board',
    accessibility: 'ladders',
    audience: 'general',
    end: 'published',
    stops: [
      {
        room: '2-40-0-E',
        title: 'Where the fires were',
        paragraphs: [
          'Two Scotch boilers filled this space with heat and noise. Three firemen to a watch fed each furnace by hand, a shovel every few seconds.',
          'The water-gauge glass on the boiler front told the watch whether the water stood high enough over the furnace crowns: the one reading that mattered most.',
        ],
        artifacts: ['1998.1.6', '1998.1.7'],
        photo: true,
        dwellMinutes: 6,
        accessNotes: 'Reached by two steel ladders from the main deck. No step-free route; the virtual tour shows this room.',
        lookFor: 'The brass cocks on the gauge glass, polished by a century of hands.',
      },
      {
        room: '2-62-0-E',
        title: 'The triple-expansion engine',
        paragraphs: [
          'Steam used three times: first in the small high-pressure cylinder, then in the middle one, then in the great low-pressure cylinder, growing each time as its pressure fell.',
          'From the starting platform the engineer answered the bridge telegraph with the reversing wheel and the throttle.',
        ],
        artifacts: ['1998.1.1', '1998.1.2', '1998.1.4'],
        photo: true,
        dwellMinutes: 8,
        accessNotes: 'Two flights of ladder down to the starting platform; handrails both sides.',
        lookFor: 'The condenser vacuum gauge: it reads below zero.',
      },
      {
        room: '2-84-2-E',
        title: 'Fresh water from the sea',
        paragraphs: [
          'Boilers need pure water. The evaporator boiled sea water under a vacuum, using spent steam from the engine, so that it boiled far below the heat of a kettle.',
          'The salt stayed behind as scale on the coils; the vapour was condensed and sent to the feed tank.',
        ],
        artifacts: ['1999.1.3'],
        ladder: {
          title: 'The evaporator’s boiling ladder',
          stages: [
            { name: 'Heating coils (exhaust steam)', pressure: 5, reading: 'psig' },
            { name: 'Evaporator shell', pressure: 26, reading: 'inHgVac' },
          ],
        },
        dwellMinutes: 5,
        accessNotes: 'Seen from the grating outside: the flat is roped off while its lagging is surveyed.',
        lookFor: 'The vacuum gauge on the shell.',
        virtual: true,
      },
      {
        room: '2-118-0-E',
        title: 'Steering by steam',
        paragraphs: ['The wheel in the wheelhouse only opened a valve. Down here a small steam engine did the heavy work of turning the rudder quadrant.'],
        dwellMinutes: 4,
        accessNotes: 'A vertical ladder through the hatch; guides go first.',
        lookFor: 'The chains running aft to the quadrant.',
      },
    ],
  },
  {
    title: 'The main deck, step-free',
    slug: 'main-deck-step-free',
    summary: 'The saloon and the purser’s office, all on one level from the gangway.',
    mode: 'on-board',
    accessibility: 'step-free',
    audience: 'families',
    end: 'published',
    stops: [
      {
        room: '1-20-0-L',
        title: 'The forward saloon',
        paragraphs: ['Passengers in their best clothes sat here on the crossing. Count the carved panels: each shows a port the ship called at.'],
        dwellMinutes: 6,
        accessNotes: 'Level from the gangway; a ramp covers the door sill.',
        lookFor: 'The mirrored panel by the stair, with its original glass.',
      },
      {
        room: '1-45-1-Q',
        title: 'Tickets and letters',
        paragraphs: ['The purser sold tickets through this window and sorted the mail bags. Every letter aboard passed through his hands.'],
        dwellMinutes: 4,
        accessNotes: 'Step-free; the window is at wheelchair height on the saloon side.',
        lookFor: 'The brass mail slots, each with a port’s name.',
      },
    ],
  },
  {
    title: 'Spaces closed to visitors',
    slug: 'closed-spaces',
    summary: 'A virtual visit to the tanks, bunkers and holds nobody enters: seen in photographs, never entered.',
    mode: 'virtual',
    accessibility: 'step-free',
    audience: 'technical',
    end: 'published',
    stops: [
      { room: '3-70-0-W', title: 'The feed water tank', paragraphs: ['Clean water for the boilers waited here. The tank is sealed: nobody goes in without a permit and a tested atmosphere.'], dwellMinutes: 3 },
      { room: '3-52-1-F', title: 'A coal bunker', paragraphs: ['Two hundred tons of coal filled this bunker. Trimmers shovelled it towards the stokehold doors as the ship burned it.'], dwellMinutes: 3 },
      { room: '3-96-0-E', title: 'Along the shaft', paragraphs: ['The propeller shaft runs aft through this narrow alley to the stern tube, turning on its bearings.'], dwellMinutes: 3 },
      { room: '3-30-0-AA', title: 'The forward hold', paragraphs: ['Mail and cargo travelled here. The hold has been sealed since a break-in; its hatch stays closed.'], dwellMinutes: 2 },
    ],
  },
  {
    title: 'Below the waterline for young explorers',
    slug: 'young-explorers',
    summary: 'A short family route to the engine room and the steering gear.',
    mode: 'on-board',
    accessibility: 'ladders',
    audience: 'families',
    end: 'in-review',
    comment: { stop: 2, text: 'Lovely. Say how the steering engine knew how far to turn; children always ask.' },
    stops: [
      { room: '2-62-0-E', title: 'The giant engine', paragraphs: ['This engine is as tall as two buses stacked up. It pushed the ship with steam, not petrol.'], artifacts: ['1998.1.1'], dwellMinutes: 6, accessNotes: 'Two flights of ladder; children hold the rail with both hands.' },
      { room: '2-118-0-E', title: 'Who steers the ship?', paragraphs: ['Turning the ship’s wheel made this little steam engine work, and it turned the rudder.'], dwellMinutes: 4 },
    ],
  },
];
