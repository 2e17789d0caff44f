import type { DataSource } from 'typeorm';

/** The database's journal mode and pending migrations, for the health check. */
export async function databaseState(dataSource: DataSource): Promise<{ journalMode: string; pendingMigrations: boolean }> {
  let journalMode = dataSource.options.type;
  if (dataSource.options.type === 'better-sqlite3') {
    const [row] = (await dataSource.query('PRAGMA journal_mode')) as { journal_mode: string }[];
    journalMode = row?.journal_mode as typeof journalMode;
  } else {
    await dataSource.query('SELECT 1');
  }
  return { journalMode: String(journalMode), pendingMigrations: await dataSource.showMigrations() };
}
