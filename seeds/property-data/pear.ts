import type { SeedCommodity, SeedValue } from './types';
import { storageModulus, typicalJanssenK, typicalValue } from './value-helpers';

const STORAGE_STUDY = 'tjaf-pear-apple-storage';
const UCD_BARTLETT = 'pome-ucd-bartlett';
const WSU_PEAR_IMPACT = 'pome-wsu-pear-impact';
const SU_PEAR = 'pome-ouyang-2019-su-pear';
const SU_METHOD =
  'Cylindrical flesh specimens in compression, with and without lateral confinement (true stress–strain)';
const LBF = 4.4482216;

/** A typical pear value kept where nothing published could be read (see its note). */
const typical = (v: Omit<SeedValue, 'isTypicalDefault' | 'typicalBasis' | 'source'>): SeedValue =>
  typicalValue(v, 'from memory');

const PEAR_FRICTION_NOTE =
  "Typical value, not published here: Öztürk et al. 2009 measured the static friction of 'Deveci' and 'Santa Maria' pears, but the coefficients are not in the abstract read. Searched: 'pear physical properties density bulk density friction coefficient cultivar', 'pear fruit length width mass true density static coefficient of friction rubber plywood galvanized'; in 2026-12 also 'pear fruit physical properties angle of repose coefficient of friction', 'some physical properties of pear fruit cultivars true density static coefficient of friction plywood galvanized', 'Iranian pear variety Shahmiveh Natanzi Spadona physical mechanical properties', '梨 果实 物理特性 休止角 密度 摩擦系数'. A DEM calibration of four Chinese pears (Snow, Crisp, Huangguan, Qiuyue; Agronomy 12(7):1720, 2022) calibrates pear–steel friction, but its values are not in the part of the abstract read.";

const PEAR_DROP_NOTE =
  "Typical value, not published: no pear no-bruise drop height onto a named surface could be read. Found: 'Bartlett' share bruised 40 % at 10 cm rising to 100 % at 41 cm, surface not named (Mitchell, read second-hand); 3-inch (76 mm) drops cause substantial bruising of 'Bartlett' (California Agriculture 54(3), 2000; its 'about 8 mm' is a slip), surface not named; all 'Williams' and 'Ankara' fruit bruised in 10–20 cm pendulum drops, impactor not named (Turk. J. Agric. For.); Stropek & Gołacki 2020 (rigid plate) give no no-bruise velocity in the part read; Celik 2017 simulated 0.25–1 m drops onto steel, wood, rubber. Pathare et al. 2021, Sinobas et al. 1991 and Acta Agroph. 25(4) 2018 (glass ball, 20–80 cm) dropped an impactor onto the fruit, with no no-bruise level stated.";

