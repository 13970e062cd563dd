import type { MDXComponents } from 'mdx/types';
import { Caution, StandingCaution } from '@/components/atlas/caution';
import { MarginBadge } from '@/components/atlas/margin-badge';
import { proseComponents } from '@/components/atlas/prose';

/**
 * The one map of components an Atlas article may use, for the server render and any client
 * preview alike. Everything here is pure. `LiveValues` and `SourceRef` read the database, so
 * the caller supplies them bound to its data (components/atlas/render-article.tsx does so for
 * the server).
 */
export const atlasComponents = {
  ...proseComponents,
  Caution,
  StandingCaution,
  MarginBadge,
} satisfies MDXComponents;

/** The `@mdx-js/react` convention: the shared map, with the caller's bound components on top. */
export function useMDXComponents(components: MDXComponents = {}): MDXComponents {
  return { ...atlasComponents, ...components };
}
