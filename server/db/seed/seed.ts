import type { DataSource } from 'typeorm';
import { hashPassword } from '../../auth/password-hash.js';
import { SEARCH_TABLE } from '../../search/search-index.js';
import { Store } from '../store.js';
import { DEMO_ORGANISATION, DEMO_PASSWORD, DEMO_USERS, DEMO_VESSELS } from './demo-data.js';
import { DEMO_COMPARTMENTS, DEMO_DECKS } from './demo-ship-map.js';

export class SeedRefused extends Error {}

/** Seeds the demo scenario into an empty database. Returns false when there was data already. */
export async function seedDemo(dataSource: DataSource, options: { bcryptCost: number }): Promise<boolean> {
  if (process.env.NODE_ENV === 'production') throw new SeedRefused('The demo seed does not run when NODE_ENV=production.');
  const store = new Store(dataSource);
  if ((await store.repos.users.count()) > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD, options.bcryptCost);
  await store.transaction(async (repos) => {
    await repos.settings.ensure();
    const settings = await repos.settings.get();
    Object.assign(settings, DEMO_ORGANISATION);
    await repos.settings.save(settings);
    const users = [];
    for (const user of DEMO_USERS) users.push(await repos.users.create({ ...user, passwordHash }));
    const conservator = users.find((u) => u.role === 'conservator')!;
    const vessels = [];
    for (const vessel of DEMO_VESSELS) vessels.push(await repos.vessels.create(vessel));
    const flagship = vessels[0]!;
    const decks = new Map<string, number>();
    for (const [position, deck] of DEMO_DECKS.entries()) decks.set(deck.name, (await repos.decks.create({ vesselId: flagship.id, ...deck, position })).id);
    for (const c of DEMO_COMPARTMENTS) {
      const compartment = await repos.compartments.create({
        vesselId: flagship.id,
        deckId: decks.get(c.deck)!,
        designation: c.designation,
        designationKey: c.designation.toUpperCase(),
        name: c.name,
        description: c.description,
        accessStatus: c.accessStatus,
        virtualVisit: c.virtualVisit ?? false,
        outline: null,
      });
      for (const h of c.hazards ?? []) {
        const checked = h.checkedDaysAgo === undefined ? null : new Date(Date.now() - h.checkedDaysAgo * 86_400_000).toISOString().slice(0, 10);
        await repos.hazards.create({ compartmentId: compartment.id, kind: h.kind, notes: h.notes, lastVerifiedOn: checked, verifiedById: checked ? conservator.id : null });
      }
    }
  });
  return true;
}

/** Empties every table the app writes (for `npm run seed`, which starts the demo over). */
export async function clearData(dataSource: DataSource): Promise<void> {
  if (process.env.NODE_ENV === 'production') throw new SeedRefused('Refusing to clear data when NODE_ENV=production.');
  await dataSource.transaction(async (manager) => {
    // A RESTRICT reference within one table is checked row by row: undo it before emptying the table.
    await manager.query('UPDATE condition_reports SET supersedesId = NULL');
    for (const entity of [...dataSource.entityMetadatas].reverse()) {
      await manager.createQueryBuilder().delete().from(entity.target).execute();
    }
    await manager.query(`DELETE FROM ${SEARCH_TABLE}`);
  });
}
