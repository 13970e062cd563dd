import { requireActor } from '@/lib/auth/session';
import { getPhotoVariant } from '@/lib/data/photos';
import { NotFoundError } from '@/lib/errors';
import { handle } from '@/lib/http/handler';
import { isVariantName } from '@/lib/photos/limits';
import { parseId } from '@/lib/validation/id';

type Context = { params: Promise<{ id: string; variant: string }> };

/**
 * One stored WebP variant (thumb, card or full) of a photo. Keys are random and a photo never
 * changes, so the browser may keep it; only signed-in users' caches, hence private.
 */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('properties:read-published');
  const { id, variant } = await context.params;
  const photoId = parseId(id);
  if (!isVariantName(variant)) {
    throw new NotFoundError(`No photo variant "${variant.slice(0, 40)}": thumb, card or full.`);
  }
  const body = await getPhotoVariant(actor, photoId, variant);
  return new Response(new Uint8Array(body), {
    headers: {
      'Content-Type': 'image/webp',
      'Content-Length': String(body.length),
      'Content-Disposition': 'inline',
      'X-Content-Type-Options': 'nosniff',
      'Cache-Control': 'private, max-age=86400, immutable',
    },
  });
});
