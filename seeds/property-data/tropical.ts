import { typical } from './value-helpers';
import type { SeedCommodity, SeedValue } from './types';

const CARABAO = 'pas-carabao-rheology';
const NEGRIN = 'ct-negrin-2013-mango';
const KP = 'ct-daf-kensington-pride';
const ORHEVBA = 'ct-orhevba-2011-avocado';
const SRILANKA = 'ct-srilanka-banana-2015';
const GRAND_NAIN = 'ct-grand-nain-banana-mass';
const NIPAH = 'ct-abidin-2019-nipah';
const BERMUDEZ = 'ct-bermudez-cavendish-thesis';

/** What the tropical searches covered, for the notes of the typical values. */
const SEARCHED = (fruit: string, queries: string) =>
  `Searched (stored pages): ${queries}; no published ${fruit} value for this quantity was found in a readable abstract or page.`;
/*
 * Queries run on the stored pages (and, in 2026-12, the docs and code corpora) for the typical
 * values below, verbatim:
 * mango — 'mango fruit modulus of elasticity Poisson ratio compression', 'Poisson's ratio mango
 *   fruit flesh', 'mango physical properties bulk density coefficient of static friction rubber',
 *   'mango bruise drop height impact threshold', 'mango fruit physical properties angle of repose
 *   coefficient of friction bulk density', 'physical properties of mango cultivars coefficient of
 *   static friction plywood galvanized iron rubber angle of repose', 'Alphonso Kesar Totapuri mango
 *   physical properties coefficient of friction', 'Ataulfo mango mechanical properties modulus
 *   firmness compression', 'mango fruit rupture stress MPa compression whole fruit cultivar',
 *   'Keitt Tommy Atkins maturation stage elasticity modulus MPa maximum stress rupture', 'mango
 *   drop test bruise height Nam Dok Mai impact', 'Tommy Atkins mango impact bruise drop height',
 *   'CIGR journal mango fruit physical mechanical properties rupture force'. Read, not storable:
 *   Dantas et al. 2017 (Rev. Ciências Agrárias 40(2), doi 10.19084/RCA16095) measured the modulus
 *   and the maximum stress to rupture of 'Keitt' and 'Tommy Atkins' — no numbers in the abstract;
 *   Osadare et al. 2019 (Asian Food Sci. J. 10(2)) — angle of repose of mango seeds, not fruit;
 *   Yaptenco et al. ('Carabao' firmness, Philipp. Agric. Sci.) — rupture force and stiffness only.
 * avocado — 'avocado fruit firmness modulus elasticity compression', 'avocado Young's modulus MPa
 *   Hertz', 'Hass avocado mesocarp Young's modulus', 'avocado Poisson ratio', 'avocado physical
 *   properties bulk density coefficient friction', 'Hass Fuerte avocado friction coefficient',
 *   'avocado Hass physical properties coefficient of friction angle of repose bulk density',
 *   'avocado fruit modulus of elasticity compression bioyield Hass Fuerte', 'Hass avocado
 *   mesocarp Young's modulus MPa ripening texture compression cylinder'. Read, not storable:
 *   Ortiz-Viedma et al. 2018 (J. Food Eng. 219:62–70) — 'Hass' mesocarp maximum stress falls with
 *   ripening, no numbers in the abstract.
 * banana — 'banana fruit physical mechanical properties modulus friction coefficient', 'banana
 *   Young's modulus MPa pulp Poisson's ratio', 'Cavendish banana modulus of elasticity', 'banana
 *   fingers bulk density static coefficient friction', 'banana fruit physical properties angle of
 *   repose coefficient of static friction', 'banana pulp Young's modulus compression test MPa
 *   ripening stage', 'banana fruit bioyield point force deformation modulus of elasticity whole
 *   finger', 'banana drop height bruise threshold impact surface', 'banana Cavendish pendulum
 *   impact bruise energy threshold', 'plantain Musa physical properties static coefficient of
 *   friction plywood galvanized steel angle of repose', 'Grand Nain Williams banana finger
 *   compression firmness modulus elasticity MPa', 'Seeni Embul Kolikuttu coefficient of static
 *   friction wood steel Styrofoam angle of repose', 'banano propiedades mecánicas módulo de
 *   elasticidad compresión Cavendish'. Read, not storable: Millán Cardona & Ciro Velásquez
 *   ('Cavendish Valery', Corporación Universitaria Lasallista) — compressive modulus fell over 12
 *   days, the abstract giving only peel firmness 16.49 → 12.39 N, probe not named.
 */

