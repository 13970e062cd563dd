import type { SeedCommodity } from './types';

/**
 * Commodities and cultivars with their published values. Every value names its source and
 * keeps its conditions; a quantity no source gives is simply absent ("no published value").
 */
export const COMMODITIES: SeedCommodity[] = [
  {
    slug: 'apple',
    name: 'Apple',
    family: 'Pome fruit',
    botanicalName: 'Malus domestica',
    cultivars: [
      {
        slug: 'apple-jonathan',
        name: 'Jonathan',
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'flesh',
            value: 2.52,
            low: 2.36,
            high: 3.28,
            method: 'Flesh cylinders in compression',
            storage: 'Bulk storage, 1 Oct – 31 Dec; value of 15 Nov, range over the season',
            source: 'shahabasi-1979',
          },
          {
            quantity: 'failure_stress',
            value: 252,
            low: 235,
            high: 444,
            method: 'Flesh cylinders in compression',
            storage: 'Bulk storage, 1 Oct – 31 Dec; value of 15 Nov, range over the season',
            source: 'shahabasi-1979',
          },
        ],
      },
      {
        slug: 'apple-type',
        name: 'Apple (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'static_bruise_threshold',
            value: 100,
            method: 'Static loads read on pressure-sensitive film',
            note: 'No bruise below 0.10 MPa; bruise area ≈ film area above 0.10 MPa.',
            source: 'wang-2024-processes',
          },
          {
            quantity: 'failure_stress',
            value: 290,
            method: 'Static loads read on pressure-sensitive film',
            source: 'wang-2024-processes',
          },
        ],
      },
    ],
  },
  {
    slug: 'kiwifruit',
    name: 'Kiwifruit',
    family: 'Berries and small fruit',
    botanicalName: 'Actinidia deliciosa',
    cultivars: [
      {
        slug: 'kiwifruit-type',
        name: 'Kiwifruit (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'flesh',
            value: 0.288,
            method: 'Flesh compression',
            ripeness: 'Day 6 of ripening (lowest values of the series)',
            source: 'du-2019-asabe',
          },
          {
            quantity: 'density',
            value: 1022,
            ripeness: 'Day 6 of ripening',
            source: 'du-2019-asabe',
          },
        ],
      },
    ],
  },
];
