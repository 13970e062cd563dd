/** What an invitation link can be, as the link page and the accept API both see it. */
export type InvitationProblem = 'invalid' | 'used' | 'revoked' | 'replaced' | 'expired';

/** The HTTP status each problem answers with: an unknown link is not found, an ended one gone. */
export const PROBLEM_STATUS: Record<InvitationProblem, 404 | 410> = {
  invalid: 404,
  used: 410,
  revoked: 410,
  replaced: 410,
  expired: 410,
};

export const PROBLEM_MESSAGES: Record<InvitationProblem, string> = {
  invalid:
    'This invitation link is not valid. Check that you copied the whole link, or ask for a new invitation.',
  used: 'This invitation has already been used. Sign in with the password you chose, or ask for a new invitation.',
  revoked:
    'This invitation was withdrawn by the person who sent it. Ask them for a new one if you still need an account.',
  replaced:
    'This invitation was replaced by a newer one. Use the link in the most recent invitation e-mail.',
  expired:
    'This invitation has expired (links work for 7 days). Ask the person who invited you for a new one.',
};
