// `npm run bench`: tiles a generated 16,000 × 12,000 px deck plan and reports the figures that
// issue 3 names: seconds and peak memory of the build, and the bytes a browser fetches for the
// first view of the plan at 1280 × 800 against the size of the original.
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import sharp, { type OverlayOptions } from 'sharp';
import { planMaxZoom, planTileCount, PLAN_TILE_SIZE } from '../../shared/schemas/plans.js';
import { buildPyramid } from '../../server/services/plan-tiler.js';

const WIDTH = 16_000;
const HEIGHT = 12_000;
const VIEW = { width: 1280, height: 800 };

/** A plan drawn in strips (one huge SVG would cost more memory than the tiler itself). */
async function drawPlan(file: string) {
  const strips: OverlayOptions[] = [];
  const stripHeight = 1000;
  for (let top = 0; top < HEIGHT; top += stripHeight) {
    const lines: string[] = [];
    for (let x = 200; x < WIDTH; x += 400) lines.push(`<line x1="${x}" y1="0" x2="${x}" y2="${stripHeight}" stroke="#9ab" stroke-width="3"/>`);
    for (let y = 0; y < stripHeight; y += 250) lines.push(`<line x1="0" y1="${y}" x2="${WIDTH}" y2="${y}" stroke="#cdd" stroke-width="2"/>`);
    for (let x = 0; x < WIDTH; x += 1600) lines.push(`<text x="${x + 40}" y="${120}" font-size="90" font-family="serif" fill="#234">FR ${x / 400}</text>`);
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${stripHeight}">${lines.join('')}</svg>`;
    strips.push({ input: await sharp(Buffer.from(svg)).png().toBuffer(), top, left: 0 });
  }
  await sharp({ create: { width: WIDTH, height: HEIGHT, channels: 3, background: '#f6f1e4' }, limitInputPixels: false })
    .composite(strips)
    .png({ compressionLevel: 6 })
    .toFile(file);
}

/** The tiles Leaflet loads to show the whole plan fitted into the view, and their bytes. */
function firstViewBytes(pyramid: string, width: number, height: number) {
  const maxZoom = planMaxZoom(width, height);
  const fit = Math.min(maxZoom, maxZoom + Math.floor(Math.log2(Math.min(VIEW.width / width, VIEW.height / height))));
  const scale = 2 ** (maxZoom - fit);
  const cols = Math.ceil(width / scale / PLAN_TILE_SIZE);
  const rows = Math.ceil(height / scale / PLAN_TILE_SIZE);
  let bytes = 0;
  for (let y = 0; y < rows; y++) for (let x = 0; x < cols; x++) bytes += statSync(path.join(pyramid, String(fit), String(y), `${x}.png`)).size;
  return { zoom: fit, tiles: cols * rows, bytes };
}

// In a child process of its own, so that its peak memory is the tiler's alone.
if (process.argv[2] === '--tile') {
  // The build runs on libvips' threads: the event loop should stay free meanwhile (issue 9).
  const loop = monitorEventLoopDelay({ resolution: 10 });
  loop.enable();
  const started = process.hrtime.bigint();
  await buildPyramid(process.argv[3]!, process.argv[4]!);
  const seconds = Number(process.hrtime.bigint() - started) / 1e9;
  loop.disable();
  console.log(JSON.stringify({ seconds, maxRssKb: process.resourceUsage().maxRSS, loopP99Ms: loop.percentile(99) / 1e6, loopMaxMs: loop.max / 1e6 }));
  process.exit(0);
}

const dir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-bench-'));
try {
  const original = path.join(dir, 'plan.png');
  console.log(`Drawing a ${WIDTH} × ${HEIGHT} px plan…`);
  await drawPlan(original);
  const originalBytes = statSync(original).size;

  const child = spawnSync(process.execPath, [...process.execArgv, process.argv[1]!, '--tile', original, path.join(dir, 'pyramid')], { encoding: 'utf8' });
  if (child.status !== 0) throw new Error(`tiling failed: ${child.stderr}`);
  const { seconds, maxRssKb, loopP99Ms, loopMaxMs } = JSON.parse(child.stdout.trim().split('\n').pop()!) as { seconds: number; maxRssKb: number; loopP99Ms: number; loopMaxMs: number };

  const view = firstViewBytes(path.join(dir, 'pyramid'), WIDTH, HEIGHT);
  const mb = (n: number) => (n / 1024 / 1024).toFixed(1);
  console.log(`tiles: ${planTileCount(WIDTH, HEIGHT)} (zoom 0–${planMaxZoom(WIDTH, HEIGHT)})`);
  console.log(`tiling: ${seconds.toFixed(1)} s (goal < 30 s)`);
  console.log(`event loop delay during the tiling: p99 ${loopP99Ms.toFixed(1)} ms, max ${loopMaxMs.toFixed(1)} ms (the loop is free when these stay near its 10 ms resolution)`);
  console.log(`peak memory of the tiling process (max RSS): ${mb(maxRssKb * 1024)} MB (goal < 1.5 GB)`);
  console.log(`original: ${mb(originalBytes)} MB`);
  console.log(`first view at ${VIEW.width} × ${VIEW.height}: zoom ${view.zoom}, ${view.tiles} tiles, ${(view.bytes / 1024).toFixed(0)} kB (goal < 1 MB), ${((view.bytes / originalBytes) * 100).toFixed(2)} % of the original`);
} finally {
  rmSync(dir, { recursive: true, force: true });
}
