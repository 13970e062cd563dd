import type { ReactNode } from 'react';
import { STANDING_CAUTION } from '@/lib/cautions';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center justify-center bg-leaf-50 px-4 py-12">
      <div className="w-full max-w-sm rounded-xl border border-stone-200 bg-white p-6 shadow-sm">
        <p className="mb-1 text-xl font-semibold tracking-tight text-leaf-900">Tenderline</p>
        {children}
      </div>
      <p className="mt-6 max-w-md text-center text-xs text-stone-500">{STANDING_CAUTION}</p>
    </div>
  );
}
