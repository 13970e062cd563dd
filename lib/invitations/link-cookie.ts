import { isHttpsApp } from '@/lib/http/origin';

/**
 * The e-mailed link hands its token to the accept page in this cookie, so the token leaves the
 * address bar (history, Referer) at once. Lax: the link is opened from a mail client, another
 * site; the path keeps it off every other request.
 */
export const LINK_COOKIE = 'tl_invite';

export function linkCookieOptions() {
  return {
    httpOnly: true,
    sameSite: 'lax' as const,
    secure: isHttpsApp(),
    path: '/invite',
    maxAge: 3600,
  };
}
