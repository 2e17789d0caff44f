import { Foundation1796204951114 } from './1796204951114-Foundation.js';

/** Every migration, oldest first; run at start by openDatabase(). */
export const migrations = [Foundation1796204951114];
