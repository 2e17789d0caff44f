// `npm run bench` (third part): the figures issue 5 names. Seeds 5,000 condition reports with
// 50,000 findings and a register of 1,000 risks into a fresh database, starts the real server on
// it, and times from outside (one request at a time) 500 risk-register pages and 500 deck
// condition overlays, as p50 and p95.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Database } from 'better-sqlite3';
import { bandOf } from '../../shared/calc/abc-risk.js';
import { GRADES, SEVERITIES } from '../../shared/calc/condition-grade.js';
import { AGENTS } from '../../shared/schemas/condition.js';
import { hashPassword } from '../../server/auth/password-hash.js';
import { openDatabase } from '../../server/db/data-source.js';
import { BENCH_EMAIL, BENCH_PASSWORD, signIn, startServer, time } from './http-bench.js';

const REPORTS = 5_000;
const FINDINGS_PER_REPORT = 10;
const RISKS = 1_000;
const REQUESTS = 500;

let state = 7;
const random = () => ((state = (state * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)]!;
const halfStep = () => 1 + Math.floor(random() * 9) / 2;

async function seed(databasePath: string) {
  const dataSource = await openDatabase(databasePath);
  const db = (dataSource.driver as unknown as { databaseConnection: Database }).databaseConnection;
  const passwordHash = await hashPassword(BENCH_PASSWORD, 4);
  const started = Date.now();
  const decks: number[] = [];
  db.transaction(() => {
    const userId = db.prepare(`INSERT INTO users (email, name, role, passwordHash, status, createdAt, updatedAt, version) VALUES (?, 'Bench Conservator', 'conservator', ?, 'active', datetime('now'), datetime('now'), 1)`).run(BENCH_EMAIL, passwordHash).lastInsertRowid;
    const vesselId = db.prepare(`INSERT INTO vessels (name, vesselType, builtYear, berth, summary, designationScheme, createdAt, updatedAt, version) VALUES ('Bench vessel', 'Steamer', 1912, '', '', 'free-text', datetime('now'), datetime('now'), 1)`).run().lastInsertRowid;
    const rooms: { id: number; deckId: number }[] = [];
    for (let d = 0; d < 4; d++) {
      const deckId = Number(db.prepare(`INSERT INTO decks (vesselId, name, position, planWidth, planHeight, createdAt, updatedAt, version) VALUES (?, ?, ?, 3200, 1000, datetime('now'), datetime('now'), 1)`).run(vesselId, `Deck ${d + 1}`, d).lastInsertRowid);
      decks.push(deckId);
      for (let c = 0; c < 10; c++) {
        const x = 100 + c * 300;
        const id = Number(
          db
            .prepare(`INSERT INTO compartments (vesselId, deckId, designation, designationKey, name, outline, createdAt, updatedAt, version) VALUES (?, ?, ?, ?, ?, ?, datetime('now'), datetime('now'), 1)`)
            .run(vesselId, deckId, `D${d + 1}-${c + 1}`, `D${d + 1}-${c + 1}`, `Compartment ${c + 1}`, JSON.stringify([[x, 100], [x + 280, 100], [x + 280, 900], [x, 900]])).lastInsertRowid,
        );
        rooms.push({ id, deckId });
      }
    }
    const report = db.prepare(
      `INSERT INTO condition_reports (vesselId, subjectType, subjectId, revision, status, inspectedOn, surveyorId, method, summary, computedGrade, grade, findingCount, submittedAt, signedBy, createdAt, updatedAt, version) VALUES (?, 'compartment', ?, 1, ?, ?, ?, 'visual', 'Routine survey', ?, ?, ?, datetime('now'), 'Bench Conservator', datetime('now'), datetime('now'), 1)`,
    );
    const finding = db.prepare(
      `INSERT INTO condition_findings (reportId, agent, damageType, severity, extentPercent, description, recommendedAction, urgency, position, createdAt, updatedAt, version) VALUES (?, ?, 'other', ?, ?, 'Observed on the bench', 'Watch it', 'routine', ?, datetime('now'), datetime('now'), 1)`,
    );
    for (let r = 0; r < REPORTS; r++) {
      const grade = pick(GRADES);
      const day = new Date(Date.UTC(2016, 0, 1) + Math.floor(random() * 3650) * 86_400_000).toISOString().slice(0, 10);
      const reportId = report.run(vesselId, pick(rooms).id, random() < 0.9 ? 'submitted' : 'draft', day, userId, grade, grade, FINDINGS_PER_REPORT).lastInsertRowid;
      for (let f = 0; f < FINDINGS_PER_REPORT; f++) finding.run(reportId, pick(AGENTS), pick(SEVERITIES), Math.round(random() * 100), f);
    }
    const risk = db.prepare(`INSERT INTO risks (vesselId, statement, agent, status, a, b, c, magnitude, band, createdAt, updatedAt, version) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, datetime('now'), datetime('now'), 1)`);
    const subject = db.prepare(`INSERT OR IGNORE INTO risk_subjects (riskId, subjectType, subjectId, deckId) VALUES (?, 'compartment', ?, ?)`);
    for (let k = 0; k < RISKS; k++) {
      const [a, b, c] = [halfStep(), halfStep(), halfStep()];
      const id = risk.run(vesselId, `Bench risk ${k}`, pick(AGENTS), random() < 0.8 ? 'open' : 'treated', a, b, c, a + b + c, bandOf(a + b + c)).lastInsertRowid;
      for (let s = 0; s < 1 + Math.floor(random() * 3); s++) {
        const room = pick(rooms);
        subject.run(id, room.id, room.deckId);
      }
    }
  })();
  await dataSource.destroy();
  return { seconds: (Date.now() - started) / 1000, decks };
}

const dir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-bench-condition-'));
try {
  const { seconds, decks } = await seed(path.join(dir, 'shipkeeper.sqlite'));
  console.log(`Seeded ${REPORTS} condition reports with ${REPORTS * FINDINGS_PER_REPORT} findings and ${RISKS} risks in ${seconds.toFixed(1)} s.`);
  const port = 44_000 + Math.floor(Math.random() * 1000);
  const server = await startServer(dir, port);
  try {
    const base = `http://127.0.0.1:${port}`;
    const cookie = await signIn(base);
    const registerUrls = Array.from({ length: REQUESTS }, (_, i) => {
      const filter = [`&agent=${pick(AGENTS)}`, `&deckId=${pick(decks)}`, `&compartmentId=${1 + Math.floor(random() * 40)}`, '&status=open', ''][i % 5];
      return `/api/v1/risks?vesselId=1&pageSize=50&page=${1 + Math.floor(random() * 3)}${filter}`;
    });
    const overlayUrls = Array.from({ length: REQUESTS }, () => `/api/v1/decks/${pick(decks)}/condition`);
    await time(base, cookie, registerUrls.slice(0, 20));
    const register = await time(base, cookie, registerUrls);
    const overlay = await time(base, cookie, overlayUrls);
    console.log(`Risk register, page of 50 ranked and filtered (${REQUESTS} requests): p50 ${register.p50.toFixed(1)} ms, p95 ${register.p95.toFixed(1)} ms, max ${register.max.toFixed(1)} ms (goal p95 < 30 ms)`);
    console.log(`Condition overlay of a deck (${REQUESTS} requests): p50 ${overlay.p50.toFixed(1)} ms, p95 ${overlay.p95.toFixed(1)} ms, max ${overlay.max.toFixed(1)} ms (goal p95 < 30 ms)`);
  } finally {
    server.kill();
  }
} finally {
  if (process.env.BENCH_KEEP) console.log(`Data kept in ${dir}`);
  else rmSync(dir, { recursive: true, force: true });
}
