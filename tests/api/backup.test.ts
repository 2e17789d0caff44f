import { cpSync, existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, utimesSync, writeFileSync, mkdirSync } from 'node:fs';
import { execFile, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { prune, takeBackup } from '../../server/backup/backup.js';
import { listFiles } from '../../server/backup/copy-files.js';
import { DATABASE_FILE, listBackups, readManifest, UPLOADS_FOLDER, type BackupManifest } from '../../server/backup/manifest.js';
import { restoreBackup, RestoreRefused, type RestoreConfig } from '../../server/backup/restore.js';
import { sha256File } from '../../server/storage/hash-file.js';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { cameraJpeg, tinyPdf } from '../support/images.js';
import { readTables, tableChecksums } from '../support/table-checksums.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

const apps: TestApp[] = [];
const folders: string[] = [];
afterEach(async () => {
  for (const app of apps.splice(0)) await app.close();
  for (const dir of folders.splice(0)) rmSync(dir, { recursive: true, force: true });
});

async function app(...args: Parameters<typeof createTestApp>) {
  const created = await createTestApp(...args);
  apps.push(created);
  return created;
}

function tempDir(): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-restore-'));
  folders.push(dir);
  return dir;
}

/** DATA_DIR and UPLOADS_DIR of a fresh data folder, restoring from the given backup folder. */
function freshTarget(backupDir: string): RestoreConfig {
  const dataDir = tempDir();
  return { dataDir, databasePath: path.join(dataDir, 'shipkeeper.sqlite'), uploadsDir: path.join(dataDir, 'uploads'), backupDir };
}

function upload(client: Client, artifactId: number, content: Buffer, filename: string) {
  return client.agent.post(`/api/v1/media?ownerType=artifact&ownerId=${artifactId}`).set('x-csrf-token', client.csrf).attach('file', content, filename);
}

/** A vessel with a deck, two compartments, artifacts, photos and documents. */
async function collection(ctx: TestApp) {
  const curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  const vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  const place = await deckWithCompartments(ctx.store, curator, vesselId);
  const photo = await cameraJpeg();
  for (let i = 1; i <= 8; i++) {
    const artifact = await addArtifact(curator, vesselId, { objectNumber: `2019.4.${i}`, name: `Gauge ${i}`, compartmentId: place.first });
    const res = await upload(curator, artifact.id, i % 2 ? photo : tinyPdf(), i % 2 ? `gauge-${i}.jpg` : `gauge-${i}.pdf`);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
  }
  return { curator, vesselId, place };
}

function flipByte(file: string, at: number) {
  const bytes = readFileSync(file);
  bytes[at] = bytes[at]! ^ 0xff;
  writeFileSync(file, bytes);
}

