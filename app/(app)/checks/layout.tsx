import type { ReactNode } from 'react';
import { requirePageActor } from '@/lib/auth/session';

/** Buyers may not run checks: the gate runs here, before anything streams, so they get a 403. */
export default async function ChecksLayout({ children }: { children: ReactNode }) {
  await requirePageActor('checks:run');
  return children;
}
