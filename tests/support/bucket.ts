import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startLocalBucket } from '@/scripts/local-bucket';

/** A fresh local bucket on a free loopback port; the app's storage settings point at it. */
export async function startTestBucket() {
  const directory = fs.mkdtempSync(path.join(os.tmpdir(), 'tenderline-s3-'));
  const bucket = await startLocalBucket({ port: 0, directory, bucket: 'tenderline-test' });
  process.env.S3_ENDPOINT = `http://127.0.0.1:${bucket.port}`;
  process.env.S3_BUCKET = 'tenderline-test';
  return {
    port: bucket.port,
    close: async () => {
      await bucket.close();
      fs.rmSync(directory, { recursive: true, force: true });
    },
  };
}
