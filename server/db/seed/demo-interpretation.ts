import type { Audience } from '../../../shared/schemas/interpretation.js';

/** Invented interpretive text of the demo ship, in plain words for visitors. */
export interface DemoInterpretation {
  /** An artifact's object number, or a compartment's designation. */
  subject: string;
  texts: Partial<Record<Audience, { label?: string[]; story?: string[]; ladder?: boolean }>>;
  /** Open the general story with the artifact's first photo (when it is marked for public use and has alt text). */
  photo?: boolean;
  /** What happens after the docent writes it: published by a curator, left in review, returned, or left a draft. */
  outcome: 'published' | 'in-review' | 'returned' | 'draft' | 'published-then-redrafted';
  returnComment?: string;
  /** A newer draft written after publishing (for 'published-then-redrafted'). */
  redraft?: Partial<Record<Audience, { label?: string[]; story?: string[] }>>;
}

export const DEMO_INTERPRETATIONS: DemoInterpretation[] = [
  {
    subject: '1998.1.1',
    outcome: 'published',
    photo: true,
    texts: {
      general: {
        label: ['This is the engine that drove the ship for sixty years. Steam pushed three pistons in turn, each bigger than the last, and the same steam did the work three times before it was spent.'],
        story: [
          'The steam came from the boilers next door at about 180 pounds on every square inch. It went first into the small cylinder at the front, then into the middle one, then into the big one at the back. Each time it had less push left, so each cylinder had to be wider to do the same work.',
          'Using the steam three times saved coal. A ship that burns less coal can carry more cargo and go further between ports.',
          'The engine still turns. Volunteers move it slowly with an electric motor on open days, so you can watch the rods and cranks at work.',
        ],
      },
      families: {
        label: ['Three big pistons took turns pushing, like three people pedalling one bike. The same puff of steam pushed all three!'],
        story: ['Look for the three tall round covers on top. Under each one a piston went up and down about ninety times a minute. Can you count the cranks that turned the shaft?'],
      },
      technical: {
        label: ['Vertical inverted triple-expansion engine, 1912: high-, intermediate- and low-pressure cylinders on a common crankshaft, piston valve on the high-pressure cylinder and slide valves on the others.'],
        story: ['Expansion in three stages keeps the temperature range in each cylinder small, which cuts the loss from steam condensing on cylinder walls cooled by the stroke before. The low-pressure cylinder exhausts to the condenser, so the last stage works down to a vacuum.'],
      },
    },
  },
  {
    subject: '1998.1.2',
    outcome: 'published',
    texts: {
      general: {
        label: ['Six gauges told the engineer how the whole plant was doing. Boiler steam, the two middle stages, the condenser, the feed water and the oil: one glance, six answers.'],
        story: ['The engineer on watch stood here for four hours at a time. If a needle moved the wrong way, he knew before anything broke. The gauge on the right reads vacuum: below the pressure of the air around you.'],
      },
    },
  },
  {
    subject: '1998.1.3',
    outcome: 'published',
    texts: {
      general: {
        label: ['Orders from the bridge arrived here. A bell rang, the pointer moved to “Half ahead” or “Stop”, and the engineer swung the handle to answer that he had understood.'],
      },
      families: {
        label: ['Ding ding! When the captain wanted to go faster or stop, this dial told the engine room. The engineers rang back to say “Got it!”'],
      },
    },
  },
  {
    subject: '1998.1.6',
    outcome: 'published-then-redrafted',
    texts: {
      general: {
        label: ['This boiler made the steam. Fires burned in three round tubes at the front, and the hot gases passed through many small tubes surrounded by water before going up the funnel.'],
        story: ['A boiler like this held about twenty tons of water. Stokers fed the fires by hand, shovel after shovel, in heat you can hardly imagine today.'],
      },
    },
    redraft: {
      general: {
        label: ['This boiler made the steam. Fires burned in three round furnaces at the front. The hot gases then passed through many small tubes in the water before going up the funnel.'],
        story: ['A boiler like this held about twenty tons of water. Stokers fed the fires by hand, shovel after shovel, in great heat. Look at the furnace doors: the port boiler still has its first ones from 1912.'],
      },
    },
  },
  {
    subject: '1998.1.7',
    outcome: 'published',
    texts: {
      general: {
        label: ['The most watched glass on the ship. The water level in the boiler showed here, and it had to stay in sight. Too low, and the furnace tops could overheat and fail.'],
      },
    },
  },
  {
    subject: '1998.1.8',
    outcome: 'in-review',
    texts: {
      general: {
        label: ['If the steam pressure rose too high, these valves opened by themselves and let steam roar out of a pipe up the funnel. They kept the boiler safe.'],
        story: ['Strong springs hold the valves shut. When the steam pushes harder than the springs, the valves lift. The lever on the side let the engineer lift them by hand to check they were not stuck.'],
      },
      families: { label: ['Whoosh! When the boiler got too full of steam, these valves popped open to let some out, like the lid of a pot of boiling water.'] },
    },
  },
  {
    subject: '1998.2.3',
    outcome: 'published',
    texts: {
      families: {
        label: ['A stoker used this shovel to feed coal into the fires, many tons every day. See how one side of the blade is worn away? That is years of scraping on the same side.'],
      },
    },
  },
  {
    subject: '1999.1.1',
    outcome: 'draft',
    texts: {
      general: { label: ['This pump pushed water into the boilers to replace the water boiled away as steam. It ran on steam itself.'] },
    },
  },
  {
    subject: '1999.1.3',
    outcome: 'published',
    texts: {
      general: {
        label: ['Boilers need pure water, but a ship is surrounded by salt water. This evaporator boiled sea water and kept the steam, leaving the salt behind.'],
        story: ['Steam from the boilers ran through copper coils inside the shell. The sea water around the coils was kept at a lower pressure, so it boiled at a lower temperature. Its steam was then cooled back to fresh water for the boilers.'],
      },
      technical: {
        story: ['A single-effect evaporator: heating steam in the coils, sea water in the shell below atmospheric pressure. The saturation temperatures of the two sides set the temperature difference that drives the heat across the coils.'],
        ladder: true,
      },
    },
  },
  {
    subject: '1999.1.4',
    outcome: 'returned',
    returnComment: 'Good start. Say what the lights were like before 1924 (oil lamps), and what 110 volts means for a visitor. Keep it under 75 words.',
    texts: {
      general: { label: ['This steam engine turned a dynamo that made electricity for the lights of the whole ship from 1924, producing direct current at 110 volts through the main switchboard.'] },
    },
  },
  {
    subject: '2001.1.1',
    outcome: 'published',
    texts: {
      general: { label: ['The helmsman steered the ship from here. The wheel did not move the rudder directly: it sent a signal down to the steering engine at the stern, which did the heavy work.'] },
      families: { label: ['Grab the spokes and imagine steering a ship as long as a football field! A machine at the back helped turn the big rudder.'] },
    },
  },
  {
    subject: '2005.1.1',
    outcome: 'published',
    texts: {
      general: { label: ['Every ship carries its birth certificate. This plate says who built her, the yard number and the year: 1912.'] },
    },
  },
  {
    subject: '2019.4.12',
    outcome: 'published',
    texts: {
      general: { label: ['The red line at 180 marks the highest pressure the boilers were allowed to reach. Inside, a curved tube straightens a little as the pressure rises and moves the needle.'] },
    },
  },
  {
    subject: '2-62-0-E',
    outcome: 'published',
    texts: {
      general: {
        label: ['The engine room: the main engine, the pumps and the gauge board. Engineers and oilers worked here day and night while the ship was at sea.'],
        story: ['It was hot, loud and oily. The men on watch listened to the engine as much as they looked at it: a new knock or a change in rhythm meant something needed care.'],
      },
    },
  },
];
