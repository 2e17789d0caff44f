import { readFile, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';

export interface BackupSuccess {
  at: string;
  name: string;
  path: string;
  sizeBytes: number;
  fileCount: number;
  missingFiles: number;
  durationMs: number;
}

export interface BackupFailure {
  at: string;
  message: string;
}

/** The outcome of the latest backups, shared by the server and `npm run backup`. */
export interface BackupStatusFile {
  lastSuccess: BackupSuccess | null;
  /** The latest failure since the last success (a success clears it). */
  lastFailure: BackupFailure | null;
}

/** Kept in DATA_DIR rather than BACKUP_DIR, so that a backup folder that cannot be written can still be reported. */
export function statusFile(dataDir: string): string {
  return path.join(dataDir, 'backup-status.json');
}

export async function readStatus(dataDir: string): Promise<BackupStatusFile> {
  try {
    const parsed = JSON.parse(await readFile(statusFile(dataDir), 'utf8')) as Partial<BackupStatusFile>;
    return { lastSuccess: parsed.lastSuccess ?? null, lastFailure: parsed.lastFailure ?? null };
  } catch {
    return { lastSuccess: null, lastFailure: null };
  }
}

export async function writeStatus(dataDir: string, status: BackupStatusFile): Promise<void> {
  const file = statusFile(dataDir);
  const temp = `${file}.${process.pid}.tmp`;
  await writeFile(temp, JSON.stringify(status, null, 2));
  await rename(temp, file);
}
