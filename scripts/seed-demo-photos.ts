// Invented demo photos for the demo's seeded cultivars: a stylised drawing per commodity, made
// with sharp from SVG and stored like any upload. The bucket runs only beside the server, so
// scripts/serve.ts calls this once the bucket is up; it does nothing if any photo exists.
import { DeleteObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { Knex } from 'knex';
import sharp from 'sharp';
import { demoDrawing } from '../lib/photos/demo-drawings';
import { storePhoto, type PhotoBucket } from '../lib/photos/store';

export const DEMO_CREDIT = 'Demo image, drawn for the demonstration';
/** The demo database's seed editor; a database without that account is not the demo. */
const DEMO_UPLOADER = 'editor@kestrelvale.example';

export interface BucketSettings {
  endpoint: string;
  bucket: string;
}

function bucketClient(settings: BucketSettings): PhotoBucket {
  const client = new S3Client({
    endpoint: settings.endpoint,
    region: process.env.S3_REGION ?? 'us-east-1',
    forcePathStyle: process.env.S3_FORCE_PATH_STYLE !== 'false',
    credentials: {
      accessKeyId: process.env.S3_ACCESS_KEY_ID ?? 'S3RVER',
      secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
    },
  });
  const Bucket = settings.bucket;
  return {
    put: async (Key, Body, ContentType) =>
      void (await client.send(new PutObjectCommand({ Bucket, Key, Body, ContentType }))),
    remove: async (Key) => void (await client.send(new DeleteObjectCommand({ Bucket, Key }))),
  };
}

const fromEnvironment = (): BucketSettings => ({
  endpoint: process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4568',
  bucket: process.env.S3_BUCKET ?? 'tenderline-uploads',
});

/** Store one demo photo per seeded cultivar if there are no photos yet; returns how many. */
export async function seedDemoPhotos(knex: Knex, settings = fromEnvironment()): Promise<number> {
  const [{ n }] = await knex('images').count({ n: '*' });
  if (Number(n) > 0) return 0;
  const uploader = await knex('users').where({ email: DEMO_UPLOADER }).first();
  if (!uploader) return 0;
  const cultivars = await knex('cultivars as c')
    .join('commodities as m', 'm.id', 'c.commodity_id')
    .select('c.id', 'c.slug', 'c.name', 'c.is_type', 'm.slug as m_slug', 'm.name as m_name')
    .orderBy('c.id');
  const bucket = bucketClient(settings);
  for (const c of cultivars) {
    const jpeg = await sharp(Buffer.from(demoDrawing(String(c.m_slug))))
      .jpeg({ quality: 88 })
      .toBuffer();
    await storePhoto(knex, bucket, {
      cultivarId: Number(c.id),
      cultivarSlug: String(c.slug),
      bytes: jpeg,
      caption: `${c.is_type ? c.m_name : `${c.m_name} (${c.name})`}: an invented drawing, not a photograph`,
      credit: DEMO_CREDIT,
      isDemo: true,
      uploadedBy: Number(uploader.id),
    });
  }
  return cultivars.length;
}
