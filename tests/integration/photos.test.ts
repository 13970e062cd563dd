import { describe, expect, it } from 'vitest';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { cameraJpeg, webpChunks } from './photos-files';
import {
  bucketKeys,
  ids,
  jpeg,
  params,
  SLUG,
  stored,
  uploadAs,
  setUpPhotoTests,
  WHO,
  type Who,
} from './photos-setup';
import { signInAs } from '../support/session';
import { db } from '@/lib/db';
import { deleteObject, getObject } from '@/lib/storage/object-store';
import { storePhoto } from '@/lib/photos/store';
import * as list from '@/app/api/cultivars/[slug]/photos/route';
import * as serve from '@/app/api/photos/[id]/[variant]/route';

setUpPhotoTests();

describe('a photo upload', () => {
  it('turns a camera JPEG into three WebP variants without its EXIF or GPS data', async () => {
    const source = await cameraJpeg(2400, 1600);
    const before = await sharp(source).metadata();
    expect(before.exif?.toString('latin1')).toContain('Kestrel Vale test'); // the input has EXIF
    const before_keys = await bucketKeys();

    const { status, body } = await uploadAs('editor', {
      file: jpeg(source),
      caption: 'Jonathan on the tree, week 3 of harvest',
      credit: 'Packhouse lab',
    });
    expect(status).toBe(201);
    expect(body.photo).toMatchObject({ widthPx: 2400, heightPx: 1600, demo: false });
    const row = await db('images').where({ id: body.photo.id }).first();
    expect(row).toMatchObject({
      original_type: 'image/jpeg',
      width: 2400,
      height: 1600,
      bytes: source.length,
      caption: 'Jonathan on the tree, week 3 of harvest',
      credit: 'Packhouse lab',
      uploaded_by: ids.editor,
    });
    expect(Boolean(row.is_demo)).toBe(false);
    expect(row.storage_prefix).toMatch(/^photos\/\d+\/[0-9a-f]{32}$/);
    const audit = await db('audit_log').where({ action: 'image.upload' }).orderBy('id', 'desc');
    expect(audit[0]).toMatchObject({ entity: 'image', entity_id: String(body.photo.id) });

    const added = (await bucketKeys()).filter((k) => !before_keys.includes(k));
    expect(added).toEqual(['card', 'full', 'thumb'].map((v) => `${row.storage_prefix}/${v}.webp`));
    // Fit inside 1600/480/160 px squares: 2400 × 1600 scales by 2/3, 1/5 and 1/15; 1600 × 2/3 =
    // 1066.7 and 1600 / 15 = 106.7 round to the nearest pixel (±1 px allowed for that rounding).
    const expected = { full: [1600, 1067], card: [480, 320], thumb: [160, 107] };
    for (const [variant, [w, h]] of Object.entries(expected)) {
      const object = (await getObject(`${row.storage_prefix}/${variant}.webp`))!;
      expect(await fileTypeFromBuffer(object.body)).toEqual({ ext: 'webp', mime: 'image/webp' });
      const meta = await sharp(object.body).metadata();
      expect(Math.abs(meta.width! - w)).toBeLessThanOrEqual(1);
      expect(Math.abs(meta.height! - h)).toBeLessThanOrEqual(1);
      expect([meta.exif, meta.xmp, meta.icc, meta.iptc, meta.orientation]).toEqual([
        undefined,
        undefined,
        undefined,
        undefined,
        undefined,
      ]);
      expect(webpChunks(object.body).filter((c) => !c.startsWith('VP8'))).toEqual([]);
      expect(object.body.toString('latin1')).not.toMatch(/Exif|Kestrel Vale|Orchard test/);
    }
  });

  it('applies the EXIF orientation to the pixels and never enlarges a small image', async () => {
    // 300 × 200 tagged "rotate 90°" (orientation 6) is seen as 200 × 300.
    const { status, body } = await uploadAs('admin', { file: jpeg(await cameraJpeg(300, 200, 6)) });
    expect(status).toBe(201);
    expect([body.photo.widthPx, body.photo.heightPx]).toEqual([200, 300]);
    const prefix = (await db('images').where({ id: body.photo.id }).first()).storage_prefix;
    // 300 px fits 480 and 1600 as it is; into 160 it scales by 160/300: 200 → 106.7 (±1 px).
    const expected = { full: [200, 300], card: [200, 300], thumb: [107, 160] };
    for (const [variant, [w, h]] of Object.entries(expected)) {
      const meta = await sharp((await getObject(`${prefix}/${variant}.webp`))!.body).metadata();
      expect(Math.abs(meta.width! - w)).toBeLessThanOrEqual(1);
      expect(Math.abs(meta.height! - h)).toBeLessThanOrEqual(1);
    }
  });

  it('takes PNG and WebP too, recording the type read from the bytes', async () => {
    const image = sharp({ create: { width: 64, height: 48, channels: 3, background: '#6a8f3a' } });
    for (const [bytes, type] of [
      [await image.clone().png().toBuffer(), 'image/png'],
      [await image.clone().webp().toBuffer(), 'image/webp'],
    ] as const) {
      // The declared type and name say JPEG; the stored type is what the bytes are.
      const { status, body } = await uploadAs('editor', { file: jpeg(bytes, 'leaf.jpg') });
      expect(status).toBe(201);
      expect(body.photo.originalType).toBe(type);
    }
  });

  it('removes the stored objects again when the database write fails', async () => {
    const before = await stored();
    const calls: string[] = [];
    const recording = {
      put: async (key: string) => void calls.push(`put ${key.split('/').pop()}`),
      remove: async (key: string) => void calls.push(`remove ${key.split('/').pop()}`),
    };
    const photo = {
      cultivarId: 999_999, // no such cultivar: the foreign key refuses the images row
      cultivarSlug: 'none',
      bytes: await cameraJpeg(40, 30),
      caption: null,
      credit: null,
      isDemo: false,
      uploadedBy: ids.editor!,
    };
    await expect(storePhoto(db, recording, photo)).rejects.toThrow();
    expect(calls.filter((c) => c.startsWith('put'))).toHaveLength(3);
    expect(calls.filter((c) => c.startsWith('remove')).sort()).toEqual([
      'remove card.webp',
      'remove full.webp',
      'remove thumb.webp',
    ]);
    expect(await stored()).toEqual(before);
  });
});

