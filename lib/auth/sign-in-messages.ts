/** Sign-in error codes (next-auth's and our own) and what the sign-in page says for each. */
const MESSAGES = new Map<string, string>([
  ['CredentialsSignin', 'That e-mail and password do not match an active account.'],
  [
    'RateLimited',
    'Too many sign-in attempts for this account from here. Wait 15 minutes and try again, or ask an admin to clear the lock.',
  ],
  ['SessionRequired', 'Sign in to continue.'],
]);

const FALLBACK = 'Sign-in failed. Try again.';

/** The message for a code from the URL or the API; unknown codes (even `__proto__`) get a plain one. */
export function signInMessage(code: string | null | undefined): string {
  return (code && MESSAGES.get(code)) || FALLBACK;
}
