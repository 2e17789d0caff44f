import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { createApp } from '../../server/app.js';
import { loadConfig, type Config } from '../../server/config.js';
import { openDatabase } from '../../server/db/data-source.js';
import { Store } from '../../server/db/store.js';
import { FakeMailServer } from '../../server/fakes/mail-server.js';
import type { StripeClient } from '../../server/payments/stripe-client.js';

export type TestApp = Awaited<ReturnType<typeof createTestApp>>;

/** The real app on a fresh temporary database (migrations run), with its own fake mail server. */
export async function createTestApp(overrides: Partial<Config> = {}, options: { dataDir?: string; mail?: boolean; stripe?: StripeClient } = {}) {
  const dataDir = options.dataDir ?? mkdtempSync(path.join(tmpdir(), 'shipkeeper-test-'));
  const config = loadConfig(
    { NODE_ENV: 'test' },
    { dataDir, uploadsDir: path.join(dataDir, 'uploads'), sessionSecret: 'test-secret-not-for-production', bcryptCost: 4, clientDir: path.join(dataDir, 'no-client'), ...overrides },
  );
  const dataSource = await openDatabase(config.databasePath);
  const fakeMail = new FakeMailServer();
  if (options.mail !== false) await fakeMail.start(0);
  const shipkeeper = createApp({ config, dataSource, fakeMail, stripe: options.stripe });
  await shipkeeper.files.ensure();
  return {
    ...shipkeeper,
    config,
    dataDir,
    dataSource,
    fakeMail,
    store: new Store(dataSource),
    async close(keepFiles = false) {
      await shipkeeper.plans.idle();
      await shipkeeper.backups.idle();
      shipkeeper.close();
      await fakeMail.stop();
      await dataSource.destroy();
      if (!keepFiles) rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
