'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { CultivarSelect } from './cultivar-select';
import { uploadAnswer, type UploadErrors } from './upload-answer';

/**
 * A lab-test upload for a cultivar: the cultivar, the kind's own fields and file (`children`,
 * given the errors by field), one message and the button. The file and fields are posted to
 * `/api/cultivars/<slug>/<route>`; the new test opens at `resultHref(id)`, or the errors appear
 * beside their fields.
 */
export function TestUploadForm({
  cultivars,
  idPrefix = '',
  cultivarLabel,
  route,
  resultHref,
  staysOnPage = false,
  testId,
  submitLabel,
  pendingLabel,
  children,
}: {
  cultivars: { slug: string; label: string }[];
  /** before every control's id, where two forms share a page */
  idPrefix?: string;
  cultivarLabel: string;
  route: string;
  resultHref: (id: number) => string;
  /** the result opens on this form's page: the form is cleared for the next upload */
  staysOnPage?: boolean;
  testId: string;
  submitLabel: string;
  pendingLabel: string;
  children: (errors: UploadErrors) => ReactNode;
}) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [errors, setErrors] = useState<UploadErrors>({});
  const [message, setMessage] = useState<string>();

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const element = event.currentTarget;
    const form = new FormData(element);
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
      const response = await fetch(`/api/cultivars/${encodeURIComponent(slug)}/${route}`, {
        method: 'POST',
        body: form,
      });
      const answer = await uploadAnswer(response);
      if (answer.id === null) {
        setErrors(answer.errors);
        setMessage(answer.message);
      } else if (staysOnPage) {
        element.reset();
        setErrors({});
        router.push(resultHref(answer.id));
      } else {
        // Another page opens: the button stays busy until it does.
        router.push(resultHref(answer.id));
        return;
      }
    } catch {
      setErrors({});
      setMessage('The upload did not reach the server; check the connection and try again.');
    }
    setPending(false);
  }

  return (
    <form onSubmit={submit} className="max-w-xl space-y-3" data-testid={testId} noValidate>
      <CultivarSelect
        id={`${idPrefix}cultivar`}
        label={cultivarLabel}
        cultivars={cultivars}
        errors={errors.cultivar}
      />
      {children(errors)}
      <FormMessage tone="error" message={message} />
      <Button type="submit" disabled={pending} aria-busy={pending}>
        {pending ? pendingLabel : submitLabel}
      </Button>
    </form>
  );
}
