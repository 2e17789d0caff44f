// `npm run seed`: starts the demo data over in DATA_DIR's database.
import { loadConfig } from '../../config.js';
import { openDatabase } from '../data-source.js';
import { clearData, seedDemo } from './seed.js';
import { seedDemoPlans } from './seed-plans.js';
import { seedDemoCollection } from './seed-collection.js';
import { seedDemoCondition } from './seed-condition.js';
import { seedDemoRepairs } from './seed-repairs.js';
import { seedDemoGiving } from './seed-giving.js';
import { seedDemoInterpretation } from './seed-interpretation.js';
import { seedDemoTours } from './seed-tours.js';
import { FileStore } from '../../storage/file-store.js';

const config = loadConfig();
try {
  const dataSource = await openDatabase(config.databasePath);
  await clearData(dataSource);
  await new FileStore(config.uploadsDir).remove('plans');
  await new FileStore(config.uploadsDir).remove('media');
  await seedDemo(dataSource, { bcryptCost: config.bcryptCost });
  await seedDemoPlans(dataSource, config);
  await seedDemoCollection(dataSource, config);
  await seedDemoCondition(dataSource, config);
  await seedDemoRepairs(dataSource, config);
  // after the repair projects' demo: it appeals for the fundraising ones
  await seedDemoGiving(dataSource);
  await seedDemoInterpretation(dataSource, config);
  await seedDemoTours(dataSource, config);
  await dataSource.destroy();
  console.log(`Demo data written to ${config.databasePath}.`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
}
