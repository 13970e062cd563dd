'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { CAPTION_MAX, CREDIT_MAX } from '@/lib/photos/limits';
import { PhotoInput } from './photo-input';
import { chosenFileProblem, sendPhoto, type UploadResult } from './upload-request';

/** Add a photo to a cultivar: the route checks the role, the bytes and the sizes again. */
export function PhotoUploadForm({ slug }: { slug: string }) {
  const router = useRouter();
  const [progress, setProgress] = useState<number | null>(null);
  const [result, setResult] = useState<UploadResult | null>(null);
  const pending = progress !== null;
  const errors = result?.fieldErrors ?? {};

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    const problem = chosenFileProblem(data.get('file'));
    if (problem) return setResult({ ok: false, fieldErrors: { file: [problem] } });
    setResult(null);
    setProgress(0);
    const answer = await sendPhoto(`/api/cultivars/${slug}/photos`, data, setProgress);
    setProgress(null);
    setResult(answer);
    if (answer.ok) {
      form.reset();
      router.refresh();
    }
  }

  return (
    <details className="max-w-lg rounded-lg border border-stone-200 bg-stone-50">
      <summary className="cursor-pointer px-4 py-2 text-sm font-medium text-stone-900">
        Add a photo
      </summary>
      <form
        onSubmit={submit}
        noValidate
        className="space-y-3 px-4 pb-4 pt-1"
        data-testid="photo-upload-form"
        aria-label="Add a photo"
      >
        <PhotoInput
          id="photo-file"
          name="file"
          type="file"
          label="Photo file"
          accept="image/jpeg,image/png,image/webp"
          hint="JPEG, PNG or WebP, at most 8 MB. Location and camera data are removed."
          errors={errors.file}
        />
        <PhotoInput
          id="photo-caption"
          name="caption"
          label="Caption"
          maxLength={CAPTION_MAX}
          errors={errors.caption}
        />
        <PhotoInput
          id="photo-credit"
          name="credit"
          label="Credit"
          maxLength={CREDIT_MAX}
          hint="Who took the photo, or where it is from."
          errors={errors.credit}
        />
        {pending ? (
          <div className="space-y-1" aria-live="polite">
            <progress max={100} value={progress} aria-label="Upload progress" className="w-full" />
            <p className="text-xs text-stone-600">
              {progress < 100 ? `Uploading… ${progress} %` : 'Making the smaller sizes…'}
            </p>
          </div>
        ) : null}
        <FormMessage tone={result?.ok ? 'success' : 'error'} message={result?.message} />
        <Button type="submit" disabled={pending}>
          {pending ? 'Uploading…' : 'Upload photo'}
        </Button>
      </form>
    </details>
  );
}
