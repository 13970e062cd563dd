import type { ReactElement } from 'react';
import { prerender } from 'react-dom/static';

/** Render a server element tree (async components included) to an HTML string. */
export async function renderHtml(element: ReactElement): Promise<string> {
  const { prelude } = await prerender(element);
  return new Response(prelude).text();
}
