import type { ReactNode } from 'react';
import { requirePageActor } from '@/lib/auth/session';

/** Buyers keep no assessments: the gate runs here, before anything streams, so they get a 403. */
export default async function AssessmentsLayout({ children }: { children: ReactNode }) {
  await requirePageActor('assessments:manage-own');
  return children;
}
