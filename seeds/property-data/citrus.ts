import { QUANTITIES } from '../../lib/properties/quantities';
import type { SeedCommodity, SeedValue } from './types';
import { frictionFromAngle, typicalJanssenK } from './value-helpers';

const SHARIFI = 'sharifi-2007-orange';
const GRADES = 'sweet-orange-bulk-handling';
const HORTFLORA = 'hortflora-mosambi-kinnow';

/** Size, weight, specific gravity and friction as the HortFlora study gives them. */
function hortflora(
  diameter: number,
  mass: number,
  density: number,
  mu: [plywood: number, aluminium: number, mildSteel: number],
): SeedValue[] {
  const friction = (variant: string, value: number): SeedValue => ({
    quantity: 'friction_coefficient',
    variant,
    value,
    note: 'Average static coefficient.',
    source: HORTFLORA,
  });
  return [
    {
      quantity: 'diameter',
      value: diameter,
      note: 'Average equivalent diameter.',
      source: HORTFLORA,
    },
    { quantity: 'mass', value: mass, note: 'Average fruit weight.', source: HORTFLORA },
    {
      quantity: 'density',
      value: density,
      note: 'Given as specific gravity in kg/m³ in the abstract.',
      source: HORTFLORA,
    },
    friction('plywood', mu[0]),
    friction('aluminium', mu[1]),
    friction('mild steel', mu[2]),
  ];
}

/** One property of the three graded sweet oranges: grade II (medium) with the range over grades. */
const graded = (
  quantity: SeedValue['quantity'],
  variant: string,
  [g1, g2, g3]: [number, number, number],
  note: string,
): SeedValue => {
  const unit = QUANTITIES[quantity].unit === '–' ? '' : ` ${QUANTITIES[quantity].unit}`;
  return {
    quantity,
    variant,
    value: g2,
    low: Math.min(g1, g2, g3),
    high: Math.max(g1, g2, g3),
    note: `Grade II (medium); grades I, II and III gave ${g1}, ${g2} and ${g3}${unit}. ${note}`.trim(),
    source: GRADES,
  };
};

export const CITRUS: SeedCommodity[] = [
  {
    slug: 'orange',
    name: 'Orange',
    family: 'Citrus',
    botanicalName: 'Citrus sinensis',
    cultivars: [
      {
        slug: 'orange-thompson',
        name: 'Thompson',
        values: [
          { quantity: 'mass', value: 215.4, note: 'Grade two (medium) fruit.', source: SHARIFI },
          { quantity: 'density', value: 1030, note: 'Grade two fruit.', source: SHARIFI },
          { quantity: 'bulk_density', value: 440, note: 'Grade two fruit.', source: SHARIFI },
          frictionFromAngle('galvanised steel', 20.2, SHARIFI, 'Grade two fruit.'),
          frictionFromAngle('glass', 23.4, SHARIFI, 'Grade two fruit.'),
          frictionFromAngle('plywood', 23.5, SHARIFI, 'Grade two fruit.'),
          typicalJanssenK(),
        ],
      },
      {
        slug: 'orange-phule-mosambi',
        name: 'Phule Mosambi',
        values: hortflora(65.68, 165.14, 1000.5, [0.39, 0.43, 0.45]),
      },
      {
        slug: 'orange-type',
        name: 'Orange (cultivar not named)',
        isType: true,
        values: [
          graded('mass', '', [248.77, 152.62, 96.8], ''),
          graded('density', '', [880, 1060, 1090], ''),
          graded('bulk_density', '', [500, 580, 520], ''),
          graded(
            'friction_coefficient',
            'mild steel',
            [0.2, 0.16, 0.19],
            "Static coefficient. About a third of the 0.45 measured on mild steel for 'Phule Mosambi' (next value), and under half of 'Thompson' on galvanised steel (0.368): the sources disagree.",
          ),
          {
            quantity: 'friction_coefficient',
            variant: 'mild steel',
            value: 0.45,
            note: "Measured on 'Phule Mosambi' (also on its own page); kept beside the graded series because the two sources differ almost threefold on mild steel.",
            source: HORTFLORA,
          },
          graded('friction_coefficient', 'glass', [0.22, 0.21, 0.22], 'Static coefficient.'),
          graded('friction_coefficient', 'plywood', [0.23, 0.18, 0.21], 'Static coefficient.'),
        ],
      },
    ],
  },
  {
    slug: 'mandarin',
    name: 'Mandarin',
    family: 'Citrus',
    botanicalName: 'Citrus reticulata',
    cultivars: [
      {
        slug: 'mandarin-kinnow',
        name: 'Kinnow',
        values: hortflora(66.44, 156.71, 1086, [0.36, 0.41, 0.42]),
      },
    ],
  },
];
