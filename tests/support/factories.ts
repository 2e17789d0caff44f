import type { Role } from '../../shared/roles.js';
import { hashPassword } from '../../server/auth/password-hash.js';
import type { Store } from '../../server/db/store.js';

export const TEST_PASSWORD = 'lantern-rivet-copper-kettle';

let sequence = 0;

export async function buildUser(store: Store, fields: { role?: Role; email?: string; name?: string; password?: string; status?: 'active' | 'deactivated' } = {}) {
  sequence += 1;
  const role = fields.role ?? 'docent';
  const user = await store.repos.users.create({
    email: fields.email ?? `${role}-${sequence}@example.test`,
    name: fields.name ?? `Test ${role} ${sequence}`,
    role,
    passwordHash: await hashPassword(fields.password ?? TEST_PASSWORD, 4),
  });
  if (fields.status === 'deactivated') {
    user.status = 'deactivated';
    await store.repos.users.save(user);
  }
  return user;
}

export async function buildVessel(store: Store, fields: Partial<{ name: string; vesselType: string; builtYear: number | null; designationScheme: 'free-text' | 'us-navy-1949' }> = {}) {
  sequence += 1;
  return store.repos.vessels.create({
    name: fields.name ?? `Test vessel ${sequence}`,
    vesselType: fields.vesselType ?? 'Steam tug',
    builtYear: fields.builtYear ?? 1910,
    berth: 'Test berth',
    summary: '',
    designationScheme: fields.designationScheme ?? 'free-text',
  });
}
