import { existsSync } from 'node:fs';
import Database from 'better-sqlite3';

/**
 * Whether another connection has the database open: the running server (which keeps its
 * connection for its whole life), a backup in progress, a seed. In WAL mode every connection holds
 * a shared lock on the `-shm` file while open, so an exclusive lock cannot be had while one does.
 * Unlike a pid file, this leaves nothing stale after `kill -9` and works across containers that
 * share the data folder (not on network file systems without working locks).
 */
export function databaseInUse(file: string): boolean {
  if (!existsSync(file)) return false;
  const db = new Database(file, { fileMustExist: true, timeout: 0 });
  try {
    db.pragma('locking_mode = EXCLUSIVE');
    db.exec('BEGIN EXCLUSIVE');
    db.exec('COMMIT');
    return false;
  } catch (err) {
    if ((err as { code?: string }).code === 'SQLITE_BUSY') return true;
    throw err;
  } finally {
    db.close();
  }
}
