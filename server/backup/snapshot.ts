import { Worker } from 'node:worker_threads';

/** The upload folders a database names (media and deck plans keep their files under these keys). */
const REFERENCE_QUERIES = ['SELECT storageKey FROM media', 'SELECT storageKey FROM plans WHERE storageKey IS NOT NULL'];

export interface Snapshot {
  migration: string | null;
  timestamp: number | null;
  referencedKeys: string[];
}

/** Copies the live database to `destination` in a worker thread, so the event loop stays free. */
export function snapshotDatabase(source: string, destination: string): Promise<Snapshot> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./snapshot-worker.mjs', import.meta.url), { workerData: { source, destination, referenceQueries: REFERENCE_QUERIES } });
    let result: Snapshot | null = null;
    let failure: Error | null = null;
    worker.on('message', (message: Snapshot) => (result = message));
    worker.on('error', (err) => (failure = err));
    worker.on('exit', (code) => {
      if (result) resolve(result);
      else reject(failure ?? new Error(`The database copy stopped (exit code ${code}).`));
    });
  });
}
