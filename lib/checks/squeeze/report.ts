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
  const hold = r.hold;
  if (hold?.curve)
    out.push({
      id: 'squeeze-hold',
      title: `Pad force held for ${hold.seconds} s as the flesh relaxes`,
      x: { label: 'time', unit: 's' },
      y: { label: 'pad force', unit: 'N' },
      series: [
        ...(hold.held
          ? [
              {
                label: 'closed to hold to the end',
                points: pointsOf(
                  hold.curve,
                  (p) => p.t_s,
                  (p) => p.held_force_n,
                ),
              },
            ]
          : []),
        {
          label: 'closed to the lift point',
          points: pointsOf(
            hold.curve,
            (p) => p.t_s,
            (p) => p.grip_force_n,
          ),
        },
      ],
      markers: [
        ...(grip?.force_n != null
          ? [{ y: grip.force_n / r.inputs_used.safety_factor, label: 'slips below' }]
          : []),
        ...(hold.grip_slips_after_s !== null && hold.grip_slips_after_s <= hold.seconds
          ? [{ x: hold.grip_slips_after_s, label: 'slips' }]
          : []),
      ],
    });
  return out;
}

/** Force and twist at the grip: which governs, and the travel that holds both. */
function twistFigures(r: SqueezeResult) {
  const t = r.twist;
  if (!t) return [];
  return [
    { label: 'Load the pads carry (weight and inertia)', value: t.load_n, unit: 'N' },
    { label: 'Twist about the pad axis', value: t.torque_n_m, unit: 'N·m' },
    { label: "Pads' torsional friction at the grip", value: t.capacity_n_m, unit: 'N·m' },
    {
      label: 'Governs the grip',
      value: null,
      unit: '–',
      text:
        t.offset_mm === 0
          ? 'the load (centred grip: no twist)'
          : `${t.governs === 'twist' ? 'the twist' : 'the load'} (load ${t.lift_utilisation}, twist ${t.twist_utilisation ?? '—'} of capacity with the safety factor)`,
    },
    ...(t.holding
      ? [
          {
            label: 'Travel per pad to hold load and twist',
            value: t.holding.travel_per_pad_mm,
            unit: 'mm',
            text: t.holding.travel_per_pad_mm === null ? (t.holding.reason ?? '—') : undefined,
          },
          {
            label: 'Bruise margin there',
            value: t.holding.bruise_margin,
            unit: '–',
            text: t.holding.bruise_margin === null ? '—' : undefined,
          },
        ]
      : []),
  ];
}

/** The hold's figures for the report: what the relaxation does to the grip, in words. */
function holdFigures(r: SqueezeResult) {
  const h = r.hold;
  if (!h) return [];
  if (!h.relaxation)
    return [
      {
        label: 'Grip force at the end of the hold',
        value: null,
        unit: '–',
        text: 'no relaxation data for this fruit: taken as held',
      },
    ];
  return [
    { label: 'Share of the grip force kept at the end', value: h.retained_at_end, unit: '–' },
    {
      label: 'Grip at the lift point slips after',
      value: h.grip_slips_after_s,
      unit: 's',
      text:
        h.grip_slips_after_s === null
          ? 'never (the safety factor outlasts the relaxation)'
          : undefined,
    },
    {
      label: 'Travel per pad to hold to the end',
      value: h.held?.travel_per_pad_mm ?? null,
      unit: 'mm',
      text: h.held ? undefined : (h.held_reason ?? '—'),
    },
    { label: 'Pad force at first, held grip', value: h.held?.force_n ?? null, unit: 'N' },
    { label: 'Pad force at the end, held grip', value: h.held?.force_end_n ?? null, unit: 'N' },
    {
      label: 'Bruise margin of the held grip (at t = 0)',
      value: h.held?.bruise_margin ?? null,
      unit: '–',
      text: h.held && h.held.bruise_margin === null ? 'no threshold' : undefined,
    },
  ];
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
        {
          label: 'Sideways acceleration of the move',
          value: u.horizontal_acceleration_m_s2 ?? 0,
          unit: 'm/s²',
        },
        { label: 'Grip offset from the centre of mass', value: u.grip_offset_mm ?? 0, unit: 'mm' },
        {
          label: u.max_travel_auto
            ? "Maximum travel per pad (5 % of the fruit's radius)"
            : 'Maximum travel per pad',
          value: u.max_travel_mm,
          unit: 'mm',
        },
        {
          label: 'Hold time',
          value: u.hold_time_s ?? null,
          unit: 's',
          text: u.hold_time_s == null ? 'not held (grip at t = 0 only)' : undefined,
        },
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
        ...twistFigures(r),
        ...holdFigures(r),
      ],
      used: [
        ...fruitUsedRows(u),
        { label: 'Friction', value: u.friction },
        { label: 'Failure stress', value: u.failure_stress_kpa },
        ...(u.relaxation_k1_s
          ? [
              { label: 'Relaxation constant k₁', value: u.relaxation_k1_s },
              { label: 'Relaxation constant k₂', value: u.relaxation_k2 ?? null },
            ]
          : []),
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
