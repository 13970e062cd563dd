import { signInAs } from '../support/session';
import { countRows } from '../support/db';
import type { Role } from '@/lib/auth/roles';
import * as uploads from '@/app/api/cultivars/[slug]/relaxation-tests/route';
import * as draft from '@/app/api/relaxation-tests/[id]/draft/route';
import { bucketKeys, uploadRequest } from './lab-tests-support';

export const SLUG = 'apple-jonathan';
export const ORIGIN = { origin: 'http://tenderline.test' };
export const FIELDS = { deformationMm: '5', specimen: 'whole fruit between flat plates' };
export const params = <T>(p: T) => ({ params: Promise.resolve(p) });

export type Who = Role | 'signed-out';
export const ids: Partial<Record<Role, number>> = {};
export const as = (who: Who) => signInAs(who === 'signed-out' ? null : ids[who]!);

/** POST a relaxation file with the form's fields, as the browser's form sends it. */
export async function upload(
  file: BlobPart | null,
  fields: Record<string, string> = FIELDS,
  headers: Record<string, string> = ORIGIN,
  fileName = 'relax.csv',
  slug = SLUG,
) {
  const request = uploadRequest(file, fields, headers, fileName);
  const response = await uploads.POST(request, params({ slug }));
  return { status: response.status, body: await response.json() };
}

export const startDraft = (id: number, headers: Record<string, string> = ORIGIN) =>
  draft.POST(
    new Request('http://tenderline.test/api', {
      method: 'POST',
      headers: { 'content-type': 'application/json', ...headers },
      body: '{}',
    }),
    params({ id: String(id) }),
  );

/** What an upload could have stored: test rows, audit rows, bucket objects. */
export async function storedState() {
  return {
    tests: await countRows('relaxation_tests'),
    audit: await countRows('audit_log'),
    objects: await bucketKeys(),
  };
}
