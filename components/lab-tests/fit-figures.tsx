import type { LabTestWithData } from '@/lib/data/lab-tests';
import { FIT_STRAIN } from '@/lib/lab-tests/limits';
import { Figure } from './figure';
import { dateText, geometryText, rangeText, sig } from './format';

/** R² below this means the readings leave the Hertz law inside the fitted range. */
const WEAK_FIT = 0.95;

/** The headline result of a test and what it was computed from. */
export function FitFigures({ test }: { test: LabTestWithData }) {
  const points = test.fit?.pointsUsed;
  return (
    <section className="space-y-3">
      <dl className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        <Figure
          label="Apparent modulus E"
          value={`${sig(test.modulusMpa)} MPa`}
          testId="fit-modulus"
        />
        <Figure label="R² of the fit" value={test.rSquared.toFixed(4)} testId="fit-r-squared" />
        <Figure
          label="Range fitted"
          value={rangeText(test.fitFromMm, test.fitToMm)}
          testId="fit-range"
        />
        <Figure
          label="Readings fitted"
          value={points === undefined ? '—' : String(points)}
          testId="fit-points"
        />
      </dl>
      {test.rSquared < WEAK_FIT ? (
        <p className="rounded-md bg-clay-50 px-3 py-2 text-sm text-clay-700">
          R² is below {WEAK_FIT}: the readings depart from the Hertz law inside the fitted range.
          Check that the file starts at first contact and holds the loading part only.
        </p>
      ) : null}
      <p className="text-sm text-stone-600">
        Sample {geometryText(test.geometry)}, ν = {test.poisson} assumed. Fitted: readings with 0
        &lt; D ≤ {FIT_STRAIN * 100} % of the sample size, force against D<sup>3/2</sup> by least
        squares (Hertz contact of a convex body between parallel plates, the basis of ASAE/ASABE
        S368). File {test.fileName}, {test.rows} rows; uploaded by {test.uploadedBy.name} on{' '}
        {dateText(test.createdAt)}.
      </p>
    </section>
  );
}
