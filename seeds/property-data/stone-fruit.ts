import type { SeedCommodity, SeedValue } from './types';
import type { TypicalBasis } from '@/lib/properties/quantities';
import { typical as typicalOf, typicalJanssenK } from './value-helpers';

const PLUM = 'intagro-2003-plum-firmness';
const GUNES = 'stone-gunes-2003-plum-tokat';
const NECTARINE = 'fooder-100430-nectarine';
const TABLE = 'stone-crisosto-min-firmness-table';
const UCD = 'stone-ucdavis-peach-nectarine-facts';

/** A typical value (see value-helpers' `typical`); a typical drop height is a no-bruise level. */
const typical = (
  quantity: SeedValue['quantity'],
  variant: string,
  value: number,
  low: number,
  high: number,
  basis: TypicalBasis,
  note: string,
): SeedValue =>
  typicalOf(
    quantity,
    variant,
    value,
    [low, high],
    basis,
    note,
    quantity === 'drop_threshold_height' ? { observation: 'no-bruise' } : {},
  );

const POISSON_NOTE =
  "No Poisson's ratio found for this fruit (searched: '<fruit> Poisson ratio modulus elasticity compression'). Finite-element studies of soft fruit flesh commonly take 0.3–0.49 (nearly incompressible watery tissue); 0.45 is stored.";

const poisson = (fruit: string): SeedValue =>
  typical(
    'poisson_ratio',
    '',
    0.45,
    0.3,
    0.49,
    'common practice',
    POISSON_NOTE.replace('<fruit>', fruit),
  );

/** Friction against rubber, steel and plastic where no source measured them. */
const typicalFriction = (fruit: string, measured: string): SeedValue[] =>
  (
    [
      ['rubber', 0.5, 0.3, 0.9],
      ['steel', 0.35, 0.15, 0.6],
      ['plastic', 0.35, 0.15, 0.6],
    ] as const
  ).map(([surface, v, lo, hi]) =>
    typical(
      'friction_coefficient',
      surface,
      v,
      lo,
      hi,
      'from memory',
      `No ${fruit} friction coefficient against ${surface} found (searched: '${fruit} coefficient of friction rubber steel', '${fruit} physical properties static coefficient of friction'). Static coefficients of whole soft fruit on handling surfaces published for other fruit run from about 0.15 to 0.9, rubber highest. ${measured}`,
    ),
  );

/** The minimum-firmness table: drops onto a PVC belt, firmness with an 8 mm tip in kgf. */
const TABLE_METHOD =
  'Single drops of 1, 5 and 10 cm (66, 185 and 246 G) onto a PVC belt; bruise = damaged area ≥ 2.5 mm across; minimum flesh firmness (8 mm tip, weakest point of the fruit) needed to avoid commercial bruising';
const tableDrop = (heightMm: number, note: string): SeedValue => ({
  quantity: 'drop_threshold_height',
  variant: 'plastic',
  value: heightMm,
  method: TABLE_METHOD,
  probe: '8 mm tip penetrometer for the firmness',
  observation: 'no-bruise',
  note: `Surface published as a PVC belt (filed under plastic). ${note}`,
  source: TABLE,
});

const readyToEat = (fruit: string): SeedValue => ({
  quantity: 'penetrometer_firmness',
  variant: '8 mm',
  value: 13.3,
  low: 8.9,
  high: 13.3,
  stage: 'ripe',
  method: 'Penetrometer, 8 mm (5/16 in) tip',
  note: `${fruit} of 2–3 lbf flesh firmness is called "ready to eat"; 2 lbf × 4.4482 = 8.9 N, 3 lbf × 4.4482 = 13.3 N; the upper end is stored. The same sheet says fruit below 6–8 lbf (26.7–35.6 N) on the cheek is more acceptable to consumers. The sheet names the 8 mm tip for the maximum-maturity (handling without bruising) firmness.`,
  source: UCD,
});

