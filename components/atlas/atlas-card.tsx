import Link from 'next/link';
import { LINE_STAGES } from '@/lib/atlas/frontmatter';
import type { AtlasEntry } from '@/lib/atlas/entries';
import { PhotoPlaceholder } from './photo-placeholder';

function Photo({ entry }: { entry: AtlasEntry }) {
  if (!entry.photo) return <PhotoPlaceholder label={entry.commodity.name} />;
  return (
    // Served by the photo route as a sized WebP; next/image would only re-encode it.
    // eslint-disable-next-line @next/next/no-img-element
    <img
      src={`/api/photos/${entry.photo.id}/card`}
      alt={entry.photo.alt}
      className="h-full w-full object-cover"
      data-testid="atlas-photo"
    />
  );
}

/** One commodity on the Atlas index: photo, summary, the stage that bruises it most, links. */
export function AtlasCard({ entry }: { entry: AtlasEntry }) {
  const { commodity, article } = entry;
  return (
    <li
      className="flex flex-col overflow-hidden rounded-lg border border-stone-200 bg-white"
      data-testid={`atlas-card-${commodity.slug}`}
    >
      <div className="aspect-[3/2] w-full overflow-hidden">
        <Photo entry={entry} />
      </div>
      <div className="flex flex-1 flex-col p-4">
        <h3 className="font-semibold text-stone-900">
          {article ? (
            <Link href={`/atlas/${commodity.slug}`} className="hover:underline">
              {commodity.name}
            </Link>
          ) : (
            commodity.name
          )}
          {article?.frontmatter.status === 'draft' ? (
            <span className="ml-2 rounded bg-amber-100 px-1.5 text-xs text-amber-900">draft</span>
          ) : null}
        </h3>
        {entry.photo?.isDemo ? <p className="text-xs text-stone-500">demo photo</p> : null}
        {article ? (
          <>
            <p className="mt-1 text-sm text-stone-600">{article.frontmatter.summary}</p>
            <p className="mt-3 text-xs text-stone-500">
              Most bruise-prone stage:{' '}
              <span className="font-medium text-clay-700">
                {LINE_STAGES[article.frontmatter.mostProneStage]}
              </span>
            </p>
            <p className="mt-auto flex gap-3 pt-3 text-sm">
              <Link href={`/atlas/${commodity.slug}`} className="text-leaf-700 underline">
                Read the article
              </Link>
              <Link href={`/atlas/${commodity.slug}/sheet`} className="text-leaf-700 underline">
                Handling sheet
              </Link>
            </p>
          </>
        ) : (
          <p className="mt-1 text-sm text-stone-500 italic">Article in preparation.</p>
        )}
      </div>
    </li>
  );
}
