import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import { z } from 'zod';

/** A backup is a folder `shipkeeper-YYYYMMDDTHHMMSSZ` (a `-2` suffix when two start in one second). */
export const MANIFEST_FILE = 'manifest.json';
export const DATABASE_FILE = 'shipkeeper.sqlite';
export const UPLOADS_FOLDER = 'uploads';
const NAME = /^shipkeeper-(\d{8}T\d{6}Z)(?:-(\d+))?$/;

const sha256 = z.string().regex(/^[0-9a-f]{64}$/);
const fileEntry = z.object({ path: z.string().min(1), size: z.number().int().min(0), sha256 });

export const backupManifest = z.object({
  format: z.literal(1),
  createdAt: z.iso.datetime(),
  appVersion: z.string(),
  /** The last migration the database had run: restore refuses a schema newer than the code's. */
  schema: z.object({ migration: z.string().min(1), timestamp: z.number().int() }),
  database: fileEntry,
  files: z.array(fileEntry),
  /** Upload folders the database names that were removed before they could be copied. */
  missing: z.array(z.string()),
});
export type BackupManifest = z.infer<typeof backupManifest>;
export type FileEntry = z.infer<typeof fileEntry>;

export function stampOf(date: Date): string {
  return date.toISOString().replace(/\.\d{3}Z$/, 'Z').replace(/[-:]/g, '');
}

/** When a backup of that name was started, from its name; null for other names. */
export function createdAtOfName(name: string): string | null {
  const m = NAME.exec(name);
  if (!m?.[1]) return null;
  const s = m[1];
  return `${s.slice(0, 4)}-${s.slice(4, 6)}-${s.slice(6, 8)}T${s.slice(9, 11)}:${s.slice(11, 13)}:${s.slice(13, 15)}Z`;
}

function order(name: string): [string, number] {
  const m = NAME.exec(name);
  return [m?.[1] ?? '', Number(m?.[2] ?? 1)];
}

/** The complete backups in a folder, oldest first (folders still being written have other names). */
export async function listBackups(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { withFileTypes: true }).catch(() => []);
  return entries
    .filter((e) => e.isDirectory() && NAME.test(e.name))
    .map((e) => e.name)
    .sort((a, b) => {
      const [sa, na] = order(a);
      const [sb, nb] = order(b);
      return sa === sb ? na - nb : sa < sb ? -1 : 1;
    });
}

/** A name for a backup started at `date` that no folder in `dir` has yet. */
export async function freeName(dir: string, date: Date): Promise<string> {
  const taken = new Set(await readdir(dir).catch(() => []));
  const base = `shipkeeper-${stampOf(date)}`;
  let name = base;
  for (let n = 2; taken.has(name) || taken.has(`.${name}.partial`); n++) name = `${base}-${n}`;
  return name;
}

export async function readManifest(folder: string): Promise<BackupManifest> {
  const raw = JSON.parse(await readFile(path.join(folder, MANIFEST_FILE), 'utf8')) as unknown;
  return backupManifest.parse(raw);
}

/** A manifest path as a path below `root`; refuses one that would leave it. */
export function pathBelow(root: string, relative: string): string {
  const resolved = path.resolve(root, ...relative.split('/'));
  if (path.isAbsolute(relative) || !resolved.startsWith(root + path.sep)) throw new Error(`Path outside the backup: ${relative}`);
  return resolved;
}
