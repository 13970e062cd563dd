import { redirect } from 'next/navigation';
import { requirePageActor } from '@/lib/auth/session';

export default async function AdminIndex() {
  await requirePageActor('users:manage');
  redirect('/admin/users');
}
