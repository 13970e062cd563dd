/**
 * The app's own origin and the cross-site test shared by route handlers, server actions (through
 * proxy.ts) and the sign-in path. Pure: reads only the environment and the request's headers.
 */

const DEFAULT_APP_URL = 'http://127.0.0.1:3000';

/** The public base URL, without a trailing slash (APP_URL, else NEXTAUTH_URL). */
export function appUrl(): string {
  return (process.env.APP_URL ?? process.env.NEXTAUTH_URL ?? DEFAULT_APP_URL).replace(/\/+$/, '');
}

export function appOrigin(): string {
  return new URL(appUrl()).origin;
}

/** True when the app is served over https, so cookies are Secure and HSTS is sent. */
export function isHttpsApp(): boolean {
  return appUrl().startsWith('https://');
}

/**
 * Why a state-changing request looks cross-site, or null when it may proceed. A browser always
 * sends Origin on a cross-origin POST; without it, Sec-Fetch-Site tells. A request with neither
 * comes from a non-browser client, which cannot carry a victim's cookies without their consent.
 */
export function crossSiteReason(headers: Headers): string | null {
  const origin = headers.get('origin');
  if (origin !== null) {
    return origin === appOrigin() ? null : `The request came from ${origin.slice(0, 100)}.`;
  }
  const site = headers.get('sec-fetch-site');
  if (site === 'cross-site' || site === 'same-site') return `The request came from a ${site} page.`;
  return null;
}

/** The one 403 message for a refused cross-site write. */
export function crossSiteMessage(reason: string): string {
  return `Refused: writes are accepted only from Tenderline's own pages (${appOrigin()}). ${reason}`;
}
