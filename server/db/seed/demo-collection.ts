import type { ArtifactCategory, ArtifactStatus, DimensionUnit } from '../../../shared/schemas/artifacts.js';

/** A history entry after the artifact was recorded: days after recording, where to and why. */
export interface DemoMove {
  after: number;
  to: string | null;
  status: ArtifactStatus;
  reason: string;
}

export interface DemoArtifact {
  number: string;
  name: string;
  category: ArtifactCategory;
  room: string | null;
  status?: ArtifactStatus;
  /** Placed on the plan (a point in its compartment) unless false. */
  placed?: boolean;
  description: string;
  date?: string;
  maker?: string;
  materials?: string;
  size?: [number | null, number | null, number | null, DimensionUnit];
  significance?: string;
  /** Days before today the record was made. */
  recordedDaysAgo: number;
  moves?: DemoMove[];
  /** Draw a photo of this kind for it. */
  photo?: 'gauge' | 'wheel' | 'machine' | 'paper' | 'plate' | 'lamp';
  deaccessionReason?: string;
}

/** The invented collection of the demo ship: makers, places and people are fictional. */
export const DEMO_ARTIFACTS: DemoArtifact[] = [
  { number: '1998.1.1', name: 'Triple-expansion main engine', category: 'propulsion', room: '2-62-0-E', description: 'Three-cylinder vertical inverted triple-expansion engine driving the single screw; high-, intermediate- and low-pressure cylinders with piston and slide valves.', date: '1912', maker: 'Vennick Bros. Engine Works', materials: 'Cast iron; steel; bronze bearings', size: [6.1, 7.4, 3.2, 'm'], significance: 'The ship’s original engine, complete and turnable by hand; the heart of the engine-room tour.', recordedDaysAgo: 3200, photo: 'machine' },
  { number: '1998.1.2', name: 'Engine-room gauge board', category: 'instruments-and-gauges', room: '2-62-0-E', description: 'Board of six pressure and vacuum gauges: boiler, high-pressure receiver, intermediate receiver, condenser vacuum, feed and lubricating oil.', date: 'c. 1912', maker: 'Oskel & Brine', materials: 'Brass; glass; painted steel board', size: [90, 140, 15, 'cm'], significance: 'Shows the engineer’s view of the plant at a glance; used in the tour to explain expansion.', recordedDaysAgo: 3200, photo: 'gauge' },
  { number: '1998.1.3', name: 'Engine-order telegraph (engine-room receiver)', category: 'instruments-and-gauges', room: '2-62-0-E', description: 'Receiving telegraph with dial and reply handle, chained to the bridge transmitter.', date: '1912', maker: 'Teague-Olwen Signal Co.', materials: 'Brass; enamel dial', size: [120, 45, 40, 'cm'], recordedDaysAgo: 3180, photo: 'gauge' },
  { number: '1998.1.4', name: 'Starting platform reversing wheel', category: 'propulsion', room: '2-62-0-E', description: 'Handwheel of the steam reversing gear at the starting platform.', materials: 'Cast iron; brass rim', size: [75, 75, 12, 'cm'], recordedDaysAgo: 3180, photo: 'wheel' },
  { number: '1998.1.5', name: 'Main stop valve', category: 'valves-and-fittings', room: '2-40-0-E', description: 'Screw-down main steam stop valve on the boiler crown with its handwheel and extended spindle.', materials: 'Cast steel; bronze seat', size: [60, 45, 45, 'cm'], recordedDaysAgo: 3100, photo: 'wheel' },
  { number: '1998.1.6', name: 'Scotch marine boiler (port)', category: 'boilers-and-steam', room: '2-40-0-E', description: 'Cylindrical fire-tube boiler with three corrugated furnaces; coal-fired, later converted to oil and back again for display.', date: '1912', maker: 'Vennick Bros. Engine Works', materials: 'Steel plate; riveted', size: [4.3, 3.6, 3.2, 'm'], significance: 'One of two boilers; the port boiler keeps its original furnace fronts.', recordedDaysAgo: 3100, photo: 'machine' },
  { number: '1998.1.7', name: 'Water-gauge glass and cocks', category: 'boilers-and-steam', room: '2-40-0-E', description: 'Gauge glass with steam, water and drain cocks on the boiler front.', materials: 'Bronze; glass', size: [45, 12, 10, 'cm'], recordedDaysAgo: 3000, photo: 'gauge' },
  { number: '1998.1.8', name: 'Spring-loaded safety valve', category: 'valves-and-fittings', room: '2-40-0-E', description: 'Twin spring-loaded safety valve chest with easing gear.', materials: 'Cast iron; steel springs', recordedDaysAgo: 3000 },
  { number: '1998.2.1', name: 'Slice bar', category: 'tools', room: '2-40-0-E', description: 'Long firing tool for breaking clinker on the grate.', materials: 'Wrought iron', size: [3.1, null, null, 'm'], recordedDaysAgo: 2900, moves: [{ after: 400, to: '2-20-0-A', status: 'in-store', reason: 'Taken off display: visitors could reach it from the gangway' }] },
  { number: '1998.2.2', name: 'Fire rake', category: 'tools', room: '2-40-0-E', description: 'Rake for levelling the fire.', materials: 'Wrought iron', recordedDaysAgo: 2900 },
  { number: '1998.2.3', name: 'Coal shovel', category: 'tools', room: '2-40-0-E', description: 'Stoker’s shovel, blade worn thin on one side.', materials: 'Steel; ash handle', recordedDaysAgo: 2900, photo: 'plate' },
  { number: '1999.1.1', name: 'Duplex feed pump', category: 'pumps-and-piping', room: '2-62-0-E', description: 'Vertical duplex direct-acting steam pump feeding the boilers from the hot well.', maker: 'Lumbrey Pump Co.', materials: 'Cast iron; bronze liners', size: [1.6, 0.9, 0.7, 'm'], recordedDaysAgo: 2700, photo: 'machine' },
  { number: '1999.1.2', name: 'Bilge and ballast pump', category: 'pumps-and-piping', room: '2-62-0-E', description: 'Simplex steam pump serving the bilge and ballast manifolds.', maker: 'Lumbrey Pump Co.', recordedDaysAgo: 2700 },
  { number: '1999.1.3', name: 'Evaporator', category: 'auxiliary-machinery', room: '2-84-2-E', description: 'Single-effect evaporator making boiler make-up water from sea water.', materials: 'Steel shell; copper coils', recordedDaysAgo: 2650 },
  { number: '1999.1.4', name: 'Steam dynamo set', category: 'electrical', room: '2-84-1-E', description: 'Single-cylinder enclosed steam engine coupled to a 110 V direct-current dynamo.', date: '1924', maker: 'Pellandine Electric', materials: 'Cast iron; copper windings', size: [1.4, 2.2, 0.8, 'm'], significance: 'Replaced the first oil-lamp lighting in 1924; the refit is recorded in the ship’s papers.', recordedDaysAgo: 2650, photo: 'machine' },
  { number: '1999.1.5', name: 'Main switchboard', category: 'electrical', room: '2-84-1-E', description: 'Slate switchboard with knife switches, fuses, ammeter and voltmeter.', materials: 'Slate; brass; copper', recordedDaysAgo: 2600, photo: 'gauge' },
  { number: '1999.2.1', name: 'Steam steering engine', category: 'auxiliary-machinery', room: '2-118-0-E', description: 'Twin-cylinder steering engine with telemotor control and quadrant.', maker: 'Teague-Olwen Signal Co.', recordedDaysAgo: 2500, photo: 'machine' },
  { number: '1999.2.2', name: 'Rudder angle indicator', category: 'instruments-and-gauges', room: '2-118-0-E', description: 'Dial showing rudder angle port and starboard.', materials: 'Brass; glass', recordedDaysAgo: 2500, status: 'missing', moves: [{ after: 2300, to: '2-118-0-E', status: 'missing', reason: 'Not found at the annual inventory; bracket screws cut' }] },
  { number: '2001.1.1', name: 'Ship’s wheel', category: 'propulsion', room: '01-48-0-C', description: 'Eight-spoke teak steering wheel on a cast pedestal.', materials: 'Teak; brass hub', size: [1.2, 1.2, 0.4, 'm'], recordedDaysAgo: 2200, photo: 'wheel' },
  { number: '2001.1.2', name: 'Engine-order telegraph (bridge transmitter)', category: 'instruments-and-gauges', room: '01-48-0-C', description: 'Bridge telegraph; its chains run down to the engine room.', maker: 'Teague-Olwen Signal Co.', materials: 'Brass; enamel', recordedDaysAgo: 2200, photo: 'gauge' },
  { number: '2001.1.3', name: 'Voice pipe mouthpiece', category: 'valves-and-fittings', room: '01-48-0-C', description: 'Whistle-capped mouthpiece of the voice pipe to the engine room.', materials: 'Brass', recordedDaysAgo: 2200 },
  { number: '2001.1.4', name: 'Binnacle', category: 'instruments-and-gauges', room: '01-48-0-C', description: 'Binnacle with compass bowl and corrector spheres.', materials: 'Brass; cast iron spheres', recordedDaysAgo: 2150, status: 'on-loan', moves: [{ after: 1800, to: null, status: 'on-loan', reason: 'Lent to the Saltreach Maritime Gallery for its navigation exhibition (loan agreement L-2024-03)' }] },
  { number: '2003.1.1', name: 'Saloon armchair', category: 'furnishings', room: '1-20-0-L', description: 'One of six upholstered oak armchairs from the forward saloon.', materials: 'Oak; leather', size: [95, 60, 58, 'cm'], recordedDaysAgo: 1900, photo: 'plate' },
  { number: '2003.1.2', name: 'Saloon ceiling lamp', category: 'furnishings', room: '1-20-0-L', description: 'Gimballed ceiling lamp converted to electric light.', materials: 'Brass; glass', recordedDaysAgo: 1900, photo: 'lamp' },
  { number: '2003.1.3', name: 'Bulkhead clock', category: 'instruments-and-gauges', room: '1-45-1-Q', description: 'Eight-day bulkhead clock from the purser’s office.', materials: 'Brass case; enamel dial', recordedDaysAgo: 1850, moves: [{ after: 300, to: null, status: 'in-store', reason: 'Sent to the conservation workshop ashore for cleaning' }, { after: 420, to: '1-45-1-Q', status: 'in-place', reason: 'Back from the workshop; rehung on its original screws' }] },
  { number: '2005.1.1', name: 'Builder’s plate', category: 'documents-and-signage', room: '1-20-0-L', description: 'Cast plate giving the builder, yard number and year.', date: '1912', materials: 'Cast brass', size: [30, 45, 2, 'cm'], significance: 'Primary evidence of the ship’s build; cast text reads “Vennick Bros., Yard No. 211, 1912”.', recordedDaysAgo: 1600, photo: 'plate' },
  { number: '2005.1.2', name: 'Engine-room log book, 1931', category: 'documents-and-signage', room: null, status: 'in-store', placed: false, description: 'Watch-by-watch log of revolutions, steam pressure and coal burnt for the 1931 season.', date: '1931', materials: 'Paper; cloth binding', recordedDaysAgo: 1600, photo: 'paper' },
  { number: '2005.1.3', name: 'Boiler-room notice: “Keep the water in sight”', category: 'documents-and-signage', room: '2-40-0-E', description: 'Painted instruction board above the boiler fronts.', materials: 'Painted wood', recordedDaysAgo: 1500, photo: 'paper' },
  { number: '2008.1.1', name: 'Oil can', category: 'tools', room: '2-62-0-E', description: 'Long-spouted engine-room oil can.', materials: 'Tinned steel; brass spout', recordedDaysAgo: 1200, photo: 'lamp' },
  { number: '2008.1.2', name: 'Set of open-ended spanners', category: 'tools', room: null, status: 'in-store', placed: false, description: 'Twelve spanners from the engineers’ tool rack, sizes stamped in inches.', materials: 'Forged steel', recordedDaysAgo: 1200 },
  { number: '2008.1.3', name: 'Propeller shaft plummer block', category: 'propulsion', room: '3-96-0-E', description: 'Shaft bearing in the shaft alley with its oil cups.', materials: 'Cast iron; white-metal bearing', recordedDaysAgo: 1100, photo: 'machine' },
  { number: '2008.1.4', name: 'Stern tube gland', category: 'propulsion', room: '3-96-0-E', description: 'Packed gland where the shaft leaves the hull.', materials: 'Bronze', recordedDaysAgo: 1100 },
  { number: '2010.1.1', name: 'Feed water filter', category: 'pumps-and-piping', room: '3-70-0-W', description: 'Twin-basket filter on the feed line.', materials: 'Cast iron', recordedDaysAgo: 900 },
  { number: '2012.1.1', name: 'Portable ventilation fan', category: 'auxiliary-machinery', room: null, status: 'deaccessioned', placed: false, description: 'Electric blower of the 1960s, not original to the ship.', materials: 'Steel; aluminium', recordedDaysAgo: 800, deaccessionReason: 'Not original to the ship and beyond repair; disposed of by board decision 2024-07' },
  { number: '2015.1.1', name: 'Ring bolt', category: 'valves-and-fittings', room: '2-20-0-A', description: 'Deck ring bolt from the forepeak.', materials: 'Wrought iron', recordedDaysAgo: 500 },
  { number: '2019.4.12', name: 'Boiler pressure gauge', category: 'instruments-and-gauges', room: '2-40-0-E', description: 'Bourdon-tube steam gauge reading to 200 psi, red line at 180.', maker: 'Oskel & Brine', materials: 'Brass case; glass; enamel dial', size: [25, 25, 10, 'cm'], significance: 'The working pressure of the boilers can be read from its red line.', recordedDaysAgo: 200, photo: 'gauge' },
];
