'use client';

import { useRouter } from 'next/navigation';
import { useId, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { IMPORT_COLUMNS, MAX_IMPORT_ROWS, REQUIRED_COLUMNS } from '@/lib/validation/import-csv';

type Answer = { message?: string; fieldErrors?: Record<string, string[]> };

/**
 * Append values to the draft from a CSV file, one value a row: all rows or none. Errors are
 * listed by line of the file (line 1 is the header); after an import the page reloads the draft.
 */
export function ImportPanel({ revisionId }: { revisionId: number }) {
  const router = useRouter();
  const fileHint = useId();
  const [pending, setPending] = useState(false);
  const [result, setResult] = useState<{
    ok: boolean;
    message: string;
    lines: [string, string[]][];
  }>();

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const element = event.currentTarget;
    const form = new FormData(element);
    const file = form.get('file');
    if (!(file instanceof File) || !file.name) {
      setResult({ ok: false, message: 'Choose a CSV file to import.', lines: [] });
      return;
    }
    setPending(true);
    try {
      const response = await fetch(`/api/revisions/${revisionId}/import`, {
        method: 'POST',
        body: form,
      });
      const answer = (await response.json().catch(() => ({}))) as Answer & {
        import?: { imported: number; values: number };
      };
      if (response.ok && answer.import) {
        const n = answer.import.imported;
        setResult({
          ok: true,
          message: `Imported ${n} value${n === 1 ? '' : 's'}; the draft now holds ${answer.import.values}.`,
          lines: [],
        });
        element.reset();
        router.refresh();
      } else {
        setResult({
          ok: false,
          message: answer.message ?? `The import was refused (${response.status}).`,
          lines: Object.entries(answer.fieldErrors ?? {}),
        });
      }
    } catch {
      setResult({ ok: false, message: 'The file did not reach the server; try again.', lines: [] });
    }
    setPending(false);
  }

  return (
    <div className="max-w-3xl space-y-3 text-sm" data-testid="import-panel">
      <p className="text-stone-600">
        One value a row, up to {MAX_IMPORT_ROWS} rows. Nothing is stored unless every row passes;
        the values are added after the draft&apos;s own. Save any changes above first: the values
        are reloaded after an import.
      </p>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3" noValidate>
        <label className="min-w-0 flex-1 basis-64">
          <span className="block font-medium text-stone-800">CSV file</span>
          <input
            type="file"
            name="file"
            accept=".csv,text/csv"
            aria-describedby={fileHint}
            className="mt-1 block w-full text-sm file:mr-3 file:rounded-md file:border file:border-stone-300 file:bg-white file:px-3 file:py-1.5"
          />
        </label>
        <Button type="submit" disabled={pending}>
          {pending ? 'Importing…' : 'Import values'}
        </Button>
      </form>
      <p id={fileHint} className="text-stone-600">
        UTF-8 CSV, at most 2 MB.{' '}
        <a
          href="/api/revisions/import-template"
          download
          className="font-medium text-leaf-700 underline underline-offset-2"
        >
          Download the template
        </a>{' '}
        (the header and one example row).
      </p>
      {result ? (
        <div data-testid={result.ok ? 'import-done' : 'import-errors'} className="space-y-2">
          <FormMessage tone={result.ok ? 'success' : 'error'} message={result.message} />
          {result.lines.length ? (
            <ul className="max-h-72 space-y-1 overflow-y-auto rounded-md border border-red-200 bg-white p-3 text-red-800">
              {result.lines.map(([where, messages]) => (
                <li key={where}>
                  <strong className="font-semibold">{where === 'more' ? '…' : where}</strong>:{' '}
                  {messages.join(' ')}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <details className="rounded-md border border-stone-200 bg-white px-3 py-2">
        <summary className="cursor-pointer font-medium text-stone-800">The columns</summary>
        <p className="mt-2 text-stone-600">
          Any order; {REQUIRED_COLUMNS.join(', ')} are required, the others may be left out.
        </p>
        <dl
          className="mt-2 grid gap-x-4 gap-y-1 sm:grid-cols-[max-content_1fr]"
          data-testid="import-columns"
        >
          {Object.entries(IMPORT_COLUMNS).map(([name, words]) => (
            <div key={name} className="contents">
              <dt className="font-mono text-xs text-stone-900 sm:pt-0.5">{name}</dt>
              <dd className="mb-1 text-stone-600 sm:mb-0">{words}</dd>
            </div>
          ))}
        </dl>
      </details>
    </div>
  );
}
