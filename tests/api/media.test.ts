import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import { readdir } from 'node:fs/promises';
import exifr from 'exifr';
import sharp from 'sharp';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addArtifact, deckWithCompartments } from '../support/collection.js';
import { buildVessel } from '../support/factories.js';
import { signedInAs, type Client } from '../support/http.js';
import { cameraJpeg, tinyPdf } from '../support/images.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let curator: Client;
let vesselId: number;
let artifactId: number;

beforeEach(async () => {
  ctx = await createTestApp({ mediaMaxBytes: 200_000 }, { mail: false });
  curator = (await signedInAs(ctx.app, ctx.store, 'curator')).client;
  vesselId = (await buildVessel(ctx.store, { designationScheme: 'us-navy-1949' })).id;
  const place = await deckWithCompartments(ctx.store, curator, vesselId);
  artifactId = (await addArtifact(curator, vesselId, { objectNumber: '2019.4.12', compartmentId: place.first })).id;
});
afterEach(() => ctx.close());

function uploadTo(client: Client, ownerId: number, content: Buffer, filename: string, ownerType = 'artifact') {
  return client.agent.post(`/api/v1/media?ownerType=${ownerType}&ownerId=${ownerId}`).set('x-csrf-token', client.csrf).attach('file', content, filename);
}

async function filesUnder(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true }).catch(() => []);
  return entries.filter((e) => e.isFile()).map((e) => e.name);
}

describe('photos', () => {
  it('turns the photo upright, reads the date taken, and strips GPS and every other EXIF tag from the derivatives', async () => {
    const original = await cameraJpeg();
    // The fixture carries what a phone would: orientation 6, a position, a camera.
    expect((await exifr.gps(original))?.latitude).toBeCloseTo(51.5, 6);

    const res = await uploadTo(curator, artifactId, original, 'gauge.jpg');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ kind: 'photo', mimeType: 'image/jpeg', width: 200, height: 400, takenAt: '2024-05-17T14:03:22', publishable: false });

    for (const variant of ['thumb', 'display'] as const) {
      const file = await curator.getBytes(res.body.urls[variant]);
      expect(file.headers['content-type']).toBe('image/webp');
      const body = file.body as Buffer;
      const meta = await sharp(body).metadata();
      expect(meta.format).toBe('webp');
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.orientation).toBeUndefined();
      expect(await exifr.parse(body).catch(() => undefined)).toBeUndefined();
      // Upright: portrait, with the original's left (red) half now on top.
      expect(meta.height!).toBeGreaterThan(meta.width!);
      const { data, info } = await sharp(body).raw().toBuffer({ resolveWithObject: true });
      const top = (Math.floor(info.height * 0.25) * info.width + Math.floor(info.width / 2)) * info.channels;
      expect(data[top]!).toBeGreaterThan(150);
      expect(data[top + 2]!).toBeLessThan(100);
    }
    // The original stays as uploaded (EXIF and all), for staff.
    const kept = await curator.get(res.body.urls.original);
    expect(kept.status).toBe(200);

    // The artifact's cover is its first photo.
    const artifact = (await curator.get(`/api/v1/artifacts/${artifactId}`)).body;
    expect(artifact.cover).toMatchObject({ mediaId: res.body.id, url: res.body.urls.thumb });
    expect(artifact.version).toBe(1);
  });

  it('requires alt text before a photo counts as publishable, and answers a stale edit with 409', async () => {
    const photo = (await uploadTo(curator, artifactId, await cameraJpeg(), 'a.jpg')).body;
    const described = await curator.patch(`/api/v1/media/${photo.id}`, { caption: 'Gauge on the boiler front', altText: 'Round brass pressure gauge', credit: 'Museum staff', version: photo.version });
    // alt text alone publishes nothing: a person marks the photo for public use
    expect(described.body).toMatchObject({ publishable: false, publicUse: false, caption: 'Gauge on the boiler front' });
    const marked = await curator.patch(`/api/v1/media/${photo.id}`, { publicUse: true, version: described.body.version });
    expect(marked.body).toMatchObject({ publishable: true, publicUse: true });
    const unlabelled = await curator.patch(`/api/v1/media/${photo.id}`, { altText: '', version: marked.body.version });
    expect(unlabelled.body).toMatchObject({ publishable: false, publicUse: true });
    const edited = { body: { version: unlabelled.body.version } };
    expect(edited.body.version).toBeGreaterThan(photo.version);
    const stale = await curator.patch(`/api/v1/media/${photo.id}`, { rights: 'CC BY 4.0', version: photo.version });
    expect(stale.status).toBe(409);
    expect(stale.body.error.fields.caption).toBeDefined();
  });

  it('keeps a PDF as a document without previews', async () => {
    const res = await uploadTo(curator, artifactId, tinyPdf(), 'manual.pdf');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'document', mimeType: 'application/pdf', urls: { thumb: null, display: null } });
    expect((await curator.get(`/api/v1/media/${res.body.id}/thumb`)).status).toBe(404);
    expect((await curator.get(res.body.urls.original)).headers['content-type']).toBe('application/pdf');
  });
});

