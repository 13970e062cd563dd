import type { ReactNode } from 'react';
import { requirePageActor } from '@/lib/auth/session';

/**
 * The area's gate runs here, outside the loading boundary, so a refused role gets a real 403
 * before anything streams; each page checks its own capability again.
 */
export default async function AdminLayout({ children }: { children: ReactNode }) {
  await requirePageActor('users:manage');
  return children;
}
