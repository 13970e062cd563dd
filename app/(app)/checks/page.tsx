import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { requirePageActor } from '@/lib/auth/session';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Checks');

export default async function ChecksPage() {
  const actor = await requirePageActor('checks:run');
  return <AreaPlaceholder title="Checks" href="/checks" role={actor.role} />;
}
