import { ASSUMPTIONS } from '../assumptions';
import { curvesOf, pointsOf, type CheckDescriptor, type ChartSpec, fruitUsedRows } from '../report';
import { squeezeResultSchema, type SqueezeResult } from './result';

function charts(r: SqueezeResult): ChartSpec[] {
  const grip = r.model.liftability?.grip ?? null;
  const gripMarker =
    grip?.travel_per_pad_mm != null ? [{ x: grip.travel_per_pad_mm, label: 'grip' }] : [];
  const out: ChartSpec[] = [
    {
      id: 'squeeze-force',
      title: 'Pad force against travel',
      x: { label: 'travel per pad', unit: 'mm' },
      y: { label: 'force', unit: 'N' },
      series: [
        {
          label: 'pad force',
          points: pointsOf(
            r.model.steps,
            (s) => s.travel_per_pad_mm ?? 0,
            (s) => s.force_n,
          ),
        },
      ],
      markers: gripMarker,
    },
  ];
  if (r.grip_profile)
    out.push({
      id: 'squeeze-profile',
      title: 'Contact pressure at the grip point',
      x: { label: 'radius', unit: 'mm' },
      y: { label: 'contact pressure', unit: 'kPa' },
      series: [
        {
          label: 'contact pressure',
          points: pointsOf(
            r.grip_profile,
            (p) => p.r_mm ?? 0,
            (p) => p.pressure_kpa,
          ),
        },
      ],
    });
  if (r.sweep)
    out.push({
      id: 'squeeze-sweep',
      title: 'Bruise margin against pad diameter',
      x: { label: 'pad diameter', unit: 'mm' },
      y: { label: 'margin', unit: '–' },
      series: [
        {
          label: 'margin',
          points: pointsOf(
            r.sweep.points,
            (p) => p.pad_diameter_mm ?? 0,
            (p) => p.bruise_margin,
          ),
        },
      ],
      markers: [
        ...(r.inputs_used.pad_diameter_mm === null
          ? []
          : [{ x: r.inputs_used.pad_diameter_mm, label: 'this pad' }]),
        { y: 1, label: 'margin 1' },
      ],
    });
  if (r.slip?.nodes)
    out.push({
      id: 'squeeze-slip',
      title: 'Pad traction and contact pressure across the pad at the grip',
      x: { label: 'radius', unit: 'mm' },
      y: { label: 'stress', unit: 'kPa' },
      series: [
        {
          label: 'contact pressure',
          points: pointsOf(
            r.slip.nodes,
            (p) => p.r_mm ?? 0,
            (p) => p.pressure_kpa,
          ),
        },
        {
          label: 'tangential traction',
          points: pointsOf(
            r.slip.nodes,
            (p) => p.r_mm ?? 0,
            (p) => p.traction_kpa,
          ),
        },
      ],
      markers:
        r.slip.stick_radius_mm == null ? [] : [{ x: r.slip.stick_radius_mm, label: 'stick edge' }],
    });
  return out;
}

/** How a saved squeeze check is shown, printed, exported and compared. */
export const squeezeDescriptor: CheckDescriptor<SqueezeResult> = {
  title: 'Squeeze check',
  resultSchemaId: 'squeeze/2',
  resultSchema: squeezeResultSchema,
  assumptions: ASSUMPTIONS.squeeze,
  report(r) {
    const u = r.inputs_used;
    const g = r.model.liftability?.grip ?? null;
    const plate = u.pad_diameter_mm === null;
    return {
      scenario: [
        {
          label: 'Pad diameter',
          value: u.pad_diameter_mm,
          unit: 'mm',
          text: plate ? 'flat plates' : undefined,
        },
        {
          label: 'Pad edge radius',
          value: u.pad_edge_mm,
          unit: 'mm',
          text: plate ? '—' : undefined,
        },
        { label: 'Pad facing', value: null, unit: '–', text: `${u.facing} (${u.facing_basis})` },
        { label: 'Safety factor on weight', value: u.safety_factor, unit: '–' },
        { label: 'Peak acceleration of the move', value: u.acceleration_m_s2, unit: 'm/s²' },
        { label: 'Maximum travel per pad', value: u.max_travel_mm, unit: 'mm' },
      ],
      figures: [
        {
          label: 'Grip force per pad',
          value: g?.force_n ?? null,
          unit: 'N',
          text: g ? undefined : 'not lifted',
        },
        { label: 'Travel per pad at the grip', value: g?.travel_per_pad_mm ?? null, unit: 'mm' },
        { label: 'Peak pressure at the grip', value: g?.peak_pressure_kpa ?? null, unit: 'kPa' },
        { label: 'Contact radius at the grip', value: g?.contact_radius_mm ?? null, unit: 'mm' },
        {
          label: 'Largest subsurface shear',
          value: g?.max_shear_kpa ?? null,
          unit: 'kPa',
          text: g?.max_shear_kpa == null ? (g?.max_shear_unavailable ?? '—') : undefined,
        },
        {
          label: 'Shear margin',
          value: g?.shear_margin ?? null,
          unit: '–',
          text: g?.shear_margin == null ? 'no failure stress' : undefined,
        },
        {
          label: 'Smallest safe pad in the sweep',
          value: r.sweep?.smallest_safe_pad_mm ?? null,
          unit: 'mm',
          text: r.sweep && r.sweep.smallest_safe_pad_mm === null ? 'none' : undefined,
        },
        {
          label: 'Slip at the grip',
          value: null,
          unit: '–',
          text: r.slip?.holds == null ? '—' : r.slip.holds ? 'holds' : 'slides',
        },
      ],
      used: [
        ...fruitUsedRows(u),
        { label: 'Friction', value: u.friction },
        { label: 'Failure stress', value: u.failure_stress_kpa },
      ],
      margin: r.margin,
      restsOn: r.evidence?.rests_on ?? null,
      bruise: r.bruise ?? null,
      charts: charts(r),
      // Curves as CSV: the force–travel steps of the squeeze (it used to export an empty file).
      curves: curvesOf(r.model.steps, [
        ['travel_per_pad_mm', 'travel_per_pad_mm'],
        ['force_n', 'force_n'],
        ['contact_radius_mm', 'contact_radius_mm'],
        ['peak_pressure_kpa', 'peak_pressure_kpa'],
        ['mean_pressure_kpa', 'mean_pressure_kpa'],
        ['lift_ratio', 'lift_ratio'],
      ]),
      // Why the grip was not found belongs beside the warnings, in words.
      // Said once each (the model may warn of the same state at two travels).
      warnings: [
        ...new Set([
          ...r.warnings,
          ...(r.model.liftability?.grip_reason ? [r.model.liftability.grip_reason] : []),
        ]),
      ],
    };
  },
};
