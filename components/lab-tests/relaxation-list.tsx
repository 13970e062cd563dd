import { Measure } from '@/components/units/measure';
import type { RelaxationTestRecord } from '@/lib/data/relaxation-tests';
import { sig } from './format';
import { UploadedTestList } from './uploaded-test-list';

/** Recent relaxation tests, newest first: a line each, its link showing the fit above. */
export function RelaxationList({ tests }: { tests: RelaxationTestRecord[] }) {
  return (
    <UploadedTestList
      tests={tests}
      testIds={{ list: 'relaxation-list', empty: 'relaxation-empty' }}
      empty="No relaxation tests yet. Upload one above: Peleg's k₁ and k₂ are fitted at once."
      name="Relaxation"
      href={(t) => `/editor/lab-tests?relaxation=${t.id}#relaxation-result`}
      figures={(t) => (
        <>
          <span className="num">k₁ {sig(t.k1S)} s</span>
          <span className="num">k₂ {sig(t.k2)}</span>
          <span className="num">R² {t.r2Force.toFixed(3)}</span>
          <span>
            F₀ <Measure value={t.f0N} unit="N" />
          </span>
        </>
      )}
    />
  );
}
