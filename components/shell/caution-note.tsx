import { MACHINERY_CAUTION, STANDING_CAUTION } from '@/lib/cautions';

export function CautionNote({ machinery = false }: { machinery?: boolean }) {
  return (
    <div className="rounded-md border border-clay-200 bg-clay-50 px-4 py-3 text-sm text-clay-700">
      <p>{STANDING_CAUTION}</p>
      {machinery ? <p className="mt-1">{MACHINERY_CAUTION}</p> : null}
    </div>
  );
}
