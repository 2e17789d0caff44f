// `npm run bench` (giving): 100,000 gifts over 50 repair projects in a fresh database. Times from
// outside, one request at a time, 500 public appeal pages and 500 of the fundraiser's totals (both
// read the totals kept on the appeals), then, in the same run and on the same file, 500 times the
// same totals summed from every gift on read (in process: there is no route that sums on read).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Database } from 'better-sqlite3';
import { hashPassword } from '../../server/auth/password-hash.js';
import { openDatabase } from '../../server/db/data-source.js';
import { Store } from '../../server/db/store.js';
import { BENCH_EMAIL, BENCH_PASSWORD, signIn, startServer } from './http-bench.js';

const PROJECTS = 50;
const GIFTS = 100_000;
const REQUESTS = 500;

let state = 11;
const random = () => ((state = (state * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
const stats = (ms: number[]) => {
  const sorted = [...ms].sort((a, b) => a - b);
  return `p50 ${percentile(sorted, 50).toFixed(2)} ms, p95 ${percentile(sorted, 95).toFixed(2)} ms, max ${sorted[sorted.length - 1]!.toFixed(2)} ms`;
};

async function seed(databasePath: string) {
  const dataSource = await openDatabase(databasePath);
  const db = (dataSource.driver as unknown as { databaseConnection: Database }).databaseConnection;
  const passwordHash = await hashPassword(BENCH_PASSWORD, 4);
  const started = Date.now();
  db.transaction(() => {
    db.prepare(`INSERT INTO users (email, name, role, passwordHash, status, createdAt, updatedAt, version) VALUES (?, 'Bench Fundraiser', 'fundraiser', ?, 'active', datetime('now'), datetime('now'), 1)`).run(BENCH_EMAIL, passwordHash);
    const vesselId = db.prepare(`INSERT INTO vessels (name, vesselType, builtYear, berth, summary, designationScheme, createdAt, updatedAt, version) VALUES ('Bench vessel', 'Steamer', 1912, '', '', 'free-text', datetime('now'), datetime('now'), 1)`).run().lastInsertRowid;
    const project = db.prepare(`INSERT INTO repair_project (vesselId, title, slug, status, scope, scopeHtml, scopeText, estimateCents, createdAt, updatedAt, version) VALUES (?, ?, ?, 'fundraising', '{"type":"doc"}', '', '', 5000000, datetime('now'), datetime('now'), 1)`);
    const appeal = db.prepare(`INSERT INTO appeals (vesselId, repairProjectId, storyDoc, storyHtml, storyText, goalCents, photos, publishedAt, createdAt, updatedAt, version) VALUES (?, ?, '{"type":"doc"}', '<p>Bench story.</p>', 'Bench story.', 5000000, '[]', datetime('now'), datetime('now'), datetime('now'), 1)`);
    const appealIds: number[] = [];
    for (let p = 1; p <= PROJECTS; p++) {
      const projectId = project.run(vesselId, `Bench repair ${p}`, `bench-repair-${p}`).lastInsertRowid;
      appealIds.push(Number(appeal.run(vesselId, projectId).lastInsertRowid));
    }
    const gift = db.prepare(`INSERT INTO donations (vesselId, appealId, reference, checkoutSessionId, paymentIntentId, amountCents, currency, status, refundedCents, donorName, donorEmail, showFirstName, anonymous, dedicationKind, dedicationName, failureMessage, succeededAt, createdAt, updatedAt, version) VALUES (?, ?, ?, ?, ?, ?, 'USD', ?, ?, ?, ?, 1, 0, NULL, '', '', ?, ?, ?, 1)`);
    for (let g = 0; g < GIFTS; g++) {
      const at = new Date(Date.UTC(2024, 0, 1) + Math.floor(random() * 700) * 86_400_000).toISOString().replace('T', ' ').slice(0, 19);
      const amount = [1000, 2500, 5000, 10_000, 25_000][Math.floor(random() * 5)]!;
      const roll = random();
      const status = roll < 0.9 ? 'succeeded' : roll < 0.93 ? 'partially_refunded' : roll < 0.95 ? 'refunded' : roll < 0.98 ? 'expired' : 'failed';
      const refunded = status === 'refunded' ? amount : status === 'partially_refunded' ? amount / 2 : 0;
      const received = status === 'succeeded' || status === 'partially_refunded' || status === 'refunded';
      gift.run(vesselId, appealIds[g % PROJECTS], `bench-${g}`, `cs_bench_${g}`, `pi_bench_${g}`, amount, status, refunded, `Donor ${g}`, `donor${g}@example.test`, received ? at : null, at, at);
    }
    // The kept totals as the ledger would have left them
    db.exec(`UPDATE appeals SET
      raisedCents = (SELECT COALESCE(SUM(amountCents), 0) FROM donations d WHERE d.appealId = appeals.id AND d.status IN ('succeeded', 'partially_refunded', 'refunded')),
      refundedCents = (SELECT COALESCE(SUM(refundedCents), 0) FROM donations d WHERE d.appealId = appeals.id AND d.status IN ('succeeded', 'partially_refunded', 'refunded')),
      giftCount = (SELECT COUNT(*) FROM donations d WHERE d.appealId = appeals.id AND d.status IN ('succeeded', 'partially_refunded'))`);
    db.exec(`INSERT INTO appeal_month_totals (appealId, month, raisedCents, refundedCents, giftCount)
      SELECT appealId, substr(succeededAt, 1, 7), SUM(amountCents), SUM(refundedCents), SUM(CASE WHEN status = 'refunded' THEN 0 ELSE 1 END)
      FROM donations WHERE status IN ('succeeded', 'partially_refunded', 'refunded') GROUP BY appealId, substr(succeededAt, 1, 7)`);
  })();
  await dataSource.destroy();
  return (Date.now() - started) / 1000;
}

async function timeHttp(base: string, cookie: string, urls: string[]) {
  const ms: number[] = [];
  for (const url of urls) {
    const started = process.hrtime.bigint();
    const res = await fetch(`${base}${url}`, { headers: { cookie, accept: 'application/json' } });
    const body = await res.json();
    ms.push(Number(process.hrtime.bigint() - started) / 1e6);
    if (!res.ok) throw new Error(`${url}: ${res.status} ${JSON.stringify(body)}`);
  }
  return ms;
}

async function timeInProcess(work: () => Promise<unknown>) {
  const ms: number[] = [];
  for (let i = 0; i < REQUESTS; i++) {
    const started = process.hrtime.bigint();
    await work();
    ms.push(Number(process.hrtime.bigint() - started) / 1e6);
  }
  return ms;
}

const dir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-bench-giving-'));
try {
  const seconds = await seed(path.join(dir, 'shipkeeper.sqlite'));
  console.log(`Seeded ${GIFTS.toLocaleString('en-US')} gifts over ${PROJECTS} repair projects in ${seconds.toFixed(1)} s.`);
  const port = 45_000 + Math.floor(Math.random() * 1000);
  const server = await startServer(dir, port);
  try {
    const base = `http://127.0.0.1:${port}`;
    const cookie = await signIn(base);
    const appealUrls = Array.from({ length: REQUESTS }, () => `/api/v1/visit/appeals/bench-repair-${1 + Math.floor(random() * PROJECTS)}`);
    const totalsUrls = Array.from({ length: REQUESTS }, () => '/api/v1/vessels/1/giving/totals');
    await timeHttp(base, cookie, appealUrls.slice(0, 20));
    const appeal = await timeHttp(base, cookie, appealUrls);
    const totals = await timeHttp(base, cookie, totalsUrls);
    console.log(`Public appeal page answer, kept totals (${REQUESTS} requests over HTTP): ${stats(appeal)} (goal p95 < 10 ms)`);
    console.log(`Fundraiser's totals by project and month, kept (${REQUESTS} requests over HTTP): ${stats(totals)} (goal p95 < 10 ms)`);
  } finally {
    server.kill();
  }
  const dataSource = await openDatabase(path.join(dir, 'shipkeeper.sqlite'));
  try {
    const store = new Store(dataSource);
    const kept = await timeInProcess(() => Promise.all([store.repos.appeals.ofVessel(1), store.repos.appeals.monthsOfVessel(1)]));
    const summed = await timeInProcess(() => Promise.all([
      store.repos.donations.sumByAppeal(1),
      // by month from every gift (SQLite's substr: bench only)
      dataSource.query(`SELECT substr(succeededAt, 1, 7) AS month, SUM(amountCents) AS raisedCents, SUM(refundedCents) AS refundedCents FROM donations WHERE vesselId = 1 AND status IN ('succeeded', 'partially_refunded', 'refunded') GROUP BY month`),
    ]));
    console.log(`The same totals, queries in process: kept ${stats(kept)}; summed from ${GIFTS.toLocaleString('en-US')} gifts on read ${stats(summed)}`);
  } finally {
    await dataSource.destroy();
  }
} finally {
  if (process.env.BENCH_KEEP) console.log(`Data kept in ${dir}`);
  else rmSync(dir, { recursive: true, force: true });
}
