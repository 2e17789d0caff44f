/** Invented donors of the demo (first names and family names made up; no real person). */
export const DEMO_DONOR_FIRST = ['Mara', 'Tobin', 'Ilse', 'Corwin', 'Anneke', 'Dov', 'Rosalind', 'Emeric', 'Sunniva', 'Ptolemy', 'Wren', 'Odile', 'Gaspard', 'Linnea', 'Barnaby', 'Yusra', 'Ferrand', 'Hollis', 'Ottoline', 'Jerome', 'Calla', 'Evander', 'Maren', 'Quill', 'Thessaly', 'Brannock', 'Ines', 'Alder', 'Perpetua', 'Ruan'];
export const DEMO_DONOR_LAST = ['Quillfeather', 'Harrowgate', 'Penhallow', 'Marchbank', 'Tolliver', 'Ashgrove', 'Bellwether', 'Crane-Oakes', 'Dunmarrow', 'Fennimore'];
/** Cents, chosen as people give: round sums, some odd ones. */
export const DEMO_AMOUNTS = [2500, 5000, 10_000, 2500, 25_000, 5000, 1500, 7500, 10_000, 50_000, 2000, 3500, 5000, 12_000, 25_000, 100_000];

export interface DemoAppeal {
  /** The demo repair project (server/db/seed/demo-repairs.ts) it appeals for, by slug. */
  slug: string;
  gifts: number;
  /** Days since the appeal opened (the project's move to fundraising). */
  daysOpen: number;
  story: string[];
  /** The artifact whose demo photo the appeal shows, with alt text if the photo has none. */
  photoOf?: { objectNumber: string; altText: string };
}

export const DEMO_APPEALS: DemoAppeal[] = [
  {
    slug: 'steering-gear-room-deckhead',
    gifts: 24,
    daysOpen: 34,
    story: [
      'Condensation drips from the deckhead of the steering gear room, and the paint has given way to rust over a quarter of it. Below it stands the steam steering engine that turned the rudder, one of the machines visitors ask about most.',
      'Your gift pays for ventilation, for the old coating to be taken off by a licensed contractor under the site safety plan (it may hold lead), and for the deckhead to be treated and painted again.',
    ],
    photoOf: { objectNumber: '1999.2.1', altText: 'The steam steering engine under the deckhead of the steering gear room' },
  },
  {
    slug: 'shaft-alley-water-ingress',
    gifts: 20,
    daysOpen: 69,
    story: [
      'After the last storm there were ten centimetres of water in the after end of the shaft alley. Section loss in the shell plating lets the sea in, and the longer it stays the more the steel around it suffers.',
      'The repair cuts out the wasted plate, welds in new steel by a licensed contractor under the site safety plan, and coats the alley again. Gifts to this appeal pay for the steel, the contractor and the coating.',
    ],
    photoOf: { objectNumber: '2008.1.3', altText: 'The propeller shaft plummer block in the shaft alley' },
  },
];
