import { AsyncLocalStorage } from 'node:async_hooks';

/**
 * Carries a refused attempt from next-auth's authorize() back to the sign-in route, which answers
 * 429 with Retry-After instead of next-auth's generic failure.
 */
export interface SignInContext {
  limitedForMs?: number;
}

export const signInContext = new AsyncLocalStorage<SignInContext>();
