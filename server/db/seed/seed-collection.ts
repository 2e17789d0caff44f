import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { daysAgo } from '../../../shared/calc/days.js';
import { pointInPolygon, type Point } from '../../../shared/calc/geometry.js';
import { objectNumberSortKey } from '../../../shared/calc/object-number.js';
import type { Config } from '../../config.js';
import { compartmentLabel } from '../../presenters/artifact.presenter.js';
import { searchDocumentOf } from '../../services/artifact-record.js';
import { MediaService } from '../../services/media.service.js';
import { FileStore } from '../../storage/file-store.js';
import type { CompartmentEntity } from '../entities/compartment.entity.js';
import { Store } from '../store.js';
import { DEMO_ARTIFACTS } from './demo-collection.js';
import { demoPhoto } from './demo-photos.js';


/** Spreads the n-th artifact of a compartment over a grid inside its outline. */
function pointIn(outline: Point[], index: number): Point | null {
  const xs = outline.map((p) => p[0]);
  const ys = outline.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const columns = 4;
  const point: Point = [x0 + ((index % columns) + 0.5) * ((x1 - x0) / columns), y0 + (Math.floor(index / columns) % 3 + 0.5) * ((y1 - y0) / 3)];
  return pointInPolygon(point, outline) ? point : null;
}

/**
 * The demo collection: artifacts across the demo ship's compartments with a location history,
 * and drawn photos sent through the same upload pipeline as real ones. Runs after the plans.
 */
export async function seedDemoCollection(dataSource: DataSource, config: Config): Promise<void> {
  const store = new Store(dataSource);
  const files = new FileStore(config.uploadsDir);
  const media = new MediaService(store, files);
  const curator = (await store.repos.users.findByEmail('curator@shipkeeper.test'))!;
  const viewer = { id: curator.id, email: curator.email, name: curator.name, role: curator.role };
  const [vessel] = await store.repos.vessels.listActive();
  if (!vessel) return;
  const rooms = new Map<string, CompartmentEntity>();
  for (const c of (await store.repos.compartments.page(vessel.id, { page: 1, pageSize: 100, sort: 'designation' })).items) rooms.set(c.designation, c);
  const perRoom = new Map<string, number>();
  const photos: { artifactId: number; kind: NonNullable<(typeof DEMO_ARTIFACTS)[number]['photo']>; seed: number; taken: Date; name: string }[] = [];

  await store.transaction(async (repos) => {
    for (const [i, demo] of DEMO_ARTIFACTS.entries()) {
      const room = demo.room ? rooms.get(demo.room) ?? null : null;
      const n = perRoom.get(demo.room ?? '') ?? 0;
      perRoom.set(demo.room ?? '', n + 1);
      const point = room?.outline && demo.placed !== false ? pointIn(room.outline, n) : null;
      // With a history, the record starts in its first place and the moves bring it to where it is now.
      const changes = Boolean(demo.moves?.length || demo.deaccessionReason);
      const startStatus = changes || !demo.status ? (room ? 'in-place' : 'in-store') : demo.status;
      const artifact = await repos.artifacts.create({
        vesselId: vessel.id,
        objectNumber: demo.number,
        objectNumberSort: objectNumberSortKey(demo.number),
        name: demo.name,
        category: demo.category,
        description: demo.description,
        dateOrPeriod: demo.date ?? '',
        maker: demo.maker ?? '',
        materials: demo.materials ?? '',
        height: demo.size?.[0] ?? null,
        width: demo.size?.[1] ?? null,
        depth: demo.size?.[2] ?? null,
        dimensionUnit: demo.size?.[3] ?? 'cm',
        significance: demo.significance ?? '',
        status: startStatus,
        deaccessionReason: null,
        compartmentId: room?.id ?? null,
        point,
        coverMediaId: null,
      });
      let place = { status: artifact.status, room, point };
      await repos.artifactMoves.create({
        artifactId: artifact.id, kind: 'recorded', movedOn: daysAgo(demo.recordedDaysAgo),
        fromStatus: null, fromCompartmentId: null, fromLabel: null, fromPoint: null,
        toStatus: place.status, toCompartmentId: place.room?.id ?? null, toLabel: compartmentLabel(place.room), toPoint: point,
        reason: 'Recorded in the collection', actorId: curator.id,
      });
      const moves = [...(demo.moves ?? [])];
      if (demo.deaccessionReason) moves.push({ after: Math.max(1, demo.recordedDaysAgo - 150), to: null, status: 'deaccessioned', reason: demo.deaccessionReason });
      for (const move of moves) {
        const room2 = move.to ? rooms.get(move.to) ?? null : null;
        const samePlace = room2?.id === place.room?.id;
        const point2 = samePlace ? place.point : room2?.outline && move.status === 'in-place' ? pointIn(room2.outline, 11) : null;
        await repos.artifactMoves.create({
          artifactId: artifact.id, kind: move.status === 'deaccessioned' ? 'deaccessioned' : samePlace ? 'status' : 'moved', movedOn: daysAgo(demo.recordedDaysAgo - move.after),
          fromStatus: place.status, fromCompartmentId: place.room?.id ?? null, fromLabel: compartmentLabel(place.room), fromPoint: place.point,
          toStatus: move.status, toCompartmentId: room2?.id ?? null, toLabel: compartmentLabel(room2), toPoint: point2,
          reason: move.reason, actorId: curator.id,
        });
        place = { status: move.status, room: room2, point: point2 };
      }
      Object.assign(artifact, { status: place.status, compartmentId: place.room?.id ?? null, point: place.point, deaccessionReason: demo.deaccessionReason ?? null });
      await repos.artifacts.save(artifact);
      await repos.search.put(searchDocumentOf(artifact));
      if (demo.photo) photos.push({ artifactId: artifact.id, kind: demo.photo, seed: i + 3, taken: new Date(`${daysAgo(demo.recordedDaysAgo - 2)}T10:30:00Z`), name: demo.name });
    }
  });

  for (const photo of photos) {
    const file = path.join(files.incoming, `demo-photo-${photo.artifactId}.jpg`);
    const jpeg = await demoPhoto(photo.kind, photo.seed, photo.taken);
    await writeFile(file, jpeg);
    const uploaded = await media.upload({ ownerType: 'artifact', ownerId: photo.artifactId }, { path: file, originalname: `${photo.name.toLowerCase().replace(/[^a-z0-9]+/g, '-')}.jpg`, size: jpeg.length }, viewer, { id: curator.id, ip: null });
    const row = (await store.repos.media.findById(uploaded.id))!;
    // Every other photo has its alt text, so the demo shows both states.
    Object.assign(row, { caption: `${photo.name}, as recorded on board`, credit: 'Demo drawing', rights: 'Demo content, no rights reserved', altText: photo.seed % 2 ? `Drawing standing in for a photograph of the ${photo.name.toLowerCase()}` : '', publicUse: true });
    await store.repos.media.save(row);
  }
}
