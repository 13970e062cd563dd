import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { requirePageActor } from '@/lib/auth/session';

export const metadata = { title: 'Properties' };

export default async function PropertiesPage() {
  const actor = await requirePageActor('properties:read-published');
  return <AreaPlaceholder title="Properties" href="/properties" role={actor.role} />;
}
