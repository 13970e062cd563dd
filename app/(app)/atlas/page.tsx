import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { requirePageActor } from '@/lib/auth/session';

export const metadata = { title: 'Atlas' };

export default async function AtlasPage() {
  const actor = await requirePageActor('atlas:read');
  return <AreaPlaceholder title="Atlas" href="/atlas" role={actor.role} />;
}
