import type { RelaxationTestRecord } from '@/lib/data/relaxation-tests';
import type { RelaxationPlot } from '@/lib/lab-tests/relaxation-plot';
import { RelaxationList } from './relaxation-list';
import { RelaxationResult } from './relaxation-result';
import { RelaxationUpload } from './relaxation-upload';

/** The test shown above the form, as the page read it from `?relaxation=<id>`. */
export type ShownRelaxation =
  | { test: RelaxationTestRecord; plot: RelaxationPlot; pointsUsed: number | null }
  | { missing: string }
  | null;

/** The relaxation-test part of the lab-tests page: what it is, the result, the form, the list. */
export function RelaxationSection({
  cultivars,
  tests,
  shown,
  canDraft,
  demoPath,
}: {
  cultivars: { slug: string; label: string }[];
  tests: RelaxationTestRecord[];
  shown: ShownRelaxation;
  canDraft: boolean;
  demoPath: string;
}) {
  return (
    <section id="relaxation" aria-labelledby="relaxation-title" className="mt-10 space-y-4">
      <h2 id="relaxation-title" className="font-semibold">
        Relaxation test
      </h2>
      <div className="max-w-3xl space-y-2 text-sm text-stone-600">
        <p>
          A fruit or a flesh cylinder held at a fixed plate travel while the force falls. Each
          upload is fitted to Peleg&apos;s F(t) = F₀·(1 − t ÷ (k₁ + k₂·t)) (Peleg, J. Food Science
          44, 1979): 1 ÷ k₁ is how fast the force starts to fall, 1 ÷ k₂ the share that finally
          relaxes. The squeeze check uses such a pair, k₁ and k₂ from one source, for a held grip.
        </p>
        <p>
          The file: a header naming time in s and force in N (e.g. <code>time_s,force_n</code>), the
          first row at t = 0, the end of loading, then the hold. A template to try:{' '}
          <a
            href={demoPath}
            download
            className="text-leaf-700 underline underline-offset-2"
            data-testid="relaxation-demo-link"
          >
            relaxation-demo.csv
          </a>{' '}
          — demo data, invented (k₁ = 8 s, k₂ = 1.6, F₀ = 30 N with small noise), not a measurement;
          an upload of it is marked as a demo.
        </p>
      </div>
      {shown && 'missing' in shown ? (
        <p className="rounded-md bg-clay-50 px-3 py-2 text-sm text-clay-700" role="status">
          {shown.missing}
        </p>
      ) : null}
      {shown && 'test' in shown ? (
        <RelaxationResult
          test={shown.test}
          plot={shown.plot}
          pointsUsed={shown.pointsUsed}
          canDraft={canDraft}
        />
      ) : null}
      <h3 className="font-semibold">Upload a relaxation test</h3>
      <RelaxationUpload cultivars={cultivars} />
      <h3 className="font-semibold">Recent relaxation tests</h3>
      <RelaxationList tests={tests} />
    </section>
  );
}
