import { curvesOf, type CheckDescriptor } from '@/lib/checks/report';
import { rollResultSchema, type RollResult } from './result';

export const rollDescriptor: CheckDescriptor<RollResult> = {
  title: 'Roll check',
  resultSchemaId: 'roll/1',
  resultSchema: rollResultSchema,
  assumptions: 'A fruit rolls without slipping at a steady speed (fixture).',
  report: (r) => ({
    scenario: [{ label: 'Chute length', value: r.inputs_used.chute_length_mm, unit: 'mm' }],
    figures: [{ label: 'Rolling speed', value: r.speed_m_s, unit: 'm/s' }],
    used: [{ label: 'Mass', value: r.inputs_used.mass_g }],
    margin: r.margin,
    restsOn: null,
    charts: [
      {
        id: 'roll-speed',
        title: 'Speed along the chute',
        x: { label: 'length', unit: 'mm' },
        y: { label: 'speed', unit: 'm/s' },
        series: [{ label: 'speed', points: r.series.map((p) => [p.length_mm, p.speed_m_s]) }],
      },
    ],
    curves: curvesOf(r.series, [
      ['length_mm', 'length_mm'],
      ['speed_m_s', 'speed_m_s'],
    ]),
    warnings: r.warnings,
  }),
};
