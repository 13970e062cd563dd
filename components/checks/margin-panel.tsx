import { VERDICT_RULE, type Verdict } from '@/lib/checks/verdict';

const TONE: Record<Verdict, string> = {
  comfortable: 'border-leaf-600 bg-leaf-50 text-leaf-900',
  tight: 'border-amber-500 bg-amber-50 text-amber-900',
  'bruise risk': 'border-red-600 bg-red-50 text-red-900',
};

/** The bruise margin in large type with its verdict in words and what it rests on. */
export function MarginPanel({
  margin,
  basis,
  pending,
  hasResult,
  restsOn,
}: {
  margin: { value: number; verdict: Verdict } | null;
  basis: string;
  /** The weakest rung of evidence the verdict rests on, in words. */
  restsOn?: string | null;
  pending: boolean;
  hasResult: boolean;
}) {
  return (
    <div
      className={`rounded-lg border-2 p-4 ${margin ? TONE[margin.verdict] : 'border-stone-300 bg-white'}`}
      data-testid="margin-panel"
      aria-busy={pending}
    >
      <p className="text-xs font-medium uppercase tracking-wide">Bruise margin</p>
      {margin ? (
        <>
          <p className="num text-4xl font-semibold" data-testid="margin-value">
            {margin.value.toFixed(2)}
          </p>
          <p className="text-lg font-medium" data-testid="margin-verdict">
            {margin.verdict}
          </p>
        </>
      ) : (
        <p className="mt-1 text-sm">
          {hasResult
            ? 'No margin: a threshold is missing (see the notes).'
            : 'Waiting for complete inputs.'}
        </p>
      )}
      <p className="mt-2 text-xs">{basis}</p>
      {restsOn ? (
        <p className="mt-1 text-xs font-medium" data-testid="rests-on">
          {restsOn}
        </p>
      ) : null}
      <p className="mt-1 text-xs opacity-80">{VERDICT_RULE}</p>
      {pending ? (
        <p className="mt-1 text-xs" role="status">
          Computing…
        </p>
      ) : null}
    </div>
  );
}
