import type { SeedCommodity, SeedValue } from './types';
import { typical as typicalOf } from './value-helpers';
import type { TypicalBasis } from '@/lib/properties/quantities';

const HAYWARD = 'berry-hayward-physical-web';
const MOGGIA = 'moggia-2017-blueberry';
const SELVA = 'berry-selva-strawberry-tabriz';

/** Static friction of 'Selva' strawberries: surface as stored, value, surface as published. */
const SELVA_FRICTION = [
  ['rubber', 0.575, 'rubber (the highest of the four surfaces)'],
  [
    'steel',
    0.415,
    'steel (the lowest of the four; not significantly different from galvanised iron)',
  ],
  ['galvanised steel', 0.439, 'galvanised iron, filed under galvanised steel'],
  ['plywood', 0.473, 'plywood'],
] as const;

/** A clearly labelled typical value: no source, a wide band, and what was searched. */
/** A typical value (see value-helpers' `typical`), its band given as low and high. */
const typical = (
  quantity: SeedValue['quantity'],
  variant: string,
  value: number,
  low: number,
  high: number,
  basis: TypicalBasis,
  note: string,
  extra: Partial<SeedValue> = {},
): SeedValue => typicalOf(quantity, variant, value, [low, high], basis, note, extra);

const poisson = (fruit: string): SeedValue =>
  typical(
    'poisson_ratio',
    '',
    0.45,
    0.3,
    0.49,
    'common practice',
    `No Poisson's ratio found for ${fruit} (searched: '${fruit} Poisson ratio modulus elasticity compression'). Finite-element studies of soft fruit flesh commonly take 0.3–0.49 (nearly incompressible watery tissue); 0.45 is stored.`,
  );

const typicalFriction = (fruit: string, surfaces: readonly string[], extra: string): SeedValue[] =>
  (
    [
      ['rubber', 0.5, 0.3, 0.9],
      ['steel', 0.35, 0.15, 0.6],
      ['plastic', 0.35, 0.15, 0.6],
    ] as const
  )
    .filter(([s]) => surfaces.includes(s))
    .map(([surface, v, lo, hi]) =>
      typical(
        'friction_coefficient',
        surface,
        v,
        lo,
        hi,
        'from memory',
        `No ${fruit} friction coefficient against ${surface} found (searched: '${fruit} coefficient of friction rubber steel', '${fruit} physical properties static coefficient of friction'). Static coefficients of whole soft fruit on handling surfaces run from about 0.15 to 0.9, rubber highest. ${extra}`,
      ),
    );

const ALL_SURFACES = ['rubber', 'steel', 'plastic'] as const;

/** The strawberry impact figures whose surface is not named: kept in notes, not as thresholds. */
const STRAWBERRY_IMPACTS =
  "Published impacts, kept out of the drop quantities because neither abstract names the surface the fruit hit: Florida cultivars (Ferreira et al. 2008, ferreira-2008-strawberry) bruised at every level tested — drops from 130 mm (0.025 J), 200 mm (0.040 J) and 380 mm (0.075 J, 71 % more bruise volume), pendulum 0.040 → 0.083 J raising bruise volume from 13 to 91 mm³. 'Selva' and 'Gavita' (Aliasgarian Najafabadi et al., aliasgarian-strawberry) bruised from 0.022 J on the pendulum (46 → 134.5 mm³ up to 0.082 J) and from 18 cm drops (0.026 J); 'Gavita' bruised more. Safe heights therefore lie below 130 mm.";

/** A single 32 cm drop onto hard plastic, then cold storage: a damaging test height. */
const blueberryDrop = (note: string): SeedValue => ({
  quantity: 'drop_threshold_height',
  variant: 'hard plastic',
  value: 320,
  method: 'Single drop of 32 cm onto a hard plastic surface, then cold storage',
  ripeness: 'Sorted as soft (< 1.60 N), medium (1.61–1.80 N) and firm (1.81–2.00 N)',
  storage: '0 °C and 85–88 % RH for up to 35 days',
  observation: 'bruised-at',
  note: `A damaging test height, not a threshold: the only drop height used, chosen to cause damage; the safe height lies below it. ${note}`,
  source: MOGGIA,
});

