import type { Metadata } from 'next';
import { CultivarPhotos } from '@/components/photos/cultivar-photos';
import { CompareForm } from '@/components/properties/compare-form';
import { CultivarHeader } from '@/components/properties/cultivar-header';
import { FollowToggle } from '@/components/properties/follow-toggle';
import { QuantityList } from '@/components/properties/quantity-list';
import { RevisionHistory } from '@/components/properties/revision-history';
import { StartDraftButton } from '@/components/properties/start-draft-button';
import { CautionNote } from '@/components/shell/caution-note';
import { can } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { listRevisions } from '@/lib/data/cultivars';
import { isFollowing } from '@/lib/data/follows';
import { cultivarTitle, getCultivarOr404 } from './lookup';

type Props = { params: Promise<{ slug: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  return { title: await cultivarTitle((await params).slug) };
}

/**
 * A cultivar's published values with full sources. History, comparison and following are read
 * and rendered only for roles with those capabilities; a buyer's page never contains them.
 */
export default async function CultivarPage({ params }: Props) {
  const actor = await requirePageActor('properties:read-published');
  const cultivar = await getCultivarOr404(actor, (await params).slug);
  const history = can(actor.role, 'properties:read-history');
  const canEdit = can(actor.role, 'revisions:edit');
  const [revisions, following] = await Promise.all([
    history ? listRevisions(actor, cultivar.slug) : null,
    can(actor.role, 'properties:follow') ? isFollowing(actor, cultivar.slug) : null,
  ]);
  return (
    <article>
      <CultivarHeader cultivar={cultivar}>
        {following !== null ? <FollowToggle slug={cultivar.slug} initial={following} /> : null}
        {canEdit ? <StartDraftButton slug={cultivar.slug} /> : null}
      </CultivarHeader>
      <CultivarPhotos slug={cultivar.slug} canUpload={can(actor.role, 'images:upload')} />
      <div className="my-6" data-testid="cultivar-caution">
        <CautionNote />
      </div>
      <h2 className="mb-3 text-lg font-semibold">Published values</h2>
      <QuantityList values={cultivar.values} />
      {revisions ? (
        <section className="mt-10 space-y-4" aria-labelledby="history-heading">
          <h2 id="history-heading" className="text-lg font-semibold">
            Revision history
          </h2>
          <CompareForm slug={cultivar.slug} revisions={revisions} />
          <RevisionHistory revisions={revisions} canEdit={canEdit} />
        </section>
      ) : null}
    </article>
  );
}