const VERGANO_STEEL: SeedValue = {
  quantity: 'drop_threshold_height',
  variant: 'steel',
  value: 310,
  method: 'Single drops onto a flat steel plate from 31 to 91 cm',
  ripeness: 'Several maturities; impact bruising did not depend on maturity',
  observation: 'bruised-at',
  note: "Bruised at this height: drops of 31 cm onto steel were often enough to bruise ('Redhaven', 'Jefferson', 'SunPrince', 'Rio-Oso-Gem', 'O'Henry'). It was the lowest height tested, so the no-bruise height lies below it. A 44 N load held 1 min (loads went up to 225 N), and vibration at 6 Hz and 1 g for 5 min, also bruised.",
  source: 'vergano-1991-peach-bruising',
};

/**
 * The only peach modulus and Poisson's ratio read with their figures: a
 * compression test of peach samples that fed a finite-element drop simulation (cultivar not named).
 */
const PEACH_FE = (where: string): SeedValue[] => {
  const common = {
    method:
      'Compression test of peach samples (whole fruit or specimens not stated in the abstract); the figures fed a finite-element drop simulation',
    source: 'stone-peach-fe-drop-test',
  };
  return [
    {
      quantity: 'youngs_modulus',
      variant: 'apparent',
      value: 0.89,
      ...common,
      note: `Published as a modulus of elasticity of 0.89 N/mm² (= MPa). Filed as apparent (whole fruit): the abstract's "specific deformation" (10.9 %) is the term such studies use for whole-fruit compression, but it does not say so. ${where} Earlier typical value (2 MPa, from memory) removed.`,
    },
    {
      quantity: 'poisson_ratio',
      value: 0.29,
      ...common,
      note: `Published Poisson's ratio 0.29, from the compression test. ${where} It replaces the typical 0.45 that finite-element studies commonly assume.`,
    },
  ];
};

/**
 * The static friction of nectarine 'Independence' on aluminium and wood (the galvanised-sheet
 * figure is not in the abstract): the only stone-fruit friction read, put first so the squeeze
 * (aluminium, a rigid pad) and the bin wall (wood) take it before the typical values below.
 */
const independenceFriction = (note: string): SeedValue[] =>
  (
    [
      [
        'aluminium',
        0.321,
        'the lowest of the three surfaces tested (wood, aluminium, galvanised sheet)',
      ],
      ['wood', 0.389, 'the highest of the three surfaces tested'],
    ] as const
  ).map(([variant, value, which]) => ({
    quantity: 'friction_coefficient',
    variant,
    value,
    method: 'Static coefficient of friction, whole fruit on the surface',
    note: `Static coefficient, ${which}. ${note}`,
    source: NECTARINE,
  }));