export const PEAR: SeedCommodity = {
  slug: 'pear',
  name: 'Pear',
  family: 'Pome fruit',
  botanicalName: 'Pyrus communis',
  cultivars: [
    {
      slug: 'pear-williams',
      name: 'Williams',
      values: [
        ...storageModulus(1.68, 0.51, STORAGE_STUDY),
        {
          quantity: 'penetrometer_firmness',
          variant: '8 mm',
          value: 84.5,
          low: 84.5,
          high: 97.9,
          stage: 'firm',
          method: 'Penetrometer, 8 mm (5/16 inch) tip; California maturity standard',
          note: `Published as 'Bartlett' (the North American name of 'Williams'). The maximum flesh firmness allowed at harvest, 19.0–22.0 lbf depending on soluble solids (below 10 % to 12 %) and fruit size; no maximum at 13 % SSC or more. × ${LBF} = 84.5–97.9 N; the value is the strictest maximum, 19.0 lbf.`,
          source: UCD_BARTLETT,
        },
        {
          quantity: 'penetrometer_firmness',
          variant: '8 mm',
          value: 13.3,
          low: 8.9,
          high: 17.8,
          stage: 'ripe',
          method: 'Penetrometer, 8 mm (5/16 inch) tip',
          note: `Published as 'Bartlett': ripe pears for eating have a flesh firmness of 2–4 lbf; × ${LBF} = 8.9–17.8 N, the value is the middle (3 lbf).`,
          source: UCD_BARTLETT,
        },
      ],
    },
    { slug: 'pear-ankara', name: 'Ankara', values: storageModulus(1.34, 0.8, STORAGE_STUDY) },
    {
      slug: 'pear-deveci',
      name: 'Deveci',
      values: [
        {
          quantity: 'mass',
          value: 289.85,
          note: 'Average fruit mass.',
          source: 'ozturk-2009-pear',
        },
      ],
    },
    {
      slug: 'pear-santa-maria',
      name: 'Santa Maria',
      values: [
        {
          quantity: 'mass',
          value: 190.36,
          note: 'Average fruit mass.',
          source: 'ozturk-2009-pear',
        },
      ],
    },
    {
      slug: 'pear-suli',
      name: 'Suli',
      values: [
        {
          quantity: 'youngs_modulus',
          variant: 'flesh',
          value: 1.81,
          low: 0.619,
          high: 1.81,
          method: SU_METHOD,
          note: "Published for 'Su' pear (酥梨) as 6.19×10⁵, 9.63×10⁵, 1.28×10⁶, 1.56×10⁶ and 1.81×10⁶ Pa at compressive strains 0.02, 0.04, 0.06, 0.08 and 0.10 (÷ 10⁶ = MPa): the modulus rose with strain. The stiffest (strain 0.10) is taken, as it gives the highest contact pressure; the range covers the five.",
          source: SU_PEAR,
        },
        {
          quantity: 'poisson_ratio',
          value: 0.421,
          low: 0.314,
          high: 0.421,
          method: SU_METHOD,
          note: "Published for 'Su' pear (酥梨) as 0.421, 0.409, 0.391, 0.364 and 0.314 at compressive strains 0.02, 0.04, 0.06, 0.08 and 0.10: the ratio fell with strain. The small-strain value (0.02) is taken, the highest, which gives the stiffer contact.",
          source: SU_PEAR,
        },
      ],
    },
    {
      slug: 'pear-type',
      name: 'Pear (commodity record)',
      isType: true,
      values: [
        {
          quantity: 'bruise_susceptibility',
          variant: 'rigid plate',
          value: 3000,
          method:
            'Whole pears impacting a rigid plate, filmed at high speed; bruise volume against the energy the fruit absorbed',
          note: 'Published as a bruise susceptibility that rises with impact speed and levels off at about 3 cm³/J (= 3000 mm³/J) at the highest speeds, for two cultivars; the levelled value is stored, the harsher one. It is per absorbed energy: the drop check applies it to the whole impact energy, which overstates the bruise (on the safe side).',
          source: 'pome-stropek-golacki-2020-pear',
        },
        {
          quantity: 'youngs_modulus',
          variant: 'apparent',
          value: 1.68,
          low: 0.51,
          high: 1.68,
          method: 'Whole fruit compressed by a probe',
          probe: '8 mm diameter cylinder with a curved end',
          loadingRate: '7 mm/min',
          storage: 'Harvest day (range: harvest to 4 months of storage)',
          note: "Measured on 'Williams'; the commodity record takes it as typical of pear. The stiffest figure of the study ('Williams' at harvest) is taken, as it gives the highest contact pressure; the range covers 'Williams' 1.68 → 0.51 MPa and 'Ankara' 1.34 → 0.80 MPa over 4 months of storage.",
          source: STORAGE_STUDY,
        },
        {
          quantity: 'poisson_ratio',
          value: 0.421,
          low: 0.314,
          high: 0.421,
          method: SU_METHOD,
          note: "Measured on 'Su' pear (酥梨, a Chinese white pear); the commodity record takes it as typical of pear, the only pear Poisson's ratio read. 0.421 at strain 0.02 falling to 0.314 at 0.10; the small-strain value is taken. Apple flesh measured 0.38–0.39 (Konya study).",
          source: SU_PEAR,
        },
        typical({
          quantity: 'density',
          value: 1030,
          low: 1000,
          high: 1070,
          note: "Typical value, not published here: Öztürk et al. 2009 measured fruit density of 'Deveci' and 'Santa Maria', but the values are not in the abstract read. Pears sink in water, which is why packing-house immersion dumps use flotation salts (California Agriculture 54(3), 2000), so the density exceeds 1000 kg/m³. Also searched in 2026-12: 'some physical properties of pear fruit cultivars true density', 'pear fruit length width thickness geometric mean diameter sphericity true density mass cultivar', 'Simulation parameter calibration typical pear varieties discrete element elastic modulus Poisson density Huangguan' (the pear DEM study's intrinsic parameters are not in the part read).",
        }),
        {
          quantity: 'diameter',
          variant: 'equatorial',
          value: 63.5,
          note: "Published for 'Bartlett' ('Williams'); the commodity record takes it as typical of pear. The California maturity standard sorts fruit into diameter classes 2⅜–2½ in and over 2½ in; 2½ in × 25.4 = 63.5 mm, the boundary between them (2⅜ in = 60.3 mm).",
          source: UCD_BARTLETT,
        },
        typical({
          quantity: 'diameter',
          variant: 'axial',
          value: 85,
          low: 70,
          high: 110,
          note: "Typical value, not published here: Öztürk et al. 2009 measured fruit length, but the values are not in the abstract read. European pears are longer than wide; 85 mm is about 1.3 × the published 63.5 mm diameter class. Also searched in 2026-12: 'pear fruit length width thickness geometric mean diameter sphericity true density mass cultivar Turkey Santa Maria Williams' (a HortScience weight–diameter model for 'Williams' gives no length).",
        }),
        {
          quantity: 'mass',
          value: 240.1,
          low: 190.36,
          high: 289.85,
          note: "Range between 'Santa Maria' (190.36 g) and 'Deveci' (289.85 g); the value is the middle of the range.",
          source: 'ozturk-2009-pear',
        },
        typical({
          quantity: 'static_bruise_threshold',
          value: 70,
          low: 40,
          high: 120,
          note: "Typical value, not published: no static bruise threshold, bioyield or failure stress for pear could be read (Öztürk et al. give rupture forces 23.04–39.59 N, forces not stresses; the storage study gives bioyield forces without values in its abstract; Blahovec et al. test static bruising of nine varieties by hysteresis loss). Kept below the published apple value (100 kPa, Wang et al. 2024): pears are softer (ripe 'Bartlett' 2–4 lbf against 19–22 lbf at harvest). Searched: 'pear fruit compression bioyield stress failure stress', 'pear cultivars elastic modulus rupture stress'; in 2026-12 also 'Conference pear flesh compression modulus failure stress', 'Korla fragrant pear flesh elastic modulus failure stress', 'pear flesh Stropek Gołacki quasi-static compression yield', '梨 果肉 压缩 弹性模量 屈服强度 破坏应力', '砀山酥梨 压缩 弹性模量 生物屈服点': only texture (TPA) studies and relaxation or creep models ('Dangshan', 'Korla') without a yield stress.",
        }),
        typical({
          quantity: 'friction_coefficient',
          variant: 'rubber',
          value: 0.5,
          low: 0.35,
          high: 0.7,
          note: PEAR_FRICTION_NOTE,
        }),
        typical({
          quantity: 'friction_coefficient',
          variant: 'steel',
          value: 0.35,
          low: 0.25,
          high: 0.45,
          note: `${PEAR_FRICTION_NOTE} Close to the apple figure on galvanised steel (μ = tan 20° = 0.364, 'Golab').`,
        }),
        typical({
          quantity: 'friction_coefficient',
          variant: 'plastic',
          value: 0.3,
          low: 0.2,
          high: 0.45,
          note: PEAR_FRICTION_NOTE,
        }),
        {
          quantity: 'drop_threshold_height',
          variant: 'rigid plate',
          value: 101.6,
          observation: 'recommended-max',
          stage: 'firm',
          method: 'Handling guide for harvest, sorting, grading and packing',
          ripeness: 'Firm pears',
          note: "Published as 'pears should not be dropped more than 4 inches onto hard surfaces' (4 in × 25.4 = 101.6 mm); 'hard surfaces' is stored as 'rigid plate' (the material is not named). A guide's maximum for firm fruit, not a measured no-bruise height; the page adds that cold fruit is more sensitive and that ripening fruit bruise far more. It replaces the typical 20 mm kept before. Caution: California Agriculture 54(3), 2000 reports substantial bruising of 'Bartlett' from 3-inch (76 mm) drops onto a surface it does not name, below this maximum; the check takes this figure, the only one onto a named hard surface.",
          source: WSU_PEAR_IMPACT,
        },
        {
          quantity: 'drop_threshold_height',
          variant: 'fruit',
          value: 203.2,
          observation: 'recommended-max',
          stage: 'firm',
          method: 'Handling guide for harvest, sorting, grading and packing',
          ripeness: 'Firm pears',
          note: "Published as 'nor more than 8 inches upon other pears' (8 in × 25.4 = 203.2 mm). A guide's maximum for a drop onto other pears, not a measured threshold.",
          source: WSU_PEAR_IMPACT,
        },
        typical({
          quantity: 'drop_threshold_height',
          variant: 'rubber',
          value: 40,
          low: 20,
          high: 80,
          observation: 'recommended-max',
          note: `${PEAR_DROP_NOTE} Rubber: twice the former typical 20 mm rigid-plate value. Searched in 2026-12: 'pear impact bruise threshold energy Blanquilla', 'Rocha pear bruising impact'.`,
        }),
        {
          quantity: 'bulk_density',
          value: 454.5,
          low: 365.84,
          high: 543.12,
          note: "Range between 'Deveci' and 'Santa Maria'; the abstract does not say which cultivar gave which end. The value is the middle of the range.",
          source: 'ozturk-2009-pear',
        },
        {
          ...typicalJanssenK(),
          note: `${typicalJanssenK().note} No published angle of repose of pears was found to derive it from. Searched in 2026-12: 'pear fruit physical properties angle of repose coefficient of friction', 'pear angle of repose simulation calibration static friction coefficient steel plate', 'measured stacking angle of pears degrees', '梨 离散元 仿真参数 标定 堆积角', '梨 果实 物理特性 休止角'. The pear DEM calibration (Agronomy 12(7):1720, 2022) uses a pile test, but its measured angle is not in the part read.`,
        },
      ],
    },
  ],
};
