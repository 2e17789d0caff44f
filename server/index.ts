import { loadConfig } from './config.js';
import { createApp } from './app.js';
import { openDatabase } from './db/data-source.js';
import { seedDemo } from './db/seed/seed.js';
import { seedDemoPlans } from './db/seed/seed-plans.js';
import { seedDemoCollection } from './db/seed/seed-collection.js';
import { seedDemoCondition } from './db/seed/seed-condition.js';
import { seedDemoRepairs } from './db/seed/seed-repairs.js';
import { seedDemoGiving } from './db/seed/seed-giving.js';
import { seedDemoInterpretation } from './db/seed/seed-interpretation.js';
import { seedDemoTours } from './db/seed/seed-tours.js';
import { DEMO_PASSWORD, DEMO_USERS } from './db/seed/demo-data.js';
import { FakeMailServer } from './fakes/mail-server.js';
import { FakeStripeServer } from './fakes/stripe/server.js';
import { createStripeClient } from './payments/stripe-client.js';

const config = loadConfig();
if (config.secureCookies && !config.trustProxy) {
  console.warn('Warning: cookies are Secure (PUBLIC_URL is https) but TRUST_PROXY is off. Behind a TLS-terminating proxy, set TRUST_PROXY=true or nobody can sign in.');
}
const dataSource = await openDatabase(config.databasePath);

let fakeMail: FakeMailServer | null = null;
if (!config.mail.host) {
  fakeMail = new FakeMailServer();
  try {
    await fakeMail.start(config.fakeMailPort);
  } catch {
    await fakeMail.start(0); // the usual port is taken: any free one will do, the app knows which
  }
  console.log(`Local fake mail server on 127.0.0.1:${fakeMail.port} (no SMTP_HOST set); messages appear in the Outbox.`);
}

let fakeStripe: FakeStripeServer | null = null;
if (!config.stripe.secretKey) {
  fakeStripe = new FakeStripeServer();
  const port = await fakeStripe.start(config.stripe.fakePort);
  console.log(`Local fake of the Stripe API on 127.0.0.1:${port} (no STRIPE_SECRET_KEY set); test key sk_test_shipkeeper_local.`);
}

if (config.seedOnStart && (await seedDemo(dataSource, { bcryptCost: config.bcryptCost }))) {
  await seedDemoPlans(dataSource, config);
  await seedDemoCollection(dataSource, config);
  await seedDemoCondition(dataSource, config);
  await seedDemoRepairs(dataSource, config);
  // after the repair projects' demo: it appeals for the fundraising ones
  await seedDemoGiving(dataSource);
  await seedDemoInterpretation(dataSource, config);
  await seedDemoTours(dataSource, config);
  console.log(`Demo data seeded. Sign in as ${DEMO_USERS.map((u) => u.email).join(', ')} with the password "${DEMO_PASSWORD}".`);
}

const stripe = createStripeClient(config.stripe, fakeStripe?.port ?? config.stripe.fakePort);
const shipkeeper = createApp({ config, dataSource, fakeMail, stripe });
await shipkeeper.files.ensure();
await shipkeeper.plans.recoverInterrupted();
shipkeeper.backups.schedule();
const server = shipkeeper.app.listen(config.port, config.host, () => {
  console.log(`Shipkeeper is running at ${config.publicUrl}`);
  if (fakeStripe) {
    // The fake signs and posts its events to our endpoint, retrying with backoff until it answers 2xx.
    fakeStripe.setWebhookUrl(`http://127.0.0.1:${config.port}/api/v1/webhooks/stripe`);
  }
  console.log(`Daily backup at ${String(config.backupHour).padStart(2, '0')}:00 server time into ${config.backupDir} (keeping ${config.backupKeep}).`);
});

async function shutdown() {
  server.close();
  shipkeeper.close();
  await fakeMail?.stop();
  await fakeStripe?.stop();
  await dataSource.destroy();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown());
process.on('SIGTERM', () => void shutdown());
