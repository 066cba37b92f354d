import { readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { PHOTO_FULL_PX, PHOTO_MAX_BYTES, PHOTO_THUMB_PX } from '@shared/constants/photos';
import { Photo } from '@server/modules/photos/photo.entity';
import { resetDatabase } from '@tests/helpers/db';
import { jpegWithExif, png } from '@tests/helpers/images';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { makeTankVia, tankPeople } from './people';

describe('photos', () => {
  let t: TestApp;
  let p: Awaited<ReturnType<typeof tankPeople>>;
  let tank: string;
  let upload: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    for (const f of readdirSync(t.config.uploadsDir)) rmSync(join(t.config.uploadsDir, f));
    p = await tankPeople(t);
    tank = `/api/clubs/${p.club.id}/tanks/${(await makeTankVia(p.asKeeper, p.club.id)).id}`;
    upload = `${tank}/photos`;
  });
  const files = () => readdirSync(t.config.uploadsDir).sort();
  const photoUrl = (id: string, thumb = false) =>
    `/api/clubs/${p.club.id}/photos/${id}${thumb ? '/thumb' : ''}`;

  it('when a JPEG with EXIF and GPS is uploaded, then a WebP without any metadata is stored and served with safe headers (ASVS 5.2.2, 5.4.1)', async () => {
    const jpeg = await jpegWithExif(2400, 1800);
    expect((await sharp(jpeg).metadata()).exif?.length).toBeGreaterThan(0);
    const res = await p.asKeeper.upload(upload, [{ data: jpeg, name: 'IMG_0001.jpg', type: 'image/jpeg' }], {
      caption: 'Day one',
    });
    expect(res.status).toBe(201);
    const [photo] = res.body.photos;
    expect(photo).toMatchObject({
      caption: 'Day one',
      width: PHOTO_FULL_PX,
      height: 1200,
      url: photoUrl(photo.id),
      thumbUrl: photoUrl(photo.id, true),
      waterTestId: null,
      eventId: null,
    });
    const row = await t.dataSource.getRepository(Photo).findOneByOrFail({ id: photo.id });
    expect(row.originalType).toBe('image/jpeg');
    expect(files()).toEqual([`${row.storageKey}.thumb.webp`, `${row.storageKey}.webp`]);

    const full = await p.asMentor.get(photoUrl(photo.id));
    expect(full.status).toBe(200);
    expect(full.headers['content-type']).toBe('image/webp');
    expect(full.headers['x-content-type-options']).toBe('nosniff');
    expect(full.headers['content-disposition']).toBe('inline; filename="photo.webp"');
    expect(full.headers['cache-control']).toMatch(/^private/);
    const meta = await sharp(full.body as Buffer).metadata();
    expect(meta).toMatchObject({ format: 'webp', width: PHOTO_FULL_PX, height: 1200 });
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    const thumb = await sharp((await p.asKeeper.get(photoUrl(photo.id, true))).body as Buffer).metadata();
    expect(thumb).toMatchObject({ format: 'webp', width: PHOTO_THUMB_PX });
    expect(thumb.exif).toBeUndefined();
  });

  it('when a PNG is named .jpg and declared as a JPEG, then the bytes decide: it is accepted as a PNG and stored as WebP', async () => {
    const res = await p.asKeeper.upload(upload, [
      { data: await png(), name: 'holiday.jpg', type: 'image/jpeg' },
    ]);
    expect(res.status).toBe(201);
    const row = await t.dataSource.getRepository(Photo).findOneByOrFail({ id: res.body.photos[0].id });
    expect(row.originalType).toBe('image/png');
    expect((await sharp((await p.asKeeper.get(photoUrl(row.id))).body as Buffer).metadata()).format).toBe(
      'webp',
    );
  });

  it('when a text file is named .png, then 400 says it is not a picture and nothing is stored', async () => {
    const res = await p.asKeeper.upload(upload, [
      {
        data: Buffer.from('just some notes about the tank\n'.repeat(20)),
        name: 'notes.png',
        type: 'image/png',
      },
    ]);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('"notes.png" is not a JPEG, PNG or WebP picture.');
    expect(res.body.issues).toEqual([{ path: 'photos.0', message: 'Choose a JPEG, PNG or WebP picture.' }]);
    expect(await t.dataSource.getRepository(Photo).count()).toBe(0);
    expect(files()).toEqual([]);
  });

  it('when a file starts like a JPEG but is damaged, then 400 says it could not be read', async () => {
    const jpeg = await jpegWithExif();
    const res = await p.asKeeper.upload(upload, [
      { data: Buffer.concat([jpeg.subarray(0, 400), Buffer.alloc(2000, 7)]), name: 'broken.jpg' },
    ]);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('"broken.jpg" could not be read as a picture: it may be damaged.');
    expect(files()).toEqual([]);
  });

  it('when a file is over 10 MB, then 413 with a clear message and nothing is stored', async () => {
    const big = Buffer.concat([await png(), Buffer.alloc(PHOTO_MAX_BYTES)]);
    const res = await p.asKeeper.upload(upload, [{ data: big, name: 'huge.png', type: 'image/png' }]);
    expect(res.status).toBe(413);
    expect(res.body.error).toEqual({
      code: 'too_large',
      message: 'A photo is larger than 10 MB. Choose a smaller one.',
    });
    expect(await t.dataSource.getRepository(Photo).count()).toBe(0);
    expect(files()).toEqual([]);
  });

  it('when more than 4 files, no file, or a form without CSRF token is sent, then it is refused', async () => {
    const one = { data: await png(), name: 'a.png', type: 'image/png' };
    expect((await p.asKeeper.upload(upload, [one, one, one, one, one])).status).toBe(400);
    const none = await p.asKeeper.upload(upload, [], { caption: 'nothing attached' });
    expect(none.status).toBe(400);
    expect(none.body.error.message).toBe('Attach at least one photo.');
    const { default: request } = await import('supertest');
    const noToken = await request(t.app)
      .post(upload)
      .set('Cookie', p.asKeeper.cookies)
      .attach('photos', one.data, 'a.png');
    expect(noToken.status).toBe(403);
    expect(await t.dataSource.getRepository(Photo).count()).toBe(0);
  });

  it('when a photo is attached to a test of another tank, then 400 and the files already written are removed', async () => {
    const other = await makeTankVia(p.asKeeper, p.club.id, {
      name: 'Second tank',
      systemType: 'coldwater',
      volume: { source: 'entered', value: 90 },
    });
    const test = await p.asKeeper.post(`/api/clubs/${p.club.id}/tanks/${other.id}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { pH: { value: 7.6 } },
    });
    const res = await p.asKeeper.upload(upload, [{ data: await png(), name: 'a.png' }], {
      waterTestId: test.body.waterTest.id,
    });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { path: 'waterTestId', message: 'That water test is not on this tank.' },
    ]);
    expect(files()).toEqual([]);
  });

  it('when photos belong to a water test, then the test shows them; deleting the test deletes their files', async () => {
    const test = await p.asKeeper.post(`${tank}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { nitrate: { value: 10, unit: 'mg/L NO3' } },
    });
    const testId = test.body.waterTest.id as string;
    const res = await p.asKeeper.upload(
      upload,
      [
        { data: await png(), name: 'strip.png' },
        { data: await jpegWithExif(), name: 'kit.jpg' },
      ],
      { waterTestId: testId },
    );
    expect(res.status).toBe(201);
    expect(res.body.photos.map((x: { waterTestId: string }) => x.waterTestId)).toEqual([testId, testId]);
    expect((await p.asMentor.get(`${tank}/water-tests/${testId}`)).body.waterTest.photos).toHaveLength(2);
    expect((await p.asMentor.get(`${tank}/photos?waterTestId=${testId}`)).body.photos).toHaveLength(2);
    expect(files()).toHaveLength(4);
    expect((await p.asKeeper.delete(`${tank}/water-tests/${testId}`)).status).toBe(204);
    expect(files()).toEqual([]);
  });

  it('when someone who may not read the tank asks for a photo, then 403 inside the club and 404 from another club', async () => {
    const res = await p.asKeeper.upload(upload, [{ data: await png(), name: 'a.png' }]);
    const id = res.body.photos[0].id as string;
    expect((await p.asNeighbour.get(photoUrl(id))).status).toBe(403);
    expect((await p.asNeighbour.get(photoUrl(id, true))).status).toBe(403);
    expect((await p.asStranger.get(photoUrl(id))).status).toBe(404);
    expect((await p.asStranger.get(`/api/clubs/${p.other.id}/photos/${id}`)).status).toBe(404);
    expect((await p.asNeighbour.upload(upload, [{ data: await png(), name: 'b.png' }])).status).toBe(403);
    expect((await p.asMentor.delete(photoUrl(id))).status).toBe(403);
    expect((await p.asKeeper.delete(photoUrl(id))).status).toBe(204);
    expect(files()).toEqual([]);
  });
});
