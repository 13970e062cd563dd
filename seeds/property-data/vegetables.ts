import type { SeedCommodity } from './types';
import { typicalJanssenK } from './value-helpers';

const CHERRY = 'polat-2007-cherry-tomato';
const RAMOS = 'stropek-golacki-2022-potato';

export const VEGETABLES: SeedCommodity[] = [
  {
    slug: 'tomato',
    name: 'Tomato',
    family: 'Fruiting vegetables',
    botanicalName: 'Solanum lycopersicum',
    cultivars: [
      {
        slug: 'tomato-tempest',
        name: 'Tempest',
        values: [
          {
            quantity: 'drop_threshold_height',
            variant: 'steel',
            value: 600,
            method: 'Laboratory drops onto steel and a pendulum impact rig',
            ripeness: 'Mature green',
            note: 'Drops above 60 cm onto steel caused internal bruising judged commercially important. Bruise severity already rose with drop height below that, so this is where injury became serious, not a no-bruise height. Coloured fruit (more than 75 % pink to red) bruised and split less.',
            source: 'thomson-lopresti-2008-tomato',
          },
        ],
      },
      {
        slug: 'tomato-type',
        name: 'Tomato (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'apparent',
            value: 0.4,
            note: 'Weak secondary figure: the kind of modulus and the test are not stated.',
            source: 'tomato-secondary-weak',
          },
          {
            quantity: 'poisson_ratio',
            value: 0.3,
            note: 'Weak secondary figure. A skin study (International Agrophysics 26(1):39–44, 2012) gives Poisson ratios of 0.4–0.8 for the skin of two greenhouse cultivars, falling in storage; skin values above 0.5 lie outside what this catalogue accepts for a bulk Poisson ratio and are not stored.',
            source: 'tomato-secondary-weak',
          },
        ],
      },
    ],
  },
  {
    slug: 'cherry-tomato',
    name: 'Cherry tomato',
    family: 'Fruiting vegetables',
    botanicalName: 'Solanum lycopersicum var. cerasiforme',
    cultivars: [
      {
        slug: 'cherry-tomato-forme',
        name: 'Forme',
        values: [
          { quantity: 'mass', value: 8.69, note: 'Greenhouse-grown fruit.', source: CHERRY },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 24.95,
            note: 'Fruit diameter; length 21.23 mm, geometric mean diameter 23.80 mm.',
            source: CHERRY,
          },
          {
            quantity: 'density',
            value: 1194.1,
            note: 'True density (the abstract prints the unit as kg/sq m).',
            source: CHERRY,
          },
          {
            quantity: 'bulk_density',
            value: 464.5,
            note: 'The abstract prints the unit as kg/sq m.',
            source: CHERRY,
          },
          { quantity: 'friction_coefficient', variant: 'plywood', value: 0.169, source: CHERRY },
          { quantity: 'friction_coefficient', variant: 'glass', value: 0.147, source: CHERRY },
          {
            quantity: 'friction_coefficient',
            variant: 'galvanised steel',
            value: 0.099,
            source: CHERRY,
          },
          typicalJanssenK(),
        ],
      },
    ],
  },
  {
    slug: 'potato',
    name: 'Potato',
    family: 'Tubers',
    botanicalName: 'Solanum tuberosum',
    cultivars: [
      {
        slug: 'potato-ramos',
        name: 'Ramos',
        values: [
          {
            quantity: 'drop_threshold_height',
            variant: 'steel',
            value: 50,
            method: 'Impacts onto a flat rigid plate, filmed with a high-speed camera',
            note: 'Bruising began at an impact velocity of 1 m/s, given as a bruise threshold drop height of 50 mm onto the rigid plate (filed under steel). Tubers of 160–190 g; restitution coefficient 0.44–0.49 over the velocities tested.',
            source: RAMOS,
          },
          {
            quantity: 'failure_stress',
            value: 900,
            method: 'Impacts onto a flat rigid plate at 1–1.75 m/s',
            note: 'Maximum impact stress, constant at 0.9 MPa from 1 to 1.75 m/s (a critical-stress criterion for bruising).',
            source: RAMOS,
          },
          {
            quantity: 'mass',
            value: 175,
            low: 160,
            high: 190,
            note: 'Tubers chosen in the 160–190 g class; the value is the middle of the class.',
            source: RAMOS,
          },
        ],
      },
      {
        slug: 'potato-type',
        name: 'Potato (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'flesh',
            value: 2,
            note: 'Recalled as about 2 MPa; filed as flesh, the specimen type is not recalled.',
            source: 'finney-hall-1967',
          },
          {
            quantity: 'poisson_ratio',
            value: 0.47,
            low: 0.45,
            high: 0.49,
            note: 'Recalled as about 0.45–0.49; the value is the middle.',
            source: 'finney-hall-1967',
          },
        ],
      },
    ],
  },
];
