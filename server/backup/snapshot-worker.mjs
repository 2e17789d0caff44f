// Runs in a worker thread (plain JavaScript, so it loads the same under tsx and the tests):
// copies the database with SQLite's online backup on its own connection, off the main thread.
import { parentPort, workerData } from 'node:worker_threads';
import Database from 'better-sqlite3';

const { source, destination, referenceQueries } = workerData;

const live = new Database(source, { fileMustExist: true, timeout: 10_000 });
try {
  // All pages in one step, so inside one read transaction: a consistent snapshot that the app's
  // writes (WAL mode) neither wait for nor restart. Smaller steps restart whenever a write lands
  // between two of them.
  await live.backup(destination, { progress: () => 0x7fffffff });
} finally {
  live.close();
}

const copy = new Database(destination, { fileMustExist: true });
try {
  // A self-contained file (no -wal beside it); the server turns WAL on again when it opens it.
  copy.pragma('journal_mode = DELETE');
  const check = copy.pragma('quick_check', { simple: true });
  if (check !== 'ok') throw new Error(`The copy of the database failed SQLite's quick check: ${check}`);
  const last = copy.prepare('SELECT name, timestamp FROM migrations ORDER BY timestamp DESC, id DESC LIMIT 1').get();
  const keys = new Set();
  for (const sql of referenceQueries) for (const value of copy.prepare(sql).pluck().all()) if (value) keys.add(String(value));
  parentPort.postMessage({ migration: last?.name ?? null, timestamp: last ? Number(last.timestamp) : null, referencedKeys: [...keys] });
} finally {
  copy.close();
}
