import { z } from 'zod';
import { idSchema } from './id';

const NOT_VALID = 'This invitation link is not valid.';

/** The shape every issued token has (32 random bytes, base64url); anything else is not valid. */
export const TOKEN_PATTERN = /^[A-Za-z0-9_-]{20,100}$/;

/** A link's token: missing is "required"; present but too long or malformed is "not valid". */
export const invitationTokenSchema = z.object({
  token: z
    .string({
      error: (issue) =>
        issue.input === undefined ? 'The invitation token is required.' : NOT_VALID,
    })
    .min(1, 'The invitation token is required.')
    .regex(TOKEN_PATTERN, NOT_VALID),
});

/** The pending-invitations list's row forms: which invitation to revoke or resend. */
export const invitationIdFormSchema = z.object({ invitationId: idSchema });
