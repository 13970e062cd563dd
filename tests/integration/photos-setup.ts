// Shared set-up of the photo tests: a fresh database, a test bucket, who is signed in, requests.
import { afterAll, beforeAll } from 'vitest';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestBucket } from '../support/bucket';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import * as photos from '@/app/api/cultivars/[slug]/photos/route';

export const SLUG = 'apple-jonathan';
export const UPLOAD_URL = `http://tenderline.test/api/cultivars/${SLUG}/photos`;
export type Who = 'signed-out' | 'admin' | 'editor' | 'engineer' | 'buyer';
export const WHO: Who[] = ['signed-out', 'admin', 'editor', 'engineer', 'buyer'];
export const ids: Record<Who, number | null> = {
  'signed-out': null,
  admin: 0,
  editor: 0,
  engineer: 0,
  buyer: 0,
};
export const params = <T>(p: T) => ({ params: Promise.resolve(p) });
export const jpeg = (bytes: Buffer, name = 'orchard-row-4.jpg') => ({
  bytes,
  name,
  type: 'image/jpeg',
});

/** Fresh database and bucket for the file; sign-in ids of the demo accounts. */
export function setUpPhotoTests() {
  let bucket: Awaited<ReturnType<typeof startTestBucket>>;
  beforeAll(async () => {
    await freshDatabase();
    bucket = await startTestBucket();
    for (const who of ['admin', 'editor', 'engineer', 'buyer'] as const) {
      ids[who] = await userId(ACCOUNTS[who]);
    }
  });
  afterAll(() => bucket.close());
}

export async function post(request: Request, who: Who = 'editor', slug = SLUG) {
  signInAs(ids[who]);
  const response = await photos.POST(request, params({ slug }));
  return { status: response.status, body: await response.json() };
}

export const uploadAs = (who: Who, parts: Parameters<typeof multipart>[1], headers = {}) =>
  post(multipart(UPLOAD_URL, parts, headers), who);

/** The keys in the test bucket (to prove a refused upload stored nothing). */
export async function bucketKeys(): Promise<string[]> {
  const client = new S3Client({
    endpoint: process.env.S3_ENDPOINT,
    region: 'us-east-1',
    forcePathStyle: true,
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
  });
  const out = await client.send(new ListObjectsV2Command({ Bucket: process.env.S3_BUCKET }));
  return (out.Contents ?? []).map((o) => o.Key!).sort();
}

/** Everything a refused upload must leave as it was: rows, audit entries, bucket objects. */
export async function stored() {
  const audits = await db('audit_log').where({ action: 'image.upload' }).count({ n: '*' });
  return {
    images: await countRows('images'),
    audits: Number(audits[0].n),
    keys: await bucketKeys(),
  };
}

export const multipart = (
  url: string,
  parts: { file?: { bytes: Buffer; name: string; type: string }; [field: string]: unknown },
  headers: Record<string, string> = {},
) => {
  const form = new FormData();
  for (const [key, value] of Object.entries(parts)) {
    if (key === 'file' && value) {
      const f = value as { bytes: Buffer; name: string; type: string };
      form.set('file', new File([new Uint8Array(f.bytes)], f.name, { type: f.type }));
    } else if (typeof value === 'string') form.set(key, value);
  }
  return new Request(url, { method: 'POST', body: form, headers });
};