describe('bad uploads lose nothing and keep nothing', () => {
  it('answers 415 for a file that is not what its name claims, and 413 for one too large', async () => {
    const fake = await uploadTo(curator, artifactId, Buffer.from('<html><script>alert(1)</script></html>'), 'photo.jpg');
    expect(fake.status).toBe(415);
    expect(fake.body.error).toMatchObject({ code: 'unsupported_media_type', fields: { file: expect.any(String) } });
    const huge = await uploadTo(curator, artifactId, Buffer.concat([await cameraJpeg(), Buffer.alloc(300_000)]), 'big.jpg');
    expect(huge.status).toBe(413);
    // The limit of this test app is 200,000 bytes.
    expect(huge.body.error.message).toBe('The file is larger than 0.2 MB, the most this server accepts for a photo or document.');
    // A JPEG header with nothing decodable after it.
    const broken = await uploadTo(curator, artifactId, Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46, 0, 1, 1, 0, 0, 1, 0, 1, 0, 0]), 'broken.jpg');
    expect(broken.status).toBe(415);
    expect(await ctx.store.repos.media.countForOwner('artifact', artifactId)).toBe(0);
    expect(await filesUnder(ctx.config.uploadsDir)).toEqual([]);
  });

  it('leaves no row and no file when the upload is cut off half way', async () => {
    const server = ctx.app.listen(0);
    const port = (server.address() as AddressInfo).port;
    try {
      const jar = (curator.agent as unknown as { jar: { getCookies(access: object): { toValueString(): string }[] } }).jar;
      const cookie = jar.getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false }).map((c) => c.toValueString()).join('; ');
      let partial: string[] = [];
      const boundary = 'cutoff-boundary';
      await new Promise<void>((resolve) => {
        const req = httpRequest({
          port,
          method: 'POST',
          path: `/api/v1/media?ownerType=artifact&ownerId=${artifactId}`,
          headers: { 'content-type': `multipart/form-data; boundary=${boundary}`, 'content-length': '150000', 'x-csrf-token': curator.csrf, cookie },
        });
        req.on('error', () => resolve());
        req.write(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="half.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`);
        req.write(Buffer.alloc(60_000, 0xff), () =>
          setTimeout(async () => {
            partial = await filesUnder(ctx.files.incoming);
            req.destroy();
            resolve();
          }, 150),
        );
      });
      // The request was accepted and half of the file was on disk when the connection broke.
      expect(partial).toHaveLength(1);
      // Give the server a moment to notice the broken connection and clean up.
      await new Promise((r) => setTimeout(r, 300));
      expect(await ctx.store.repos.media.countForOwner('artifact', artifactId)).toBe(0);
      expect(await filesUnder(ctx.config.uploadsDir)).toEqual([]);
    } finally {
      server.close();
    }
  });

  it('lets only roles that may change the record upload, and deletes with an audit event and the files', async () => {
    const docent = (await signedInAs(ctx.app, ctx.store, 'docent')).client;
    expect((await uploadTo(docent, artifactId, await cameraJpeg(), 'a.jpg')).status).toBe(403);
    const conservator = (await signedInAs(ctx.app, ctx.store, 'conservator')).client;
    const refused = await uploadTo(conservator, artifactId, await cameraJpeg(), 'a.jpg');
    expect(refused.status).toBe(403);
    expect(await filesUnder(ctx.config.uploadsDir)).toEqual([]);
    expect((await uploadTo(curator, 999999, await cameraJpeg(), 'a.jpg')).status).toBe(404);

    const photo = (await uploadTo(curator, artifactId, await cameraJpeg(), 'a.jpg')).body;
    expect((await filesUnder(ctx.config.uploadsDir)).sort()).toEqual(['display.webp', 'original.jpg', 'thumb.webp']);
    expect((await curator.send('delete', `/api/v1/media/${photo.id}`)).status).toBe(204);
    expect(await filesUnder(ctx.config.uploadsDir)).toEqual([]);
    expect((await curator.get(`/api/v1/artifacts/${artifactId}`)).body.cover).toBeNull();
    const events = await ctx.store.repos.auditEvents.latestFor('media', photo.id, 5);
    expect(events.map((e) => e.action)).toEqual(['delete', 'upload']);
  });
});
