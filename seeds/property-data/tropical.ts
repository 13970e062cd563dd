import type { SeedCommodity, SeedValue } from './types';

const CARABAO = 'pas-carabao-rheology';
const AVOCADO = 'mazhar-2018-avocado';
const UNNAMED_SURFACE = 'The drop surface is not named in the abstract: filed under steel.';

/** 'No more than 0.26 m' onto each of the three surfaces the Carabao study names. */
const carabaoDrop = (variant: string, note: string): SeedValue => ({
  quantity: 'drop_threshold_height',
  variant,
  value: 260,
  method: 'Drops from several heights; impact coefficient 12.25–94.52 cm/J over the heights',
  note: `Recommended maximum: the fruit should never be dropped from more than 0.26 m onto carton, plastic or solid ground. ${note}`.trim(),
  source: CARABAO,
});

/** Weight and density at the standard harvest maturity the Ghana study fixed. */
const mangoAtHarvest = (mass: number, density: number): SeedValue[] => [
  {
    quantity: 'mass',
    value: mass,
    ripeness: 'Standard harvest maturity',
    source: 'abu-2021-mango',
  },
  {
    quantity: 'density',
    value: density,
    ripeness: 'Standard harvest maturity',
    note: `${density / 1000} g/cm³ in the abstract.`,
    source: 'abu-2021-mango',
  },
];

/** Green banana pulp: specific gravity × 1000 kg/m³ (water). */
const bananaPulp = (specificGravity: number): SeedValue => ({
  quantity: 'density',
  value: Math.round(specificGravity * 1000),
  ripeness: 'Green (unripe) fruit',
  note: `Pulp; published as specific gravity ${specificGravity}, stored as ${specificGravity} × 1000 kg/m³ (water).`,
  source: 'kachru-1995-banana',
});

export const TROPICAL: SeedCommodity[] = [
  {
    slug: 'mango',
    name: 'Mango',
    family: 'Tropical and subtropical',
    botanicalName: 'Mangifera indica',
    cultivars: [
      {
        slug: 'mango-carabao',
        name: 'Carabao',
        values: [
          carabaoDrop(
            'carton',
            'Static loads: green fruit took 80 kg without significant internal damage, breaker-stage fruit 20 kg and 30 % yellow fruit 5 kg; cells ruptured at 2.45, 0.63 and 0.50 kN.',
          ),
          carabaoDrop('hard plastic', "The abstract says 'plastic'."),
          carabaoDrop('ground', "The abstract says 'solid ground'."),
        ],
      },
      { slug: 'mango-haden', name: 'Haden', values: mangoAtHarvest(640, 1147) },
      { slug: 'mango-kent', name: 'Kent', values: mangoAtHarvest(836, 1076) },
      { slug: 'mango-palmer', name: 'Palmer', values: mangoAtHarvest(837, 1084) },
      { slug: 'mango-keitt', name: 'Keitt', values: mangoAtHarvest(1104, 1189) },
    ],
  },
  {
    slug: 'avocado',
    name: 'Avocado',
    family: 'Tropical and subtropical',
    botanicalName: 'Persea americana',
    cultivars: [
      {
        slug: 'avocado-hass',
        name: 'Hass',
        // Softening fruit first: a check takes the first value of a quantity, and this is the harsher.
        values: [
          {
            quantity: 'drop_threshold_height',
            variant: 'steel',
            value: 500,
            ripeness: 'Softening, firm ripe and soft ripe',
            note: `Bruises from this height: fruit dropped from 50 cm (≈ 0.8 J absorbed) developed progressively more bruising as they ripened, so the no-bruise height of ripening fruit is lower. Fruit at 2.5 or 5 °C at impact bruised less than at 20 °C. ${UNNAMED_SURFACE}`,
            source: AVOCADO,
          },
          {
            quantity: 'drop_threshold_height',
            variant: 'steel',
            value: 1000,
            ripeness: 'Hard green mature',
            note: `No bruise at or below this height: hard green mature fruit expressed no bruising from drops of up to 100 cm (≈ 1.36 J absorbed). ${UNNAMED_SURFACE}`,
            source: AVOCADO,
          },
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 0.8,
            ripeness: 'Softening, firm ripe and soft ripe',
            note: `Bruises from this energy: about 0.8 J absorbed in a 50 cm drop. ${UNNAMED_SURFACE}`,
            source: AVOCADO,
          },
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 1.36,
            ripeness: 'Hard green mature',
            note: `No bruise at or below this energy: about 1.36 J absorbed in a 100 cm drop. ${UNNAMED_SURFACE}`,
            source: AVOCADO,
          },
        ],
      },
    ],
  },
  {
    slug: 'banana',
    name: 'Banana',
    family: 'Tropical and subtropical',
    botanicalName: 'Musa spp.',
    cultivars: [
      { slug: 'banana-dwarf-cavendish', name: 'Dwarf Cavendish', values: [bananaPulp(0.993)] },
      { slug: 'banana-nendran', name: 'Nendran', values: [bananaPulp(1.11)] },
      {
        slug: 'banana-type',
        name: 'Banana (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 0.074,
            method: 'Pendulum impacts of 0.074, 0.160 and 0.273 J',
            storage: '12 days at 5, 13 or 22 °C after impact',
            note: 'Bruised at every energy tested: bruise area and susceptibility rose with the impact energy from 0.074 J, so 0.074 J bruises and is not a safe level. Local bananas, cultivar not named. The pendulum impactor material is not named in the abstract: filed under steel.',
            source: 'al-dairi-2023-banana',
          },
        ],
      },
    ],
  },
];
