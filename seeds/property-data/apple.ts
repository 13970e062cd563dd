import type { SeedCommodity, SeedValue } from './types';
import { frictionFromAngle, storageModulus } from './value-helpers';

const SELCUK = 'selcuk-1992-apple-poisson';
const STORAGE_STUDY = 'tjaf-pear-apple-storage';
const CHAKESPARI = 'gorji-chakespari-apple-compression';

/** Poisson's ratio of one cultivar in the Konya study (flesh cylinders at 62 mm/min). */
const konyaPoisson = (value: number, note?: string): SeedValue => ({
  quantity: 'poisson_ratio',
  value,
  method: 'Cylindrical flesh specimens in compression',
  loadingRate: '62 mm/min',
  note,
  source: SELCUK,
});

/** The four moduli of one Iranian cultivar, tangent first (the stiffest, so the harshest check). */
const compressionModuli = (moduli: [number, number, number, number]): SeedValue[] =>
  (['Tangent', 'Chord', 'Secant', 'Initial tangent'] as const).map((kind, i) => ({
    quantity: 'youngs_modulus',
    variant: 'apparent',
    value: moduli[i],
    method: 'Whole-fruit compression',
    note: `${kind} modulus.`,
    source: CHAKESPARI,
  }));

const JONATHAN_STORAGE = 'Bulk storage, 1 Oct – 31 Dec; value of 15 Nov, range over the season';

export const APPLE: SeedCommodity = {
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
          storage: JONATHAN_STORAGE,
          note: '3.28 MPa on 1 Oct, 2.52 MPa on 15 Nov, 2.36 MPa on 31 Dec.',
          source: 'shahabasi-1979',
        },
        {
          quantity: 'failure_stress',
          value: 252,
          low: 235,
          high: 444,
          method: 'Flesh cylinders in compression',
          storage: JONATHAN_STORAGE,
          note: '444, 252 and 235 kPa at failure strains of 0.14, 0.11 and 0.12 on 1 Oct, 15 Nov and 31 Dec.',
          source: 'shahabasi-1979',
        },
      ],
    },
    {
      slug: 'apple-amasya',
      name: 'Amasya',
      values: [konyaPoisson(0.39)],
    },
    {
      slug: 'apple-golden-delicious',
      name: 'Golden Delicious',
      values: [konyaPoisson(0.382, "Named 'Golden' in the abstract.")],
    },
    {
      slug: 'apple-starking',
      name: 'Starking',
      values: [konyaPoisson(0.382), ...storageModulus(1.51, 1.1, STORAGE_STUDY)],
    },
    {
      slug: 'apple-starkspur-golden-delicious',
      name: 'Starkspur Golden Delicious',
      values: storageModulus(1.45, 0.88, STORAGE_STUDY),
    },
    {
      slug: 'apple-golab',
      name: 'Golab',
      values: [
        {
          quantity: 'mass',
          value: 74.87,
          note: 'Average fruit mass.',
          source: 'meisami-asl-golab',
        },
        frictionFromAngle('galvanised steel', 20, 'meisami-asl-golab'),
        frictionFromAngle('glass', 26.3, 'meisami-asl-golab'),
        frictionFromAngle('plywood', 26.8, 'meisami-asl-golab'),
      ],
    },
    {
      slug: 'apple-golab-kohanz',
      name: 'Golab Kohanz',
      values: [
        ...compressionModuli([2.08, 2.04, 1.52, 0.81]),
        {
          quantity: 'failure_stress',
          value: 320,
          method: 'Whole-fruit compression',
          note: 'Failure strain 23.36 %, rupture force 51.11 N; fruit moisture 86 % (wet basis).',
          source: CHAKESPARI,
        },
      ],
    },
    {
      slug: 'apple-shafi-abadi',
      name: 'Shafi Abadi',
      values: [
        ...compressionModuli([2.27, 2.11, 1.76, 0.93]),
        {
          quantity: 'failure_stress',
          value: 370,
          method: 'Whole-fruit compression',
          note: 'Failure strain 31.2 %, rupture force 57.81 N; fruit moisture 84 % (wet basis).',
          source: CHAKESPARI,
        },
      ],
    },
    {
      slug: 'apple-royal-gala',
      name: 'Royal Gala',
      values: [
        {
          quantity: 'impact_threshold_energy',
          variant: 'steel',
          value: 0.08,
          method: 'Pendulum impacts in 2 cm height steps; bruise thickness method',
          note: 'Weak source: an undergraduate report. Given as the bruise threshold, the energy at which bruising began. The abstract does not name the impactor material: filed under steel as a rigid impactor. Turgor was varied by soaking fruit 0, 1 or 18 h; one threshold is reported.',
          source: 'shen-shan-ubc-royal-gala',
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
          method: 'Static compression, contact pressure read on pressure-sensitive film',
          note: 'No bruise where the contact pressure stayed below 0.10 MPa; the area above 0.10 MPa matched the bruise area (correlation ≥ 0.99). Food & Machinery 31(5) reports the same 0.10 MPa relation.',
          source: 'wang-2024-processes',
        },
        {
          quantity: 'failure_stress',
          value: 290,
          method: 'Static compression, contact pressure read on pressure-sensitive film',
          note: 'Apple flesh failure stress.',
          source: 'food-machinery-31-5-apple-film',
        },
        {
          quantity: 'youngs_modulus',
          variant: 'apparent',
          value: 2.08,
          low: 1.11,
          high: 3.05,
          method: 'Loaded through a 2.2 mm diameter die; modulus from the Boussinesq solution',
          loadingRate: '62 mm/min',
          note: "Range over regions of the fruit in 'Amasya', 'Golden Delicious' and 'Starking', not split by cultivar in the abstract; the value is the middle of the range.",
          source: SELCUK,
        },
        {
          quantity: 'poisson_ratio',
          value: 0.386,
          low: 0.382,
          high: 0.39,
          method: 'Cylindrical flesh specimens in compression',
          loadingRate: '62 mm/min',
          note: "Range of the cultivar means of 'Amasya', 'Golden Delicious' and 'Starking' (each on its own page); the value is the middle.",
          source: SELCUK,
        },
        {
          quantity: 'poisson_ratio',
          value: 0.275,
          low: 0.2,
          high: 0.35,
          method: 'Apple flesh under compressive loading',
          note: 'Recalled as about 0.2–0.35, below the 0.38–0.39 measured in the Konya study: the two sources disagree. The value is the middle of the recalled range.',
          source: 'chappell-hamann-1968',
        },
        {
          quantity: 'density',
          value: 825,
          low: 800,
          high: 850,
          note: 'Apple flesh, recalled as 800–850 kg/m³; the value is the middle.',
          source: 'mohsenin-1986',
        },
      ],
    },
  ],
};
