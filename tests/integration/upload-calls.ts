import { afterAll, beforeAll } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestBucket } from '../support/bucket';
import { ACCOUNTS } from '../support/accounts';
import type { Role } from '@/lib/auth/roles';
import { bucketKeys, uploadRequest } from './lab-tests-support';

export const SLUG = 'apple-jonathan';
export const ORIGIN = { origin: 'http://tenderline.test' };
export const params = <T>(p: T) => ({ params: Promise.resolve(p) });

export type Who = Role | 'signed-out';
export const ids: Partial<Record<Role, number>> = {};
export const as = (who: Who) => signInAs(who === 'signed-out' ? null : ids[who]!);

/** A fresh database and bucket for a file's upload tests, and the seeded accounts' ids for `as`. */
export function prepareUploadTests() {
  let bucket: Awaited<ReturnType<typeof startTestBucket>>;
  beforeAll(async () => {
    await freshDatabase();
    bucket = await startTestBucket();
    for (const role of ['admin', 'editor', 'engineer', 'buyer'] as const)
      ids[role] = await userId(ACCOUNTS[role]);
  });
  afterAll(() => bucket.close());
}

type Route<P> = (request: Request, context: { params: Promise<P> }) => Promise<Response>;

/**
 * The calls one kind of lab-test upload is tested through: its upload route (POST with the
 * form's fields, as the browser's form sends it), its draft route, and what an upload could have
 * stored (its table's rows, audit rows, bucket objects).
 */
export function uploadCalls(kind: {
  upload: Route<{ slug: string }>;
  draft: Route<{ id: string }>;
  table: string;
  fields: Record<string, string>;
  fileName: string;
}) {
  async function upload(
    file: BlobPart | null,
    fields: Record<string, string> = kind.fields,
    headers: Record<string, string> = ORIGIN,
    fileName = kind.fileName,
    slug = SLUG,
  ) {
    const request = uploadRequest(file, fields, headers, fileName);
    const response = await kind.upload(request, params({ slug }));
    return { status: response.status, body: await response.json() };
  }

  const startDraft = (id: number, headers: Record<string, string> = ORIGIN) =>
    kind.draft(
      new Request('http://tenderline.test/api', {
        method: 'POST',
        headers: { 'content-type': 'application/json', ...headers },
        body: '{}',
      }),
      params({ id: String(id) }),
    );

  async function storedState() {
    return {
      tests: await countRows(kind.table),
      audit: await countRows('audit_log'),
      objects: await bucketKeys(),
    };
  }

  return { upload, startDraft, storedState };
}
