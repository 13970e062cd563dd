import { ASSUMPTIONS } from '../assumptions';
import { curvesOf, fruitUsedRows, pointsOf, type CheckDescriptor, type Marker } from '../report';
import { stackResultSchema, type StackResult } from './result';

/** How a saved stack check is shown, printed, exported and compared. */
export const stackDescriptor: CheckDescriptor<StackResult> = {
  title: 'Stack check',
  resultSchemaId: 'stack/2',
  resultSchema: stackResultSchema,
  assumptions: ASSUMPTIONS.stack,
  report(r) {
    const u = r.inputs_used;
    const b = r.bottom;
    const safe = r.deepest_safe_fill_mm;
    const within = r.deepest_fill_within_tolerance_mm;
    const markers: Marker[] = [{ x: u.fill_depth_mm, label: 'this fill' }];
    if (typeof safe === 'number') markers.push({ x: safe, label: 'no bruise' });
    if (typeof within === 'number') markers.push({ x: within, label: 'within tolerance' });
    const layers = (n: number | null | undefined) =>
      typeof n === 'number' ? ` (${n} layer${n === 1 ? '' : 's'} of fruit)` : undefined;
    return {
      scenario: [
        { label: 'Bin inside length', value: u.bin_length_mm, unit: 'mm' },
        { label: 'Bin inside width', value: u.bin_width_mm, unit: 'mm' },
        { label: 'Fill depth', value: u.fill_depth_mm, unit: 'mm' },
      ],
      figures: [
        { label: 'Bin pressure at the bottom', value: b.vertical_pressure_kpa, unit: 'kPa' },
        { label: 'Load on one contact', value: b.contact_force_n, unit: 'N' },
        { label: 'Contact radius', value: b.contact_radius_mm, unit: 'mm' },
        { label: 'Contact pressure', value: b.contact_pressure_kpa, unit: 'kPa' },
        {
          label: 'Deepest fill with no bruise',
          value: typeof safe === 'number' ? safe : null,
          unit: 'mm',
          text:
            safe === null
              ? 'any depth'
              : safe === undefined
                ? 'needs a threshold'
                : layers(r.layers?.no_bruise),
        },
        ...(r.bruise
          ? [
              { label: 'Bruise at the bottom contact', value: r.bruise.diameter_mm, unit: 'mm' },
              {
                label: 'Deepest fill within the grade',
                value: typeof within === 'number' ? within : null,
                unit: 'mm',
                text:
                  within === null
                    ? 'any depth'
                    : within === undefined
                      ? '—'
                      : layers(r.layers?.within_tolerance),
              },
            ]
          : []),
      ],
      used: [
        ...fruitUsedRows(u),
        { label: 'Bulk density', value: u.bulk_density_kg_m3 },
        { label: 'Wall friction', value: u.wall_friction },
        { label: 'Lateral pressure ratio', value: u.lateral_pressure_ratio },
      ],
      margin: r.margin,
      restsOn: r.evidence?.rests_on ?? null,
      bruise: r.bruise ?? null,
      charts: [
        {
          id: 'stack-pressure',
          title: 'Pressure against fill depth',
          x: { label: 'fill depth', unit: 'mm' },
          y: { label: 'pressure', unit: 'kPa' },
          series: [
            {
              label: 'bin vertical pressure',
              points: r.series.map((p) => [p.depth_mm, p.vertical_pressure_kpa]),
            },
            {
              label: 'bottom contact pressure',
              points: r.series.map((p) => [p.depth_mm, p.contact_pressure_kpa]),
            },
          ],
          markers,
        },
        {
          id: 'stack-margin',
          title: 'Bruise margin against fill depth',
          x: { label: 'fill depth', unit: 'mm' },
          y: { label: 'margin', unit: '–' },
          series: [
            {
              label: 'margin',
              points: pointsOf(
                r.series,
                (p) => p.depth_mm,
                (p) => p.margin,
              ),
            },
          ],
          markers,
        },
      ],
      curves: curvesOf(r.series, [
        ['depth_mm', 'depth_mm'],
        ['vertical_pressure_kpa', 'vertical_pressure_kpa'],
        ['contact_pressure_kpa', 'contact_pressure_kpa'],
        ['margin', 'margin'],
      ]),
      warnings: r.warnings,
    };
  },
};
