'use client';

import { useState } from 'react';
import type { FacingPreset } from '@/lib/checks/facings';
import type { SqueezeCheckResult } from '@/lib/checks/squeeze/check';
import { useUnits } from '@/components/units/units-provider';
import type { CultivarOption } from './check-fields';
import { initialText, type FormText } from './initial-text';
import { squeezeDescriptor } from '@/lib/checks/squeeze/report';
import { CheckWorkbench } from './check-workbench';
import { SlipMap } from './slip-map';
import { SqueezeForm } from './squeeze-form';
import { SqueezeProbability } from './squeeze-probability';
import { siFields, useCheck } from './use-check';

export function SqueezeCheck({
  cultivars,
  initialCultivar,
}: {
  cultivars: CultivarOption[];
  initialCultivar: string;
}) {
  const units = useUnits();
  const [cultivar, setCultivar] = useState(initialCultivar);
  const [facing, setFacing] = useState<FacingPreset>('rigid');
  const [text, setText] = useState<FormText>(() =>
    initialText(
      {
        padDiameterMm: '20',
        padEdgeMm: '2',
        safetyFactor: '2',
        accelerationMs2: '2',
        maxTravelMm: '2',
      },
      units.toDisplay,
    ),
  );
  const set = (key: string) => (value: string) => setText((t) => ({ ...t, [key]: value }));
  const body: Record<string, unknown> = {
    facing,
    ...(cultivar && { cultivar }),
    ...siFields(text, units.fromDisplay, (key) => !key.startsWith('facing') || facing === 'custom'),
  };
  const state = useCheck<SqueezeCheckResult>('/api/checks/squeeze', body, 500);
  return (
    <CheckWorkbench
      check="squeeze"
      descriptor={squeezeDescriptor}
      state={state}
      body={body}
      figuresTestId="squeeze-figures"
      form={
        <SqueezeForm
          cultivars={cultivars}
          cultivar={cultivar}
          setCultivar={setCultivar}
          facing={facing}
          setFacing={setFacing}
          text={text}
          set={set}
          fieldErrors={state.fieldErrors}
          message={state.message}
        />
      }
      basis={() =>
        'Static bruise threshold ÷ peak contact pressure at the grip point (the least squeeze that lifts the fruit).'
      }
      extras={(r) => (r.slip ? <SlipMap slip={r.slip} /> : null)}
      after={<SqueezeProbability body={body} disabled={!state.result?.margin} />}
    />
  );
}
