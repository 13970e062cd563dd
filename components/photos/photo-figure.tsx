import type { PhotoRecord } from '@/lib/photos/record';
import { variantSize } from '@/lib/photos/limits';
import { photoUrl } from '@/lib/photos/shape';

/** One photo as a card: the 480 px variant (links to the full one), caption, credit, demo label. */
export function PhotoFigure({ photo }: { photo: PhotoRecord }) {
  const card = variantSize(photo.width, photo.height, 'card');
  const alt = photo.caption ?? 'Photo of the cultivar';
  return (
    <figure
      className="h-full overflow-hidden rounded-lg border border-stone-200 bg-white"
      data-testid="photo"
    >
      <a href={photoUrl(photo.id, 'full')} target="_blank" rel="noopener" className="block">
        {/* A plain img: photos come from a signed-in route the image optimiser cannot fetch. */}
        {/* eslint-disable-next-line @next/next/no-img-element */}
        <img
          src={photoUrl(photo.id, 'card')}
          width={card.width}
          height={card.height}
          alt={alt}
          loading="lazy"
          className="aspect-[4/3] w-full bg-stone-100 object-contain"
        />
      </a>
      <figcaption className="space-y-1 px-3 py-2 text-sm text-stone-800">
        {photo.isDemo ? (
          <span className="inline-block rounded bg-amber-100 px-1.5 py-0.5 text-xs font-medium text-amber-900">
            demo photo
          </span>
        ) : null}
        {photo.caption ? <p className="break-words">{photo.caption}</p> : null}
        {photo.credit ? (
          <p className="break-words text-xs text-stone-500">Credit: {photo.credit}</p>
        ) : null}
      </figcaption>
    </figure>
  );
}
