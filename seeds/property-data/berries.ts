import type { SeedCommodity, SeedValue } from './types';

const IMPACTOR = 'The pendulum impactor material is not named in the abstract: filed under steel.';

/** 'Selva' and 'Gavita': one energy series for both cultivars in the abstract. */
const selvaGavitaEnergy = (note: string): SeedValue => ({
  quantity: 'impact_threshold_energy',
  variant: 'steel',
  value: 0.022,
  method: 'Pendulum impacts; bruise volume as the damage index',
  note: `Bruised at every energy tested: bruise volume rose from 46 to 134.5 mm³ as the energy rose from 0.022 to 0.082 J (presumably the pendulum series; drops are reported apart), so 0.022 J bruises and is not a safe level. ${note} ${IMPACTOR}`,
  source: 'aliasgarian-strawberry',
});

const SELVA_GAVITA =
  "The abstract gives one series for 'Selva' and 'Gavita'; 'Gavita' bruised more, significantly only under the pendulum. Drops from 18 cm (0.026 J) also bruised.";

/** A single 32 cm drop onto hard plastic, then cold storage: the test, not a threshold. */
const blueberryDrop = (note: string): SeedValue => ({
  quantity: 'drop_threshold_height',
  variant: 'hard plastic',
  value: 320,
  method: 'Single drop of 32 cm onto a hard plastic surface, then cold storage',
  ripeness: 'Sorted as soft (< 1.60 N), medium (1.61–1.80 N) and firm (1.81–2.00 N)',
  storage: '0 °C and 85–88 % RH for up to 35 days',
  note: `Test condition, not a threshold: the only drop height used. ${note}`,
  source: 'moggia-2017-blueberry',
});

export const BERRIES: SeedCommodity[] = [
  {
    slug: 'strawberry',
    name: 'Strawberry',
    family: 'Berries and small fruit',
    botanicalName: 'Fragaria × ananassa',
    cultivars: [
      { slug: 'strawberry-selva', name: 'Selva', values: [selvaGavitaEnergy(SELVA_GAVITA)] },
      { slug: 'strawberry-gavita', name: 'Gavita', values: [selvaGavitaEnergy(SELVA_GAVITA)] },
      {
        slug: 'strawberry-type',
        name: 'Strawberry (cultivar not named)',
        isType: true,
        values: [
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 0.04,
            method: 'Pendulum impacts; bruise volume as the damage index',
            note: `Bruised at every energy tested: doubling the energy from 0.040 to 0.083 J raised the bruise volume from 13 to 91 mm³, so 0.040 J bruises and is not a safe level. Drops from 130 mm (0.025 J) also bruised. Florida cultivars, not named in the abstract. ${IMPACTOR}`,
            source: 'ferreira-2008-strawberry',
          },
          selvaGavitaEnergy(
            "Measured on 'Selva' and 'Gavita' (each on its own page) and kept here beside the Florida series because the two disagree: 134.5 mm³ at 0.082 J against 91 mm³ at 0.083 J.",
          ),
        ],
      },
    ],
  },
  {
    slug: 'blueberry',
    name: 'Blueberry',
    family: 'Berries and small fruit',
    botanicalName: 'Vaccinium corymbosum',
    cultivars: [
      {
        slug: 'blueberry-duke',
        name: 'Duke',
        values: [
          blueberryDrop(
            "In 'Duke' the drop made little difference to internal browning; browning and softening followed firmness at harvest.",
          ),
        ],
      },
      {
        slug: 'blueberry-brigitta',
        name: 'Brigitta',
        values: [
          blueberryDrop(
            "In 'Brigitta' dropped fruit differed markedly from non-dropped fruit: a 32 cm drop onto hard plastic harms this cultivar.",
          ),
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
            note: 'Tangent modulus of the same flesh 0.080 MPa.',
            source: 'du-2019-asabe',
          },
          {
            quantity: 'failure_stress',
            value: 24,
            method: 'Flesh compression',
            ripeness: 'Day 6 of ripening (lowest values of the series)',
            note: 'Bio-yield stress, 0.024 MPa.',
            source: 'du-2019-asabe',
          },
          {
            quantity: 'density',
            value: 1022,
            ripeness: 'Day 6 of ripening',
            note: 'Flesh density, 1.022 g/cm³.',
            source: 'du-2019-asabe',
          },
        ],
      },
    ],
  },
];
