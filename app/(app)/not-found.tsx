import { NotFoundNotice } from '@/components/shell/not-found-notice';

/** notFound() from a page of the app: the (app) layout around it already has the header. */
export default function AppNotFound() {
  return <NotFoundNotice />;
}
