// Used only by the TypeORM command line (npm run migration:generate).
import { createDataSource } from './data-source.js';

export default createDataSource(process.env.MIGRATION_DB ?? './data/shipkeeper.sqlite');
