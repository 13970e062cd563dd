import { TextInUnits } from '@/components/units/text-in-units';
import type { Text } from '@/lib/phrase';
import type { BruiseView } from '@/lib/checks/bruise';
import { VERDICT_RULE, type Verdict } from '@/lib/checks/verdict';

const BRUISE_TONE: Record<BruiseView['verdict'], string> = {
  'no bruise': 'border-leaf-600 bg-leaf-50 text-leaf-900',
  'within tolerance': 'border-leaf-600 bg-leaf-50 text-leaf-900',
  'beyond tolerance': 'border-red-600 bg-red-50 text-red-900',
};

export const BRUISE_HEADLINE: Record<BruiseView['verdict'], string> = {
  'no bruise': 'no bruise',
  'within tolerance': "bruise within the grade's tolerance",
  'beyond tolerance': 'bruise beyond tolerance',
};

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
  bruise,
}: {
  margin: { value: number; verdict: Verdict } | null;
  basis: Text;
  /** The weakest rung of evidence the verdict rests on, in words. */
  restsOn?: string | null;
  /** The predicted bruise against the grade rule: the verdict, with the onset margin beside it. */
  bruise?: BruiseView | null;
  pending: boolean;
  hasResult: boolean;
}) {
  return (
    <div
      className={`rounded-lg border-2 p-4 ${bruise ? BRUISE_TONE[bruise.verdict] : margin ? TONE[margin.verdict] : 'border-stone-300 bg-white'}`}
      data-testid="margin-panel"
      aria-busy={pending}
    >
      {bruise ? (
        <div className="mb-3 border-b border-current/20 pb-3">
          <p className="text-xs font-medium uppercase tracking-wide">Verdict against the grade</p>
          <p className="text-2xl font-semibold" data-testid="bruise-verdict">
            {BRUISE_HEADLINE[bruise.verdict]}
          </p>
          <p className="mt-1 text-sm" data-testid="bruise-words">
            <TextInUnits text={bruise.words} />
          </p>
        </div>
      ) : null}
      <p className="text-xs font-medium uppercase tracking-wide">
        {bruise ? 'Onset margin (threshold ÷ peak pressure)' : 'Bruise margin'}
      </p>
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
      <p className="mt-2 text-xs">
        <TextInUnits text={basis} />
      </p>
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
