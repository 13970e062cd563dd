import type { ReactNode } from 'react';

export function PageTitle({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="mb-6 border-b border-stone-200 pb-4">
      <h1 className="text-2xl font-semibold tracking-tight text-stone-900">{title}</h1>
      {children ? <div className="mt-2 max-w-3xl text-sm text-stone-600">{children}</div> : null}
    </div>
  );
}
