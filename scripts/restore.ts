// `npm run restore -- <backup>`: replaces DATA_DIR's database and UPLOADS_DIR with a backup, the server stopped.
// <backup> is a backup folder, or the name of one in BACKUP_DIR. Without it, lists the backups kept.
import { listBackups } from '../server/backup/manifest.js';
import { restoreBackup, RestoreRefused } from '../server/backup/restore.js';
import { loadConfig } from '../server/config.js';

const config = loadConfig();
const source = process.argv[2];
if (!source) {
  const names = (await listBackups(config.backupDir)).reverse();
  console.log(names.length ? `Backups in ${config.backupDir}, newest first:\n${names.map((n) => `  ${n}`).join('\n')}` : `No backups in ${config.backupDir}.`);
  console.log('Restore one with: npm run restore -- <name or folder>');
  process.exit(names.length ? 0 : 1);
}
try {
  const done = await restoreBackup(config, source);
  console.log(`Restored ${done.backup} (taken ${done.createdAt}): the database and ${done.fileCount} files.`);
  if (done.setAside.database) console.log(`The database it replaced is kept in ${done.setAside.database}.`);
  if (done.setAside.uploads) console.log(`The uploads it replaced are kept in ${done.setAside.uploads}.`);
  console.log('Start the server; it brings the schema up to date if the backup is older.');
} catch (err) {
  console.error(err instanceof RestoreRefused ? `Not restored: ${err.message}` : `Restore failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
}
