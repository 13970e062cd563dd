/** Sign-in error codes (next-auth's and our own) and what the sign-in page says for each. */
export const SIGN_IN_ERRORS: Record<string, string> = {
  CredentialsSignin: 'That e-mail and password do not match an active account.',
  RateLimited: 'Too many failed sign-ins for this e-mail. Wait 15 minutes and try again.',
};
