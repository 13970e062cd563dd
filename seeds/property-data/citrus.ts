import { QUANTITIES } from '../../lib/properties/quantities';
import type { SeedCommodity, SeedValue } from './types';
import { frictionFromAngle, typical, typicalJanssenK } from './value-helpers';

const SHARIFI = 'sharifi-2007-orange';
const GRADES = 'sweet-orange-bulk-handling';
const HORTFLORA = 'hortflora-mosambi-kinnow';
const PUNCH = 'ct-orange-punch-jiroft';
const MURCOTT = 'ct-rehal-2017-murcott';

/*
 * Queries run on the stored pages for the typical values below, verbatim: 'orange fruit Young's
 * modulus Poisson ratio compression', 'Valencia orange compression modulus bioyield rupture',
 * 'Citrus sinensis fruit elastic modulus MPa', 'orange fruit bruise drop height impact', 'orange
 * coefficient of friction rubber plastic', 'mandarin fruit physical mechanical properties rupture
 * force modulus', 'Kinnow Nagpur mandarin modulus'; and in 2026-12 (pages, docs, code): 'orange
 * fruit physical properties angle of repose static coefficient of friction rubber', 'orange
 * Poisson's ratio whole fruit measured compression Valencia', 'finite element orange fruit drop
 * impact elastic modulus Poisson ratio simulation', 'orange fruit drop height damage steel
 * surface impact energy threshold citrus', 'sweet orange Valencia bruise threshold compression
 * pressure kPa peel oleocellosis damage load', 'citrus fruit angle of repose orange heap bulk
 * handling', 'mandarin tangerine fruit elastic modulus compression rupture force physical
 * mechanical properties', 'Kinnow mandarin physical properties bulk density angle of repose
 * static coefficient of friction', 'orange Citrus sinensis compression test Young's modulus
 * bioyield whole fruit International Agrophysics', 'naranja propiedades físico-mecánicas módulo
 * de elasticidad coeficiente de fricción ángulo de reposo'. Read, not storable for orange or
 * mandarin: lemon 'Eureka' (Underhill et al. 1998, J. Texture Stud. 29:437–452: damage under a
 * 3.7 kg static load and drops up to 100 cm, no threshold); instrumented-sphere calibration for
 * oranges (Di Renzo et al. 2009, J. Agric. Eng. 4:9–17); kumquat (Int. Agrophys. 27:107–109) and
 * musk lime (Citrus microcarpa: static friction 0.238 on glass to 0.247 on steel) — other species.
 */