const get = async (who: Who, id: string, variant: string) => {
  signInAs(ids[who]);
  return serve.GET(
    new Request(`http://tenderline.test/api/photos/${id}/${variant}`),
    params({ id, variant }),
  );
};

describe('serving a photo', () => {
  it('answers WebP that the browser may keep privately and must not sniff', async () => {
    const { body } = await uploadAs('editor', { file: jpeg(await cameraJpeg(800, 600)) });
    const response = await get('buyer', String(body.photo.id), 'card');
    expect(response.status).toBe(200);
    expect(Object.fromEntries(response.headers)).toMatchObject({
      'content-type': 'image/webp',
      'x-content-type-options': 'nosniff',
      'cache-control': 'private, max-age=86400, immutable',
      'content-disposition': 'inline',
    });
    const bytes = Buffer.from(await response.arrayBuffer());
    expect(await fileTypeFromBuffer(bytes)).toEqual({ ext: 'webp', mime: 'image/webp' });
    expect((await sharp(bytes).metadata()).width).toBe(480); // 800 × 600 fits 480 as 480 × 360
  });

  it('a malformed id is a 400; an unknown id, variant or missing object a 404', async () => {
    const { body } = await uploadAs('editor', { file: jpeg(await cameraJpeg(50, 50)) });
    const id = String(body.photo.id);
    for (const bad of ['abc', '0', '0x1', '-1', '1.5', '007']) {
      expect((await get('engineer', bad, 'card')).status, bad).toBe(400);
    }
    expect((await get('engineer', '999999', 'card')).status).toBe(404);
    for (const variant of ['original', 'full.webp', 'CARD', '..']) {
      expect((await get('engineer', id, variant)).status, variant).toBe(404);
    }
    const prefix = (
      await db('images')
        .where({ id: Number(id) })
        .first()
    ).storage_prefix;
    await deleteObject(`${prefix}/thumb.webp`);
    expect((await get('engineer', id, 'thumb')).status).toBe(404);
    expect((await get('engineer', id, 'full')).status).toBe(200);
  });
});

/**
 * Who may do what, written out by hand: every signed-in role sees photos; only admins and
 * editors upload them; signed-out visitors get 401 everywhere.
 */
describe('role expectations of the photo routes', () => {
  const EXPECT: Record<string, Record<Who, number>> = {
    'GET /api/cultivars/[slug]/photos': {
      'signed-out': 401,
      admin: 200,
      editor: 200,
      engineer: 200,
      buyer: 200,
    },
    'POST /api/cultivars/[slug]/photos': {
      'signed-out': 401,
      admin: 201,
      editor: 201,
      engineer: 403,
      buyer: 403,
    },
    'GET /api/photos/[id]/[variant]': {
      'signed-out': 401,
      admin: 200,
      editor: 200,
      engineer: 200,
      buyer: 200,
    },
  };

  it('each identity gets the status written above', async () => {
    const { body } = await uploadAs('editor', { file: jpeg(await cameraJpeg(40, 40)) });
    const photoId = String(body.photo.id);
    const file = jpeg(await cameraJpeg(40, 40));
    const calls: Record<string, (who: Who) => Promise<number>> = {
      'GET /api/cultivars/[slug]/photos': async (who) => {
        signInAs(ids[who]);
        const request = new Request(`http://tenderline.test/api/cultivars/${SLUG}/photos`);
        return (await list.GET(request, params({ slug: SLUG }))).status;
      },
      'POST /api/cultivars/[slug]/photos': async (who) => (await uploadAs(who, { file })).status,
      'GET /api/photos/[id]/[variant]': async (who) => (await get(who, photoId, 'thumb')).status,
    };
    const seen: Record<string, Record<string, number>> = {};
    for (const [route, call] of Object.entries(calls)) {
      seen[route] = {};
      for (const who of WHO) seen[route][who] = await call(who);
    }
    expect(seen).toEqual(EXPECT);
  });

  it('the list names each photo with its variant addresses', async () => {
    signInAs(ids.buyer);
    const request = new Request(`http://tenderline.test/api/cultivars/${SLUG}/photos`);
    const { photos } = await (await list.GET(request, params({ slug: SLUG }))).json();
    expect(photos.length).toBe(await countImages());
    expect(photos[0].urls).toEqual({
      thumb: `/api/photos/${photos[0].id}/thumb`,
      card: `/api/photos/${photos[0].id}/card`,
      full: `/api/photos/${photos[0].id}/full`,
    });
  });
});

async function countImages() {
  const cultivar = await db('cultivars').where({ slug: SLUG }).first();
  const [{ n }] = await db('images').where({ cultivar_id: cultivar.id }).count({ n: '*' });
  return Number(n);
}
