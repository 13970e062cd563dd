import type { SeedCommodity } from './types';
import { typicalJanssenK } from './value-helpers';

const PLUM = 'intagro-2003-plum-firmness';
const NECTARINE = 'fooder-100430-nectarine';

export const STONE_FRUIT: SeedCommodity[] = [
  {
    slug: 'peach',
    name: 'Peach',
    family: 'Stone fruit',
    botanicalName: 'Prunus persica',
    cultivars: [
      {
        slug: 'peach-type',
        name: 'Peach (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'drop_threshold_height',
            variant: 'steel',
            value: 310,
            method: 'Single drops onto a flat steel plate from 31 to 91 cm',
            ripeness: 'Several maturities; impact bruising did not depend on maturity',
            note: "Often bruises at this height: drops of 31 cm onto steel were often enough to bruise ('Redhaven', 'Jefferson', 'SunPrince', 'Rio-Oso-Gem', 'O'Henry'). It was the lowest height tested, so the no-bruise height is lower. A 44 N load held 1 min, and vibration at 6 Hz and 1 g for 5 min, also bruised.",
            source: 'vergano-1991-peach-bruising',
          },
        ],
      },
    ],
  },
  {
    slug: 'nectarine',
    name: 'Nectarine',
    family: 'Stone fruit',
    botanicalName: 'Prunus persica var. nucipersica',
    cultivars: [
      {
        slug: 'nectarine-independence',
        name: 'Independence',
        values: [
          { quantity: 'mass', value: 97.74, note: 'Average fruit mass.', source: NECTARINE },
          {
            quantity: 'diameter',
            value: 59.1,
            low: 57,
            high: 61,
            note: 'Geometric mean diameter; smallest and largest diameters 57 and 61 mm.',
            source: NECTARINE,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'aluminium',
            value: 0.321,
            note: 'Static coefficient; the lowest of the three surfaces tested (wood, aluminium, galvanised sheet).',
            source: NECTARINE,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'wood',
            value: 0.389,
            note: 'Static coefficient; the highest of the three surfaces tested. The galvanised-sheet value is not given in the abstract.',
            source: NECTARINE,
          },
        ],
      },
    ],
  },
  {
    slug: 'plum',
    name: 'Plum',
    family: 'Stone fruit',
    botanicalName: 'Prunus domestica',
    cultivars: [
      {
        slug: 'plum-type',
        name: 'Plum (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'apparent',
            value: 0.15,
            low: 0.1,
            high: 0.25,
            method: 'Apparent modulus under a cylindrical probe, universal testing machine',
            probe: '6 mm cylindrical probe, 1 N force',
            ripeness: 'Eating ripeness',
            note: "Range for 'Dąbrowicka', 'Amerf' and 'Valjevka' at eating ripeness; the optimum is 0.150 MPa.",
            source: PLUM,
          },
          {
            quantity: 'youngs_modulus',
            variant: 'apparent',
            value: 0.12,
            low: 0.071,
            high: 0.217,
            method: 'Apparent modulus under a cylindrical probe, universal testing machine',
            probe: '4 mm cylindrical probe (recalculated), 1 N force',
            ripeness: 'Eating ripeness',
            note: 'The same firmness range recalculated for a 4 mm probe, optimum 0.120 MPa: the probe size changes the apparent modulus.',
            source: PLUM,
          },
        ],
      },
    ],
  },
  {
    slug: 'apricot',
    name: 'Apricot',
    family: 'Stone fruit',
    botanicalName: 'Prunus armeniaca',
    cultivars: [
      {
        slug: 'apricot-sonnati-salmas',
        name: 'Sonnati Salmas',
        values: [
          {
            quantity: 'density',
            value: 940.7,
            note: 'True density of the whole fruit at 82.34 % moisture (wet basis).',
            source: 'ahmadi-2009-apricot',
          },
          {
            quantity: 'bulk_density',
            value: 443.2,
            note: 'Bulk density of the fruit at 82.34 % moisture (wet basis).',
            source: 'ahmadi-2009-apricot',
          },
          typicalJanssenK(),
        ],
      },
    ],
  },
];
