import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { storageSettings } from '@/lib/storage/object-store';

/** mulberry32: a small deterministic PRNG, uniform on [0, 1). */
export function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface CurveInputs {
  modulusPa: number;
  diameterM: number;
  poisson: number;
  /** plate travel step, mm, and number of steps after the first reading at 0 */
  stepMm: number;
  steps: number;
  seed?: number;
}

/**
 * A plate force–travel curve from the Hertz relation for a sphere of diameter d between two
 * parallel plates, each contact taking half the travel (K. L. Johnson, Contact Mechanics,
 * Cambridge University Press 1985, ch. 4): F = (d^½ / (3(1 − ν²))) E D^(3/2). With a seed, each
 * force gets ±2 % multiplicative and ±0.02 N additive uniform noise (never below 0 N).
 */
export function hertzCsv(c: CurveInputs): string {
  const random = c.seed === undefined ? null : mulberry32(c.seed);
  const k = (Math.sqrt(c.diameterM) / (3 * (1 - c.poisson ** 2))) * c.modulusPa;
  const lines = ['displacement_mm,force_n'];
  for (let i = 0; i <= c.steps; i++) {
    const dMm = i * c.stepMm;
    let force = k * (dMm / 1000) ** 1.5;
    if (random)
      force = Math.max(0, force * (1 + 0.04 * (random() - 0.5)) + 0.04 * (random() - 0.5));
    lines.push(`${dMm.toFixed(4)},${force.toFixed(4)}`);
  }
  return lines.join('\n') + '\n';
}

/** Invented inputs for the synthetic curve, not data: a 70 mm fruit, E = 2.5 MPa, ν = 0.35. */
export const CURVE: CurveInputs = {
  modulusPa: 2.5e6,
  diameterM: 0.07,
  poisson: 0.35,
  stepMm: 0.04,
  steps: 150,
};

/** A small valid curve with one row replaced (row numbers count the header as row 1). */
export function csvWithRow(row: number, line: string, header = 'displacement_mm,force_n'): string {
  const lines = [header];
  for (let i = 0; i < 40; i++) lines.push(`${(i * 0.1).toFixed(1)},${(i * i * 0.5).toFixed(2)}`);
  lines[row - 1] = line;
  return lines.join('\n') + '\n';
}

/** A multipart upload request, as the browser's form would send it. */
export function uploadRequest(
  file: BlobPart | null,
  fields: Record<string, string>,
  headers: Record<string, string> = {},
  fileName = 'test.csv',
): Request {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  if (file !== null) form.set('file', new File([file], fileName, { type: 'text/csv' }));
  return new Request('http://tenderline.test/api/cultivars/x/lab-tests', {
    method: 'POST',
    headers,
    body: form,
  });
}

export async function bucketKeys(): Promise<string[]> {
  const s = storageSettings();
  const client = new S3Client({
    endpoint: s.endpoint,
    region: s.region,
    forcePathStyle: true,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
  });
  const out = await client.send(new ListObjectsV2Command({ Bucket: s.bucket }));
  return (out.Contents ?? []).map((o) => o.Key!).sort();
}
