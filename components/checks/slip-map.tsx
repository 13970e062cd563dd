'use client';

import { useUnits } from '@/components/units/units-provider';
import type { SqueezeCheckResult } from '@/lib/checks/squeeze/check';

type Slip = NonNullable<SqueezeCheckResult['slip']>;
const STATE_COLOUR = { stick: '#2f5f2c', slip: '#d97706', open: '#d6d3d1' } as const;

/**
 * The pad face seen from the fruit at the grip point: the stick disc, the slip annulus around
 * it, and each contact point's state, with the tangential traction along a radius below.
 */
export function SlipMap({ slip }: { slip: Slip }) {
  const u = useUnits();
  if (slip.holds === null || !('nodes' in slip) || !slip.nodes) {
    return (
      <p className="text-sm text-stone-600">
        No slip map: {slip.reason ?? 'the fruit is not lifted.'}
      </p>
    );
  }
  const a = slip.contact_radius_mm ?? 0;
  const c = slip.stick_radius_mm ?? 0;
  const scale = 80 / Math.max(a, 1e-6);
  const maxQ = Math.max(...slip.nodes.map((n) => n.traction_kpa ?? 0), 1e-9);
  return (
    <figure className="rounded-lg border border-stone-200 bg-white p-3" data-testid="slip-map">
      <figcaption className="text-sm font-medium">
        Slip map at the grip point —{' '}
        <span data-testid="slip-verdict" className={slip.holds ? 'text-leaf-700' : 'text-red-700'}>
          {slip.holds ? 'the grip holds' : 'the fruit slides out of the grip'}
        </span>
      </figcaption>
      <div className="mt-2 flex flex-wrap items-center gap-6">
        <svg
          viewBox="-100 -100 200 200"
          className="h-44 w-44"
          role="img"
          aria-label={`Stick zone radius ${u.show(c, 'mm')} inside a contact of radius ${u.show(a, 'mm')}`}
        >
          <circle r={a * scale} fill={STATE_COLOUR.slip} opacity={0.55} />
          <circle r={c * scale} fill={STATE_COLOUR.stick} opacity={0.75} />
          {slip.nodes.map((n) => (
            <circle
              key={n.r_mm ?? 0}
              cx={(n.r_mm ?? 0) * scale}
              cy={0}
              r={2.2}
              fill={STATE_COLOUR[n.state]}
              stroke="#fff"
              strokeWidth={0.6}
            />
          ))}
          <line
            x1={-95}
            y1={0}
            x2={95}
            y2={0}
            stroke="#a8a29e"
            strokeWidth={0.5}
            strokeDasharray="2 2"
          />
        </svg>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm">
          <dt className="text-stone-600">Contact radius</dt>
          <dd className="num">{u.show(a, 'mm')}</dd>
          <dt className="text-stone-600">Stick radius</dt>
          <dd className="num">{u.show(c, 'mm')}</dd>
          <dt className="text-stone-600">Load per pad while lifting</dt>
          <dd className="num">{slip.lift_load_n == null ? '—' : u.show(slip.lift_load_n, 'N')}</dd>
          <dt className="text-stone-600">Friction used (T ÷ μP)</dt>
          <dd className="num">{slip.utilisation}</dd>
        </dl>
      </div>
      <div className="mt-2 flex h-16 items-end gap-px" aria-hidden="true">
        {slip.nodes.map((n) => (
          <div
            key={n.r_mm ?? 0}
            title={`${u.show(n.r_mm ?? 0, 'mm')}: ${n.state}, traction ${u.show(n.traction_kpa ?? 0, 'kPa')}`}
            style={{
              height: `${(100 * (n.traction_kpa ?? 0)) / maxQ}%`,
              background: STATE_COLOUR[n.state],
            }}
            className="min-w-1 flex-1"
          />
        ))}
      </div>
      <p className="mt-1 text-xs text-stone-600">
        Tangential traction along a radius from the centre (left) outward. Green: sticks; amber:
        slips; grey: out of contact. Ciavarella–Jäger superposition on the finite-element pressure,
        Coulomb friction.
      </p>
    </figure>
  );
}
