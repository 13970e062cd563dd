import { can } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { listCultivarPhotos } from '@/lib/data/photos';
import { PhotoFigure } from './photo-figure';
import { PhotoUploadForm } from './photo-upload-form';

/** A cultivar's photos, and the upload form when the page offers it to a role that may upload. */
export async function CultivarPhotos({ slug, canUpload }: { slug: string; canUpload: boolean }) {
  const actor = await requirePageActor('properties:read-published');
  const photos = await listCultivarPhotos(actor, slug);
  const mayUpload = canUpload && can(actor.role, 'images:upload');
  return (
    <section
      aria-labelledby="cultivar-photos-heading"
      className="mt-6 space-y-4"
      data-testid="cultivar-photos"
    >
      <h2 id="cultivar-photos-heading" className="text-lg font-semibold">
        Photos
      </h2>
      {photos.length ? (
        <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {photos.map((photo) => (
            <li key={photo.id}>
              <PhotoFigure photo={photo} />
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-stone-500">No photo yet.</p>
      )}
      {mayUpload ? <PhotoUploadForm slug={slug} /> : null}
    </section>
  );
}
