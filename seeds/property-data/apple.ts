import type { SeedCommodity, SeedValue } from './types';
import { frictionFromAngle, storageModulus, typicalJanssenK } from './value-helpers';

const SELCUK = 'selcuk-1992-apple-poisson';
const STORAGE_STUDY = 'tjaf-pear-apple-storage';
const CHAKESPARI = 'gorji-chakespari-apple-compression';
const GOLAB = 'meisami-asl-golab';
const SLUPSKA = 'pome-slupska-2022-apple-drops';
const VURSAVUS = 'pome-vursavus-1999-apple';
const KJFP = 'pome-kjfp-apple-size';
const WA_GRADES = 'pome-wa-apple-grades';
const STORED_TENSILE = 'pome-stored-apples-tensile';
const ARSHAD = 'pome-arshad-2017-apple-geometry';
const FUJI_PICKING = 'pome-apple-picking-damage-fuji';
const LULI_DEM = 'pome-scau-luli-apple-dem';
const LULI_METHOD =
  'Inclined-plane and rolling tests combined with DEM simulation (calibrated static friction), checked by a bottomless-cylinder lifting test';

/** Ultimate tensile strength of flesh specimens, at harvest and after 18 weeks in cool store. */
const storedTensile = (): SeedValue[] =>
  [
    { value: 250, low: 200, high: 300, storage: 'Straight after harvest (start of cool storage)' },
    { value: 10, storage: 'After 18 weeks in cool store' },
  ].map((v) => ({
    quantity: 'failure_stress' as const,
    ...v,
    method: 'Ultimate tensile strength of flesh specimens (tension, not compression)',
    note: "Published as 200–300 kPa at the start, falling to 10 kPa after 18 weeks, across 'Granny Smith', 'Delicious' and 'Jonathan' (not split by cultivar in the abstract); the first value is the middle of the range. Tensile strength, lower than a compressive failure stress, so a check using it errs on the safe side. Bruise resistance of whole fruit under slow and impact compression stayed fairly constant over storage.",
    source: STORED_TENSILE,
  }));

/** Washington minimum pressure at shipment, published in pounds-force (1 lbf = 4.4482216 N). */
const waMinimumFirmness = (lbf: number, newtons: number): SeedValue => ({
  quantity: 'penetrometer_firmness',
  variant: '11.1 mm',
  value: newtons,
  method: 'Pressure (penetrometer) test for the Washington grade, at the time of shipment',
  note: `A grade minimum, not a measured mean: published as ${lbf} lb internal pressure, × 4.4482216 = ${newtons} N (10 % tolerance allowed). The page does not name the probe; apples are tested with the 7/16-inch (11.1 mm) plunger (WSU TFREC, Measuring fruit firmness with a penetrometer).`,
  source: WA_GRADES,
});

