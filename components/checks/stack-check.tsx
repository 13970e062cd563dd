'use client';

import { useState } from 'react';
import type { StackCheckResult } from '@/lib/checks/stack/check';
import { CultivarSelect, type CultivarOption } from './check-fields';
import {
  CheckFormError,
  FRUIT_FIELDS,
  FruitFieldset,
  MeasureFields,
  type FieldSpec,
} from './measure-fields';
import { stackDescriptor } from '@/lib/checks/stack/report';
import { CheckWorkbench } from './check-workbench';
import { siFields, useCheck } from './use-check';
import { initialText, type FormText } from './initial-text';
import { useUnits } from '@/components/units/units-provider';

const BIN_FIELDS: readonly FieldSpec[] = [
  ['binLengthMm', 'Bin inside length'],
  ['binWidthMm', 'Bin inside width'],
  ['fillDepthMm', 'Fill depth'],
  ['bulkDensityKgM3', 'Bulk density', 'empty: published, else 60 % of the fruit density'],
  [
    'wallFriction',
    'Wall friction coefficient',
    'empty: published (plywood or wood), else 0.4 typical',
  ],
  ['lateralRatio', 'Lateral pressure ratio K', 'empty: published, else 0.4 typical'],
];

export function StackCheck({
  cultivars,
  initialCultivar,
}: {
  cultivars: CultivarOption[];
  initialCultivar: string;
}) {
  const units = useUnits();
  const [cultivar, setCultivar] = useState(initialCultivar);
  const [text, setText] = useState<FormText>(() =>
    initialText(
      {
        binLengthMm: '1200',
        binWidthMm: '1000',
        fillDepthMm: '600',
      },
      units.toDisplay,
    ),
  );
  const set = (key: string) => (value: string) => setText((t) => ({ ...t, [key]: value }));
  const body: Record<string, unknown> = {
    ...(cultivar && { cultivar }),
    ...siFields(text, units.fromDisplay),
  };
  const state = useCheck<StackCheckResult>('/api/checks/stack', body);
  const fields = { text, set, fieldErrors: state.fieldErrors };
  const option = cultivars.find((o) => o.slug === cultivar);
  const form = (
    <form className="space-y-3" onSubmit={(e) => e.preventDefault()} aria-label="Stack inputs">
      <CultivarSelect
        options={cultivars}
        value={cultivar}
        onChange={setCultivar}
        errors={state.fieldErrors.cultivar}
      />
      <MeasureFields fields={BIN_FIELDS} state={fields} />
      <FruitFieldset fields={FRUIT_FIELDS} state={fields} option={option} />
      <CheckFormError message={state.message} />
    </form>
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
        <p className="text-sm" data-testid="deepest-safe">
          Deepest safe fill:{' '}
          <strong className="num">
            {r.deepest_safe_fill_mm === undefined
              ? 'needs a threshold'
              : r.deepest_safe_fill_mm === null
                ? 'any depth (the bin pressure levels off below the limit)'
                : units.show(r.deepest_safe_fill_mm, 'mm')}
          </strong>
        </p>
      )}
    />
  );
}
