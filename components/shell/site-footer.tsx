import { MACHINERY_CAUTION, STANDING_CAUTION } from '@/lib/cautions';

export function SiteFooter() {
  return (
    <footer className="print:hidden mt-16 border-t border-stone-200 bg-white">
      <div
        className="mx-auto max-w-6xl space-y-1 px-4 py-4 text-xs text-stone-600"
        data-testid="standing-caution"
      >
        <p>{STANDING_CAUTION}</p>
        <p>{MACHINERY_CAUTION}</p>
      </div>
    </footer>
  );
}
