import Link from 'next/link';
import { AcceptInvitationForm } from '@/components/auth/accept-invitation-form';
import { getInvitationState } from '@/lib/data/invitations';

export const metadata = { title: 'Accept invitation' };
export const dynamic = 'force-dynamic';

const PROBLEMS = {
  invalid:
    'This invitation link is not valid. Check that you copied the whole link, or ask for a new invitation.',
  used: 'This invitation has already been used. Sign in with the password you chose, or ask for a new invitation.',
  expired:
    'This invitation has expired (links work for 7 days). Ask the person who invited you for a new one.',
} as const;

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await getInvitationState(token);
  if (invitation.state !== 'valid') {
    return (
      <div className="space-y-3" data-testid="invitation-problem">
        <h1 className="font-semibold">Invitation</h1>
        <p className="text-sm text-stone-700">{PROBLEMS[invitation.state]}</p>
        <Link href="/sign-in" className="text-sm text-leaf-700 underline">
          Sign in
        </Link>
      </div>
    );
  }
  return (
    <>
      <h1 className="mb-2 font-semibold">Accept your invitation</h1>
      <AcceptInvitationForm token={token} email={invitation.email} />
    </>
  );
}
