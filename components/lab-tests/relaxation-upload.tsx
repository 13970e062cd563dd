'use client';

import type { InputHTMLAttributes } from 'react';
import { FieldFrame } from '@/components/ui/field-frame';
import { RELAXATION_SPECIMENS } from '@/lib/lab-tests/relaxation-schema';
import { TestUploadForm } from './test-upload-form';
import type { UploadErrors } from './upload-answer';

const SELECT =
  'block w-full rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm aria-invalid:border-red-500';
const INPUT =
  'block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500';

// The compression form shares the page, so ids take a prefix; the names are the route's fields.
const PREFIX = 'relax-';
const id = (name: string) => `${PREFIX}${name}`;

function Input({
  label,
  name,
  errors,
  hint,
  ...input
}: InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  name: string;
  errors: UploadErrors;
  hint?: string;
}) {
  return (
    <FieldFrame id={id(name)} label={label} errors={errors[name]} hint={hint}>
      {(control) => <input {...control} name={name} className={INPUT} {...input} />}
    </FieldFrame>
  );
}

/** Upload a relaxation-test CSV for a cultivar; errors appear beside their fields. */
export function RelaxationUpload({ cultivars }: { cultivars: { slug: string; label: string }[] }) {
  return (
    <TestUploadForm
      cultivars={cultivars}
      idPrefix={PREFIX}
      cultivarLabel="Fruit and variety"
      route="relaxation-tests"
      resultHref={(testId) => `/editor/lab-tests?relaxation=${testId}#relaxation-result`}
      staysOnPage
      testId="relaxation-upload"
      submitLabel="Fit the relaxation test"
      pendingLabel="Fitting…"
    >
      {(errors) => (
        <>
          <FieldFrame id={id('specimen')} label="Specimen" errors={errors.specimen}>
            {(control) => (
              <select
                {...control}
                name="specimen"
                defaultValue={RELAXATION_SPECIMENS[0]}
                className={SELECT}
              >
                {RELAXATION_SPECIMENS.map((s) => (
                  <option key={s} value={s}>
                    {s.charAt(0).toUpperCase() + s.slice(1)}
                  </option>
                ))}
              </select>
            )}
          </FieldFrame>
          <Input
            label="Held plate travel (mm)"
            name="deformationMm"
            inputMode="decimal"
            hint="The deformation the plates held during the readings, above 0 and at most 100 mm."
            errors={errors}
          />
          <div className="grid gap-3 sm:grid-cols-2">
            <Input
              label="Loading rate (optional)"
              name="loadingRate"
              hint="As the lab gives it, e.g. 20 mm/min."
              errors={errors}
            />
            <Input
              label="Test temperature (°C, optional)"
              name="temperatureC"
              inputMode="decimal"
              hint="From −5 to 50 °C."
              errors={errors}
            />
          </div>
          <Input
            label="Relaxation readings (CSV)"
            name="file"
            type="file"
            accept=".csv,text/csv"
            hint="Header naming units, e.g. time_s,force_n; the first row at t = 0 s, the end of loading; at most 2 MB and 50 000 rows."
            errors={errors}
          />
        </>
      )}
    </TestUploadForm>
  );
}
