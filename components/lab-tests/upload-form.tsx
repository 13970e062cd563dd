'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';
import { CultivarSelect } from './cultivar-select';
import { uploadAnswer, type UploadErrors } from './upload-answer';

/** Upload a compression-test CSV for a cultivar; errors appear beside their fields. */
export function UploadForm({ cultivars }: { cultivars: { slug: string; label: string }[] }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [errors, setErrors] = useState<UploadErrors>({});
  const [message, setMessage] = useState<string>();

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const slug = String(form.get('cultivar') ?? '');
    form.delete('cultivar');
    if (!slug) {
      setErrors({ cultivar: ['Choose the cultivar the sample belongs to.'] });
      setMessage('Some fields are not valid.');
      return;
    }
    setPending(true);
    setMessage(undefined);
    try {
      const response = await fetch(`/api/cultivars/${encodeURIComponent(slug)}/lab-tests`, {
        method: 'POST',
        body: form,
      });
      const answer = await uploadAnswer(response);
      if (answer.id !== null) {
        router.push(`/editor/lab-tests/${answer.id}`);
        return;
      }
      setErrors(answer.errors);
      setMessage(answer.message);
    } catch {
      setErrors({});
      setMessage('The upload did not reach the server; check the connection and try again.');
    }
    setPending(false);
  }

  return (
    <form onSubmit={submit} className="max-w-xl space-y-3" data-testid="lab-test-upload" noValidate>
      <CultivarSelect cultivars={cultivars} errors={errors.cultivar} />
      <Field
        label="Sample diameter (mm)"
        name="diameterMm"
        inputMode="decimal"
        hint="The fit uses readings up to 5 % of this diameter in plate travel."
        errors={errors.diameterMm}
      />
      <details className="rounded-md border border-stone-200 bg-white px-3 py-2 text-sm">
        <summary className="cursor-pointer text-stone-700">
          Not round? Give two radii of curvature instead
        </summary>
        <div className="mt-3 grid gap-3 sm:grid-cols-2">
          <Field
            label="First radius (mm)"
            name="radius1Mm"
            inputMode="decimal"
            errors={errors.radius1Mm}
          />
          <Field
            label="Second radius (mm)"
            name="radius2Mm"
            inputMode="decimal"
            errors={errors.radius2Mm}
          />
        </div>
        <p className="mt-1 text-xs text-stone-500">
          The principal radii at the plate contacts; leave the diameter empty.
        </p>
      </details>
      <Field
        label="Poisson's ratio ν (–)"
        name="poisson"
        inputMode="decimal"
        hint="Above 0 and below 0.5; about 0.3–0.4 for most fruit flesh."
        errors={errors.poisson}
      />
      <Field
        label="Test file (CSV)"
        name="file"
        type="file"
        accept=".csv,text/csv"
        hint="Header naming units, e.g. displacement_mm,force_n; loading part only; at most 2 MB and 50 000 rows."
        errors={errors.file}
      />
      <FormMessage tone="error" message={message} />
      <Button type="submit" disabled={pending} aria-busy={pending}>
        {pending ? 'Uploading and fitting…' : 'Upload and fit'}
      </Button>
    </form>
  );
}
