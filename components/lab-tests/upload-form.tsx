'use client';

import { Field } from '@/components/ui/field';
import { TestUploadForm } from './test-upload-form';

/** Upload a compression-test CSV for a cultivar; errors appear beside their fields. */
export function UploadForm({ cultivars }: { cultivars: { slug: string; label: string }[] }) {
  return (
    <TestUploadForm
      cultivars={cultivars}
      cultivarLabel="Cultivar"
      route="lab-tests"
      resultHref={(id) => `/editor/lab-tests/${id}`}
      testId="lab-test-upload"
      submitLabel="Upload and fit"
      pendingLabel="Uploading and fitting…"
    >
      {(errors) => (
        <>
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
        </>
      )}
    </TestUploadForm>
  );
}
