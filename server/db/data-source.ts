import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { entities } from './entities/index.js';
import { migrations } from './migrations/index.js';
import { SettingsRepository } from './repositories/settings.repository.js';

export function createDataSource(databasePath: string): DataSource {
  return new DataSource({
    type: 'better-sqlite3',
    database: databasePath,
    entities,
    migrations,
    migrationsTransactionMode: 'each',
    enableWAL: true,
    timeout: 5000, // busy timeout in milliseconds
    synchronize: false,
    logging: ['error'],
  });
}

/** Opens the database and brings its schema up to date. */
export async function openDatabase(databasePath: string): Promise<DataSource> {
  const dataSource = createDataSource(databasePath);
  await dataSource.initialize();
  await dataSource.runMigrations();
  await new SettingsRepository(dataSource.manager).ensure();
  return dataSource;
}
