import { NotFoundNotice } from '@/components/shell/not-found-notice';
import { SiteFooter } from '@/components/shell/site-footer';
import { SiteHeader } from '@/components/shell/site-header';
import { getCurrentActor } from '@/lib/auth/session';

export const metadata = { title: 'Page not found' };

/**
 * An unknown address renders here, outside the (app) layout, so a signed-in user gets the
 * header added and keeps their navigation. notFound() inside the app has app/(app)/not-found.tsx.
 */
export default async function NotFound() {
  const actor = await getCurrentActor();
  if (!actor) {
    return (
      <main className="flex min-h-screen flex-col">
        <NotFoundNotice />
      </main>
    );
  }
  return (
    <div className="flex min-h-screen flex-col">
      <SiteHeader actor={actor} />
      <main className="flex flex-1 flex-col">
        <NotFoundNotice />
      </main>
      <SiteFooter />
    </div>
  );
}
