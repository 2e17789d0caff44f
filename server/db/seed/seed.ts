import type { DataSource } from 'typeorm';
import { hashPassword } from '../../auth/password-hash.js';
import { Store } from '../store.js';
import { DEMO_ORGANISATION, DEMO_PASSWORD, DEMO_USERS, DEMO_VESSELS } from './demo-data.js';

export class SeedRefused extends Error {}

/** Seeds the demo scenario into an empty database. Returns false when there was data already. */
export async function seedDemo(dataSource: DataSource, options: { bcryptCost: number }): Promise<boolean> {
  if (process.env.NODE_ENV === 'production') throw new SeedRefused('The demo seed does not run when NODE_ENV=production.');
  const store = new Store(dataSource);
  if ((await store.repos.users.count()) > 0) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD, options.bcryptCost);
  await store.transaction(async (repos) => {
    const settings = await repos.settings.get();
    Object.assign(settings, DEMO_ORGANISATION);
    await repos.settings.save(settings);
    for (const user of DEMO_USERS) await repos.users.create({ ...user, passwordHash });
    for (const vessel of DEMO_VESSELS) await repos.vessels.create(vessel);
  });
  return true;
}

/** Empties every table the app writes (for `npm run seed`, which starts the demo over). */
export async function clearData(dataSource: DataSource): Promise<void> {
  if (process.env.NODE_ENV === 'production') throw new SeedRefused('Refusing to clear data when NODE_ENV=production.');
  await dataSource.transaction(async (manager) => {
    for (const entity of [...dataSource.entityMetadatas].reverse()) {
      await manager.createQueryBuilder().delete().from(entity.target).execute();
    }
  });
}
