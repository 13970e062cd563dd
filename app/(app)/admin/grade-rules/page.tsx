import { AdminTabs } from '@/components/admin/admin-tabs';
import { GradeRuleForm } from '@/components/admin/grade-rule-form';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { listCommodities } from '@/lib/data/cultivars';
import { allGradeRules } from '@/lib/data/grade-rules';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('grade-rules:manage', 'Grade rules');

const KIND_WORDS = {
  standard: 'published grading standard',
  research: 'research definition',
  site: "this site's own rule",
} as const;

export default async function GradeRulesPage() {
  const actor = await requirePageActor('grade-rules:manage');
  const [rules, commodities] = await Promise.all([allGradeRules(), listCommodities(actor)]);
  return (
    <section>
      <PageTitle title="Admin">
        The largest bruise each grade tolerates. The stack, squeeze and drop checks judge their
        predicted bruise against one of these (the commodity&apos;s strictest published rule unless
        the engineer chooses another).
      </PageTitle>
      <AdminTabs current="/admin/grade-rules" />
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="grade-rules">
          <thead className="text-xs text-stone-600">
            <tr>
              <th className="py-1 pr-2">Rule</th>
              <th className="py-1 pr-2">Commodity</th>
              <th className="py-1 pr-2">Largest bruise</th>
              <th className="py-1 pr-2">Kind</th>
              <th className="py-1">Source</th>
            </tr>
          </thead>
          <tbody>
            {rules.map((r) => (
              <tr key={r.slug} className="border-t border-stone-200 align-top">
                <td className="py-1 pr-2">{r.name}</td>
                <td className="py-1 pr-2">{r.commodity ?? 'any'}</td>
                <td className="num py-1 pr-2">
                  {r.measure === 'diameter' ? `${r.limit} mm across` : `${r.limit} mm²`}
                  {r.maxDepthMm !== null ? `, ${r.maxDepthMm} mm deep` : ''}
                </td>
                <td className="py-1 pr-2">{KIND_WORDS[r.kind]}</td>
                <td className="py-1 text-xs text-stone-600">{r.source ?? '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <GradeRuleForm commodities={commodities.map((c) => ({ slug: c.slug, name: c.name }))} />
    </section>
  );
}
