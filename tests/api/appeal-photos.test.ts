import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppealEntity } from '../../server/db/entities/appeal.entity.js';
import { MediaEntity } from '../../server/db/entities/media.entity.js';
import { buildAppeal } from '../support/giving.js';
import { createTestApp, type TestApp } from '../support/test-app.js';

let ctx: TestApp;
let seeded: Awaited<ReturnType<typeof buildAppeal>>;
let photo: MediaEntity;

beforeAll(async () => {
  ctx = await createTestApp({}, { mail: false });
  seeded = await buildAppeal(ctx.store);
  const media = ctx.dataSource.getRepository(MediaEntity);
  photo = await media.save(media.create({
    vesselId: seeded.vessel.id, ownerType: 'compartment', ownerId: 1, kind: 'photo', mimeType: 'image/jpeg', fileName: 'gauges.jpg',
    byteSize: 1, sha256: '0'.repeat(64), storageKey: 'media/missing.jpg', width: 10, height: 10, takenAt: null,
    caption: 'The gauge board', credit: '', altText: 'A gauge board with two broken glasses', publicUse: true, rights: '', uploadedById: null,
  }));
  await ctx.dataSource.getRepository(AppealEntity).update(seeded.appeal.id, { photos: [{ mediaId: photo.id, altText: photo.altText, caption: photo.caption }] });
});
afterAll(() => ctx.close());

const page = () => request(ctx.app).get('/api/v1/visit/appeals/gauge-board');
const list = () => request(ctx.app).get('/api/v1/visit/appeals');

describe('the photos of a public appeal', () => {
  it('are shown while marked for public use with alt text', async () => {
    const res = await page();
    expect(res.status).toBe(200);
    expect(res.body.photos).toHaveLength(1);
    expect(res.body.coverPhoto.url).toBe(`/api/v1/visit/appeals/gauge-board/photos/${photo.id}`);
  });

  it('leave the page, the list and the photo route once withdrawn from public use after publishing', async () => {
    await ctx.dataSource.getRepository(MediaEntity).update(photo.id, { publicUse: false });
    const res = await page();
    expect(res.body.photos).toEqual([]);
    expect(res.body.coverPhoto).toBeNull();
    expect((await list()).body.items[0].coverPhoto).toBeNull();
    expect((await request(ctx.app).get(`/api/v1/visit/appeals/gauge-board/photos/${photo.id}`)).status).toBe(404);
  });

  it('leave the page when their alt text is emptied', async () => {
    await ctx.dataSource.getRepository(MediaEntity).update(photo.id, { publicUse: true, altText: '' });
    expect((await page()).body.photos).toEqual([]);
    expect((await request(ctx.app).get(`/api/v1/visit/appeals/gauge-board/photos/${photo.id}`)).status).toBe(404);
  });
});
