import { PageSkeleton } from '@/components/ui/page-skeleton';

/**
 * Here rather than beside the editor layout: a loading boundary there would start streaming the
 * revision pages (status 200) before their lookup, so an unknown revision could not answer 404.
 */
export default function Loading() {
  return <PageSkeleton />;
}
