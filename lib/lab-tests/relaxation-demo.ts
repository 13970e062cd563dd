import { createHash } from 'node:crypto';

/** Where the page offers the demo file (public/, made by scripts/relaxation-demo.ts). */
export const RELAXATION_DEMO_PATH = '/samples/relaxation-demo.csv';

/** SHA-256 of public/samples/relaxation-demo.csv; tests/lib/lab-tests keeps the two in step. */
export const RELAXATION_DEMO_SHA256 =
  '6ab836a07486a4ee79d27cdeac260bf92af4a8d6f0852c5ac43853a5f5810cda';

/**
 * An upload byte for byte the demo file is recorded as a demo, so a draft from it cites a 'demo'
 * source, never a 'report': invented readings must not pass for a measurement.
 */
export function isRelaxationDemoFile(bytes: Uint8Array): boolean {
  return createHash('sha256').update(bytes).digest('hex') === RELAXATION_DEMO_SHA256;
}
