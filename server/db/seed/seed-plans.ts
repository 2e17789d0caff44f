import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { Config } from '../../config.js';
import { PlanService } from '../../services/plan.service.js';
import { FileStore } from '../../storage/file-store.js';
import { Store } from '../store.js';
import { DEMO_COMPARTMENTS, DEMO_DECKS } from './demo-ship-map.js';
import { CENTERLINE_Y, DEMO_LAST_FRAME, demoOutline, drawDeckPlan, FRAME_SPACING_METRES, frameX } from './demo-plans.js';

/**
 * Draws and tiles a plan for each deck of the demo ship, calibrates it from its frames, and
 * draws the compartments on it. Runs after seedDemo, through the same plan pipeline as uploads.
 */
export async function seedDemoPlans(dataSource: DataSource, config: Config): Promise<void> {
  const store = new Store(dataSource);
  const files = new FileStore(config.uploadsDir);
  await files.ensure();
  const plans = new PlanService(store, files, config);
  const curator = (await store.repos.users.findByEmail('curator@shipkeeper.test'))!;
  const viewer = { id: curator.id, email: curator.email, name: curator.name, role: curator.role };
  const [vessel] = await store.repos.vessels.listActive();
  if (!vessel) return;
  for (const deck of await store.repos.decks.listForVessel(vessel.id)) {
    const spec = DEMO_DECKS.find((d) => d.name === deck.name);
    if (!spec) continue;
    const rooms = DEMO_COMPARTMENTS.filter((c) => c.deck === deck.name);
    const file = path.join(files.incoming, `demo-${deck.id}.png`);
    const png = await drawDeckPlan(`${vessel.name} — ${deck.name}`, rooms);
    await writeFile(file, png);
    await plans.upload(deck.id, { path: file, originalname: `${deck.name.toLowerCase().replace(/\s+/g, '-')}.png`, size: png.length }, viewer, { id: curator.id, ip: null });
    await plans.idle();
    await store.transaction(async (repos) => {
      const fresh = (await repos.decks.findById(deck.id))!;
      const a: [number, number] = [frameX(10), CENTERLINE_Y];
      const b: [number, number] = [frameX(110), CENTERLINE_Y];
      fresh.calibration = { method: 'frames', a, b, realMetres: 100 * FRAME_SPACING_METRES, frameSpaces: 100, frameSpacingMetres: FRAME_SPACING_METRES };
      fresh.metresPerUnit = (100 * FRAME_SPACING_METRES) / (b[0] - a[0] === 0 ? 1 : Math.abs(b[0] - a[0]));
      fresh.centerlineY = CENTERLINE_Y;
      fresh.frames = { referenceFrame: 0, referenceX: frameX(0), spacingMetres: FRAME_SPACING_METRES, lastFrame: DEMO_LAST_FRAME };
      fresh.bowTo = 'right';
      await repos.decks.save(fresh);
      for (const room of rooms) {
        const compartment = await repos.compartments.findByDesignation(vessel.id, room.designation.toUpperCase());
        if (!compartment) continue;
        compartment.outline = demoOutline(room);
        await repos.compartments.save(compartment);
      }
    });
  }
}
