/**
 * The client's network address. The app's own server (scripts/server.ts) drops any
 * X-Forwarded-For a client sent unless TRUST_PROXY is set, and Next then fills it from the
 * socket; behind a trusted proxy, the proxy appends the address it saw, so the last entry counts.
 */
export function clientAddress(headers: Headers | Record<string, string | undefined>): string {
  const raw =
    headers instanceof Headers ? headers.get('x-forwarded-for') : headers['x-forwarded-for'];
  const last = raw?.split(',').pop()?.trim();
  if (!last) return 'unknown';
  return last.replace(/^::ffff:/, '').slice(0, 64);
}

/** Whether the app runs behind a proxy that sets X-Forwarded-For and X-Forwarded-Host. */
export function trustProxy(): boolean {
  return process.env.TRUST_PROXY === 'true' || process.env.TRUST_PROXY === '1';
}
