import { Children, isValidElement, type ComponentProps, type ReactNode } from 'react';
import { headingId } from '@/lib/atlas/sections';

/** The words of a heading's children, for its anchor id (the search index slugs the same way). */
function textOf(node: ReactNode): string {
  return Children.toArray(node)
    .map((child) =>
      typeof child === 'string' || typeof child === 'number'
        ? String(child)
        : isValidElement<{ children?: ReactNode }>(child)
          ? textOf(child.props.children)
          : '',
    )
    .join('');
}

export function H2({ children }: { children?: ReactNode }) {
  const id = headingId(textOf(children));
  return (
    <h2
      id={id}
      className="clear-both mt-10 mb-3 scroll-mt-24 border-b border-stone-200 pb-1 text-xl font-semibold text-stone-900 break-after-avoid"
    >
      {children}
    </h2>
  );
}

export function H3({ children }: { children?: ReactNode }) {
  return (
    <h3
      id={headingId(textOf(children))}
      className="mt-6 mb-2 scroll-mt-24 text-base font-semibold text-stone-900 break-after-avoid"
    >
      {children}
    </h3>
  );
}

/** Tables scroll inside their own box on a phone instead of widening the page. */
export function Table(props: ComponentProps<'table'>) {
  return (
    <div className="my-5 overflow-x-auto rounded-md border border-stone-200 bg-white">
      <table className="w-full border-collapse text-left text-sm" {...props} />
    </div>
  );
}

export function Anchor({ href = '', ...props }: ComponentProps<'a'>) {
  const external = /^https?:\/\//.test(href);
  return (
    <a
      href={href}
      rel={external ? 'noreferrer' : undefined}
      className="text-leaf-700 underline underline-offset-2 hover:text-leaf-900"
      {...props}
    />
  );
}

/** The plain HTML elements of an article with the product's type scale. */
export const proseComponents = {
  h2: H2,
  h3: H3,
  table: Table,
  a: Anchor,
  p: (props: ComponentProps<'p'>) => <p className="my-3 leading-relaxed" {...props} />,
  ul: (props: ComponentProps<'ul'>) => <ul className="my-3 list-disc space-y-1 pl-6" {...props} />,
  ol: (props: ComponentProps<'ol'>) => (
    <ol className="my-3 list-decimal space-y-1 pl-6" {...props} />
  ),
  th: (props: ComponentProps<'th'>) => (
    <th
      className="border-b border-stone-200 bg-stone-50 px-3 py-2 font-semibold text-stone-700"
      {...props}
    />
  ),
  td: (props: ComponentProps<'td'>) => (
    <td className="border-b border-stone-100 px-3 py-2 align-top" {...props} />
  ),
  strong: (props: ComponentProps<'strong'>) => (
    <strong className="font-semibold text-stone-900" {...props} />
  ),
  code: (props: ComponentProps<'code'>) => (
    <code className="rounded bg-stone-100 px-1 font-mono text-[0.9em]" {...props} />
  ),
};
