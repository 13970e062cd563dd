'use client';

import type { StackCheckResult } from '@/lib/checks/stack/check';
import type { CultivarOption } from './check-fields';
import { CheckForm, MeasureFields, type FieldSpec } from './measure-fields';
import { stackDescriptor } from '@/lib/checks/stack/report';
import { CheckWorkbench } from './check-workbench';
import { useCheckForm } from './use-check-form';
import { useUnits } from '@/components/units/units-provider';

const BIN_FIELDS: readonly FieldSpec[] = [
  ['binLengthMm', 'Bin inside length'],
  ['binWidthMm', 'Bin inside width'],
  ['fillDepthMm', 'Fill depth'],
  [
    'bulkDensityKgM3',
    'Bulk density',
    'empty: the knowledge base (the cultivar, its commodity, a typical value), else 60 % of the fruit density',
  ],
  [
    'wallFriction',
    'Wall friction coefficient',
    'empty: the knowledge base (on plywood, wood or plastic), else 0.4 typical',
  ],
  [
    'lateralRatio',
    'Lateral pressure ratio K',
    'empty: the knowledge base, else 0.4 typical (bin design takes 0.3–0.6)',
  ],
];

export function StackCheck({
  cultivars,
  initialCultivar,
}: {
  cultivars: CultivarOption[];
  initialCultivar: string;
}) {
  const units = useUnits();
  const { cultivar, setCultivar, stage, setStage, grade, body, state, fields } =
    useCheckForm<StackCheckResult>({
      endpoint: '/api/checks/stack',
      initialCultivar,
      defaults: { binLengthMm: '1200', binWidthMm: '1000', fillDepthMm: '600' },
      choices: {},
    });
  const form = (
    <CheckForm
      label="Stack inputs"
      cultivars={cultivars}
      cultivar={cultivar}
      setCultivar={setCultivar}
      stage={stage}
      setStage={setStage}
      grade={grade}
      fields={fields}
      message={state.message}
    >
      <MeasureFields fields={BIN_FIELDS} state={fields} />
    </CheckForm>
  );
  return (
    <CheckWorkbench
      check="stack"
      descriptor={stackDescriptor}
      state={state}
      body={body}
      form={form}
      figuresTestId="stack-figures"
      basis={() =>
        'Static bruise threshold ÷ Hertz contact pressure between two bottom-layer fruit.'
      }
      extras={(r) => (
        <div className="space-y-1 text-sm">
          <p data-testid="deepest-safe">
            Deepest fill with no bruise at all:{' '}
            <strong className="num">
              {r.deepest_safe_fill_mm === undefined
                ? 'needs a threshold'
                : r.deepest_safe_fill_mm === null
                  ? 'any depth (the bin pressure levels off below the limit)'
                  : units.show(r.deepest_safe_fill_mm, 'mm')}
            </strong>
            {typeof r.layers?.no_bruise === 'number'
              ? ` — ${r.layers.no_bruise} layers of fruit`
              : ''}
          </p>
          {r.bruise?.rule ? (
            <p data-testid="deepest-within">
              Deepest fill whose bottom bruise stays within {r.bruise.rule.name}:{' '}
              <strong className="num">
                {r.deepest_fill_within_tolerance_mm === null
                  ? 'any depth (the bin pressure levels off below it)'
                  : r.deepest_fill_within_tolerance_mm === undefined
                    ? '—'
                    : units.show(r.deepest_fill_within_tolerance_mm, 'mm')}
              </strong>
              {typeof r.layers?.within_tolerance === 'number'
                ? ` — ${r.layers.within_tolerance} layers of fruit`
                : ''}
            </p>
          ) : null}
        </div>
      )}
    />
  );
}
