/** Invented donors of the demo (first names and family names made up; no real person). */
export const DEMO_DONOR_FIRST = ['Mara', 'Tobin', 'Ilse', 'Corwin', 'Anneke', 'Dov', 'Rosalind', 'Emeric', 'Sunniva', 'Ptolemy', 'Wren', 'Odile', 'Gaspard', 'Linnea', 'Barnaby', 'Yusra', 'Ferrand', 'Hollis', 'Ottoline', 'Jerome', 'Calla', 'Evander', 'Maren', 'Quill', 'Thessaly', 'Brannock', 'Ines', 'Alder', 'Perpetua', 'Ruan'];
export const DEMO_DONOR_LAST = ['Quillfeather', 'Harrowgate', 'Penhallow', 'Marchbank', 'Tolliver', 'Ashgrove', 'Bellwether', 'Crane-Oakes', 'Dunmarrow', 'Fennimore'];
/** Cents, chosen as people give: round sums, some odd ones. */
export const DEMO_AMOUNTS = [2500, 5000, 10_000, 2500, 25_000, 5000, 1500, 7500, 10_000, 50_000, 2000, 3500, 5000, 12_000, 25_000, 100_000];

export interface DemoAppeal {
  /** Matches the demo repair project by slug, or by title when its slug differs. */
  slug: string;
  title: string;
  goalCents: number;
  gifts: number;
  story: string[];
}

export const DEMO_APPEALS: DemoAppeal[] = [
  {
    slug: 'gauge-board-glasses',
    title: 'Replace the vandalised gauge glasses',
    goalCents: 1_200_000,
    gifts: 26,
    story: [
      'Last month two glasses of the engine room gauge board were found cracked. The board is one of the first things visitors see when they come down the ladder, and it still reads as the engineers left it.',
      'Your gift pays for period-correct glasses, cut to fit and set by a conservator, and for a clear screen that protects the board without hiding it. The broken fragments are kept with the board’s record.',
    ],
  },
  {
    slug: 'shaft-alley-water',
    title: 'Stop the water in the shaft alley',
    goalCents: 2_200_000,
    gifts: 18,
    story: [
      'After the last storm there were ten centimetres of water in the after end of the shaft alley. Section loss in the shell plating lets the sea in, and the longer it stays the more the steel around it suffers.',
      'The repair cuts out the wasted plate, welds in new steel by a licensed contractor under the site safety plan, and coats the alley again. Gifts to this appeal pay for the steel, the contractor and the coating.',
    ],
  },
];
