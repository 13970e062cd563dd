import { cookies } from 'next/headers';
import { notFound, redirect } from 'next/navigation';
import { AcceptInvitationForm } from '@/components/auth/accept-invitation-form';
import { getInvitationState } from '@/lib/data/invitations';
import { LINK_COOKIE } from '@/lib/invitations/link-cookie';

export const metadata = { title: 'Accept invitation', robots: { index: false } };

export default async function AcceptInvitationPage() {
  const token = (await cookies()).get(LINK_COOKIE)?.value;
  if (!token) notFound();
  const invitation = await getInvitationState(token);
  // The link itself answers with the reason and the right status (404 or 410).
  if (invitation.state !== 'valid') redirect(`/invite/${encodeURIComponent(token)}`);
  return (
    <>
      <h1 className="mb-2 font-semibold">Accept your invitation</h1>
      <AcceptInvitationForm token={token} email={invitation.email} />
    </>
  );
}