describe('backup and restore', () => {
  it('backs up while writes continue; a restore into a fresh data folder has every row and file of the snapshot', async () => {
    const ctx = await app({}, { mail: false });
    const { curator, vesselId, place } = await collection(ctx);
    const before = readTables(ctx.config.databasePath);

    // Writes (artifacts, and documents on some of them) go on before, during and after the backup.
    let stop = false;
    let backingUp = false;
    let writes = 0;
    let writesDuring = 0;
    const writer = (async () => {
      for (let i = 1; !stop; i++) {
        const artifact = await addArtifact(curator, vesselId, { objectNumber: `2021.7.${i}`, name: `Rivet ${i}`, compartmentId: place.second });
        if (i % 3 === 0) expect((await upload(curator, artifact.id, tinyPdf(), `rivet-${i}.pdf`)).status).toBe(201);
        writes += 1;
        if (backingUp) writesDuring += 1;
      }
    })();
    const writesReach = async (n: number) => {
      while (writes < n) await new Promise((r) => setTimeout(r, 5));
    };
    let done: Awaited<ReturnType<typeof takeBackup>>;
    try {
      await writesReach(3);
      backingUp = true;
      done = await takeBackup(ctx.config);
      backingUp = false;
      await writesReach(writes + 3);
    } finally {
      stop = true;
      await writer;
    }
    expect(writesDuring).toBeGreaterThan(0);

    const manifest = await readManifest(done.path);
    expect(manifest.missing).toEqual([]);
    expect(done.fileCount).toBe(manifest.files.length);
    const backupDb = path.join(done.path, DATABASE_FILE);
    expect(manifest.database.sha256).toBe(await sha256File(backupDb));

    const target = freshTarget(ctx.config.backupDir);
    const restored = await restoreBackup(target, done.name);
    expect(restored).toMatchObject({ backup: done.name, fileCount: manifest.files.length, setAside: { database: null, uploads: null } });

    // Row counts and checksums per table: the restored database is the snapshot.
    const restoredSums = tableChecksums(target.databasePath);
    expect(restoredSums).toEqual(tableChecksums(backupDb));
    expect(Object.keys(restoredSums)).toEqual(expect.arrayContaining(['artifacts', 'media', 'audit_events', 'search_documents_content']));

    // Every row written before the backup started is there, unchanged. Rows SQLite or the session
    // store rewrite in place (the sequence counters, session expiry) are compared by key only; the
    // full-text index's segments are merged as documents arrive, so its documents are compared
    // (search_documents_content) and the search is tried on the restored app below.
    const after = readTables(target.databasePath);
    const rewrittenInPlace = ['sqlite_sequence', 'sessions'];
    for (const [table, rows] of before) {
      if (table === 'search_documents_data' || table === 'search_documents_idx') continue;
      const restoredRows = after.get(table)!;
      for (const [key, row] of rows) {
        expect(restoredRows.has(key), `${table} ${key}`).toBe(true);
        if (!rewrittenInPlace.includes(table)) expect(restoredRows.get(key), `${table} ${key}`).toBe(row);
      }
    }
    const live = readTables(ctx.config.databasePath);
    expect(after.get('artifacts')!.size).toBeGreaterThan(before.get('artifacts')!.size);
    expect(after.get('artifacts')!.size).toBeLessThan(live.get('artifacts')!.size);

    // Every file of the manifest, and no other, restored with identical bytes.
    expect(await listFiles(target.uploadsDir)).toEqual(manifest.files.map((f) => f.path).sort());
    for (const file of manifest.files) {
      const restoredFile = path.join(target.uploadsDir, ...file.path.split('/'));
      expect(await sha256File(restoredFile), file.path).toBe(file.sha256);
      expect(await sha256File(path.join(ctx.config.uploadsDir, ...file.path.split('/'))), file.path).toBe(file.sha256);
    }
    // And every photo or document the restored database names has its original, as uploaded.
    const db = new Database(target.databasePath, { readonly: true });
    const media = db.prepare('SELECT storageKey, sha256 FROM media').all() as { storageKey: string; sha256: string }[];
    db.close();
    expect(media.length).toBeGreaterThan(8);
    for (const m of media) {
      const original = manifest.files.find((f) => f.path.startsWith(`${m.storageKey}/original.`));
      expect(original?.sha256, m.storageKey).toBe(m.sha256);
    }

    // The app runs on the restored folder and serves what was backed up.
    const back = await app({}, { dataDir: target.dataDir, mail: false });
    const reader = (await signedInAs(back.app, back.store, 'curator')).client;
    const list = await reader.get(`/api/v1/vessels/${vesselId}/artifacts?pageSize=1`);
    expect(list.body.total).toBe(after.get('artifacts')!.size);
    expect((await reader.get(`/api/v1/vessels/${vesselId}/artifacts?q=gauge`)).body.total).toBe(8);
  });

  it('refuses a backup from a newer schema, a damaged one, and a server that is running, changing nothing', async () => {
    const ctx = await app({}, { mail: false });
    await collection(ctx);
    const done = await takeBackup(ctx.config);
    const manifest = await readManifest(done.path);

    // A target that holds data already: a refusal must leave it as it was.
    const target = freshTarget(ctx.config.backupDir);
    await restoreBackup(target, done.path);
    const targetSum = await sha256File(target.databasePath);
    const targetFiles = await listFiles(target.uploadsDir);

    const tampered = (change: (folder: string, m: BackupManifest) => void) => {
      const folder = path.join(tempDir(), done.name);
      cpSync(done.path, folder, { recursive: true });
      const m = structuredClone(manifest);
      change(folder, m);
      writeFileSync(path.join(folder, 'manifest.json'), JSON.stringify(m));
      return folder;
    };
    const refusal = async (folder: string, databaseOpen = false) => {
      const err = await restoreBackup(target, folder).then(
        () => null,
        (e: unknown) => e,
      );
      expect(err).toBeInstanceOf(RestoreRefused);
      // (An open database changes under the app that has it open; it must still be in place.)
      if (!databaseOpen) expect(await sha256File(target.databasePath)).toBe(targetSum);
      expect(readdirSync(target.dataDir).filter((name) => name !== 'session-secret').sort()).toEqual(databaseOpen ? ['shipkeeper.sqlite', 'shipkeeper.sqlite-shm', 'shipkeeper.sqlite-wal', 'uploads'] : ['shipkeeper.sqlite', 'uploads']);
      expect(await listFiles(target.uploadsDir)).toEqual(targetFiles);
      expect(readdirSync(target.uploadsDir).filter((name) => name.startsWith('.restore') || name.startsWith('.pre-restore'))).toEqual([]);
      return (err as Error).message;
    };

    const newer = tampered((_f, m) => (m.schema = { migration: 'Harbour9999999999999', timestamp: 9999999999999 }));
    expect(await refusal(newer)).toMatch(/^This backup is from a newer Shipkeeper \(version 0\.1\.0, schema Harbour9999999999999\); this one \(version 0\.1\.0\) knows the schema up to [A-Za-z]+\d{13}\. Update Shipkeeper, then restore\.$/);

    const unknown = tampered((_f, m) => (m.schema = { migration: 'Harbour1000000000000', timestamp: 1000000000000 }));
    expect(await refusal(unknown)).toMatch(/schema Harbour1000000000000 is not one this Shipkeeper knows/);

    const flippedDb = tampered((folder) => flipByte(path.join(folder, DATABASE_FILE), 5000));
    expect(await refusal(flippedDb)).toBe('The backup is damaged: shipkeeper.sqlite does not match the checksum in its manifest. Nothing was changed.');

    const first = manifest.files[0]!;
    const flippedFile = tampered((folder) => flipByte(path.join(folder, UPLOADS_FOLDER, ...first.path.split('/')), 10));
    expect(await refusal(flippedFile)).toBe(`The backup is damaged: ${first.path} does not match the checksum in its manifest. Nothing was changed.`);

    const gone = tampered((folder) => rmSync(path.join(folder, UPLOADS_FOLDER, ...first.path.split('/'))));
    expect(await refusal(gone)).toBe(`The backup is damaged: ${first.path} is missing. Nothing was changed.`);

    const escaping = tampered((_f, m) => m.files.push({ ...first, path: '../../outside.txt' }));
    expect(await refusal(escaping)).toMatch(/names a file outside it \(\.\.\/\.\.\/outside\.txt\)/);

    // A manifest that lies about the schema while the checksums hold.
    const lying = tampered((_f, m) => (m.schema = { migration: 'Foundation1796204951114', timestamp: 1796204951114 }));
    expect(await refusal(lying)).toMatch(/its database does not open as the schema its manifest names/);

    const notABackup = tempDir();
    expect(await refusal(notABackup)).toMatch(/is not a Shipkeeper backup/);

    // The running app has the target's database open.
    const running = await app({}, { dataDir: target.dataDir, mail: false });
    expect(await refusal(done.path, true)).toMatch(/^The database .*shipkeeper\.sqlite is open in another program, most likely the running Shipkeeper server/);
    await running.close(true);
    apps.splice(apps.indexOf(running), 1);
    await expect(restoreBackup(target, done.path)).resolves.toMatchObject({ backup: done.name });
  });

  it('keeps BACKUP_KEEP backups, removing the oldest, and clears folders abandoned mid-way', async () => {
    const ctx = await app({ backupKeep: 2 }, { mail: false });
    const abandoned = path.join(ctx.config.backupDir, '.shipkeeper-20200101T000000Z.partial');
    const inProgress = path.join(ctx.config.backupDir, '.shipkeeper-20200101T000001Z.partial');
    mkdirSync(abandoned, { recursive: true });
    mkdirSync(inProgress);
    const old = new Date(Date.now() - 25 * 3_600_000);
    utimesSync(abandoned, old, old);

    const names = [];
    for (let i = 0; i < 3; i++) names.push((await takeBackup(ctx.config)).name);
    expect(new Set(names).size).toBe(3);
    expect(await listBackups(ctx.config.backupDir)).toEqual(names.slice(1));
    expect(existsSync(abandoned)).toBe(false);
    expect(existsSync(inProgress)).toBe(true);
    expect(await prune(ctx.config.backupDir, 1)).toEqual([names[1]]);
  });
});

