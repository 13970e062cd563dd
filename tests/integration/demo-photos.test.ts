import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { countRows, freshDatabase } from '../support/db';
import { startTestBucket } from '../support/bucket';
import { db } from '@/lib/db';
import { getObject } from '@/lib/storage/object-store';
import { seedDemoPhotos } from '@/scripts/seed-demo-photos';

describe('demo photos', () => {
  let bucket: Awaited<ReturnType<typeof startTestBucket>>;
  const settings = () => ({ endpoint: process.env.S3_ENDPOINT!, bucket: process.env.S3_BUCKET! });
  beforeAll(async () => {
    await freshDatabase();
    bucket = await startTestBucket();
  });
  afterAll(() => bucket.close());

  it('gives every seeded cultivar one drawing, labelled demo, once', async () => {
    const cultivars = await countRows('cultivars');
    expect(await countRows('images')).toBe(0);
    expect(await seedDemoPhotos(db, settings())).toBe(cultivars);
    expect(await seedDemoPhotos(db, settings())).toBe(0); // a second start adds none
    const rows = await db('images as i')
      .join('cultivars as c', 'c.id', 'i.cultivar_id')
      .select('i.*', 'c.slug');
    expect(rows).toHaveLength(cultivars);
    for (const row of rows) {
      expect(Boolean(row.is_demo)).toBe(true);
      expect(row.credit).toBe('Demo image, drawn for the demonstration');
      expect(row.caption).toMatch(/: an invented drawing, not a photograph$/);
    }
    const jonathan = rows.find((r) => r.slug === 'apple-jonathan')!;
    expect(jonathan.caption).toBe('Apple (Jonathan): an invented drawing, not a photograph');
    expect([jonathan.width, jonathan.height]).toEqual([1200, 900]);
    const card = (await getObject(`${jonathan.storage_prefix}/card.webp`))!;
    const meta = await sharp(card.body).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['webp', 480, 360]); // 1200 × 900 × 0.4
  });
});
