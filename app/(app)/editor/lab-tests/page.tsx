import { RelaxationSection, type ShownRelaxation } from '@/components/lab-tests/relaxation-section';
import { TestList } from '@/components/lab-tests/test-list';
import { UploadForm } from '@/components/lab-tests/upload-form';
import { PageTitle } from '@/components/ui/page-title';
import { can } from '@/lib/auth/roles';
import type { Actor } from '@/lib/auth/actor';
import { requirePageActor } from '@/lib/auth/session';
import { listLabTests, listCultivarChoices } from '@/lib/data/lab-tests';
import { getRelaxationTest, listRelaxationTests } from '@/lib/data/relaxation-tests';
import { NotFoundError } from '@/lib/errors';
import { RELAXATION_DEMO_PATH } from '@/lib/lab-tests/relaxation-demo';
import { relaxationPlot } from '@/lib/lab-tests/relaxation-plot';
import { titleFor } from '@/lib/page-title';
import { idSchema } from '@/lib/validation/id';

export const generateMetadata = titleFor('lab-tests:upload', 'Lab tests');

/** How many relaxation tests the page lists. */
const RECENT = 20;

/** The relaxation test named by `?relaxation=<id>`, with what its result draws. */
async function shownRelaxation(actor: Actor, raw: string | string[] | undefined) {
  if (raw === undefined) return null;
  const id = idSchema.safeParse(raw);
  if (!id.success) return { missing: 'That is not a relaxation test number.' };
  try {
    const { readings, fit, ...test } = await getRelaxationTest(actor, id.data);
    return { test, plot: relaxationPlot(test, readings), pointsUsed: fit?.points ?? null };
  } catch (error) {
    if (error instanceof NotFoundError) return { missing: `No relaxation test #${id.data}.` };
    throw error;
  }
}

export default async function LabTestsPage({
  searchParams,
}: {
  searchParams: Promise<{ relaxation?: string | string[] }>;
}) {
  const actor = await requirePageActor('lab-tests:upload');
  const [tests, cultivars, relaxationTests, shown] = await Promise.all([
    listLabTests(actor),
    listCultivarChoices(actor),
    listRelaxationTests(actor),
    searchParams.then((p): Promise<ShownRelaxation> => shownRelaxation(actor, p.relaxation)),
  ]);
  return (
    <section>
      <PageTitle title="Lab tests">
        Parallel-plate compression tests of whole fruit, each fitted to the Hertz law for its
        apparent modulus, and stress-relaxation tests, each fitted to Peleg&apos;s model. A result
        can start a draft revision of the cultivar.
      </PageTitle>
      <h2 className="mb-3 font-semibold">Compression tests</h2>
      <TestList tests={tests} />
      <h2 className="mb-3 mt-8 font-semibold">Upload a compression test</h2>
      <UploadForm cultivars={cultivars} />
      <RelaxationSection
        cultivars={cultivars}
        tests={relaxationTests.slice(0, RECENT)}
        shown={shown}
        canDraft={can(actor.role, 'revisions:edit')}
        demoPath={RELAXATION_DEMO_PATH}
      />
    </section>
  );
}
