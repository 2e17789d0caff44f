import type { DataSource } from 'typeorm';

/**
 * One writer at a time. better-sqlite3 gives TypeORM a single connection, so an open transaction
 * would otherwise swallow other requests' writes (and roll them back with its own).
 */
class WriteLock {
  private tail: Promise<unknown> = Promise.resolve();

  run<T>(work: () => Promise<T>): Promise<T> {
    const result = this.tail.then(work, work);
    this.tail = result.catch(() => undefined);
    return result;
  }
}

const locks = new WeakMap<DataSource, WriteLock>();

export function writeLock(dataSource: DataSource): WriteLock {
  let lock = locks.get(dataSource);
  if (!lock) locks.set(dataSource, (lock = new WriteLock()));
  return lock;
}
