import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import type { Role } from '@/lib/auth/roles';
import { formatDateTime } from '@/lib/dates';
import { AppError } from '@/lib/errors';
import { appUrl, sendMail } from '@/lib/mail/send';

/** Only the SHA-256 of a token is stored; the token itself is only ever in the e-mail. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

interface InvitationMail {
  to: string;
  role: Role;
  inviterName: string;
  token: string;
  expiresAt: Date;
}

/** E-mail the one-time link; a refused or unreachable mail server is a 502 with what to do next. */
export async function mailInvitation(mail: InvitationMail, failure: string): Promise<void> {
  const article = mail.role === 'buyer' ? 'a buyer' : `an ${mail.role}`;
  try {
    await sendMail({
      to: mail.to,
      subject: 'Your invitation to Tenderline',
      text: [
        `${mail.inviterName} has invited you to Tenderline as ${article}.`,
        '',
        `Open this link to choose your name and password (it works once, until ${formatDateTime(mail.expiresAt)}):`,
        `${appUrl()}/invite/${mail.token}`,
        '',
        'If you did not expect this message, you can ignore it.',
      ].join('\n'),
    });
  } catch {
    throw new AppError(502, 'mail_failed', failure);
  }
}
