// `npm run bench` (fourth part): the figures issue 9 names for long work. Starts the real server
// on a fresh data folder, signs in as a curator and imports 5,000 generated valid artifact rows
// (mode `all`), timing the import's wall time, while a public request (GET /api/v1/visit/site)
// is fired every 10 ms from this process; reports that request's p50/p95/max during the import
// against the same request on an idle server; then the same during the CSV export of those rows.
import { mkdtempSync, rmSync } from 'node:fs';
import { get } from 'node:http';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Database } from 'better-sqlite3';
import { ARTIFACT_CATEGORIES } from '../../shared/schemas/artifacts.js';
import { hashPassword } from '../../server/auth/password-hash.js';
import { openDatabase } from '../../server/db/data-source.js';
import { BENCH_EMAIL, BENCH_PASSWORD, signIn, startServer } from './http-bench.js';

const ROWS = 5000;
const COMPARTMENTS = 40;
const EVERY_MS = 10;
const PUBLIC_URL = '/api/v1/visit/site';

function percentile(sorted: number[], p: number) {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

function stats(ms: number[]) {
  const sorted = [...ms].sort((a, b) => a - b);
  return { n: sorted.length, p50: percentile(sorted, 50), p95: percentile(sorted, 95), max: sorted[sorted.length - 1]! };
}

async function seed(databasePath: string) {
  const dataSource = await openDatabase(databasePath);
  const db = (dataSource.driver as unknown as { databaseConnection: Database }).databaseConnection;
  const passwordHash = await hashPassword(BENCH_PASSWORD, 4);
  db.transaction(() => {
    db.prepare(`INSERT INTO users (email, name, role, passwordHash, status, createdAt, updatedAt, version) VALUES (?, 'Bench Curator', 'curator', ?, 'active', datetime('now'), datetime('now'), 1)`).run(BENCH_EMAIL, passwordHash);
    const vesselId = db.prepare(`INSERT INTO vessels (name, vesselType, builtYear, berth, summary, designationScheme, createdAt, updatedAt, version) VALUES ('Bench vessel', 'Steamer', 1912, '', '', 'free-text', datetime('now'), datetime('now'), 1)`).run().lastInsertRowid;
    const deckId = db.prepare(`INSERT INTO decks (vesselId, name, position, planWidth, planHeight, createdAt, updatedAt, version) VALUES (?, 'Main deck', 0, 3200, 1000, datetime('now'), datetime('now'), 1)`).run(vesselId).lastInsertRowid;
    const compartment = db.prepare(`INSERT INTO compartments (vesselId, deckId, designation, designationKey, name, outline, createdAt, updatedAt, version) VALUES (?, ?, ?, ?, ?, NULL, datetime('now'), datetime('now'), 1)`);
    for (let c = 1; c <= COMPARTMENTS; c++) compartment.run(vesselId, deckId, `C-${c}`, `C-${c}`, `Compartment ${c}`);
  })();
  await dataSource.destroy();
}

/** 5,000 valid rows: every column filled, half aboard in a compartment, half in store. */
function csv(): string {
  const lines = ['object_number,name,category,description,date_or_period,maker,materials,height,width,depth,dimension_unit,significance,status,compartment'];
  for (let i = 0; i < ROWS; i++) {
    const aboard = i % 2 === 0;
    lines.push(
      [
        `2024.${1 + Math.floor(i / 100)}.${1 + (i % 100)}`,
        `Brass gauge ${i}`,
        ARTIFACT_CATEGORIES[i % ARTIFACT_CATEGORIES.length],
        `"A pressure gauge, number ${i}, from the boiler room"`,
        'c. 1920',
        'Vennick & Co.',
        'brass; glass',
        String(10 + (i % 50)),
        String(12 + (i % 40)),
        '4.5',
        'cm',
        'Fitted when the ship was built.',
        aboard ? 'in-place' : 'in-store',
        aboard ? `C-${1 + (i % COMPARTMENTS)}` : '',
      ].join(','),
    );
  }
  return lines.join('\r\n');
}

async function importCsv(base: string, cookie: string, csrf: string, text: string, mode: string) {
  const form = new FormData();
  form.append('file', new Blob([text], { type: 'text/csv' }), 'bench.csv');
  const res = await fetch(`${base}/api/v1/vessels/1/artifacts/import?mode=${mode}`, { method: 'POST', headers: { cookie, 'x-csrf-token': csrf }, body: form });
  const body = (await res.json()) as { imported?: number; error?: unknown };
  if (!res.ok) throw new Error(`import failed: ${res.status} ${JSON.stringify(body)}`);
  return body;
}

/** One public request on a new connection (as a visitor's would be), answering its status. */
function getPublic(base: string): Promise<number> {
  return new Promise((resolve, reject) => {
    get(`${base}${PUBLIC_URL}`, { agent: false }, (res) => {
      res.resume();
      res.on('end', () => resolve(res.statusCode ?? 0));
      res.on('error', reject);
    }).on('error', reject);
  });
}

/** Fires the public request every EVERY_MS until `until` settles; each answer's time from its start. */
async function firePublic(base: string, until: Promise<unknown>) {
  const ms: number[] = [];
  const pending: Promise<void>[] = [];
  let done = false;
  void until.finally(() => (done = true));
  while (!done) {
    const started = performance.now();
    pending.push(
      getPublic(base).then((status) => {
        if (status !== 200) throw new Error(`${PUBLIC_URL}: ${status}`);
        ms.push(performance.now() - started);
      }),
    );
    await new Promise((r) => setTimeout(r, EVERY_MS));
  }
  await Promise.all(pending);
  return ms;
}

const dir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-bench-import-'));
try {
  await seed(path.join(dir, 'shipkeeper.sqlite'));
  const port = 44_000 + Math.floor(Math.random() * 1000);
  const server = await startServer(dir, port);
  try {
    const base = `http://127.0.0.1:${port}`;
    const cookie = await signIn(base);
    const { csrfToken } = (await (await fetch(`${base}/api/v1/auth/csrf`, { headers: { cookie } })).json()) as { csrfToken: string };
    const text = csv();
    // Warm up the public route; and, as the import screen does, preview before importing (the
    // preview starts the import's worker thread, which then stays warm). BENCH_COLD=1 skips it.
    for (let i = 0; i < 50; i++) await getPublic(base);
    if (!process.env.BENCH_COLD) await importCsv(base, cookie, csrfToken, text.split('\r\n').slice(0, 20).join('\r\n'), 'preview');

    const idle = stats(await firePublic(base, new Promise((r) => setTimeout(r, 2000))));
    const started = performance.now();
    let seconds = 0;
    const running = importCsv(base, cookie, csrfToken, text, 'all').then((body) => {
      seconds = (performance.now() - started) / 1000;
      if (body.imported !== ROWS) throw new Error(`imported ${body.imported} of ${ROWS}`);
    });
    const during = stats(await firePublic(base, running));
    await running;

    const afterImport = stats(await firePublic(base, new Promise((r) => setTimeout(r, 1000))));
    // The same rule for the CSV export of what was just imported (a long read, in short slices).
    const exportStarted = performance.now();
    let exportSeconds = 0;
    const exporting = fetch(`${base}/api/v1/vessels/1/artifacts/export`, { headers: { cookie } }).then(async (res) => {
      const lines = (await res.text()).trim().split('\r\n').length;
      exportSeconds = (performance.now() - exportStarted) / 1000;
      if (!res.ok || lines !== ROWS + 1) throw new Error(`export: ${res.status}, ${lines} lines`);
    });
    const duringExport = stats(await firePublic(base, exporting));
    await exporting;

    const row = (label: string, s: ReturnType<typeof stats>) => `| ${label.padEnd(28)} | ${String(s.n).padStart(5)} | ${s.p50.toFixed(1).padStart(7)} | ${s.p95.toFixed(1).padStart(7)} | ${s.max.toFixed(1).padStart(7)} |`;
    console.log(`CSV import of ${ROWS} valid rows (mode all${process.env.BENCH_COLD ? ', cold: no preview first' : ', after a preview'}): ${seconds.toFixed(2)} s (goal < 1 s)`);
    console.log(`GET ${PUBLIC_URL} every ${EVERY_MS} ms, ms (goal during the import: p95 < 100 ms):`);
    console.log('| public request               |     n |     p50 |     p95 |     max |');
    console.log('|------------------------------|-------|---------|---------|---------|');
    console.log(row('idle server (2 s)', idle));
    console.log(row('during the import', during));
    console.log(row('after the import, idle (1 s)', afterImport));
    console.log(row('during the export', duringExport));
    console.log(`CSV export of the ${ROWS} rows: ${exportSeconds.toFixed(2)} s`);
  } finally {
    server.kill();
  }
} finally {
  rmSync(dir, { recursive: true, force: true });
}