/** Apparent modulus of the Turkish four-cultivar study (8 mm die, 6 mm/min). */
const vursavusModulus = (value: number, note: string): SeedValue => ({
  quantity: 'youngs_modulus',
  variant: 'apparent',
  value,
  method: 'Whole-fruit compression with an 8 mm diameter die (Instron 4300)',
  loadingRate: '6 mm/min',
  note,
  source: VURSAVUS,
});

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
      values: [konyaPoisson(0.382, "Named 'Golden' in the abstract."), waMinimumFirmness(10, 44.5)],
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
          source: GOLAB,
        },
        {
          quantity: 'diameter',
          value: 53.5,
          low: 35.14,
          high: 65.04,
          note: 'Published as the maximum, average and minimum diameters of the sample; the abstract does not say which axis, so no equatorial/axial variant is given.',
          source: GOLAB,
        },
        {
          quantity: 'density',
          value: 742.7,
          note: "Published as 0.7427 g/cm³, the 'density' of 'an apple pile' (× 1000 = kg/m³). Read as the fruit's own density: the published mean mass and volume give 74.87 g / 104.5 cm³ = 0.716 g/cm³, close to it.",
          source: GOLAB,
        },
        {
          quantity: 'bulk_density',
          value: 240.1,
          note: "Published as the 'apparent density' of 'an apple pile', 0.2401 g/cm³ (× 1000 = kg/m³). Caution: the same abstract gives a porosity of 54.13 %, which with 742.7 kg/m³ would imply about 340 kg/m³; the label is ambiguous, and these are small (75 g) fruit.",
          source: GOLAB,
        },
        frictionFromAngle('galvanised steel', 20, GOLAB),
        frictionFromAngle('glass', 26.3, GOLAB),
        frictionFromAngle('plywood', 26.8, GOLAB),
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
      slug: 'apple-braeburn',
      name: 'Braeburn',
      values: [
        vursavusModulus(
          4.88,
          "Published as 4.88 N/mm² (= MPa), the highest of the four cultivars tested; bruise damage in the study's impact test rose as the modulus fell.",
        ),
      ],
    },
    {
      slug: 'apple-granny-smith',
      name: 'Granny Smith',
      values: [
        vursavusModulus(
          2.37,
          "Published as 2.37 N/mm² (= MPa), the lowest of the four cultivars tested; 'Granny Smith' was the most susceptible to bruise damage in the study's impact test.",
        ),
        ...storedTensile(),
      ],
    },
    {
      slug: 'apple-fuji',
      name: 'Fuji',
      values: [
        {
          quantity: 'youngs_modulus',
          variant: 'flesh',
          value: 2.091,
          method: 'Compression of flesh cubes on a CMT6502 universal testing machine',
          ripeness: 'Ripe (mature) fruit',
          note: "Published for 'Red Fuji' as the compressive elastic modulus, 2.091 MPa, from a compression model of the cubes; the abstract adds that the modulus stayed within 5–7 MPa while the cubes were compressed (a tangent figure, not stored).",
          source: FUJI_PICKING,
        },
        {
          quantity: 'bioyield_stress',
          value: 125,
          method: 'Compression of flesh cubes on a CMT6502 universal testing machine',
          ripeness: 'Ripe (mature) fruit',
          note: "Published for 'Red Fuji' as the lower yield limit, 0.125 MPa (× 1000 = 125 kPa), beyond which the cubes deformed faster; the maximum elastic limit was 0.130 MPa. Flesh specimens, not whole fruit.",
          source: FUJI_PICKING,
        },
        {
          quantity: 'mass',
          value: 267,
          low: 174,
          high: 409,
          samples: 3,
          method: 'Fruit weighed by size class (apples per 15 kg box)',
          note: 'Size class 5D (50–59 apples per 15 kg), the middle class; the range runs from class 8D (174 g) to 3D (409 g). Mean of three determinations (Table 1).',
          source: KJFP,
        },
        {
          quantity: 'density',
          value: 878,
          low: 847,
          high: 885,
          method: 'Fruit mass over fruit volume (Table 1)',
          note: 'Derived: size class 5D weighs 267 g for a volume of 304 mL, 267 / 304 = 0.878 g/mL = 878 kg/m³. The range is from the published specific volumes of the Fuji classes, 1.13–1.18 mL/g (1/1.18 = 0.847, 1/1.13 = 0.885 g/mL).',
          source: KJFP,
        },
      ],
    },
    {
      slug: 'apple-red-delicious',
      name: 'Red Delicious',
      values: [waMinimumFirmness(12, 53.4), ...storedTensile()],
    },
    {
      slug: 'apple-gala',
      name: 'Gala',
      values: [waMinimumFirmness(11, 48.9)],
    },
    {
      slug: 'apple-jonagold',
      name: 'Jonagold',
      values: [waMinimumFirmness(11, 48.9)],
    },
    {
      slug: 'apple-luli',
      name: 'Luli',
      values: [
        {
          quantity: 'friction_coefficient',
          variant: 'foam',
          value: 0.46,
          method: LULI_METHOD,
          note: "Published for 'Luli' (鲁丽) apples against a super-high-density foam (特高密度泡棉), a calibrated DEM static friction coefficient. Taken first as the lower of the two foams (the harsher figure for a grip that must not slip); against a high-density foam 0.61 (below). Foam kinds and thicknesses are not given in the abstract.",
          source: LULI_DEM,
        },
        {
          quantity: 'friction_coefficient',
          variant: 'foam',
          value: 0.61,
          method: LULI_METHOD,
          note: "Published for 'Luli' apples against a high-density foam (高密度泡棉), a calibrated DEM static friction coefficient.",
          source: LULI_DEM,
        },
        {
          quantity: 'friction_coefficient',
          variant: 'fruit',
          value: 0.42,
          method: LULI_METHOD,
          note: "Published for 'Luli' apples against each other (apple particle models), a calibrated DEM static friction coefficient; the same study gives apple–apple restitution 0.65 and rolling friction 0.032.",
          source: LULI_DEM,
        },
      ],
    },
    {
      slug: 'apple-type',
      name: 'Apple (commodity record)',
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
          value: 878,
          low: 847,
          high: 885,
          method: 'Fruit mass over fruit volume, by size class',
          note: "Measured on 'Fuji'; the commodity record takes it as typical of apple. Derived: 267 g / 304 mL = 0.878 g/mL (size class 5D); range from the published specific volumes 1.13–1.18 mL/g. Taken first because it is whole commercial fruit; the 'Golab' figure below is for small (75 g) fruit and its label is ambiguous.",
          source: KJFP,
        },
        {
          quantity: 'density',
          value: 742.7,
          note: "Measured on 'Golab' (0.7427 g/cm³, the 'density' of 'an apple pile'); kept beside the 'Fuji' figure, which it undercuts by 15 %.",
          source: GOLAB,
        },
        {
          quantity: 'density',
          value: 825,
          low: 800,
          high: 850,
          note: 'Apple flesh, recalled as 800–850 kg/m³; the value is the middle.',
          source: 'mohsenin-1986',
        },
        {
          quantity: 'diameter',
          variant: 'equatorial',
          value: 66,
          low: 65,
          high: 67,
          samples: 270,
          method:
            'Fruit width measured on 270 fruits (3 cultivars × 3 tree ages × 2 canopy positions)',
          note: "Published as a width of 6.5–6.7 cm (× 10 = 65–67 mm), the range of the means over 'Golden Delicious', 'Red Crispy' and 'Red Delicious', tree ages and sun/shade sides; the commodity record takes the middle as typical of apple. Thickness (the other cross axis) 6.3–6.6 cm.",
          source: ARSHAD,
        },
        {
          quantity: 'diameter',
          variant: 'axial',
          value: 61,
          low: 60,
          high: 62,
          samples: 270,
          method: 'Fruit length (stem–calyx) measured on 270 fruits',
          note: "Published as a length of 6.0–6.2 cm (× 10 = 60–62 mm) over 'Golden Delicious', 'Red Crispy' and 'Red Delicious'; the value is the middle. Apples are a little shorter than wide here (aspect ratio 0.91–0.95).",
          source: ARSHAD,
        },
        {
          quantity: 'mass',
          value: 135.5,
          low: 134,
          high: 137,
          samples: 270,
          note: "Published as a weight of 134–137 g over 'Golden Delicious', 'Red Crispy' and 'Red Delicious' (the same fruits as the diameters above, so size and mass agree); the value is the middle. Taken before the 'Fuji' class figure below, which is for larger fruit.",
          source: ARSHAD,
        },
        {
          quantity: 'mass',
          value: 267,
          low: 174,
          high: 409,
          method: 'Fruit weighed by size class',
          note: "Measured on 'Fuji'; the commodity record takes it as typical of apple. Middle size class 5D; range over the classes 8D–3D.",
          source: KJFP,
        },
        frictionFromAngle(
          'galvanised steel',
          20,
          GOLAB,
          "Measured on 'Golab'; the commodity record takes it as typical of apple.",
        ),
        frictionFromAngle(
          'plywood',
          26.8,
          GOLAB,
          "Measured on 'Golab'; the commodity record takes it as typical of apple (the bin wall figure).",
        ),
        frictionFromAngle(
          'glass',
          26.3,
          GOLAB,
          "Measured on 'Golab'; the commodity record takes it as typical of apple.",
        ),
        {
          quantity: 'friction_coefficient',
          variant: 'rubber',
          value: 0.55,
          low: 0.4,
          high: 0.8,
          note: "Typical value, not published here: Puchalski et al. (Int. Agrophys. 2001, 2002) measured 'Gala' and 'McLemore' apples on rubber and plastic, but the coefficients are not in the abstracts read. Searched: 'apple coefficient of friction rubber steel plastic', 'static and dynamic coefficient of friction apple rubber plastic masonite'. Wide band: friction rose with ripeness and varied with humidity in those studies.",
          isTypicalDefault: true,
          typicalBasis: 'from memory',
          source: null,
        },
        {
          quantity: 'friction_coefficient',
          variant: 'plastic',
          value: 0.35,
          low: 0.25,
          high: 0.5,
          note: "Typical value, not published here (searched as for rubber; the Puchalski et al. plastic values are not in the abstracts). An Iranian four-cultivar study (Atirli, Kapak, Kowse, Paiez; IJABBR) found PVC the lowest of its surfaces, without values in the abstract; 0.35 sits just below the published galvanised-steel 0.364 for 'Golab'.",
          isTypicalDefault: true,
          typicalBasis: 'from memory',
          source: null,
        },
        {
          quantity: 'drop_threshold_height',
          variant: 'foam',
          value: 50,
          observation: 'no-bruise',
          method:
            'Free fall from 10 to 150 mm in 10 mm steps onto wood, concrete, corrugated cardboard and foam',
          note: "Measured on 'Idared', 'Golden Delicious' and 'Jonagold'; the commodity record takes it as typical of apple. 'The foam protected apples from bruising up to a drop height of 50 mm'; the foam's kind and thickness are not in the abstract. On wood and concrete (which behaved alike) and on cardboard no no-bruise height is given in the abstract. 'Idared' was the most resistant, 'Jonagold' the least.",
          source: SLUPSKA,
        },
        {
          quantity: 'drop_threshold_height',
          variant: 'rigid plate',
          value: 20,
          low: 10,
          high: 30,
          observation: 'recommended-max',
          note: "Typical value, not published: no no-bruise drop height onto a named hard surface was readable. Found: 30 mm estimated as not causing plastic deformation on a pendulum, surface not named (Komarnicki & Stopa 2013); per-cultivar heights for a 100 mm² bruise onto steel, rubber, plastic not in the abstract (Pang et al. 1994, range 6–143 mm); no bruise at 22 N on bare aluminium ('Jazz', Fu et al. 2017), a force; about 0.08 J onset, impactor not named ('Royal Gala', student report); 1400 mm onto metal bruised (Unuigbe & Onuoha), too high to guide. 20 mm is kept below the 30 mm estimate. Searched in 2026-12: 'apple bruise threshold drop height steel no bruising critical height', 'Jonagold apple bruise threshold impact energy pendulum', 'apples should not be dropped more than inches onto hard surfaces', '苹果 跌落 损伤 临界跌落高度 钢板': a 'Gala' drop-bruise boundary study (Trans. CSAE 2008) gives no value in its abstract; the WSU 4-inch guide is for pears only.",

          isTypicalDefault: true,
          typicalBasis: 'from memory',
          source: null,
        },
        {
          quantity: 'bulk_density',
          value: 480,
          low: 350,
          high: 600,
          note: "Typical value, not published for commercial fruit: the only published figure read, 240.1 kg/m³ ('apparent density' of a pile of small 'Golab' apples), is ambiguous and kept on that cultivar. Searched: 'apple bulk density bin kg/m3', 'apple physical properties bulk density porosity'. 480 kg/m³ is about 0.55 × the 'Fuji' fruit density 878 kg/m³, i.e. a bin porosity near 45 % (the 'Golab' study reports 50–57 %). Also searched in 2026-12: 'apple fruit bulk density kg m-3 porosity true density cultivars physical properties', 'Golab Kohanz Shafi Abadi bulk density fruit density coefficient of static friction', 'Redspar Delbarstival apple density bulk density static coefficient of friction': Gorji Chakespari et al. (J. Agric. Sci. 2(3):61, 2010) measured bulk density of 'Golab Kohanz' and 'Shafi Abadi', values not in the part read.",
          isTypicalDefault: true,
          typicalBasis: 'from memory',
          source: null,
        },
        {
          ...typicalJanssenK(),
          note: `${typicalJanssenK().note} No published angle of repose of apples was found to derive it from. Searched in 2026-12: 'apple fruit angle of repose physical properties', 'apple discrete element calibration angle of repose Fuji static friction coefficient', 'Calibrating and simulating contact parameters of the discrete element for apple particles stacking angle' (Zhang et al., Trans. CSAE 40(12), 2024: a stacking-angle calibration of 'Red Fuji', 'Hua Niu' and 'Golden Delicious', its measured angle not in the part of the abstract read), '苹果 离散元 接触参数 标定 堆积角 红富士'.`,
        },
      ],
    },
  ],
};