/** What the tropical searches covered, in short, for the notes of the typical values. */
const MANGO_Q =
  "mango modulus, Poisson's ratio; bulk density, friction, angle of repose; 'Keitt', 'Tommy Atkins', 'Alphonso', 'Ataulfo' mechanics; drop and impact bruising (queries in the seed file)";
const AVOCADO_Q =
  "avocado modulus, Young's modulus of 'Hass' mesocarp, Poisson's ratio; bulk density, friction and angle of repose of 'Hass' and 'Fuerte' (2026-12 queries in the seed file; Ortiz-Viedma et al. 2018 give no numbers in the abstract)";
const BANANA_Q =
  "banana pulp and finger modulus, Poisson's ratio, bioyield; bulk density, static friction and angle of repose (also plantain, and the Sri Lankan cultivars' paper); drop and pendulum bruise thresholds; Spanish 'banano módulo de elasticidad' (2026-12 queries in the seed file)";

/**
 * Mazhar et al. 2018 (Hass drops): the abstract names no drop surface, so the figures are kept
 * here as text, not as drop or impact values (a surface must not be guessed).
 */
const MAZHAR_NOTE =
  "Hass drops (Mazhar et al. 2018, 'mazhar-2018-avocado', read in the abstract): hard green mature fruit expressed no bruising at drop heights ≤ 100 cm (≈ 1.36 J absorbed); softening, firm-ripe and soft-ripe fruit dropped from 50 cm (≈ 0.8 J) developed progressively more bruising; fruit at 2.5 or 5 °C at impact bruised less than at 20 °C. The abstract names no drop surface, so these are not stored as drop thresholds (they were filed under steel before, a guessed surface).";

/** Modulus of a whole mango at the three ripening phases of Negrín Hernández et al. 2013. */
const negrinModulus = (moduli: [number, number, number]): SeedValue[] =>
  (['firm', 'firm-ripe', 'ripe'] as const).map((stage, i) => ({
    quantity: 'youngs_modulus',
    variant: 'apparent',
    value: moduli[i],
    stage,
    ripeness: `Ripening phase ${i + 1} of 3`,
    method: 'Whole fruit compressed axially in its natural resting position',
    note: `Phase ${i + 1} of the source's three ripening phases, filed as '${stage}' (phases 1, 2, 3 → firm, firm-ripe, ripe).`,
    source: NEGRIN,
  }));

