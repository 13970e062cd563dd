import type { LabTestRecord } from '@/lib/data/lab-tests';
import { rangeText, sig } from './format';
import { UploadedTestList } from './uploaded-test-list';

/** Uploaded tests, newest first: a card per test, its result in one line. */
export function TestList({ tests }: { tests: LabTestRecord[] }) {
  return (
    <UploadedTestList
      tests={tests}
      testIds={{ list: 'lab-test-list', empty: 'lab-tests-empty' }}
      empty="No compression tests yet. Upload one below: its apparent modulus is fitted at once."
      name="Test"
      href={(t) => `/editor/lab-tests/${t.id}`}
      figures={(t) => (
        <>
          <span className="num">E {sig(t.modulusMpa)} MPa</span>
          <span className="num">R² {t.rSquared.toFixed(3)}</span>
          <span className="num">{rangeText(t.fitFromMm, t.fitToMm)}</span>
        </>
      )}
    />
  );
}