export const BERRIES: SeedCommodity[] = [
  {
    slug: 'strawberry',
    name: 'Strawberry',
    family: 'Berries and small fruit',
    botanicalName: 'Fragaria × ananassa',
    cultivars: [
      {
        slug: 'strawberry-type',
        name: 'Strawberry (commodity record)',
        isType: true,
        values: [
          {
            quantity: 'bruise_susceptibility',
            value: 1640,
            low: 1640,
            high: 2091,
            method: "Pendulum impacts of 'Selva' and 'Gavita' fruit, impactor not named",
            note: 'Bruise volume 46 → 134.5 mm³ as the impact energy rose 0.022 → 0.082 J; stored as volume ÷ energy, the usual definition of bruise susceptibility: 134.5 ÷ 0.082 = 1640 mm³/J at the highest energy (2091 at the lowest, the band). Of the two strawberry studies the harsher, so the check takes it first; the Florida study gives 1096 mm³/J at 0.083 J.',
            source: 'aliasgarian-strawberry',
          },
          {
            quantity: 'bruise_susceptibility',
            value: 1096,
            low: 325,
            high: 1096,
            method: 'Pendulum impacts of Florida cultivars, impactor not named',
            note: 'Bruise volume 13 → 91 mm³ as the impact energy rose 0.040 → 0.083 J; stored as volume ÷ energy at the highest energy, 91 ÷ 0.083 = 1096 mm³/J (325 at 0.040 J, the band). About 1.5× below the Selva/Gavita study at 0.08 J.',
            source: 'ferreira-2008-strawberry',
          },
          typical(
            'youngs_modulus',
            'apparent',
            0.5,
            0.1,
            2,
            'from memory',
            "No strawberry modulus with its figure found (searched: 'strawberry fruit compression elastic modulus Poisson ratio', 'strawberry cultivar Young's modulus MPa', 'strawberry Camarosa firmness modulus', 'strawberry cultivars compression test elastic modulus failure stress kPa', 'strawberry Hongyan compression elastic modulus damage finite element', and in Chinese '草莓 力学特性 弹性模量 泊松比'). Creep studies ('Vibrant', 'Elsanta', 'Magic') give strains, not a modulus.",
          ),
          poisson('strawberry'),
          {
            quantity: 'density',
            value: 1068.88,
            ripeness: 'Initial moisture content 91.07 % (w.b.)',
            note: "True density measured on 'Selva' (the only published figure found for the commodity); published as 1068.880 kg/m³. Replaces the typical 950 kg/m³.",
            source: SELVA,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 28.26,
            note: "Fruit diameter measured on 'Selva' (the only published figure found for the commodity); length 29.70 mm, geometric mean diameter 28.59 mm, sphericity 0.971.",
            source: SELVA,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 29.7,
            note: "Fruit length measured on 'Selva' (the only published figure found for the commodity). Long-conic cultivars run longer (length/width 1.2–1.4; Jamieson, ISHS Acta Hortic. 1156, abstract).",
            source: SELVA,
          },
          {
            quantity: 'mass',
            value: 21.5,
            low: 7,
            high: 27,
            note: 'Weak source: a popular article, no study cited. Average commercially supplied strawberry about 21.5 g in 2023 (13.6 g in 2011); small ≈ 7 g, medium ≈ 12 g, large ≈ 18 g, extra-large ≈ 27 g.',
            source: 'berry-strawberry-mass-web',
          },
          typical(
            'static_bruise_threshold',
            '',
            20,
            5,
            60,
            'from memory',
            "No strawberry static bruise pressure, bioyield or failure stress found (searched: 'strawberry compression failure stress kPa', 'strawberry mass tissue strength', 'strawberry cultivars compression test elastic modulus failure stress kPa'). The 'Paros' study (Fatehi, Mahmoudi, Hosseinpour, Samimi Akhijahani; Iranian Food Science and Technology Research Journal 16(1):17–27, 2020, Persian) measured a bioyield point by size class, but the part of its abstract read gives no figure. Compression bruised strawberries more than impacts of similar energy (Ferreira et al. 2008; Aliasgarian Najafabadi et al.); 'Sweet Charlie' bruised 40 % more under compression than the other Florida cultivars.",
          ),
          ...SELVA_FRICTION.map(([variant, value, as]) => ({
            quantity: 'friction_coefficient' as const,
            variant,
            value,
            method: 'Static coefficient of friction, whole fruit on the surface',
            note: `Static coefficient measured on 'Selva' (the only published figure found for the commodity); surface published as ${as}.`,
            source: SELVA,
          })),
          ...typicalFriction(
            'strawberry',
            ['plastic'],
            "'Selva' was measured on steel 0.415, galvanised iron 0.439, plywood 0.473 and rubber 0.575, not on a plastic.",
          ),
          typical(
            'drop_threshold_height',
            'rigid plate',
            30,
            10,
            130,
            'from memory',
            STRAWBERRY_IMPACTS,
            { observation: 'no-bruise' },
          ),
          typical(
            'drop_threshold_height',
            'plastic',
            50,
            10,
            130,
            'from memory',
            `A recalled typical for a plastic tray or belt, not an observation. ${STRAWBERRY_IMPACTS}`,
            { observation: 'no-bruise' },
          ),
          {
            quantity: 'bulk_density',
            value: 474.33,
            ripeness: 'Initial moisture content 91.07 % (w.b.)',
            note: "Measured on 'Selva' (the only published figure found for the commodity); published as 474.330 kg/m³, porosity 51.11 %. Replaces the typical 500 kg/m³ (a 1 litre punnet of strawberries weighs about 0.5 kg, mafra.com.pl packaging page).",
            source: SELVA,
          },
        ],
      },
      {
        slug: 'strawberry-selva',
        name: 'Selva',
        values: [
          {
            quantity: 'mass',
            value: 11.885,
            note: 'Mean fruit mass; volume 12.33 cm³.',
            source: SELVA,
          },
          {
            quantity: 'diameter',
            value: 28.59,
            note: 'Geometric mean diameter; sphericity 0.971.',
            source: SELVA,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 28.26,
            note: 'Fruit diameter.',
            source: SELVA,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 29.7,
            note: 'Fruit length.',
            source: SELVA,
          },
          {
            quantity: 'density',
            value: 1068.88,
            ripeness: 'Initial moisture content 91.07 % (w.b.)',
            note: 'True density, published as 1068.880 kg/m³.',
            source: SELVA,
          },
          {
            quantity: 'bulk_density',
            value: 474.33,
            ripeness: 'Initial moisture content 91.07 % (w.b.)',
            note: 'Published as 474.330 kg/m³; porosity 51.11 %. Firmness 3.63 N (probe not given in the abstract, so not stored as penetrometer firmness).',
            source: SELVA,
          },
          ...SELVA_FRICTION.map(([variant, value, as]) => ({
            quantity: 'friction_coefficient' as const,
            variant,
            value,
            method: 'Static coefficient of friction, whole fruit on the surface',
            note: `Static coefficient; surface published as ${as}.`,
            source: SELVA,
          })),
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
        slug: 'blueberry-type',
        name: 'Blueberry (commodity record)',
        isType: true,
        values: [
          typical(
            'youngs_modulus',
            'apparent',
            1,
            0.2,
            3,
            'from memory',
            "No blueberry modulus with its figure found (searched: 'blueberry fruit elastic modulus compression', 'apparent modulus of elasticity blueberries FirmTech', 'blueberry cultivars compression Young's modulus rupture force stress', 'Duke blueberry firmness elastic modulus compression', 'blueberry finite element drop damage elastic modulus Poisson ratio', and in Chinese '蓝莓 果实 弹性模量 泊松比'). Tetteh et al. (Trans. ASABE 49:113–121, 2006) computed apparent moduli from FirmTech 2 readings, but the abstract gives no figure.",
          ),
          poisson('blueberry'),
          typical(
            'density',
            '',
            1000,
            900,
            1100,
            'from memory',
            "No blueberry density found (searched: 'blueberry physical properties bulk density sphericity', 'blueberry berry mass diameter true density').",
          ),
          typical(
            'diameter',
            'equatorial',
            15,
            10,
            20,
            'from memory',
            'No study found; popular pages give cultivated berries 5–16 mm and commercial highbush 15–18 mm across (ntro.it.com, towerlandscapedesign.com).',
          ),
          typical(
            'diameter',
            'axial',
            12,
            8,
            18,
            'from memory',
            'Blueberries are round and slightly flattened: the axial size is a little below the equatorial.',
          ),
          typical(
            'mass',
            '',
            2,
            1,
            3.5,
            'from memory',
            'No study found; popular pages give cultivated highbush berries 1–3.5 g and wild berries about 0.3 g (ntro.it.com).',
          ),
          typical(
            'static_bruise_threshold',
            '',
            40,
            10,
            100,
            'from memory',
            "No blueberry static bruise pressure found (searched: 'blueberry compression rupture force safe pressure'). The Wrocław calcium study (Agriculture 15(4):438, 2025) measured safe pressures but the abstract gives no figure; it found firmness about 80 % above the detachment force.",
          ),
          ...typicalFriction('blueberry', ALL_SURFACES, ''),
          blueberryDrop(
            "Measured on 'Duke' and 'Brigitta'; the commodity record takes it as an upper bound for blueberry. Damage after the drop depended on the firmness at harvest.",
          ),
          {
            quantity: 'drop_threshold_height',
            variant: 'rigid plate',
            value: 150,
            method:
              'Drop tests of single berries onto a hard surface and onto cushioning materials',
            observation: 'bruised-at',
            note: "Published as: extensive bruising resulted when the drop height to a hard surface exceeded 150 mm (6 in.); cushioning materials prevented bruising for drops as great as 0.6 to 1.2 m. Stored as an upper bound (fruit bruised above it; the no-bruise height lies at or below it). The abstract names no material: 'a hard surface' (uncushioned, set against the cushioning materials) is filed under rigid plate. Cultivar not named for the drop test ('Bluecrop' in the harvest tests). Put first: the only blueberry figure onto an uncushioned surface of unnamed material.",
            source: 'berry-brown-1996-blueberry',
          },
          {
            quantity: 'drop_threshold_height',
            variant: 'wood',
            value: 406,
            method: 'Drops onto hard boards, in increments of 10.2 cm (4 in) or 40.6 cm (16 in)',
            observation: 'bruised-at',
            note: 'Bruised at this height: blueberries dropped onto hard boards softened (bruised) in proportion to the total distance of fall; a standard fall of 8 drops of 40.6 cm softened them predictably (firmness after = −0.590 + 0.627 × firmness before). Surface published as hard boards, filed under wood. 40.6 cm = 406 mm.',
            source: 'berry-ballinger-1973-blueberry',
          },
          typical(
            'bulk_density',
            '',
            600,
            500,
            700,
            'from memory',
            "No blueberry bulk density found (searched: 'blueberry bulk density', 'blueberry physical properties bulk density true density static friction angle of repose highbush cultivar'). Small round berries pack more densely than large fruit.",
          ),
        ],
      },
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
        name: 'Kiwifruit (commodity record)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'flesh',
            value: 0.288,
            stage: 'ripe',
            method: 'Flesh compression',
            ripeness: 'Day 6 of ripening (lowest values of the series)',
            note: 'Tangent modulus of the same flesh 0.080 MPa. Cultivar not named in the abstract.',
            source: 'du-2019-asabe',
          },
          poisson('kiwifruit'),
          {
            quantity: 'density',
            value: 1093,
            note: "Whole-fruit density measured on 'Hayward' (secondary source); put first because the checks need the whole fruit. The flesh density of Du et al. 2019 (1022 kg/m³) follows.",
            source: HAYWARD,
          },
          {
            quantity: 'density',
            value: 1022,
            stage: 'ripe',
            ripeness: 'Day 6 of ripening',
            note: 'Flesh density, 1.022 g/cm³.',
            source: 'du-2019-asabe',
          },
          {
            quantity: 'density',
            value: 996,
            note: "Weak source (class report, 50 'Hayward' fruit): true density 996 kg/m³.",
            source: 'berry-hayward-student-report',
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 46.28,
            note: "Measured on 'Hayward': width 46.28 mm (thickness 42.87 mm); the commodity record takes it as typical of kiwifruit.",
            source: HAYWARD,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 59.41,
            note: "Measured on 'Hayward': fruit length 59.41 mm.",
            source: HAYWARD,
          },
          {
            quantity: 'mass',
            value: 72.28,
            note: "Measured on 'Hayward' (average fruit weight); the commodity record takes it as typical of kiwifruit.",
            source: HAYWARD,
          },
          {
            quantity: 'bioyield_stress',
            value: 24,
            stage: 'ripe',
            method: 'Flesh compression',
            ripeness: 'Day 6 of ripening (lowest values of the series)',
            note: 'Bio-yield stress, 0.024 MPa (× 1000 = 24 kPa). Stands in for a static bruise threshold, which no source gives. A finite-element study found no noticeable damage below 5 % compressive strain (berry-zhu-kiwifruit-static, abstract).',
            source: 'du-2019-asabe',
          },
          {
            quantity: 'friction_coefficient',
            variant: 'rubber',
            value: 0.163,
            note: "Static coefficient, measured on 'Hayward'.",
            source: HAYWARD,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'galvanised steel',
            value: 0.158,
            note: "Static coefficient, measured on 'Hayward' (galvanized steel sheet, the lowest of four surfaces).",
            source: HAYWARD,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'plastic',
            value: 0.173,
            note: "Static coefficient on polyethylene, measured on 'Hayward'.",
            source: HAYWARD,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'plywood',
            value: 0.19,
            note: "Static coefficient, measured on 'Hayward' (the highest of four surfaces).",
            source: HAYWARD,
          },
          {
            quantity: 'drop_threshold_height',
            variant: 'steel',
            value: 300,
            method: 'Single drop of 30 cm onto a steel plate (impact injury treatment)',
            ripeness: 'Typical harvesting stage',
            observation: 'bruised-at',
            note: 'Injured at this height: the 30 cm drop was the impact-injury treatment and raised soluble solids and flesh and core deformation above the controls. Rough sandpaper surfaces did more than smooth steel; chilling to 4 °C reduced the response.',
            source: 'berry-mencarelli-1996-kiwifruit',
          },
          typical(
            'drop_threshold_height',
            'plastic',
            100,
            30,
            300,
            'from memory',
            "No kiwifruit no-bruise drop height found (searched: 'kiwifruit Hayward drop height bruise threshold', 'kiwifruit falling height contact material'). The Foods 13(21):3523 (2024) drop study modelled heights and contact materials but its abstract gives no threshold; a 30 cm drop onto steel injures. A recalled typical, not an observation.",
            { observation: 'no-bruise' },
          ),
          {
            quantity: 'penetrometer_firmness',
            variant: '8 mm',
            value: 62.3,
            stage: 'firm',
            method: 'Penetrometer, 8 mm (5/16 in) tip',
            note: 'Minimum flesh firmness at harvest: 14 lbf × 4.4482 = 62.3 N.',
            source: 'berry-kiwifruit-postharvest-recs',
          },
          {
            quantity: 'penetrometer_firmness',
            variant: '8 mm',
            value: 13.3,
            low: 8.9,
            high: 13.3,
            stage: 'ripe',
            method: 'Penetrometer, 8 mm (5/16 in) tip',
            note: 'Fruit at 2–3 lb flesh firmness is considered ripe: 2 × 4.4482 = 8.9 N to 3 × 4.4482 = 13.3 N; the upper end is stored. Ripe fruit (below 4 lbf) produce 50–100 µl/kg·h ethylene at 20 °C. The sheet names the 8 mm tip for the harvest figure; the ripe figure is taken to use the same tip.',
            source: 'berry-kiwifruit-postharvest-recs',
          },
          {
            quantity: 'bulk_density',
            value: 575.27,
            note: "Measured on 'Hayward' (porosity 47.13 %); the commodity record takes it as typical of kiwifruit.",
            source: HAYWARD,
          },
          {
            quantity: 'bulk_density',
            value: 563.21,
            note: "Weak source (class report, 50 'Hayward' fruit); porosity 43.40 %. Agrees with the figure above within 2 %.",
            source: 'berry-hayward-student-report',
          },
        ],
      },
      {
        slug: 'kiwifruit-hayward',
        name: 'Hayward',
        values: [
          { quantity: 'mass', value: 72.28, note: 'Average fruit weight.', source: HAYWARD },
          {
            quantity: 'diameter',
            value: 49.03,
            note: 'Geometric mean diameter; length 59.41, width 46.28, thickness 42.87 mm; sphericity 0.825; volume 66.52 cm³.',
            source: HAYWARD,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 59.41,
            note: 'Fruit length.',
            source: HAYWARD,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 46.28,
            note: 'Fruit width (thickness 42.87 mm).',
            source: HAYWARD,
          },
          { quantity: 'density', value: 1093, note: 'Fruit density.', source: HAYWARD },
          {
            quantity: 'bulk_density',
            value: 575.27,
            note: 'Porosity 47.13 %.',
            source: HAYWARD,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'plywood',
            value: 0.19,
            note: 'Static coefficient; the highest of four surfaces.',
            source: HAYWARD,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'plastic',
            value: 0.173,
            note: 'Static coefficient on polyethylene.',
            source: HAYWARD,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'rubber',
            value: 0.163,
            note: 'Static coefficient.',
            source: HAYWARD,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'galvanised steel',
            value: 0.158,
            note: 'Static coefficient on galvanized steel sheet; the lowest of four surfaces.',
            source: HAYWARD,
          },
        ],
      },
      {
        slug: 'kiwifruit-zesy002',
        name: 'Zesy002 (SunGold, Gold3)',
        values: [
          {
            quantity: 'mass',
            value: 138.9,
            stage: 'firm',
            ripeness: 'On the vine, week 14 of the New Zealand season (before harvest)',
            note: 'Mean fresh weight in industry monitoring at week 14; mean firmness 6.51 kgf then (probe not stated on the page, so not stored as penetrometer firmness).',
            source: 'berry-trevelyan-2021-kiwifruit',
          },
        ],
      },
    ],
  },
];
