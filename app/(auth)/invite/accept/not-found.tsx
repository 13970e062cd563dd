import Link from 'next/link';

/** The accept page opened without coming through an invitation link first. */
export default function InvitationNotFound() {
  return (
    <div className="space-y-3" data-testid="invitation-problem">
      <h1 className="font-semibold">Invitation</h1>
      <p className="text-sm text-stone-700">
        This page opens from the link in your invitation e-mail. Open that link again; if it no
        longer works, ask for a new invitation.
      </p>
      <Link href="/sign-in" className="text-sm text-leaf-700 underline">
        Sign in
      </Link>
    </div>
  );
}
