import Link from 'next/link';
import type { ReactNode } from 'react';

/** The checks an article may point to, each at /checks/<name>. */
export const ARTICLE_CHECKS = ['squeeze', 'drop', 'stack'] as const;
export type ArticleCheck = (typeof ARTICLE_CHECKS)[number];

/**
 * A check named in an article: a link to it for a reader who may run checks, the same words as
 * plain text for one who may not (a buyer), so the article never sends them to a page they cannot
 * open. An unknown check name is an error, as an unknown source key is.
 */
export function CheckLink({
  check,
  mayRun,
  children,
}: {
  check: string;
  mayRun: boolean;
  children?: ReactNode;
}) {
  if (!(ARTICLE_CHECKS as readonly string[]).includes(check)) {
    throw new Error(`Unknown check "${check}" in an article: use ${ARTICLE_CHECKS.join(', ')}.`);
  }
  if (!mayRun) return <>{children}</>;
  return (
    <Link href={`/checks/${check}`} className="text-leaf-700 underline" data-testid="check-link">
      {children}
    </Link>
  );
}
