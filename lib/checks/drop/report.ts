import { ASSUMPTIONS } from '../assumptions';
import { curvesOf, type CheckDescriptor, fruitUsedRows } from '../report';
import { dropResultSchema, type DropResult } from './result';

/** How a saved drop check is shown, printed, exported and compared. */
export const dropDescriptor: CheckDescriptor<DropResult> = {
  title: 'Drop check',
  resultSchemaId: 'drop/2',
  resultSchema: dropResultSchema,
  assumptions: ASSUMPTIONS.drop,
  report(r) {
    const i = r.impact;
    const u = r.inputs_used;
    return {
      scenario: [
        { label: 'Drop height', value: u.height_mm, unit: 'mm' },
        { label: 'Surface', value: null, unit: '–', text: `${u.surface} (${u.surface_basis})` },
      ],
      figures: [
        { label: 'Impact energy', value: i.impact_energy_j, unit: 'J' },
        { label: 'Peak force', value: i.peak_force_n, unit: 'N' },
        { label: 'Peak pressure', value: i.peak_pressure_kpa, unit: 'kPa' },
        { label: 'Contact radius', value: i.contact_radius_mm, unit: 'mm' },
        { label: 'Contact time', value: i.contact_time_ms, unit: 'ms' },
        { label: 'Impact speed', value: i.impact_velocity_m_s, unit: 'm/s' },
        {
          label: 'Published safe height',
          value: r.dynamic?.safe_height_mm ?? null,
          unit: 'mm',
          text: r.dynamic ? undefined : 'none published for this surface',
        },
        {
          label: 'Static margin (elastic estimate)',
          value: r.static?.margin ?? null,
          unit: '–',
          text: r.static ? undefined : 'no static threshold',
        },
        ...(r.bruise_volume
          ? [
              {
                label: 'Bruise susceptibility (published)',
                value: r.bruise_volume.susceptibility_mm3_j,
                unit: 'mm³/J',
              },
              { label: 'Bruise volume', value: r.bruise_volume.volume_mm3, unit: 'mm³' },
              {
                label: 'Bruise across (taken as a hemisphere)',
                value: r.bruise_volume.diameter_mm,
                unit: 'mm',
              },
              {
                label: 'Tallest drop within the grade (susceptibility)',
                value: r.within_tolerance_height_mm ?? null,
                unit: 'mm',
              },
            ]
          : r.bruise
            ? [
                { label: 'Bruise from the Hertz field', value: r.bruise.diameter_mm, unit: 'mm' },
                {
                  label: 'Tallest drop within the grade (Hertz)',
                  value: r.within_tolerance_height_mm ?? null,
                  unit: 'mm',
                },
              ]
            : []),
      ],
      used: [...fruitUsedRows(u)],
      margin: r.margin,
      restsOn: r.evidence?.rests_on ?? null,
      // A published drop figure outranks the elastic estimate: that bruise verdict leads only
      // without one. A bruise sized from a published susceptibility (drop tests) always leads.
      bruise: r.bruise_volume || r.margin?.basis !== 'dynamic' ? (r.bruise ?? null) : null,
      relation: r.relation ?? null,
      charts: [
        {
          id: 'drop-pressure',
          title: 'Peak pressure against drop height',
          x: { label: 'drop height', unit: 'mm' },
          y: { label: 'peak pressure', unit: 'kPa' },
          series: [
            {
              label: 'peak pressure',
              points: r.series.map((p) => [p.height_mm, p.peak_pressure_kpa]),
            },
          ],
          markers: [
            { x: u.height_mm, label: 'this drop' },
            ...(r.static ? [{ y: r.static.threshold_kpa, label: 'static threshold' }] : []),
          ],
        },
        {
          id: 'drop-energy',
          title: 'Impact energy against drop height',
          x: { label: 'drop height', unit: 'mm' },
          y: { label: 'impact energy', unit: 'J' },
          series: [
            {
              label: 'impact energy',
              points: r.series.map((p) => [p.height_mm, p.impact_energy_j]),
            },
          ],
          markers: [{ x: u.height_mm, label: 'this drop' }],
        },
      ],
      curves: curvesOf(r.series, [
        ['height_mm', 'height_mm'],
        ['peak_pressure_kpa', 'peak_pressure_kpa'],
        ['impact_energy_j', 'impact_energy_j'],
      ]),
      warnings: r.warnings,
    };
  },
};