describe('backups on the admin settings page', () => {
  it('the administrator starts one, sees it running, then its time, size and the backups kept', async () => {
    const ctx = await app({}, { mail: false });
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    const { client: curator } = await signedInAs(ctx.app, ctx.store, 'curator');
    expect((await curator.get('/api/v1/backups')).status).toBe(403);
    expect((await curator.post('/api/v1/backups')).status).toBe(403);

    const empty = await admin.get('/api/v1/backups');
    expect(empty.body).toMatchObject({ directory: ctx.config.backupDir, keep: 14, hour: 3, nextAt: null, runningSince: null, lastSuccess: null, lastFailure: null, backups: [] });

    const started = await admin.post('/api/v1/backups');
    expect(started.status).toBe(202);
    expect(started.body.runningSince).toEqual(expect.any(String));
    const again = await admin.post('/api/v1/backups');
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/^A backup is already running/);
    await ctx.backups.idle();

    const status = (await admin.get('/api/v1/backups')).body;
    const [only] = await listBackups(ctx.config.backupDir);
    const manifest = await readManifest(path.join(ctx.config.backupDir, only!));
    expect(status).toMatchObject({ runningSince: null, lastFailure: null, lastSuccess: { name: only, path: path.join(ctx.config.backupDir, only!), fileCount: 0, missingFiles: 0 } });
    expect(status.lastSuccess.sizeBytes).toBe(manifest.database.size);
    expect(status.backups).toEqual([{ name: only, createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ$/) }]);
  });

  it('shows why a backup failed', async () => {
    const blocked = path.join(tempDir(), 'not-a-folder');
    writeFileSync(blocked, '');
    const ctx = await app({ backupDir: blocked }, { mail: false });
    const { client: admin } = await signedInAs(ctx.app, ctx.store, 'admin');
    expect((await admin.post('/api/v1/backups')).status).toBe(202);
    await ctx.backups.idle();
    const status = (await admin.get('/api/v1/backups')).body;
    expect(status.lastSuccess).toBeNull();
    expect(status.lastFailure.message).toMatch(/^The backup folder .*not-a-folder cannot be written \(EEXIST/);
  });
});

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

