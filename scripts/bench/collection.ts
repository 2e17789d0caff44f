// `npm run bench` (second part): the figures issue 4 names. Seeds 10,000 artifacts and 30,000
// media records into a fresh database, starts the real server on it, and times from outside
// (over HTTP, one request at a time) 500 list requests (page of 50, sorted and filtered) and 500
// full-text searches, as p50 and p95; then the photo derivatives made per second.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Database } from 'better-sqlite3';
import sharp from 'sharp';
import { objectNumberSortKey } from '../../shared/calc/object-number.js';
import { ARTIFACT_CATEGORIES, ARTIFACT_STATUSES } from '../../shared/schemas/artifacts.js';
import { hashPassword } from '../../server/auth/password-hash.js';
import { openDatabase } from '../../server/db/data-source.js';
import { ArtifactEntity } from '../../server/db/entities/artifact.entity.js';
import { SearchIndex } from '../../server/search/search-index.js';
import { searchDocumentOf } from '../../server/services/artifact-record.js';
import { makeDerivatives } from '../../server/services/media-derivatives.js';
import { BENCH_EMAIL, BENCH_PASSWORD, signIn, startServer, time } from './http-bench.js';

const ARTIFACTS = 10_000;
const MEDIA = 30_000;
const REQUESTS = 500;

// A small deterministic generator, so every run measures the same data.
let state = 42;
const random = () => ((state = (state * 1_103_515_245 + 12_345) % 2 ** 31) / 2 ** 31);
const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)]!;

const NOUNS = ['gauge', 'valve', 'pump', 'wheel', 'lamp', 'telegraph', 'boiler', 'engine', 'cylinder', 'bearing', 'shaft', 'spanner', 'shovel', 'clock', 'chair', 'plate', 'notice', 'log', 'dynamo', 'switch', 'fan', 'filter', 'gland', 'bolt', 'ladder', 'hatch', 'bell', 'compass', 'whistle', 'injector'];
const ADJECTIVES = ['brass', 'steam', 'bronze', 'cast', 'forged', 'duplex', 'feed', 'bilge', 'main', 'auxiliary', 'pressure', 'vacuum', 'oil', 'water', 'electric', 'teak', 'copper', 'iron', 'painted', 'portable'];
const PLACES = ['boiler room', 'engine room', 'shaft alley', 'wheelhouse', 'saloon', 'store', 'dynamo flat', 'steering gear room'];

function sentence(words: number): string {
  const out: string[] = [];
  for (let i = 0; i < words; i++) out.push(i % 3 === 0 ? pick(ADJECTIVES) : i % 3 === 1 ? pick(NOUNS) : pick(['of the', 'from the', 'in the', 'near the', 'with a', 'and']) + ' ' + pick(PLACES));
  return out.join(' ');
}

async function seed(databasePath: string) {
  const dataSource = await openDatabase(databasePath);
  const db = (dataSource.driver as unknown as { databaseConnection: Database }).databaseConnection;
  const passwordHash = await hashPassword(BENCH_PASSWORD, 4);
  const started = Date.now();
  db.transaction(() => {
    db.prepare(`INSERT INTO users (email, name, role, passwordHash, status, createdAt, updatedAt, version) VALUES (?, 'Bench Curator', 'curator', ?, 'active', datetime('now'), datetime('now'), 1)`).run(BENCH_EMAIL, passwordHash);
    const vesselId = db.prepare(`INSERT INTO vessels (name, vesselType, builtYear, berth, summary, designationScheme, createdAt, updatedAt, version) VALUES ('Bench vessel', 'Steamer', 1912, '', '', 'free-text', datetime('now'), datetime('now'), 1)`).run().lastInsertRowid;
    const deckIds: number[] = [];
    for (let d = 0; d < 4; d++) {
      deckIds.push(Number(db.prepare(`INSERT INTO decks (vesselId, name, position, planWidth, planHeight, createdAt, updatedAt, version) VALUES (?, ?, ?, 3200, 1000, datetime('now'), datetime('now'), 1)`).run(vesselId, `Deck ${d + 1}`, d).lastInsertRowid));
    }
    const compartmentIds: number[] = [];
    for (let c = 0; c < 40; c++) {
      const x = 100 + (c % 10) * 300;
      compartmentIds.push(
        Number(
          db
            .prepare(`INSERT INTO compartments (vesselId, deckId, designation, designationKey, name, outline, createdAt, updatedAt, version) VALUES (?, ?, ?, ?, ?, ?, datetime('now'), datetime('now'), 1)`)
            .run(vesselId, deckIds[c % 4], `C-${c + 1}`, `C-${c + 1}`, `Compartment ${c + 1}`, JSON.stringify([[x, 100], [x + 280, 100], [x + 280, 900], [x, 900]])).lastInsertRowid,
        ),
      );
    }
    const artifact = db.prepare(
      `INSERT INTO artifacts (vesselId, objectNumber, objectNumberSort, name, category, description, materials, maker, significance, status, compartmentId, point, createdAt, updatedAt, version) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, datetime('now', ?), datetime('now', ?), 1)`,
    );
    const media = db.prepare(
      `INSERT INTO media (vesselId, ownerType, ownerId, kind, mimeType, fileName, byteSize, sha256, storageKey, width, height, createdAt, updatedAt, version) VALUES (?, 'artifact', ?, 'photo', 'image/jpeg', ?, 2400000, ?, ?, 4000, 3000, datetime('now'), datetime('now'), 1)`,
    );
    const setCover = db.prepare('UPDATE artifacts SET coverMediaId = ? WHERE id = ?');
    const ids: number[] = [];
    for (let i = 0; i < ARTIFACTS; i++) {
      const number = `${1990 + (i % 35)}.${1 + Math.floor(i / 35) % 300}.${1 + (i % 97)}`;
      const name = `${pick(ADJECTIVES)} ${pick(NOUNS)}`;
      const description = sentence(12 + Math.floor(random() * 30));
      const materials = `${pick(ADJECTIVES)}; ${pick(ADJECTIVES)}`;
      const maker = `${pick(['Vennick', 'Oskel', 'Lumbrey', 'Teague'])} & Co.`;
      const significance = sentence(8);
      const age = `-${Math.floor(random() * 2000)} hours`;
      const id = Number(artifact.run(vesselId, `${number}-${i}`, objectNumberSortKey(`${number}-${i}`), name, pick(ARTIFACT_CATEGORIES), description, materials, maker, significance, pick(ARTIFACT_STATUSES), pick(compartmentIds), JSON.stringify([200, 500]), age, age).lastInsertRowid);
      ids.push(id);
    }
    for (let m = 0; m < MEDIA; m++) {
      const owner = ids[m % ids.length]!;
      const id = Number(media.run(vesselId, owner, `photo-${m}.jpg`, 'x'.repeat(64), `media/bench/${m}`).lastInsertRowid);
      if (m < ids.length) setCover.run(id, owner);
    }
  })();
  // The search documents are written by the app's own index code, as a save would.
  await dataSource.transaction(async (manager) => {
    const index = new SearchIndex(manager);
    for (const artifact of await manager.getRepository(ArtifactEntity).find()) await index.put(searchDocumentOf(artifact));
  });
  await dataSource.destroy();
  return (Date.now() - started) / 1000;
}

