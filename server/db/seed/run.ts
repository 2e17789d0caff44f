// `npm run seed`: starts the demo data over in DATA_DIR's database.
import { loadConfig } from '../../config.js';
import { openDatabase } from '../data-source.js';
import { clearData, seedDemo } from './seed.js';

const config = loadConfig();
try {
  const dataSource = await openDatabase(config.databasePath);
  await clearData(dataSource);
  await seedDemo(dataSource, { bcryptCost: config.bcryptCost });
  await dataSource.destroy();
  console.log(`Demo data written to ${config.databasePath}.`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
}