export const STONE_FRUIT: SeedCommodity[] = [
  {
    slug: 'peach',
    name: 'Peach',
    family: 'Stone fruit',
    botanicalName: 'Prunus persica',
    cultivars: [
      {
        slug: 'peach-type',
        name: 'Peach (commodity record)',
        isType: true,
        values: [
          ...PEACH_FE(
            'Measured on peach samples, cultivar not named: the commodity-general figure.',
          ),
          {
            quantity: 'density',
            value: 1240,
            note: "Measured on 'Tabrizi' (1.24 g/cm³); the commodity record takes it as typical of peach. High for a watery fruit: the nectarine 'Independence' was 990 kg/m³ in another study.",
            source: 'stone-emadi-2011-peach-tabrizi',
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 61.1,
            note: "Measured on 'Tabrizi': big, medium and small diameters 61.1, 60.29 and 59.21 mm. The abstract does not say which is the axial one; the largest is stored as equatorial and the smallest as axial (our assignment).",
            source: 'stone-emadi-2011-peach-tabrizi',
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 59.21,
            note: "Measured on 'Tabrizi' (smallest of the three diameters; see the equatorial note for the assignment).",
            source: 'stone-emadi-2011-peach-tabrizi',
          },
          {
            quantity: 'mass',
            value: 137.37,
            note: "Measured on 'Tabrizi'; the commodity record takes it as typical of peach.",
            source: 'stone-emadi-2011-peach-tabrizi',
          },
          typical(
            'static_bruise_threshold',
            '',
            100,
            30,
            250,
            'from memory',
            "No peach static bruise pressure, bioyield or failure stress found (searched: 'peach bruise threshold', 'Dixred peach rupture stress', 'peach failure stress bioyield kPa', 'peach fruit static compression bruise threshold pressure kPa', 'peach flesh bio-yield stress maturity', 'peach modulus of elasticity bioyield stress compression cultivar MPa', and in Chinese '桃 果肉 弹性模量 泊松比 屈服'). The finite-element peach study's 1.19 MPa at the maximum force is likely a contact stress (not stored). Published only as forces: a 44 N load held 1 min bruised peaches (Vergano et al. 1991; no contact area given), and 'Dixred' peaches could be packed 13–16 layers deep at harvest but only 4–6 after 28 days at 0 °C (stone-tubitak-2003-dixred-peach). Stored near the apple figure (100 kPa); ripe peaches bruise far lower.",
          ),
          ...independenceFriction(
            "Measured on the nectarine 'Independence' (Prunus persica var. nucipersica, the same species as peach), not on peach: no peach friction coefficient was found (searched: 'peach coefficient of friction rubber steel', 'peach cultivars physical properties static coefficient of friction galvanized rubber plywood', 'peach bulk density porosity static friction angle'); kept as the nearest published figure, as the nectarine record keeps the peach steel-plate drop.",
          ),
          ...typicalFriction(
            'peach',
            "The nearest measured figures are the nectarine 'Independence' at 0.321 (aluminium) to 0.389 (wood).",
          ),
          tableDrop(
            50,
            "For fruit whose weakest-point firmness is at least 10 kgf (× 9.80665 = 98.1 N, 8 mm tip): 10 kgf is the largest minimum among the 13 yellow-flesh peach cultivars of the table at 5 cm ('Rich Lady'); four cultivars needed no minimum at 5 cm. At 10 cm the minimum rose to 6–11 kgf.",
          ),
          {
            quantity: 'drop_threshold_height',
            variant: 'wood',
            value: 200,
            method: 'Drops of 20 cm onto a hard board 2.7 cm thick',
            probe: 'Magness–Taylor pressure tester (probe size not given)',
            observation: 'no-bruise',
            note: 'Measured on \'Sunago-wase\': fruit of flesh firmness above about 2 lb (× 4.4482 = 8.9 N) on the Magness–Taylor tester withstood a 20 cm drop onto the board without injury ("allowable flesh firmness"); softer fruit bruised. Surface published as a hard board, filed under wood. Bruises were most frequent at the stem end.',
            source: 'stone-tsukamoto-1979-peach',
          },
          VERGANO_STEEL,
          readyToEat('Peach'),
          typical(
            'bulk_density',
            '',
            520,
            430,
            620,
            'from memory',
            "No peach bulk density found (searched: 'peach bulk density physical properties', 'peach cultivars physical properties static coefficient of friction bulk density fruit density'). Published neighbours: apricot 'Sonnati Salmas' 443 kg/m³, kiwifruit 'Hayward' 575 kg/m³.",
          ),
          {
            ...typicalJanssenK(),
            note: `${typicalJanssenK().note} No angle of repose found for peach (searched: 'stone fruit angle of repose emptying filling peach apricot plum fruits', 'peach fruit physical properties coefficient of static friction angle of repose'); the typical ratio stays.`,
          },
        ],
      },
      {
        slug: 'peach-tabrizi',
        name: 'Tabrizi',
        values: [
          {
            quantity: 'mass',
            value: 137.37,
            note: 'Mean fruit mass; volume 107.37 cm³.',
            source: 'stone-emadi-2011-peach-tabrizi',
          },
          {
            quantity: 'density',
            value: 1240,
            note: 'Published as 1.24 g/cm³ (× 1000).',
            source: 'stone-emadi-2011-peach-tabrizi',
          },
          {
            quantity: 'diameter',
            value: 60.14,
            note: 'Arithmetic mean diameter; big, medium and small diameters 61.1, 60.29 and 59.21 mm; sphericity 96.05 %. Puncture "stiffness" 11.35 N without peel and 15.31 N with peel (probe not given in the abstract, so not stored as penetrometer firmness).',
            source: 'stone-emadi-2011-peach-tabrizi',
          },
        ],
      },
      {
        slug: 'peach-sunago-wase',
        name: 'Sunago-wase',
        values: [
          {
            quantity: 'drop_threshold_height',
            variant: 'wood',
            value: 200,
            method: 'Drops of 20 cm onto a hard board 2.7 cm thick',
            probe: 'Magness–Taylor pressure tester (probe size not given)',
            observation: 'no-bruise',
            note: 'No injury for fruit above about 2 lb (8.9 N) flesh firmness on the Magness–Taylor tester; softer fruit bruised. Surface published as a hard board, filed under wood.',
            source: 'stone-tsukamoto-1979-peach',
          },
        ],
      },
      {
        slug: 'peach-ohenry',
        name: "O'Henry",
        values: [
          {
            quantity: 'mass',
            value: 175,
            low: 125,
            high: 275,
            note: 'Size classes of the 1995 trial: large ≈ 275 g, medium ≈ 175 g, small ≈ 125 g; the medium class is stored. Also one of the five cultivars in which 31 cm drops onto steel often bruised (Vergano et al. 1991); at the 5 cm PVC-belt drop it needed at least 5 kgf (49 N, 8 mm tip) to avoid bruising (stone-crisosto-min-firmness-table).',
            source: 'stone-crisosto-1999-peach-size',
          },
        ],
      },
      ...(
        [
          ['peach-rich-may', 'Rich May', 9],
          ['peach-diamond-princess', 'Diamond Princess', 9],
          ['peach-summer-lady', 'Summer Lady', 8],
          ['peach-ryan-sun', 'Ryan Sun', 10],
        ] as const
      ).map(([slug, name, at10]) => ({
        slug,
        name,
        values: [
          tableDrop(
            50,
            `No minimum firmness was needed at 1 and 5 cm: fruit of any firmness tested did not bruise commercially. At 10 cm it needed at least ${at10} kgf (× 9.80665 = ${(at10 * 9.80665).toFixed(1)} N, 8 mm tip).`,
          ),
        ],
      })),
    ],
  },
  {
    slug: 'nectarine',
    name: 'Nectarine',
    family: 'Stone fruit',
    botanicalName: 'Prunus persica var. nucipersica',
    cultivars: [
      {
        slug: 'nectarine-type',
        name: 'Nectarine (commodity record)',
        isType: true,
        values: [
          ...PEACH_FE(
            "Measured on peach (the same species, Prunus persica), not on nectarine: no nectarine modulus, Poisson's ratio or tissue stress was found (searched: 'nectarine modulus elasticity', 'nectarine Independence physical properties', 'nectarine physical mechanical properties friction bulk density modulus'); kept here as the nearest published figure, as this record keeps the peach steel-plate drop. The 'Independence' study gives only a break force (58.9 N at 10 mm deformation, 0.3 J).",
          ),
          {
            quantity: 'density',
            value: 990,
            note: 'Measured on \'Independence\'; the commodity record takes it as typical of nectarine. Published as 0.99 with the unit misprinted "g/N"; read as g/cm³ (× 1000).',
            source: NECTARINE,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 61,
            note: "Measured on 'Independence': largest diameter 61 mm, mean 59, smallest 57. The abstract does not name the axes; the largest is stored as equatorial, the smallest as axial (our assignment).",
            source: NECTARINE,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 57,
            note: "Measured on 'Independence' (smallest diameter; see the equatorial note).",
            source: NECTARINE,
          },
          {
            quantity: 'mass',
            value: 97.74,
            note: "Measured on 'Independence'; the commodity record takes it as typical of nectarine.",
            source: NECTARINE,
          },
          typical(
            'static_bruise_threshold',
            '',
            100,
            30,
            250,
            'from memory',
            "No nectarine static bruise pressure, bioyield or failure stress found (searched: 'nectarine bruise threshold', 'nectarine physical mechanical properties', 'nectarine impact bruising threshold drop height cultivars', 'nectarine cultivar flesh Young's modulus compression'). Taken as for peach.",
          ),
          ...independenceFriction(
            "Measured on 'Independence'; the commodity record takes it as typical of nectarine.",
          ),
          ...typicalFriction(
            'nectarine',
            "Measured on 'Independence' only against aluminium (0.321) and wood (0.389); galvanised sheet was tested but its figure is not in the abstract.",
          ),
          tableDrop(
            50,
            "For fruit whose weakest-point firmness is at least 12 kgf (× 9.80665 = 117.7 N, 8 mm tip): the largest minimum among the 12 yellow-flesh nectarine cultivars of the table at 5 cm ('August Red'); 'Summer Fire' and 'September Red' needed none.",
          ),
          {
            ...VERGANO_STEEL,
            note: `Measured on peach (the same species, Prunus persica), not on nectarine: kept here as the nearest published steel-plate figure. ${VERGANO_STEEL.note}`,
          },
          readyToEat('Nectarine'),
          typical(
            'bulk_density',
            '',
            520,
            430,
            620,
            'from memory',
            "No nectarine bulk density found (searched: 'nectarine bulk density'). As for peach.",
          ),
          {
            ...typicalJanssenK(),
            note: `${typicalJanssenK().note} No angle of repose found for nectarine (searched: 'stone fruit angle of repose emptying filling peach apricot plum fruits', 'nectarine fruit physical properties coefficient of static friction angle of repose'); the typical ratio stays.`,
          },
        ],
      },
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
            quantity: 'density',
            value: 990,
            note: 'Published as 0.99 with the unit misprinted "g/N"; read as g/cm³ (× 1000). Break force 58.9 N at 10 mm deformation, fracture energy 0.3 J (not stored: no contact area).',
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
      ...(
        [
          ['nectarine-summer-fire', 'Summer Fire', 9],
          ['nectarine-september-red', 'September Red', 10],
        ] as const
      ).map(([slug, name, at10]) => ({
        slug,
        name,
        values: [
          tableDrop(
            50,
            `No minimum firmness was needed at 1 and 5 cm. At 10 cm it needed at least ${at10} kgf (× 9.80665 = ${(at10 * 9.80665).toFixed(1)} N, 8 mm tip).`,
          ),
        ],
      })),
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
        name: 'Plum (commodity record)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'apparent',
            value: 0.15,
            low: 0.1,
            high: 0.25,
            stage: 'ripe',
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
            stage: 'ripe',
            method: 'Apparent modulus under a cylindrical probe, universal testing machine',
            probe: '4 mm cylindrical probe (recalculated), 1 N force',
            ripeness: 'Eating ripeness',
            note: 'The same firmness range recalculated for a 4 mm probe, optimum 0.120 MPa: the probe size changes the apparent modulus.',
            source: PLUM,
          },
          poisson('plum'),
          typical(
            'density',
            '',
            1050,
            950,
            1150,
            'from memory',
            "No plum density found (searched: 'plum fruit physical properties true density', 'plum physical properties true density bulk density porosity sphericity static friction', 'plum cultivars physical properties bulk density static coefficient of friction angle of repose'). Whole watery fruit are close to water; stone fruit with a stone slightly above.",
          ),
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 35.48,
            low: 20.05,
            high: 35.48,
            note: "Fruit diameters of nine local plum varieties of Tokat province, Turkey, ranged from 20.05 to 35.48 mm (variety means; the varieties at the ends are not named in the abstract). The largest is stored, as the mass is. Small local plums: the Californian Japanese plums of this record ('Fortune', 'Angeleno', …) are larger; a smaller diameter gives the squeeze a higher contact pressure for the same force.",
            source: GUNES,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 34.29,
            low: 22.83,
            high: 34.29,
            note: 'Fruit lengths of the same nine local varieties ranged from 22.83 to 34.29 mm; the largest is stored (see the equatorial note).',
            source: GUNES,
          },
          {
            quantity: 'mass',
            value: 25.18,
            low: 5.23,
            high: 25.18,
            note: "Fruit weights of the same nine local varieties ranged from 5.23 to 25.18 g; the largest is stored, the conservative end for drop and stack loads among them. Commercial Japanese plums run far heavier (not measured here): enter the fruit's own mass for them.",
            source: GUNES,
          },
          typical(
            'static_bruise_threshold',
            '',
            100,
            30,
            250,
            'from memory',
            "No plum static bruise pressure found (searched: 'plum bruise threshold', 'plum rupture force modulus', 'plum fruit bioyield point stress compression cultivar', 'plum impact bruising pendulum drop height bruise volume'). Plums are described as having low bruising susceptibility (Crisosto, Horticulturae 9:682, 2023, abstract); stored as for peach.",
          ),
          ...typicalFriction('plum', ''),
          tableDrop(
            100,
            "For fruit whose weakest-point firmness is at least 3 kgf (× 9.80665 = 29.4 N, 8 mm tip): 'Fortune', 'Royal Diamond' and 'Angeleno' needed no minimum at any of the three heights, 'Blackamber' needed 3 kgf at 10 cm.",
          ),
          typical(
            'drop_threshold_height',
            'steel',
            100,
            50,
            300,
            'from memory',
            "No plum drop onto steel found (searched: 'plum drop height bruise', 'plum impact bruising pendulum drop height bruise volume cultivar'). Plums bruise less than peaches (no minimum firmness needed at 10 cm onto a PVC belt for three of four cultivars), and peaches often bruise from 31 cm onto steel; 100 mm is stored. A recalled typical, not an observation.",
          ),
          typical(
            'bulk_density',
            '',
            560,
            450,
            650,
            'from memory',
            "No plum bulk density found (searched: 'plum bulk density', 'plum physical properties true density bulk density porosity'). Published neighbours: apricot 443, kiwifruit 575 kg/m³.",
          ),
          {
            ...typicalJanssenK(),
            note: `${typicalJanssenK().note} No angle of repose found for plum (searched: 'stone fruit angle of repose emptying filling peach apricot plum fruits', 'plum fruit physical properties coefficient of static friction angle of repose'); the typical ratio stays.`,
          },
        ],
      },
      ...(
        [
          ['plum-fortune', 'Fortune'],
          ['plum-royal-diamond', 'Royal Diamond'],
          ['plum-angeleno', 'Angeleno'],
        ] as const
      ).map(([slug, name]) => ({
        slug,
        name,
        values: [
          tableDrop(
            100,
            'No minimum firmness was needed at any of the three heights (1, 5 and 10 cm): fruit of any firmness tested did not bruise commercially from 10 cm. Weakest point: shoulder.',
          ),
        ],
      })),
      {
        slug: 'plum-blackamber',
        name: 'Blackamber',
        values: [
          tableDrop(
            50,
            'No minimum firmness was needed at 1 and 5 cm; at 10 cm it needed at least 3 kgf (× 9.80665 = 29.4 N, 8 mm tip). Weakest point: tip.',
          ),
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
        slug: 'apricot-type',
        name: 'Apricot (commodity record)',
        isType: true,
        values: [
          typical(
            'youngs_modulus',
            'apparent',
            1,
            0.2,
            4,
            'from memory',
            "No apricot modulus with its figure found (searched: 'apricot modulus of elasticity MPa', 'Hazbavi apricot rupture force'). Apricots soften fast (about 3 lbf a day at 20 °C, UC Davis sheet copy on water-foods.com); cf. plum at eating ripeness 0.10–0.25 MPa.",
          ),
          poisson('apricot'),
          {
            quantity: 'density',
            value: 940.7,
            note: "Measured on 'Sonnati Salmas' (true density at 82.34 % moisture, wet basis); the commodity record takes it as typical of apricot.",
            source: 'ahmadi-2009-apricot',
          },
          typical(
            'diameter',
            'equatorial',
            50,
            40,
            65,
            'from memory',
            'No apricot equatorial or axial diameter found. Geometric mean diameters of 13 cultivars in Serbia ran 41.76–65.08 mm (stone-milosevic-2014-apricot-size, abstract); the band follows them.',
          ),
          typical(
            'diameter',
            'axial',
            50,
            40,
            65,
            'from memory',
            'As for the equatorial diameter.',
          ),
          {
            quantity: 'diameter',
            value: 65.08,
            low: 41.76,
            high: 65.08,
            note: "Geometric mean diameter: cultivar means ranged from 41.76 to 65.08 mm across the 13 cultivars and selections (the ends are not named in the abstract; 'Roksana' had the highest values for most attributes). The largest is stored, matching the mass. Axes not given: the equatorial and axial diameters below stay typical values.",
            source: 'stone-milosevic-2014-apricot-size',
          },
          {
            quantity: 'mass',
            value: 81.6,
            low: 37.09,
            high: 81.6,
            note: 'Mean fruit mass ranged from 37.09 to 81.60 g across 13 cultivars and selections (the cultivars at the ends are not named in the abstract). The largest cultivar mean is stored: the conservative one for drop and stack loads.',
            source: 'stone-milosevic-2014-apricot-size',
          },
          typical(
            'static_bruise_threshold',
            '',
            60,
            20,
            150,
            'from memory',
            "No apricot static bruise pressure, bioyield or failure stress found (searched: 'apricot bruise threshold', 'apricot rupture force'). Published only as forces: rupture force 7.0–10.1 N by axis ('Sonnati Salmas'), 6.5 N (Hazbavi, CIGR Journal, box height below 49.5 cm). Apricots are called very susceptible to bruising when soft.",
          ),
          ...typicalFriction(
            'apricot',
            "'Sonnati Salmas' fruit were tested on wood, glass, galvanised sheet and fibreglass, but the fruit figures are not in the abstract.",
          ),
          typical(
            'drop_threshold_height',
            'steel',
            100,
            20,
            300,
            'from memory',
            "No apricot drop threshold found (searched: 'apricot drop height bruise', 'apricot bruise susceptibility'). Apricots bruise more readily than peaches, which often bruise from 31 cm onto steel. A recalled typical, not an observation.",
          ),
          typical(
            'drop_threshold_height',
            'plastic',
            50,
            10,
            100,
            'from memory',
            'As for steel; on a PVC belt peaches and nectarines of adequate firmness survived 5 cm (stone-crisosto-min-firmness-table). A recalled typical, not an observation.',
          ),
          {
            quantity: 'bulk_density',
            value: 443.2,
            note: "Measured on 'Sonnati Salmas' at 82.34 % moisture (wet basis); porosity 52.87 %.",
            source: 'ahmadi-2009-apricot',
          },
          {
            ...typicalJanssenK(),
            note: `${typicalJanssenK().note} No angle of repose found for apricot (searched: 'stone fruit angle of repose emptying filling peach apricot plum fruits', 'apricot fruit physical properties coefficient of static friction angle of repose'); the typical ratio stays.`,
          },
        ],
      },
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
            note: 'Bulk density of the fruit at 82.34 % moisture (wet basis). Rupture force of the fruit 10.11 N through the length, 7.98 N through the width, 7.01 N through the thickness (forces, not stored as stresses).',
            source: 'ahmadi-2009-apricot',
          },
          typicalJanssenK(),
        ],
      },
    ],
  },
];
