import { AreaPlaceholder } from '@/components/shell/area-placeholder';
import { requirePageActor } from '@/lib/auth/session';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('assessments:manage-own', 'Assessments');

export default async function AssessmentsPage() {
  const actor = await requirePageActor('assessments:manage-own');
  return <AreaPlaceholder title="Assessments" href="/assessments" role={actor.role} />;
}
