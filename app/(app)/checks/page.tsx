import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { requirePageActor } from '@/lib/auth/session';

export const metadata = { title: 'Checks' };

export default async function ChecksPage() {
  const actor = await requirePageActor('checks:run');
  return <AreaPlaceholder title="Checks" href="/checks" role={actor.role} />;
}
