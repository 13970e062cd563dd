/**
 * The Content-Security-Policy of every page: scripts only with this response's nonce (Next puts
 * it on its own scripts when it finds the policy on the request), styles from the app's own
 * files, inline style attributes allowed (charts and formulas set them), nothing framed, forms
 * posted only to the app itself.
 */
export function contentSecurityPolicy(nonce: string, options: { dev: boolean; https: boolean }) {
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${options.dev ? " 'unsafe-eval'" : ''}`,
    `style-src 'self' 'nonce-${nonce}'`,
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ];
  if (options.https) directives.push('upgrade-insecure-requests');
  return directives.join('; ');
}

/** Two years, as HSTS preload lists expect; sent only when the app is served over https. */
export const HSTS = 'max-age=63072000; includeSubDomains';
