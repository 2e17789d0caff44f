import { Foundation1796204951114 } from './1796204951114-Foundation.js';
import { ShipMap1796208163044 } from './1796208163044-ShipMap.js';

/** Every migration, oldest first; run at start by openDatabase(). */
export const migrations = [Foundation1796204951114, ShipMap1796208163044];
