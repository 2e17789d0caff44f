// `npm run backup`: a backup of DATA_DIR's database and UPLOADS_DIR into BACKUP_DIR, safe while the server runs.
import { backUpAndRecord } from '../server/backup/backup.js';
import { loadConfig } from '../server/config.js';

const config = loadConfig();
try {
  const done = await backUpAndRecord(config);
  console.log(`Backup ${done.name} written to ${done.path}: the database and ${done.fileCount} files, ${(done.sizeBytes / 1024 / 1024).toFixed(1)} MB in ${(done.durationMs / 1000).toFixed(1)} s.`);
  if (done.missingFiles) console.warn(`${done.missingFiles} upload folders the database names were removed before they could be copied (see "missing" in its manifest.json).`);
} catch (err) {
  console.error(`Backup failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
}
