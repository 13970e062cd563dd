import { NextResponse } from 'next/server';
import { z } from 'zod';
import { requireActor } from '@/lib/auth/session';
import { createCultivarPhoto, listCultivarPhotos } from '@/lib/data/photos';
import { handle } from '@/lib/http/handler';
import { photoFieldsSchema } from '@/lib/photos/fields';
import { MAX_UPLOAD_BODY } from '@/lib/photos/limits';
import { readUpload } from '@/lib/photos/read-upload';
import { photoJson } from '@/lib/photos/shape';
import { slugSchema } from '@/lib/validation/cultivars';
import { parseInput } from '@/lib/validation/parse';

type Context = { params: Promise<{ slug: string }> };
const slugOf = async (context: Context) =>
  parseInput(z.object({ slug: slugSchema }), await context.params).slug;

/** A cultivar's photos with the addresses of their variants. */
export const GET = handle(async (_request, context: Context) => {
  const actor = await requireActor('properties:read-published');
  const photos = await listCultivarPhotos(actor, await slugOf(context));
  return NextResponse.json({ photos: photos.map(photoJson) });
});

/**
 * Upload a photo as multipart/form-data: `file` (JPEG, PNG or WebP, at most 8 MB, type read from
 * its bytes), `caption` and `credit` (optional text). The role is checked before the body is read.
 */
export const POST = handle(
  async (request, context: Context) => {
    const actor = await requireActor('images:upload');
    const slug = await slugOf(context);
    const upload = await readUpload(request);
    const { caption, credit } = parseInput(photoFieldsSchema, upload.fields);
    const photo = await createCultivarPhoto(actor, slug, { bytes: upload.bytes, caption, credit });
    return NextResponse.json({ photo: photoJson(photo) }, { status: 201 });
  },
  { accept: ['multipart/form-data'], maxBodyBytes: MAX_UPLOAD_BODY },
);
