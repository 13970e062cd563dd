'use client';

import { FACING_KEYS, type FacingPreset } from '@/lib/checks/facings';
import type { SqueezeCheckResult } from '@/lib/checks/squeeze/check';
import type { CultivarOption } from './check-fields';
import { squeezeDescriptor } from '@/lib/checks/squeeze/report';
import { CheckWorkbench } from './check-workbench';
import { useAddressChoice, useCheckForm } from './use-check-form';
import { SlipMap } from './slip-map';
import { SqueezeForm } from './squeeze-form';
import { SqueezeProbability } from './squeeze-probability';

export function SqueezeCheck({
  cultivars,
  initialCultivar,
}: {
  cultivars: CultivarOption[];
  initialCultivar: string;
}) {
  const [facing, setFacing] = useAddressChoice<FacingPreset>('facing', FACING_KEYS, 'rigid');
  const { cultivar, setCultivar, stage, setStage, grade, text, set, body, state } =
    useCheckForm<SqueezeCheckResult>({
      endpoint: '/api/checks/squeeze',
      initialCultivar,
      defaults: {
        padDiameterMm: '20',
        padEdgeMm: '2',
        safetyFactor: '2',
        accelerationMs2: '2',
        horizontalAccelerationMs2: '0',
        gripOffsetMm: '0',
        // A pick-and-place transfer takes a few seconds [common practice].
        holdSeconds: '3',
      },
      choices: { facing },
      keep: (key) => !key.startsWith('facing') || facing === 'custom',
      delayMs: 500,
    });
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
          stage={stage}
          setStage={setStage}
          grade={grade}
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
