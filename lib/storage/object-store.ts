import 'server-only';

import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
} from '@aws-sdk/client-s3';

/**
 * Uploaded files (photos, lab-test files) live in an S3-compatible bucket. The demo and the tests
 * point these settings at a local fake on loopback; production at a real bucket.
 */
export function storageSettings() {
  return {
    endpoint: process.env.S3_ENDPOINT ?? 'http://127.0.0.1:4568',
    region: process.env.S3_REGION ?? 'us-east-1',
    bucket: process.env.S3_BUCKET ?? 'tenderline-uploads',
    accessKeyId: process.env.S3_ACCESS_KEY_ID ?? 'S3RVER',
    secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
    forcePathStyle: process.env.S3_FORCE_PATH_STYLE !== 'false',
  };
}

let cached: { key: string; client: S3Client } | undefined;

function client(): { client: S3Client; bucket: string } {
  const s = storageSettings();
  const key = JSON.stringify(s);
  if (cached?.key !== key) {
    cached = {
      key,
      client: new S3Client({
        endpoint: s.endpoint,
        region: s.region,
        forcePathStyle: s.forcePathStyle,
        credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
      }),
    };
  }
  return { client: cached.client, bucket: s.bucket };
}

/** Store bytes under a key (keys are made by the app, never taken from a file name). */
export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  const { client: c, bucket } = client();
  await c.send(
    new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType }),
  );
}

/** The bytes and type of an object, or null when there is none. */
export async function getObject(
  key: string,
): Promise<{ body: Buffer; contentType: string } | null> {
  const { client: c, bucket } = client();
  try {
    const out = await c.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    const bytes = await out.Body!.transformToByteArray();
    return { body: Buffer.from(bytes), contentType: out.ContentType ?? 'application/octet-stream' };
  } catch (error) {
    if (error instanceof NoSuchKey || (error as { name?: string }).name === 'NoSuchKey')
      return null;
    throw error;
  }
}

export async function deleteObject(key: string): Promise<void> {
  const { client: c, bucket } = client();
  await c.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
}