/** 'No more than 0.26 m' onto each of the three surfaces the Carabao study names. */
const carabaoDrop = (variant: string, note: string, extra = ''): SeedValue => ({
  quantity: 'drop_threshold_height',
  variant,
  value: 260,
  observation: 'recommended-max',
  method: 'Drops from several heights; impact coefficient 12.25–94.52 cm/J over the heights',
  note: `Recommended maximum: the fruit should never be dropped from more than 0.26 m onto carton, plastic or solid ground. ${note} ${extra}`.trim(),
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
            'Static loads: green fruit took 80 kg without significant internal damage, breaker-stage fruit 20 kg and 30 % yellow fruit 5 kg; cells ruptured at 2.45, 0.63 and 0.50 kN (forces, not stored as stresses: no contact area is given).',
          ),
          carabaoDrop('plastic', "The abstract says 'plastic'."),
          carabaoDrop('ground', "The abstract says 'solid ground'."),
        ],
      },
      {
        slug: 'mango-keitt',
        name: 'Keitt',
        values: [...negrinModulus([2.065, 1.734, 1.381]), ...mangoAtHarvest(1104, 1189)],
      },
      {
        slug: 'mango-tommy-atkins',
        name: 'Tommy Atkins',
        values: negrinModulus([1.698, 1.657, 1.518]),
      },
      {
        slug: 'mango-kensington-pride',
        name: 'Kensington Pride',
        values: [
          {
            quantity: 'mass',
            value: 450,
            low: 300,
            high: 600,
            note: 'Published as weight 300–600 g; the midpoint (300 + 600) / 2 = 450 g is stored.',
            source: KP,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 106,
            note: 'Published as average length.',
            source: KP,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 79,
            note: 'Published as average width; the average depth is 83 mm.',
            source: KP,
          },
        ],
      },
      { slug: 'mango-haden', name: 'Haden', values: mangoAtHarvest(640, 1147) },
      { slug: 'mango-kent', name: 'Kent', values: mangoAtHarvest(836, 1076) },
      { slug: 'mango-palmer', name: 'Palmer', values: mangoAtHarvest(837, 1084) },
      {
        slug: 'mango-type',
        name: 'Mango (commodity record)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'apparent',
            value: 2.065,
            low: 1.381,
            high: 2.065,
            stage: 'firm',
            method: 'Whole fruit compressed axially in its natural resting position',
            note: "Measured on 'Keitt' at ripening phase 1 (the stiffest of the six values of 'Keitt' and 'Tommy Atkins' over three phases, 1.381–2.065 MPa); the commodity record takes it as typical of mango. The stiffest is kept because a stiffer fruit sees the higher contact pressure under the same load.",
            source: NEGRIN,
          },
          typical(
            'poisson_ratio',
            '',
            0.4,
            [0.3, 0.49],
            'common practice',
            `Contact calculations for fruit flesh commonly take 0.3–0.49. ${SEARCHED('mango', MANGO_Q)}`,
          ),
          {
            quantity: 'density',
            value: 1084,
            low: 1076,
            high: 1189,
            ripeness: 'Standard harvest maturity',
            note: "Measured on 'Palmer'; 'Haden', 'Kent', 'Palmer' and 'Keitt' gave 1147, 1076, 1084 and 1189 kg/m³ (1.084 g/cm³ in the abstract for 'Palmer'). The commodity record takes the second-lowest as typical of mango.",
            source: 'abu-2021-mango',
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 79,
            note: "Measured on 'Kensington Pride' (average width; depth 83 mm); the commodity record takes it as typical of mango.",
            source: KP,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 106,
            note: "Measured on 'Kensington Pride' (average length); the commodity record takes it as typical of mango.",
            source: KP,
          },
          {
            quantity: 'mass',
            value: 450,
            low: 300,
            high: 600,
            note: "Measured on 'Kensington Pride' (300–600 g, midpoint stored); the commodity record takes it as typical of mango. The Ghana study gave 640–1104 g for 'Haden', 'Kent', 'Palmer' and 'Keitt'.",
            source: KP,
          },
          typical(
            'static_bruise_threshold',
            '',
            100,
            [50, 300],
            'from memory',
            `Held-load no-bruise pressures of soft climacteric fruit are commonly of the order of 0.1 MPa. Published mango figures are forces only and cannot be turned into pressures without the contact area: Carabao green fruit took 80 kg without significant internal damage, breaker 20 kg, 30 % yellow 5 kg ('pas-carabao-rheology'); Dashehari first yield at 0.30 kN and rupture at 0.48 kN (Verma & Singh 1999, J. Appl. Hortic. 1(2):112–114, read in the abstract); an unnamed Mexican mango elastic limit 1.95 kN at 13.3 % deformation (Pérez-López et al., Chapingo, read in the abstract). ${SEARCHED('mango', MANGO_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'belt rubber',
            0.5,
            [0.3, 0.8],
            'common practice',
            `Fruit on conveyor rubber is commonly taken at 0.4–0.8. ${SEARCHED('mango', MANGO_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'steel',
            0.35,
            [0.2, 0.5],
            'common practice',
            `Smooth-skinned fruit on steel is commonly taken at 0.2–0.5 (orange 0.16–0.45 in this knowledge base). ${SEARCHED('mango', MANGO_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'hard plastic',
            0.3,
            [0.15, 0.5],
            'common practice',
            `Smooth-skinned fruit on hard plastic is commonly taken at 0.15–0.5. ${SEARCHED('mango', MANGO_Q)}`,
          ),
          carabaoDrop(
            'carton',
            "Measured on 'Carabao'; the commodity record takes it as typical of mango.",
            'Other drops read: Carabao fruit dropped 0.5–1.5 m at three ripeness stages showed more bruised flesh as height rose (Lacap et al. 2021, Philipp. J. Sci. 150(6B):1689–1701, read in the abstract; surface not named, so not stored).',
          ),
          carabaoDrop(
            'plastic',
            "Measured on 'Carabao'; the commodity record takes it as typical of mango.",
          ),
          carabaoDrop(
            'ground',
            "Measured on 'Carabao'; the commodity record takes it as typical of mango.",
          ),
          typical(
            'drop_threshold_height',
            'rigid plate',
            200,
            [100, 260],
            'common practice',
            "Kept below the published maximum for 'Carabao' of 0.26 m onto carton, plastic or solid ground ('pas-carabao-rheology', stored above): a steel or other rigid plate is harder than any of those, so a lower height is taken. Carabao fruit dropped 0.5–1.5 m bruised more as height rose (Lacap et al. 2021, Philipp. J. Sci. 150(6B), read in the abstract; surface not named). Searched: 'mango fruit drop test steel plate bruise height', 'mango bruise drop height impact threshold'; no mango drop onto a rigid surface was found.",
            { observation: 'recommended-max' },
          ),
          typical(
            'bulk_density',
            '',
            500,
            [400, 600],
            'common practice',
            `Large ovoid fruit in a bin commonly pack at about half their true density (here 1076–1189 kg/m³). ${SEARCHED('mango', MANGO_Q)}`,
          ),
        ],
      },
    ],
  },
  {
    slug: 'avocado',
    name: 'Avocado',
    family: 'Tropical and subtropical',
    botanicalName: 'Persea americana',
    cultivars: [
      // Hass: the drop figures of Mazhar et al. 2018 name no surface and are kept as text in the
      // commodity record's drop notes (MAZHAR_NOTE); with nothing storable, no cultivar page.
      {
        slug: 'avocado-fuerte',
        name: 'Fuerte',
        values: [
          { quantity: 'density', value: 1051, note: 'Four replicates.', source: ORHEVBA },
          {
            quantity: 'mass',
            value: 382.5,
            note: 'Published as 0.3825 kg, × 1000 = 382.5 g.',
            source: ORHEVBA,
          },
        ],
      },
      {
        slug: 'avocado-type',
        name: 'Avocado (commodity record)',
        isType: true,
        values: [
          typical(
            'youngs_modulus',
            'apparent',
            1,
            [0.05, 4],
            'from memory',
            `Avocado firmness falls about a hundredfold between hard green and eating ripe (whole-fruit firmness 253 N → 2 N during ripening, Landahl & Terry 2020, Biosyst. Eng. 194:251–260, read in the abstract), so the band is very wide; a firm-fruit value is kept. ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          typical(
            'poisson_ratio',
            '',
            0.4,
            [0.3, 0.49],
            'common practice',
            `Contact calculations for fruit flesh commonly take 0.3–0.49. ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          {
            quantity: 'density',
            value: 1051,
            note: "Measured on 'Fuerte' (four replicates); the commodity record takes it as typical of avocado.",
            source: ORHEVBA,
          },
          typical(
            'diameter',
            'equatorial',
            70,
            [55, 90],
            'from memory',
            `Typical of 'Hass' and 'Fuerte' in the trade; the one study read ('ct-orhevba-2011-avocado') prints diameters in a unit that cannot be right. ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          typical(
            'diameter',
            'axial',
            100,
            [75, 140],
            'from memory',
            `Typical of 'Hass' and 'Fuerte' in the trade (pear-shaped, longer than wide). ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          {
            quantity: 'mass',
            value: 382.5,
            note: "Measured on 'Fuerte' (0.3825 kg); the commodity record takes it as typical of avocado.",
            source: ORHEVBA,
          },
          typical(
            'static_bruise_threshold',
            '',
            50,
            [10, 200],
            'from memory',
            `Ripening avocado bruises under light squeezing (shoppers' squeezes can bruise firm- and soft-ripe fruit, Hort Innovation project AV12009 summary, read in the stored page), so a low value with a wide band is kept. Purple avocado (Philippines): small fruit withstood 5 kg and medium 6 kg of load after harvest without significant internal damage (Valencia et al., Philipp. J. Agric. Biosyst. Eng., read in the abstract) — forces, not pressures. ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'belt rubber',
            0.5,
            [0.3, 0.8],
            'common practice',
            `Fruit on conveyor rubber is commonly taken at 0.4–0.8. ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'steel',
            0.4,
            [0.2, 0.6],
            'common practice',
            `Fruit on steel is commonly taken at 0.2–0.6; 'Hass' has a rough skin, so the middle of the band is kept. ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'hard plastic',
            0.35,
            [0.15, 0.6],
            'common practice',
            `Fruit on hard plastic is commonly taken at 0.15–0.6. ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
          typical(
            'drop_threshold_height',
            'rigid plate',
            300,
            [100, 500],
            'common practice',
            `Handling guides commonly cap drops of ripening fruit at about 30 cm onto hard surfaces. ${MAZHAR_NOTE} The 50 cm at which softening fruit bruised lies above this value, consistent with it.`,
            { observation: 'recommended-max' },
          ),
          typical(
            'drop_threshold_height',
            'padded surface',
            500,
            [200, 1000],
            'common practice',
            `A padded surface is commonly allowed more height than a hard one. ${MAZHAR_NOTE}`,
            { observation: 'recommended-max' },
          ),
          typical(
            'bulk_density',
            '',
            550,
            [450, 650],
            'common practice',
            `Ovoid fruit in a bin commonly pack at about half their true density (1051 kg/m³ for 'Fuerte'). ${SEARCHED('avocado', AVOCADO_Q)}`,
          ),
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
      {
        slug: 'banana-dwarf-cavendish',
        name: 'Dwarf Cavendish',
        values: [
          bananaPulp(0.993),
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 30.64,
            ripeness: 'Green (unripe) fruit',
            note: 'Derived: maximum diameter of the fruit without peel 23.34 mm plus twice the peel thickness 3.65 mm, 23.34 + 2 × 3.65 = 30.64 mm (both published in the abstract).',
            source: 'kachru-1995-banana',
          },
        ],
      },
      {
        slug: 'banana-nendran',
        name: 'Nendran',
        values: [
          bananaPulp(1.11),
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 42.98,
            ripeness: 'Green (unripe) fruit',
            note: 'Derived: maximum diameter of the fruit without peel 37.08 mm plus twice the peel thickness 2.95 mm, 37.08 + 2 × 2.95 = 42.98 mm (both published in the abstract).',
            source: 'kachru-1995-banana',
          },
        ],
      },
      {
        slug: 'banana-embul',
        name: 'Embul',
        values: [
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 105,
            sd: 8.6,
            ripeness: 'Harvest maturity',
            note: 'Finger length, published as 10.5 (± 0.86) cm, × 10 = 105 mm.',
            source: SRILANKA,
          },
        ],
      },
      {
        slug: 'banana-kolikuttu',
        name: 'Kolikuttu',
        values: [
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 143,
            sd: 16.6,
            ripeness: 'Harvest maturity',
            note: 'Finger length, published as 14.3 (± 1.66) cm, × 10 = 143 mm.',
            source: SRILANKA,
          },
        ],
      },
      {
        slug: 'banana-grand-nain',
        name: 'Grand Nain',
        values: [
          {
            quantity: 'mass',
            value: 139.65,
            sd: 7.66,
            low: 126.05,
            high: 154.29,
            note: 'Table 1 (mean, SD, min, max).',
            source: GRAND_NAIN,
          },
          {
            quantity: 'density',
            value: 1030,
            sd: 30,
            low: 980,
            high: 1110,
            note: 'Table 1: fruit (true) density 1.03 ± 0.03 g/cm³, min 0.98, max 1.11; × 1000 = kg/m³.',
            source: GRAND_NAIN,
          },
          {
            quantity: 'bulk_density',
            value: 410,
            sd: 30,
            low: 350,
            high: 460,
            note: 'Table 1: bulk density 0.41 ± 0.03 g/cm³, min 0.35, max 0.46; × 1000 = kg/m³.',
            source: GRAND_NAIN,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 169.9,
            sd: 7.1,
            low: 154.5,
            high: 182,
            note: 'Table 1: length 16.99 ± 0.71 cm (min 15.45, max 18.20); × 10 = mm.',
            source: GRAND_NAIN,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 37.8,
            sd: 0.8,
            low: 36.1,
            high: 39.1,
            note: 'Table 1: width 3.78 ± 0.08 cm (min 3.61, max 3.91); × 10 = mm. The thickness was 3.50 cm.',
            source: GRAND_NAIN,
          },
        ],
      },
      {
        slug: 'banana-nipah',
        name: 'Nipah',
        values: [
          {
            quantity: 'mass',
            value: 77.85,
            sd: 28.61,
            ripeness: 'Unripe',
            note: 'Average weight of unripe fruit.',
            source: NIPAH,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 38.78,
            sd: 5.77,
            ripeness: 'Unripe',
            note: 'Published as average diameter 38.78 ± 5.77 mm × 29.25 ± 4.92 mm; the larger cross-section dimension is stored.',
            source: NIPAH,
          },
        ],
      },
      {
        slug: 'banana-giant-cavendish',
        name: 'Giant Cavendish',
        values: [
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 208.5,
            note: "Published as mean length 20.85 cm, × 10 = 208.5 mm. The thesis names the cultivar 'Cavendish gigante (Jonson)'.",
            source: BERMUDEZ,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 35.8,
            note: 'Derived: published as mean circumference 11.25 cm; diameter = 112.5 mm ÷ π = 35.81 mm, stored as 35.8 mm (a round cross-section assumed). Peel 2.5 mm and pulp 28.5 mm thick. The abstract also reports little resistance to impacts above "105.94 (J)", a figure whose unit cannot be right for a banana, so no impact value is stored.',
            source: BERMUDEZ,
          },
        ],
      },
      {
        slug: 'banana-type',
        name: 'Banana (commodity record)',
        isType: true,
        values: [
          typical(
            'youngs_modulus',
            'apparent',
            1,
            [0.2, 3],
            'from memory',
            `Green bananas are firm and ripe ones very soft; a green-fruit value is kept with a wide band. ${SEARCHED('banana', BANANA_Q)}`,
          ),
          typical(
            'poisson_ratio',
            '',
            0.4,
            [0.3, 0.49],
            'common practice',
            `Contact calculations for fruit flesh commonly take 0.3–0.49. ${SEARCHED('banana', BANANA_Q)}`,
          ),
          {
            ...bananaPulp(0.993),
            note: "Measured on 'Dwarf Cavendish' pulp (specific gravity 0.993 × 1000 kg/m³); the commodity record takes it as typical of banana. Pulp, not the whole fruit with peel; 'Nendran' pulp gave 1110 kg/m³.",
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 30.64,
            ripeness: 'Green (unripe) fruit',
            note: "Derived for 'Dwarf Cavendish': pulp maximum diameter 23.34 mm + 2 × peel 3.65 mm = 30.64 mm; the commodity record takes it as typical of banana.",
            source: 'kachru-1995-banana',
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 105,
            sd: 8.6,
            ripeness: 'Harvest maturity',
            note: "Finger length measured on 'Embul' and 'Seeni' (10.5 ± 0.86 cm each, × 10 = 105 mm); the commodity record takes it as typical of banana. 'Kolikuttu' gave 143 mm.",
            source: SRILANKA,
          },
          {
            quantity: 'mass',
            value: 139.65,
            sd: 7.66,
            low: 126.05,
            high: 154.29,
            note: "Measured on 'Grand Nain' (Table 1 of the source); the commodity record takes it as typical of banana. Unripe 'Nipah' fingers weighed 77.85 ± 28.61 g ('ct-abidin-2019-nipah').",
            source: GRAND_NAIN,
          },
          typical(
            'static_bruise_threshold',
            '',
            80,
            [30, 250],
            'from memory',
            `Bananas mark under light handling pressure, more so as they ripen; a low value with a wide band is kept. Peel fracture force fell from 53.0 ± 1.6 N to 2.1 ± 0.2 N during induced ripening (Khanal et al. 2023, Postharvest Biol. Technol. 198:112252, read in the abstract) — a force on peel specimens, not a pressure. ${SEARCHED('banana', BANANA_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'belt rubber',
            0.5,
            [0.3, 0.8],
            'common practice',
            `Fruit on conveyor rubber is commonly taken at 0.4–0.8. The Sri Lankan study ('ct-srilanka-banana-2015') measured static friction on wood, steel and Styrofoam at harvest maturity (lowest on Styrofoam, highest on wood) but its abstract gives no numbers. ${SEARCHED('banana', BANANA_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'steel',
            0.4,
            [0.2, 0.6],
            'common practice',
            `Fruit on steel is commonly taken at 0.2–0.6; the Sri Lankan study measured steel but gives no number in its abstract. ${SEARCHED('banana', BANANA_Q)}`,
          ),
          typical(
            'friction_coefficient',
            'hard plastic',
            0.35,
            [0.15, 0.6],
            'common practice',
            `Fruit on hard plastic is commonly taken at 0.15–0.6. ${SEARCHED('banana', BANANA_Q)}`,
          ),
          typical(
            'impact_threshold_energy',
            'rigid plate',
            0.05,
            [0.02, 0.074],
            'common practice',
            `Kept below the lowest pendulum energy that bruised local Omani bananas, 0.074 J (Al-Dairi et al. 2023, 'al-dairi-2023-banana', read in the abstract: bruise area and susceptibility rose with energy over 0.074, 0.160 and 0.273 J, storage 12 days at 5, 13 or 22 °C). That figure is not stored as an impact value because the abstract does not name the impactor material (it was filed under steel before, a guessed surface). ${SEARCHED('banana', BANANA_Q)}`,
            { observation: 'recommended-max' },
          ),
          typical(
            'drop_threshold_height',
            'padded surface',
            300,
            [100, 500],
            'common practice',
            `Bananas are packed in hands in padded cartons; handling guides commonly cap drops at about 30 cm. ${SEARCHED('banana', BANANA_Q)}`,
            { observation: 'recommended-max' },
          ),
          {
            quantity: 'bulk_density',
            value: 410,
            sd: 30,
            low: 350,
            high: 460,
            note: "Measured on 'Grand Nain' fingers (Table 1: 0.41 ± 0.03 g/cm³, × 1000 = kg/m³); the commodity record takes it as typical of banana. The Sri Lankan study ('ct-srilanka-banana-2015') found the bulk density of fruits and hands higher than that of whole bunches but gives no number in its abstract.",
            source: GRAND_NAIN,
          },
        ],
      },
    ],
  },
];
