import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { requirePageActor } from '@/lib/auth/session';

export const metadata = { title: 'Assessments' };

export default async function AssessmentsPage() {
  const actor = await requirePageActor('assessments:manage-own');
  return <AreaPlaceholder title="Assessments" href="/assessments" role={actor.role} />;
}
