import type { RevisionStatus } from '@/lib/properties/quantities';
import { STATUS_LABEL } from './format';

const TONE: Record<RevisionStatus, string> = {
  draft: 'bg-stone-100 text-stone-700 ring-stone-300',
  in_review: 'bg-amber-50 text-amber-900 ring-amber-300',
  returned: 'bg-red-50 text-red-800 ring-red-300',
  published: 'bg-leaf-50 text-leaf-900 ring-leaf-600',
  superseded: 'bg-white text-stone-500 ring-stone-300',
};

export function StatusBadge({ status }: { status: RevisionStatus }) {
  return (
    <span
      className={`inline-block rounded-full px-2 py-0.5 text-xs font-medium ring-1 ring-inset ${TONE[status]}`}
      data-testid="revision-status"
    >
      {STATUS_LABEL[status]}
    </span>
  );
}