describe('npm run backup and npm run restore', () => {
  it('back up a running server from another process; restore refuses until it stops, even after kill -9', { timeout: 90_000 }, async () => {
    const dataDir = tempDir();
    const port = await freePort();
    const env = { ...process.env, NODE_ENV: 'development', HOST: '127.0.0.1', PORT: String(port), DATA_DIR: dataDir, UPLOADS_DIR: path.join(dataDir, 'uploads'), FAKE_SMTP_PORT: '0', SMTP_HOST: '', SEED_ON_START: 'false' };
    const tsx = path.resolve('node_modules/.bin/tsx');
    const script = (name: string, ...args: string[]) =>
      promisify(execFile)(tsx, ['--tsconfig', 'tsconfig.node.json', `scripts/${name}.ts`, ...args], { env }).then(
        ({ stdout }) => ({ code: 0, out: stdout }),
        (err: { code: number; stdout: string; stderr: string }) => ({ code: err.code, out: err.stdout + err.stderr }),
      );

    // Node itself (not the tsx wrapper, which SIGKILL would leave its child running), with tsx's loader.
    const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { env: { ...env, TSX_TSCONFIG_PATH: 'tsconfig.node.json' }, stdio: 'ignore' });
    const exited = new Promise((r) => server.once('exit', r));
    try {
      for (let tries = 0; ; tries++) {
        const up = await fetch(`http://127.0.0.1:${port}/api/v1/health`).then((r) => r.ok, () => false);
        if (up) break;
        if (tries > 240 || server.exitCode !== null) throw new Error('the server did not start');
        await new Promise((r) => setTimeout(r, 250));
      }
      const backup = await script('backup');
      expect(backup.out).toMatch(/^Backup (shipkeeper-\d{8}T\d{6}Z) written to .*: the database and 0 files/);
      const name = /Backup (\S+)/.exec(backup.out)![1]!;

      const refused = await script('restore', name);
      expect(refused.code).toBe(1);
      expect(refused.out).toMatch(/^Not restored: The database .* is open in another program, most likely the running Shipkeeper server/);
    } finally {
      server.kill('SIGKILL');
      await exited;
    }
    const [name] = await listBackups(path.join(dataDir, 'backups'));
    const restored = await script('restore', name!);
    expect(restored.code, restored.out).toBe(0);
    expect(restored.out).toMatch(new RegExp(`^Restored ${name} .*\\nThe database it replaced is kept in ${dataDir}/pre-restore-`));
    expect((await script('restore')).out).toContain(`Backups in ${path.join(dataDir, 'backups')}, newest first:\n  ${name}\n`);
  });
});
