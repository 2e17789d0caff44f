// `npm run bench` (tours): a published tour of 40 stops, each 800 words with 3 images, written
// through the services in a fresh database. Times from outside, one request at a time, 500 public
// reads of the tour (nothing is rendered or sanitized per request: the goal is p95 under 10 ms),
// then, in process, rendering and sanitizing one 5,000-word stop as a save does.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { loadConfig } from '../../server/config.js';
import { openDatabase } from '../../server/db/data-source.js';
import { Store } from '../../server/db/store.js';
import type { Mailer } from '../../server/mail/mailer.js';
import { renderRichText } from '../../server/richtext/render.js';
import { ClosureService } from '../../server/services/closure.service.js';
import { TourReviewService } from '../../server/services/tour-review.service.js';
import { TourService } from '../../server/services/tour.service.js';
import type { RichTextDoc } from '../../shared/schemas/rich-text.js';
import { hashPassword } from '../../server/auth/password-hash.js';
import { BENCH_EMAIL, BENCH_PASSWORD, startServer } from './http-bench.js';

const STOPS = 40;
const WORDS = 800;
const REQUESTS = 500;
const WORDS_LONG = 5000;

const VOCABULARY = 'steam boiler furnace engine piston valve gauge pressure vacuum condenser feed water coal stoker watch bridge telegraph shaft propeller bearing brass copper rivet plate deck ladder hatch'.split(' ');
const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
const stats = (ms: number[]) => {
  const sorted = [...ms].sort((a, b) => a - b);
  return `p50 ${percentile(sorted, 50).toFixed(2)} ms, p95 ${percentile(sorted, 95).toFixed(2)} ms, max ${sorted[sorted.length - 1]!.toFixed(2)} ms`;
};

/** A story of `words` words in paragraphs of 80 with a heading every 400, and `images` photos. */
function story(words: number, images: number, seed: number): RichTextDoc {
  const content: NonNullable<RichTextDoc['content']> = [];
  for (let w = 0, p = 0; w < words; w += 80, p++) {
    if (p % 5 === 0) content.push({ type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: `Part ${p / 5 + 1}` }] });
    const text = Array.from({ length: Math.min(80, words - w) }, (_, i) => VOCABULARY[(seed + w + i) % VOCABULARY.length]).join(' ');
    content.push({ type: 'paragraph', content: [{ type: 'text', text: `${text}.` }, ...(p % 3 === 0 ? [{ type: 'text', text: ' In bold.', marks: [{ type: 'bold' }] }] : [])] });
    if (p < images) content.push({ type: 'image', attrs: { src: `/api/v1/media/${seed * 10 + p + 1}/display`, alt: `Bench photo ${p + 1}` } });
  }
  return { type: 'doc', content };
}

const dataDir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-bench-tours-'));
try {
  const config = loadConfig({ ...process.env, DATA_DIR: dataDir });
  const dataSource = await openDatabase(config.databasePath);
  const store = new Store(dataSource);
  const user = await store.repos.users.create({ email: BENCH_EMAIL, name: 'Bench Curator', role: 'curator', passwordHash: await hashPassword(BENCH_PASSWORD, 4) });
  const viewer = { id: user.id, email: user.email, name: user.name, role: user.role } as Express.User;
  const actor = { id: user.id, ip: null };
  const vessel = await store.repos.vessels.create({ name: 'Bench vessel', vesselType: 'Steamer', builtYear: 1912, berth: '', summary: '', designationScheme: 'free-text' });
  const deck = await store.repos.decks.create({ vesselId: vessel.id, name: 'Main deck', position: 0, levelCode: '1' });
  const room = await store.repos.compartments.create({ vesselId: vessel.id, deckId: deck.id, designation: 'ER', designationKey: 'ER', name: 'Engine room', description: '', accessStatus: 'open', virtualVisit: false, outline: null });
  const closures = new ClosureService(store);
  const tours = new TourService(store, closures);
  const review = new TourReviewService(store, tours, closures, { send: async () => undefined } as unknown as Mailer, config);

  const started = Date.now();
  let tour = await tours.create(vessel.id, { title: 'Bench tour', slug: 'bench-tour', summary: '', audience: 'general', mode: 'on-board', accessibility: 'ladders', coverMediaId: null, language: 'en' }, viewer, actor);
  for (let s = 0; s < STOPS; s++) {
    tour = await tours.createStop(tour.id, { compartmentId: room.id, artifactIds: [], title: `Stop ${s + 1}`, textDoc: story(WORDS, 3, s + 1), audioMediaId: null, transcript: '', dwellMinutes: 2, accessNotes: '', lookFor: '', virtual: false, point: null }, viewer, actor);
  }
  tour = await review.submit(tour.id, tour.version, viewer, actor);
  await review.approve(tour.id, tour.version, '', viewer, actor);
  console.log(`Tours: wrote and published ${STOPS} stops × ${WORDS} words × 3 images in ${((Date.now() - started) / 1000).toFixed(1)} s`);

  // Rendering and sanitizing at save, in process: one warm-up, then 20 runs.
  const long = story(WORDS_LONG, 3, 99);
  renderRichText(long, 'textDoc');
  const renders: number[] = [];
  for (let i = 0; i < 20; i++) {
    const t = process.hrtime.bigint();
    renderRichText(long, 'textDoc');
    renders.push(Number(process.hrtime.bigint() - t) / 1e6);
  }
  console.log(`Tours: render + sanitize one ${WORDS_LONG}-word stop (${JSON.stringify(long).length} bytes of JSON), 20 runs: ${stats(renders)}`);
  await dataSource.destroy();

  const port = 3900 + Math.floor(Math.random() * 90);
  const server = await startServer(dataDir, port);
  try {
    const base = `http://127.0.0.1:${port}`;
    const ms: number[] = [];
    let bytes = 0;
    for (let i = 0; i < REQUESTS + 20; i++) {
      const t = process.hrtime.bigint();
      const res = await fetch(`${base}/api/v1/visit/tours/bench-tour`, { headers: { accept: 'application/json' } });
      const body = await res.text();
      if (!res.ok) throw new Error(`${res.status} ${body.slice(0, 200)}`);
      if (i >= 20) ms.push(Number(process.hrtime.bigint() - t) / 1e6);
      bytes = body.length;
    }
    console.log(`Tours: GET /api/v1/visit/tours/:slug (${(bytes / 1024).toFixed(0)} KiB), ${REQUESTS} requests one at a time after 20 warm-up: ${stats(ms)}`);
  } finally {
    server.kill();
  }
} finally {
  rmSync(dataDir, { recursive: true, force: true });
}
