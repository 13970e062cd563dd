// A local S3-compatible bucket (s3rver) on loopback for the demo and the tests; files under data/.
import path from 'node:path';
import S3rver from 's3rver';

export async function startLocalBucket(options: {
  port: number;
  directory: string;
  bucket: string;
}) {
  const server = new S3rver({
    address: '127.0.0.1',
    port: options.port,
    directory: path.resolve(options.directory),
    silent: true,
    configureBuckets: [{ name: options.bucket, configs: [] }],
  });
  const address = (await server.run()) as { port: number };
  return { port: address.port, close: () => server.close() };
}