/** What the citrus searches covered, in short, for the notes of the typical values. */
const CITRUS_SEARCHED =
  "Searched (stored pages): whole-fruit Young's modulus, Poisson's ratio, bioyield and bruise pressure of orange ('Valencia', Citrus sinensis) and mandarin ('Kinnow', 'Nagpur'); drop and impact thresholds on steel; friction on rubber and plastic; angle of repose (queries in the seed file). Found peel-only moduli (Jentzsch et al. 2022, five Citrus peels), whole-fruit relaxation without a modulus value (Moresi et al. 2012, Tarocco), and lemon, kumquat and musk-lime studies (other species); nothing for the whole orange or mandarin.";

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
          {
            quantity: 'diameter',
            value: 77.4,
            low: 75.5,
            high: 84.1,
            note: 'Grade two fruit: major, intermediate and minor diameters 84.1, 77.4 and 75.5 mm; the intermediate is stored. The abstract does not say which axis is the stem axis, so no equatorial/axial variant is given.',
            source: SHARIFI,
          },
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
        name: 'Orange (commodity record)',
        isType: true,
        values: [
          typical(
            'youngs_modulus',
            'apparent',
            2,
            [0.5, 5],
            'from memory',
            `Whole-fruit apparent modulus of a few MPa is what compression studies of firm fruit usually report; the band is wide on purpose. ${CITRUS_SEARCHED}`,
          ),
          typical(
            'poisson_ratio',
            '',
            0.4,
            [0.3, 0.49],
            'common practice',
            `Contact calculations for fruit flesh commonly take 0.3–0.49 (nearly incompressible turgid tissue). Note: citrus PEEL alone gave a Poisson's ratio near zero or slightly negative (Jentzsch et al. 2022, Front. Mater. 9:979151, read in the abstract) — peel, not whole fruit, so not stored here. ${CITRUS_SEARCHED}`,
          ),
          graded('mass', '', [248.77, 152.62, 96.8], ''),
          graded('density', '', [880, 1060, 1090], ''),
          graded(
            'diameter',
            'equatorial',
            [84.32, 66.99, 58.41],
            'Published as breadth (mean); the width was 84.00, 66.75 and 58.02 mm.',
          ),
          graded(
            'diameter',
            'axial',
            [75.97, 61.08, 53.71],
            'Published as length (mean), taken as the stem (axial) dimension.',
          ),
          {
            quantity: 'failure_stress',
            value: 300,
            low: 300,
            high: 1500,
            method:
              'Punch test of the fruit with punches 4.3–14.3 mm; stress = peak force / punch area',
            note: "Lowest and highest mean punch stress over five cultivars ('Valencia', 'March', 'Washington Navel', 'Blood', local Jiroft) and seven punch diameters: 0.3 and 1.5 MPa, stored as 300 and 1500 kPa. The lowest is stored because a check should take the weakest fruit; the stored abstract breaks off before naming the punch of each extreme. A punch (penetration) stress through the peel, not a no-bruise contact pressure: a bruise threshold under a broad contact lies lower.",
            source: PUNCH,
          },
          typical(
            'static_bruise_threshold',
            '',
            150,
            [75, 300],
            'from memory',
            "Half the lowest mean punch stress of five orange cultivars (0.3 MPa through the peel, 'ct-orange-punch-jiroft'), the band reaching that stress: a broad held contact bruises below the stress at which a punch breaks the peel. Read as forces only (no contact area): satsuma juice sacs broke above 4 kg of quasi-static load ('ct-satsuma-packing-injury'). Tarocco oranges: repeated impacts on steel altered the struck spot ('ct-cerruto-2003-orange'). Searched: 'orange bioyield stress kPa compression', 'orange fruit Young's modulus Poisson ratio compression', 'Valencia orange firmness compression bruise threshold'; Singh & Reddy 2006 (J. Food Eng. 73:112–120) measured a bioyield point, with no number in the abstract.",
          ),
          graded(
            'friction_coefficient',
            'mild steel',
            [0.2, 0.16, 0.19],
            "Static coefficient. About a third of the 0.45 measured on mild steel for 'Phule Mosambi' (next value), and under half of 'Thompson' on galvanised steel (0.368): the sources disagree. First because it is the study of unnamed sweet oranges in three grades.",
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
          typical(
            'friction_coefficient',
            'belt rubber',
            0.5,
            [0.3, 0.8],
            'common practice',
            `Fruit on conveyor rubber is commonly taken above fruit on steel or plywood (0.16–0.45 measured for orange here); no orange-on-rubber value was found. ${CITRUS_SEARCHED}`,
          ),
          typical(
            'friction_coefficient',
            'hard plastic',
            0.3,
            [0.15, 0.5],
            'common practice',
            `Taken between the measured glass (0.21–0.22) and plywood (0.18–0.23) values and the higher mild-steel value for 'Phule Mosambi' (0.45); no orange-on-plastic value was found. ${CITRUS_SEARCHED}`,
          ),
          typical(
            'drop_threshold_height',
            'rigid plate',
            300,
            [150, 600],
            'common practice',
            `Handling guides commonly cap fruit drops at about 30 cm onto hard surfaces; citrus, with its thick peel, is usually held more tolerant than stone fruit. No orange drop threshold was found. ${CITRUS_SEARCHED}`,
            { observation: 'recommended-max' },
          ),
          typical(
            'drop_threshold_height',
            'padded surface',
            600,
            [300, 1000],
            'common practice',
            `A padded surface is commonly allowed about twice the hard-surface height. No orange drop threshold was found. ${CITRUS_SEARCHED}`,
            { observation: 'recommended-max' },
          ),
          graded('bulk_density', '', [500, 580, 520], ''),
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
      {
        slug: 'mandarin-w-murcott',
        name: 'W. Murcott',
        values: [
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 75.395,
            low: 68.97,
            high: 81.82,
            note: 'Published as a range of fruit diameter, 68.97–81.82 mm; the midpoint (68.97 + 81.82) / 2 = 75.395 mm is stored. The abstract also gives an "equatorial length" of 68.43–86.51 mm.',
            source: MURCOTT,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 56.705,
            low: 52.08,
            high: 61.33,
            note: 'Published as a range of length, 52.08–61.33 mm; the midpoint (52.08 + 61.33) / 2 = 56.705 mm is stored.',
            source: MURCOTT,
          },
        ],
      },
      {
        slug: 'mandarin-page',
        name: 'Page',
        values: [
          {
            quantity: 'density',
            value: 970,
            note: 'Published as specific gravity 0.97 (printed "0/97"); stored as 0.97 × 1000 kg/m³ (water).',
            source: 'ct-khadivi-2013-mandarin',
          },
        ],
      },
      {
        slug: 'mandarin-type',
        name: 'Mandarin (commodity record)',
        isType: true,
        values: [
          typical(
            'youngs_modulus',
            'apparent',
            1.5,
            [0.3, 4],
            'from memory',
            `Mandarins are softer and looser-skinned than oranges; a lower typical value than orange's is kept, with a wide band. ${CITRUS_SEARCHED}`,
          ),
          typical(
            'poisson_ratio',
            '',
            0.4,
            [0.3, 0.49],
            'common practice',
            `Contact calculations for fruit flesh commonly take 0.3–0.49. ${CITRUS_SEARCHED}`,
          ),
          {
            quantity: 'density',
            value: 1086,
            note: "Measured on 'Kinnow' (given as specific gravity in kg/m³ in the abstract); the commodity record takes it as typical of mandarin. 'Page' gave 970 kg/m³ (Khadivi-Khub 2013).",
            source: HORTFLORA,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 75.395,
            low: 68.97,
            high: 81.82,
            note: "Measured on 'W. Murcott' (midpoint of the published 68.97–81.82 mm); the commodity record takes it as typical of mandarin. 'Kinnow' gave an equivalent diameter of 66.44 mm (HortFlora).",
            source: MURCOTT,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 56.705,
            low: 52.08,
            high: 61.33,
            note: "Measured on 'W. Murcott' (midpoint of the published length 52.08–61.33 mm); the commodity record takes it as typical of mandarin.",
            source: MURCOTT,
          },
          {
            quantity: 'mass',
            value: 156.71,
            note: "Measured on 'Kinnow' (average fruit weight); the commodity record takes it as typical of mandarin.",
            source: HORTFLORA,
          },
          typical(
            'static_bruise_threshold',
            '',
            120,
            [50, 300],
            'from memory',
            "No mandarin pressure threshold found. Satsuma (M size) under quasi-static load: juice sacs broke above 4 kg (2 kg with rotation), locular membranes above 8 kg, the peel above 10 kg ('ct-satsuma-packing-injury'); pulp damage once compression exceeded 8 mm (Tian, Chen & Li 2024, Foods 13(6):892, read in the abstract) — forces and deformations, not pressures. Kept below orange's typical 150 kPa (looser peel); the lowest orange punch stress, 0.3 MPa, caps the band. Searched: 'mandarin fruit mechanical properties rupture force modulus', 'Kinnow mandarin compression bioyield', 'Satsuma mandarin compression peel puncture'.",
          ),
          {
            quantity: 'friction_coefficient',
            variant: 'mild steel',
            value: 0.42,
            note: "Measured on 'Kinnow' (average static coefficient); the commodity record takes it as typical of mandarin.",
            source: HORTFLORA,
          },
          {
            quantity: 'friction_coefficient',
            variant: 'plywood',
            value: 0.36,
            note: "Measured on 'Kinnow' (average static coefficient); the commodity record takes it as typical of mandarin.",
            source: HORTFLORA,
          },
          typical(
            'friction_coefficient',
            'belt rubber',
            0.5,
            [0.3, 0.8],
            'common practice',
            `Fruit on conveyor rubber is commonly taken above fruit on steel (0.42 measured on 'Kinnow'); no mandarin-on-rubber value was found. ${CITRUS_SEARCHED}`,
          ),
          typical(
            'friction_coefficient',
            'hard plastic',
            0.35,
            [0.2, 0.5],
            'common practice',
            `Taken just below the measured 'Kinnow' values on plywood (0.36) and aluminium (0.41); no mandarin-on-plastic value was found. ${CITRUS_SEARCHED}`,
          ),
          typical(
            'drop_threshold_height',
            'rigid plate',
            300,
            [150, 600],
            'common practice',
            `Handling guides commonly cap fruit drops at about 30 cm onto hard surfaces. No mandarin drop threshold was found. ${CITRUS_SEARCHED}`,
            { observation: 'recommended-max' },
          ),
          typical(
            'drop_threshold_height',
            'padded surface',
            600,
            [300, 1000],
            'common practice',
            `A padded surface is commonly allowed about twice the hard-surface height. No mandarin drop threshold was found. ${CITRUS_SEARCHED}`,
            { observation: 'recommended-max' },
          ),
          typical(
            'bulk_density',
            '',
            550,
            [440, 650],
            'common practice',
            `No mandarin bulk density was found; the orange studies give 440–580 kg/m³ (Sharifi et al. 2007; sweet-orange grades), and smaller fruit pack slightly denser. ${CITRUS_SEARCHED}`,
          ),
        ],
      },
    ],
  },
];
