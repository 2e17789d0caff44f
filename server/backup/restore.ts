import { existsSync } from 'node:fs';
import { mkdir, readdir, rename, rm, rmdir, stat } from 'node:fs/promises';
import path from 'node:path';
import Database from 'better-sqlite3';
import type { Config } from '../config.js';
import { migrations } from '../db/migrations/index.js';
import { appVersion } from '../version.js';
import { copyWithHash } from './copy-files.js';
import { databaseInUse } from './database-in-use.js';
import { pathBelow, readManifest, stampOf, UPLOADS_FOLDER, type BackupManifest, type FileEntry } from './manifest.js';

export type RestoreConfig = Pick<Config, 'dataDir' | 'databasePath' | 'uploadsDir' | 'backupDir'>;

/** A restore that was not started; nothing in DATA_DIR or UPLOADS_DIR was changed. */
export class RestoreRefused extends Error {}

export interface RestoreResult {
  backup: string;
  createdAt: string;
  fileCount: number;
  /** Where the database and the uploads that were replaced were moved (null when there were none). */
  setAside: { database: string | null; uploads: string | null };
}

const SIDE_FILES = ['', '-wal', '-shm', '-journal'];

function timestampOf(migration: string): number {
  return Number(/(\d{13})$/.exec(migration)?.[1] ?? NaN);
}

/** Refuses a schema this code does not know: a newer one cannot be migrated down. */
export function checkSchema(schema: BackupManifest['schema'], backupVersion: string): void {
  const known = migrations.map((m) => m.name);
  if (known.includes(schema.migration)) return;
  const latest = known.at(-1) ?? 'none';
  if (schema.timestamp > timestampOf(latest)) {
    throw new RestoreRefused(
      `This backup is from a newer Shipkeeper (version ${backupVersion}, schema ${schema.migration}); this one (version ${appVersion}) knows the schema up to ${latest}. Update Shipkeeper, then restore.`,
    );
  }
  throw new RestoreRefused(`This backup's schema ${schema.migration} is not one this Shipkeeper knows. Restore it with the version that took it (${backupVersion}).`);
}

function refuseIfInUse(databasePath: string) {
  if (databaseInUse(databasePath)) {
    throw new RestoreRefused(`The database ${databasePath} is open in another program, most likely the running Shipkeeper server (or a backup in progress). Stop it, then restore.`);
  }
}

function inside(root: string, relative: string): string {
  try {
    return pathBelow(root, relative);
  } catch {
    throw new RestoreRefused(`The backup is damaged: its manifest names a file outside it (${relative}). Nothing was changed.`);
  }
}

async function stageFile(from: string, to: string, expected: FileEntry) {
  if (!existsSync(from)) throw new RestoreRefused(`The backup is damaged: ${expected.path} is missing. Nothing was changed.`);
  const copied = await copyWithHash(from, to);
  if (copied.size !== expected.size || copied.sha256 !== expected.sha256) {
    throw new RestoreRefused(`The backup is damaged: ${expected.path} does not match the checksum in its manifest. Nothing was changed.`);
  }
}

/** The staged database opens, passes SQLite's quick check and has the schema its manifest says. */
function checkStagedDatabase(file: string, schema: BackupManifest['schema']) {
  let db: Database.Database | null = null;
  try {
    db = new Database(file, { readonly: true, fileMustExist: true });
    const check = db.pragma('quick_check', { simple: true });
    const last = db.prepare('SELECT name FROM migrations ORDER BY timestamp DESC, id DESC LIMIT 1').pluck().get();
    if (check !== 'ok' || last !== schema.migration) throw new Error(String(check));
  } catch {
    throw new RestoreRefused('The backup is damaged: its database does not open as the schema its manifest names. Nothing was changed.');
  } finally {
    db?.close();
  }
}

async function resolveBackup(source: string, backupDir: string): Promise<string> {
  for (const candidate of [path.resolve(source), path.resolve(backupDir, source)]) {
    if ((await stat(candidate).catch(() => null))?.isDirectory()) return candidate;
  }
  throw new RestoreRefused(`There is no backup at ${source} (nor in ${backupDir}).`);
}

/**
 * Restores a backup into DATA_DIR and UPLOADS_DIR while the server is stopped. It checks the
 * manifest's schema, that nothing has the database open, then copies every file into a staging
 * place verifying its checksum; only when all of it matches does it move the current database and
 * uploads aside (kept, in case) and the staged ones into place, each a rename.
 */
export async function restoreBackup(config: RestoreConfig, source: string): Promise<RestoreResult> {
  const folder = await resolveBackup(source, config.backupDir);
  let manifest: BackupManifest;
  try {
    manifest = await readManifest(folder);
  } catch {
    throw new RestoreRefused(`${folder} is not a Shipkeeper backup, or its manifest.json is damaged.`);
  }
  checkSchema(manifest.schema, manifest.appVersion);
  refuseIfInUse(config.databasePath);

  const stamp = stampOf(new Date());
  await mkdir(config.dataDir, { recursive: true });
  await mkdir(config.uploadsDir, { recursive: true });
  const stagedDb = path.join(config.dataDir, `.restore-${stamp}.sqlite`);
  const stagedUploads = path.join(config.uploadsDir, `.restore-${stamp}`);
  try {
    await stageFile(inside(folder, manifest.database.path), stagedDb, manifest.database);
    checkStagedDatabase(stagedDb, manifest.schema);
    await mkdir(stagedUploads);
    for (const file of manifest.files) await stageFile(inside(path.join(folder, UPLOADS_FOLDER), file.path), inside(stagedUploads, file.path), file);
    refuseIfInUse(config.databasePath); // again: a server may have started while we copied
  } catch (err) {
    await rm(stagedDb, { force: true });
    await rm(stagedUploads, { recursive: true, force: true });
    throw err;
  }

  // The swap: renames only, within DATA_DIR and within UPLOADS_DIR (which may be a mount point).
  let databaseAside: string | null = path.join(config.dataDir, `pre-restore-${stamp}`);
  const present = SIDE_FILES.map((suffix) => config.databasePath + suffix).filter((f) => existsSync(f));
  if (present.length) {
    await mkdir(databaseAside, { recursive: true });
    for (const file of present) await rename(file, path.join(databaseAside, path.basename(file)));
  } else databaseAside = null;
  await rename(stagedDb, config.databasePath);

  let uploadsAside: string | null = path.join(config.uploadsDir, `.pre-restore-${stamp}`);
  const current = (await readdir(config.uploadsDir)).filter((name) => !name.startsWith('.'));
  if (current.length) {
    await mkdir(uploadsAside);
    for (const name of current) await rename(path.join(config.uploadsDir, name), path.join(uploadsAside, name));
  } else uploadsAside = null;
  for (const name of await readdir(stagedUploads)) await rename(path.join(stagedUploads, name), path.join(config.uploadsDir, name));
  await rmdir(stagedUploads);

  return { backup: path.basename(folder), createdAt: manifest.createdAt, fileCount: manifest.files.length, setAside: { database: databaseAside, uploads: uploadsAside } };
}
