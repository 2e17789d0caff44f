import { existsSync } from 'node:fs';
import { mkdir, readdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Config } from '../config.js';
import { sha256File } from '../storage/hash-file.js';
import { appVersion } from '../version.js';
import { copyWithHash, listFiles } from './copy-files.js';
import { DATABASE_FILE, freeName, listBackups, MANIFEST_FILE, UPLOADS_FOLDER, type BackupManifest, type FileEntry } from './manifest.js';
import { snapshotDatabase } from './snapshot.js';
import { readStatus, writeStatus, type BackupSuccess } from './status.js';

export type BackupConfig = Pick<Config, 'dataDir' | 'databasePath' | 'uploadsDir' | 'backupDir' | 'backupKeep'>;

/** A folder still being written is left alone this long before retention takes it for abandoned. */
const ABANDONED_AFTER_MS = 24 * 3_600_000;

/**
 * Takes a backup while the app runs: the database first (SQLite online backup, a consistent
 * snapshot), then the uploaded files. Files are moved into the store whole and only then named by
 * a row, so every file a row of the snapshot names is already in place when the copy starts; a
 * folder removed before it was copied (its row deleted after the snapshot) is listed as missing.
 * The backup is written under a temporary name and renamed when complete.
 */
export async function takeBackup(config: BackupConfig, now = new Date()): Promise<BackupSuccess> {
  const started = Date.now();
  if (!existsSync(config.databasePath)) throw new Error(`There is no database at ${config.databasePath} to back up.`);
  await mkdir(config.backupDir, { recursive: true }).catch((err: Error) => {
    throw new Error(`The backup folder ${config.backupDir} cannot be written (${err.message}).`);
  });
  const { name, work } = await claimName(config.backupDir, now);
  const final = path.join(config.backupDir, name);
  try {
    const dbFile = path.join(work, DATABASE_FILE);
    const snapshot = await snapshotDatabase(config.databasePath, dbFile);
    if (!snapshot.migration || snapshot.timestamp === null) throw new Error('The database records no migrations; it is not a Shipkeeper database.');
    const database: FileEntry = { path: DATABASE_FILE, size: (await stat(dbFile)).size, sha256: await sha256File(dbFile) };

    const files: FileEntry[] = [];
    for (const relative of await listFiles(config.uploadsDir)) {
      try {
        const copied = await copyWithHash(path.join(config.uploadsDir, relative), path.join(work, UPLOADS_FOLDER, ...relative.split('/')));
        files.push({ path: relative, ...copied });
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err; // removed since it was listed
      }
    }
    const copied = new Set(files.flatMap((f) => f.path.split('/').map((_, i, parts) => parts.slice(0, i + 1).join('/'))));
    const missing = snapshot.referencedKeys.filter((key) => !copied.has(key)).sort();

    const manifest: BackupManifest = {
      format: 1,
      createdAt: now.toISOString(),
      appVersion,
      schema: { migration: snapshot.migration, timestamp: snapshot.timestamp },
      database,
      files,
      missing,
    };
    await writeFile(path.join(work, MANIFEST_FILE), JSON.stringify(manifest, null, 2));
    await rename(work, final);
    await prune(config.backupDir, config.backupKeep);
    return {
      at: manifest.createdAt,
      name,
      path: final,
      sizeBytes: database.size + files.reduce((sum, f) => sum + f.size, 0),
      fileCount: files.length,
      missingFiles: missing.length,
      durationMs: Date.now() - started,
    };
  } catch (err) {
    await rm(work, { recursive: true, force: true });
    throw err;
  }
}

/** A free name and its work folder, created; another process may take the same name at the same moment. */
async function claimName(dir: string, now: Date): Promise<{ name: string; work: string }> {
  for (let attempt = 0; ; attempt++) {
    const name = await freeName(dir, now);
    const work = path.join(dir, `.${name}.partial`);
    try {
      await mkdir(work);
      return { name, work };
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EEXIST' || attempt >= 5) throw err;
    }
  }
}

/** Removes the oldest backups beyond `keep`, and folders of backups abandoned mid-way. */
export async function prune(dir: string, keep: number): Promise<string[]> {
  const backups = await listBackups(dir);
  const removed = backups.slice(0, Math.max(0, backups.length - keep));
  for (const name of removed) await rm(path.join(dir, name), { recursive: true, force: true });
  for (const entry of await readdir(dir)) {
    if (!/^\.shipkeeper-.*\.partial$/.test(entry)) continue;
    const info = await stat(path.join(dir, entry)).catch(() => null);
    if (info && Date.now() - info.mtimeMs > ABANDONED_AFTER_MS) await rm(path.join(dir, entry), { recursive: true, force: true });
  }
  return removed;
}

/** Takes a backup and records its outcome in the status file the admin's settings page reads. */
export async function backUpAndRecord(config: BackupConfig): Promise<BackupSuccess> {
  try {
    const success = await takeBackup(config);
    await writeStatus(config.dataDir, { lastSuccess: success, lastFailure: null });
    return success;
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    const previous = await readStatus(config.dataDir);
    await writeStatus(config.dataDir, { ...previous, lastFailure: { at: new Date().toISOString(), message } }).catch(() => undefined);
    throw err;
  }
}
