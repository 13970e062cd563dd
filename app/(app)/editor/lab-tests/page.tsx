import { TestList } from '@/components/lab-tests/test-list';
import { UploadForm } from '@/components/lab-tests/upload-form';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { listLabTests, listCultivarChoices } from '@/lib/data/lab-tests';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('lab-tests:upload', 'Lab tests');

export default async function LabTestsPage() {
  const actor = await requirePageActor('lab-tests:upload');
  const [tests, cultivars] = await Promise.all([listLabTests(actor), listCultivarChoices(actor)]);
  return (
    <section>
      <PageTitle title="Lab tests">
        Parallel-plate compression tests of whole fruit. Each upload is fitted to the Hertz law for
        its apparent modulus; a result can start a draft revision of the cultivar.
      </PageTitle>
      <h2 className="mb-3 font-semibold">Uploaded tests</h2>
      <TestList tests={tests} />
      <h2 className="mb-3 mt-8 font-semibold">Upload a test</h2>
      <UploadForm cultivars={cultivars} />
    </section>
  );
}
