'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';

type Errors = Record<string, string[]>;

/** An admin's own grade rule: a name, the commodity (or any), and the largest bruise. */
export function GradeRuleForm({ commodities }: { commodities: { slug: string; name: string }[] }) {
  const router = useRouter();
  const [state, setState] = useState<{ pending?: boolean; message?: string; errors?: Errors }>({});
  async function submit(form: HTMLFormElement) {
    const data = new FormData(form);
    const text = (k: string) => String(data.get(k) ?? '').trim();
    const number = (k: string) => (text(k) === '' ? null : Number(text(k).replace(',', '.')));
    setState({ pending: true });
    try {
      const res = await fetch('/api/grade-rules', {
        method: 'POST',
        headers: { 'content-type': 'application/json', accept: 'application/json' },
        body: JSON.stringify({
          name: text('name'),
          commodity: text('commodity') || null,
          measure: text('measure'),
          limit: number('limit'),
          maxDepthMm: number('maxDepthMm'),
          note: text('note') || null,
        }),
      });
      const json = await res.json().catch(() => ({}));
      if (!res.ok)
        return setState({
          message: json.message ?? `The server answered ${res.status}.`,
          errors: json.fieldErrors ?? {},
        });
      form.reset();
      setState({ message: `Saved: ${json.rule?.name}.` });
      router.refresh();
    } catch {
      setState({ message: 'No answer from the server; try again.' });
    }
  }
  const err = (k: string) =>
    state.errors?.[k]?.length ? (
      <span className="block text-xs text-red-700">{state.errors[k].join(' ')}</span>
    ) : null;
  const input = 'w-full max-w-xs rounded-md border border-stone-300 bg-white px-2 py-1 text-sm';
  return (
    <form
      className="mt-6 max-w-xl space-y-3 rounded-lg border border-stone-200 bg-white p-4"
      aria-label="Add a site rule"
      data-testid="grade-rule-form"
      onSubmit={(e) => {
        e.preventDefault();
        void submit(e.currentTarget);
      }}
    >
      <h2 className="text-sm font-semibold">Add this site&apos;s own rule</h2>
      <label className="block text-sm">
        Name
        <input name="name" required maxLength={160} className={input} />
        {err('name')}
      </label>
      <label className="block text-sm">
        Commodity
        <select name="commodity" className={input} defaultValue="">
          <option value="">Any commodity</option>
          {commodities.map((c) => (
            <option key={c.slug} value={c.slug}>
              {c.name}
            </option>
          ))}
        </select>
        {err('commodity')}
      </label>
      <label className="block text-sm">
        Measured as
        <select name="measure" className={input} defaultValue="diameter">
          <option value="diameter">Diameter across the bruise (mm)</option>
          <option value="area">Area of the bruise (mm²)</option>
        </select>
        {err('measure')}
      </label>
      <label className="block text-sm">
        Largest bruise tolerated (mm, or mm² for an area)
        <input name="limit" inputMode="decimal" required className={input} />
        {err('limit')}
      </label>
      <label className="block text-sm">
        Largest depth tolerated, mm (optional; not yet predicted by the checks)
        <input name="maxDepthMm" inputMode="decimal" className={input} />
        {err('maxDepthMm')}
      </label>
      <label className="block text-sm">
        Note
        <input name="note" maxLength={1000} className={input} />
        {err('note')}
      </label>
      <Button type="submit" disabled={state.pending}>
        {state.pending ? 'Saving…' : 'Add rule'}
      </Button>
      {state.message ? (
        <p className="text-sm" aria-live="polite" data-testid="grade-rule-message">
          {state.message}
        </p>
      ) : null}
    </form>
  );
}