async function derivatives(dir: string) {
  // A 12-megapixel photo of noise: harder to compress than a real one, so a fair upper bound.
  const photo = path.join(dir, 'photo.jpg');
  await sharp({ create: { width: 4000, height: 3000, channels: 3, background: '#777', noise: { type: 'gaussian', mean: 128, sigma: 40 } } }).jpeg({ quality: 85 }).toFile(photo);
  const count = 20;
  const started = process.hrtime.bigint();
  for (let i = 0; i < count; i++) await makeDerivatives(photo, dir);
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  return { count, seconds, perSecond: count / seconds };
}

const dir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-bench-collection-'));
try {
  const seedSeconds = await seed(path.join(dir, 'shipkeeper.sqlite'));
  console.log(`Seeded ${ARTIFACTS} artifacts and ${MEDIA} media records in ${seedSeconds.toFixed(1)} s.`);
  const port = 43_000 + Math.floor(Math.random() * 1000);
  const server = await startServer(dir, port);
  try {
    const base = `http://127.0.0.1:${port}`;
    const cookie = await signIn(base);
    const sorts = ['name', '-updatedAt', 'objectNumber', '-category', 'status'];
    const listUrls = Array.from({ length: REQUESTS }, (_, i) => {
      const filter = i % 3 === 0 ? `&category=${pick(ARTIFACT_CATEGORIES)}` : i % 3 === 1 ? `&status=${pick(ARTIFACT_STATUSES)}` : '';
      return `/api/v1/vessels/1/artifacts?pageSize=50&page=${1 + Math.floor(random() * 10)}&sort=${sorts[i % sorts.length]}${filter}`;
    });
    const searchUrls = Array.from({ length: REQUESTS }, (_, i) => {
      const q = i % 4 === 0 ? `${pick(ADJECTIVES)} ${pick(NOUNS)}` : i % 4 === 1 ? pick(NOUNS).slice(0, 4) : i % 4 === 2 ? `${1990 + (i % 35)}.${1 + (i % 300)}` : pick(NOUNS);
      return `/api/v1/vessels/1/artifacts?pageSize=50&q=${encodeURIComponent(q)}${i % 2 ? '&sort=relevance' : ''}`;
    });
    const narrowedUrls = Array.from({ length: REQUESTS }, (_, i) => `/api/v1/vessels/1/artifacts?pageSize=50&q=${pick(NOUNS)}&${i % 2 ? `category=${pick(ARTIFACT_CATEGORIES)}` : 'sort=name'}`);
    await time(base, cookie, listUrls.slice(0, 20)); // warm up
    const list = await time(base, cookie, listUrls);
    const search = await time(base, cookie, searchUrls);
    const narrowed = await time(base, cookie, narrowedUrls);
    console.log(`Artifacts list, page of 50 sorted and filtered (${REQUESTS} requests): p50 ${list.p50.toFixed(1)} ms, p95 ${list.p95.toFixed(1)} ms, max ${list.max.toFixed(1)} ms (goal p95 < 30 ms)`);
    console.log(`Full-text search, page of 50 (${REQUESTS} requests, ${search.withResults} with matches): p50 ${search.p50.toFixed(1)} ms, p95 ${search.p95.toFixed(1)} ms, max ${search.max.toFixed(1)} ms (goal p95 < 20 ms)`);
    console.log(`Full-text search with a filter or sorted by name (${REQUESTS} requests): p50 ${narrowed.p50.toFixed(1)} ms, p95 ${narrowed.p95.toFixed(1)} ms, max ${narrowed.max.toFixed(1)} ms (no goal set)`);
  } finally {
    server.kill();
  }
  if (!process.env.BENCH_SKIP_PHOTOS) {
    const made = await derivatives(dir);
    console.log(`Photo derivatives (12-megapixel JPEG → 320 px and 1600 px WebP): ${made.count} photos in ${made.seconds.toFixed(1)} s, ${made.perSecond.toFixed(2)} photos per second`);
  }
} finally {
  if (process.env.BENCH_KEEP) console.log(`Data kept in ${dir}`);
  else rmSync(dir, { recursive: true, force: true });
}
