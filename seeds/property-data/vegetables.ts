import type { SeedCommodity } from './types';
import { typicalJanssenK, typicalValue } from './value-helpers';

const CHERRY = 'polat-2007-cherry-tomato';
const RAMOS = 'stropek-golacki-2022-potato';
const TEMPEST = 'thomson-lopresti-2008-tomato';
const BUCCHERI = 'veg-buccheri-cantwell-tomato-slices';
const IDAHO_STORAGE = 'veg-hendricks-2022-spudman-storage-bruise';
const SALEH = 'veg-saleh-awolola-irish-potato';
const CUTTING_TABLE = 'veg-jamdagni-jia-2019-cutting-table';

const typical = typicalValue;

const TOMATO_NOT_FOUND =
  'No published whole-tomato figure found; searched "tomato physical properties density bulk density friction coefficient rubber galvanized", "tomato coefficient of friction rubber steel plywood", "tomato fruit density mass equatorial diameter cultivar" (abstracts read: five Saudi varieties, storage and packaging study, deficit-irrigation study — none prints the value in its abstract).';

const CHERRY_NOT_FOUND =
  'No published cherry-tomato figure found; searched "cherry tomato Young\'s modulus firmness compression", "cherry tomato compression modulus elasticity rupture force bruise", "cherry tomato drop test damage height surface", "cherry tomato collision damage rubber steel plastic".';

const POTATO_NOT_FOUND =
  'No published figure read; searched "potato bulk density coefficient of static friction physical properties cultivars", "potato tubers bulk density true density porosity", "Schaper Yaeger coefficients of friction of Irish potatoes" (only cited, not read), "Agria potato bulk density" (the Agria paper measures it but the value is not in the part stored).';

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
            observation: 'bruised-at',
            stage: 'firm',
            method: 'Laboratory drops onto steel and a pendulum impact rig',
            ripeness: 'Mature green',
            note: 'Drops above 60 cm onto steel caused internal bruising judged commercially important; bruise severity already rose with drop height below that, so fruit bruised at this height: an upper bound, the no-bruise height lies lower (observation changed from a threshold in 2026-12). Coloured fruit (more than 75 % pink to red) bruised and split less.',
            source: TEMPEST,
          },
        ],
      },
      // Searched 2026-12 for tomato (nothing storable found): 'tomato pericarp Young's modulus cultivar
      // compression failure stress', 'Li tomato exocarp mesocarp locular gel elastic modulus failure stress values
      // MPa' (J. Food Eng. 2012: only its reference list is stored), 'Babarinsa Ige Roma tomato bioyield stress'
      // and 'Roma tomatoes stress at bioyield unripe half-ripe full-ripe' (only the first page of the IISTE paper
      // is stored, its values are not in it), 'physical and mechanical properties of tomato fruits as related to
      // robot's harvesting' (Trans. CSAE 2008: no values in the abstract; Cobra 26: failure forces 81.8 N pink,
      // 50.3 N red, forces without a contact area), 'tomato fruit elastic modulus ranged from MPa whole fruit
      // compression cultivar', 'Van linden tomato bruise susceptibility instrumented pendulum impact energy
      // threshold', 'tomato fruit true density bulk density porosity coefficient of friction plywood galvanized
      // values variety' (five Saudi varieties: no values in the abstract), 'tomato angle of repose degrees'. The
      // deficit-irrigation study (Misr J. Agric. Eng.) gives maximum packing-box heights of 177–526 mm by water
      // regime, a box depth rather than a stress or drop height, so not stored.
      {
        slug: 'tomato-type',
        name: 'Tomato (commodity record)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'apparent',
            value: 0.4,
            note: "Published as E = 0.4 × 10⁶ (N/m²) for tomato in the material table of a robotic-cutting study, read second-hand in a repository that cites it; 0.4 × 10⁶ Pa = 0.4 MPa. Whole fruit or flesh, test and ripeness are not stated; filed as apparent like the weak secondary figure below, which it equals. Kept first because its origin is named. No whole-tomato modulus was found in a stored abstract (searched 'tomato fruit modulus of elasticity MPa bioyield stress kPa values', 'Li tomato exocarp mesocarp locular gel Young\'s modulus').",
            source: CUTTING_TABLE,
          },
          {
            quantity: 'poisson_ratio',
            value: 0.3,
            note: 'Published as ν = 0.3 for tomato in the same robotic-cutting material table (read second-hand); equals the weak secondary figure below. Kept first because its origin is named.',
            source: CUTTING_TABLE,
          },
          {
            quantity: 'youngs_modulus',
            variant: 'apparent',
            value: 0.4,
            note: 'Weak secondary figure: the kind of modulus and the test are not stated. No whole-tomato modulus in MPa was found in a stored abstract (searched "tomato fruit Young\'s modulus compression whole fruit", "tomato apparent modulus of elasticity MPa whole fruit parallel plate ripening stage"); the deficit-irrigation study (Misr J. Agric. Eng.) and the Super Bta / Petoerly Ch study measure it but print no value in the abstract.',
            source: 'tomato-secondary-weak',
          },
          {
            quantity: 'poisson_ratio',
            value: 0.3,
            note: 'Weak secondary figure. The skin study (intagro-2012-tomato-skin) gives Poisson ratios of 0.4–0.8 for the skin of Admiro and Encore, falling in storage, and about 0.5 at room temperature; skin values above 0.5 lie outside what this catalogue accepts for a bulk Poisson ratio and are not stored.',
            source: 'tomato-secondary-weak',
          },
          typical(
            {
              quantity: 'density',
              value: 1000,
              low: 940,
              high: 1100,
              note: `${TOMATO_NOT_FOUND} A tomato is mostly water and floats or barely sinks in water, so about 1000 kg/m³ is stored with a wide band; the one published figure read is for cherry tomato 'Forme' (1194.1 kg/m³ true density, Polat et al. 2007), a different commodity here.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'diameter',
              variant: 'equatorial',
              value: 57,
              low: 40,
              high: 67,
              note: `${TOMATO_NOT_FOUND} Trade size grades for round tomatoes read on a trader's specification page: MMM 40–47 mm, MM 47–57 mm, M 57–67 mm; 57 mm (the MM/M boundary) is stored with the three grades as the band.`,
            },
            'common practice',
          ),
          typical(
            {
              quantity: 'diameter',
              variant: 'axial',
              value: 50,
              low: 35,
              high: 65,
              note: `${TOMATO_NOT_FOUND} Round tomatoes are slightly oblate, so the stem-to-blossom height is taken a little below the equatorial diameter.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'mass',
              value: 100,
              low: 50,
              high: 180,
              note: `${TOMATO_NOT_FOUND} About 100 g is the mass of a sphere of 57 mm at 1000 kg/m³ (computed: π/6 × 5.7³ cm³ ≈ 97 g); the band covers the MMM to M grades.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'bioyield_stress',
              value: 150,
              low: 80,
              high: 300,
              note: 'No tomato bioyield or failure stress in kPa found in a stored abstract; searched "tomato bioyield stress", "Babarinsa Ige Roma tomatoes bioyield stress" (the Roma study measures stress at bioyield at three ripeness stages but its values are not in the part stored), "Mechanical properties of tomato exocarp, mesocarp and locular gel tissues". Wide band: ripe fruit lie near the low end.',
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'belt rubber',
              value: 0.6,
              low: 0.4,
              high: 0.9,
              note: `${TOMATO_NOT_FOUND} Rubber belting grips produce more than metal; stored high with a wide band.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'steel',
              value: 0.3,
              low: 0.1,
              high: 0.5,
              note: `${TOMATO_NOT_FOUND} The one published figure read is 0.099 on galvanised steel for cherry tomato 'Forme' (Polat et al. 2007); the band reaches down to it.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'hard plastic',
              value: 0.3,
              low: 0.15,
              high: 0.5,
              note: TOMATO_NOT_FOUND,
            },
            'from memory',
          ),
          {
            quantity: 'drop_threshold_height',
            variant: 'steel',
            value: 600,
            observation: 'bruised-at',
            stage: 'firm',
            ripeness: 'Mature green',
            method: 'Laboratory drops onto steel and a pendulum impact rig',
            note: "Measured on 'Tempest'; the commodity record takes it as typical of tomato. Drops above 60 cm onto steel caused commercially important internal bruising and bruising rose with height below that: an upper bound. Related figures whose surface is not named (not stored as drop heights): no rupture but latent damage from falls up to 59 cm, rupture from 1.58 J (first ripening stage) and 0.84 J (third) by pendulum (veg-mohammadi-aylar-2010-tomato, Super Bta and Petoerly-ch); cracking height for 50 % of fruit 150 cm for Roma VF, 100–125 cm for Ibadan Local, 220 cm for NHLe 158-13 (veg-adebooye-2005-tomato-cracking); bruised area at 20, 40 and 60 cm drops, 129.59 / 259.18 / 388.77 mJ (veg-pathare-2023-tomato-drop); a pendulum force equal to two 40 cm drops changed ripening of Roma 'BHN 467' (veg-lee-sargent-huber-2007-roma); breaker fruit of '901' and 'Bobcat' dropped once 1 m onto a 'hard surface' were damaged (veg-buccheri-cantwell-tomato-slices).",
            source: TEMPEST,
          },
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 0.65,
            observation: 'bruised-at',
            stage: 'firm',
            ripeness: 'Breaker',
            method:
              'Three impacts of a 67 g steel ball dropped from 99 cm onto the fruit, then ripened at 20 °C',
            note: "Measured on '901' and 'Bobcat'; the commodity record takes it as typical of tomato. Energy computed by exact arithmetic: 0.067 kg × 9.80665 m/s² × 0.99 m = 0.650 J per impact (three impacts). Fruit so treated were damaged (less firm when ripe, lower lycopene 3.5 against 4.0 mg/kg). The abstract also lists 33 and 66 cm (0.217 and 0.434 J) but does not say whether those damaged the fruit, so they are not stored.",
            source: BUCCHERI,
          },
          typical(
            {
              quantity: 'drop_threshold_height',
              variant: 'padded surface',
              value: 150,
              low: 100,
              high: 300,
              observation: 'recommended-max',
              note: `No padded-surface tomato drop limit found in a stored source (searched "tomato drop height bruise threshold surface", "Pathare tomato drop height", "cherry tomato drop test damage height surface"; the Brazilian packing-line study found padding cut impact damage by up to 31 % but gives no height). Handling guides commonly keep drops onto padding to about 15 cm; the band is wide.`,
            },
            'common practice',
          ),
          typical(
            {
              quantity: 'bulk_density',
              value: 580,
              low: 450,
              high: 700,
              note: `${TOMATO_NOT_FOUND} Cherry tomato 'Forme' gives 464.5 kg/m³ (Polat et al. 2007); larger round fruit pack to a similar void fraction, so a value a little higher is stored with a wide band.`,
            },
            'from memory',
          ),
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
            quantity: 'diameter',
            variant: 'axial',
            value: 21.23,
            note: 'Published as the fruit length (stem to blossom end).',
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
          {
            ...typicalJanssenK(),
            note: `${typicalJanssenK().note} No angle of repose of cherry tomatoes was found to derive it from (searched 2026-12: 'cherry tomato physical properties static coefficient of friction rubber angle of repose bulk density cultivar', 'tomato angle of repose degrees physical properties fruits handling'); Polat et al. 2007 list no angle for 'Forme'.`,
          },
        ],
      },
      // Searched 2026-12 for cherry tomato (nothing storable found): 'cherry tomato mechanical properties
      // cultivars rupture force firmness modulus of elasticity Kabas', 'cherry tomato physical properties static
      // coefficient of friction rubber angle of repose bulk density cultivar'. The cherry-tomato peel studies
      // (Matas et al. 2004, Inbred 10, Sweet 100, Sausalito Cocktail) are tensile tests of peels, with no values
      // in the abstracts read.
      {
        slug: 'cherry-tomato-type',
        name: 'Cherry tomato (commodity record)',
        isType: true,
        values: [
          typical(
            {
              quantity: 'youngs_modulus',
              variant: 'apparent',
              value: 0.4,
              low: 0.2,
              high: 1,
              note: `${CHERRY_NOT_FOUND} Taken at the tomato record's 0.4 MPa with a wide band; small fruit with a tougher skin may read higher.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'poisson_ratio',
              value: 0.45,
              low: 0.3,
              high: 0.49,
              note: `${CHERRY_NOT_FOUND} Turgid, watery fruit tissue is nearly incompressible, so a value near 0.45 is usual in models.`,
            },
            'from memory',
          ),
          {
            quantity: 'density',
            value: 1194.1,
            note: "Measured on 'Forme' (true density; the abstract prints the unit as kg/sq m); the commodity record takes it as typical of cherry tomato.",
            source: CHERRY,
          },
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 24.95,
            note: "Measured on 'Forme'; the commodity record takes it as typical of cherry tomato.",
            source: CHERRY,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 21.23,
            note: "Published as the fruit length of 'Forme'; the commodity record takes it as typical of cherry tomato.",
            source: CHERRY,
          },
          {
            quantity: 'mass',
            value: 8.69,
            note: "Measured on 'Forme' (greenhouse-grown); the commodity record takes it as typical of cherry tomato.",
            source: CHERRY,
          },
          typical(
            {
              quantity: 'bioyield_stress',
              value: 150,
              low: 80,
              high: 300,
              note: `${CHERRY_NOT_FOUND} Polat et al. 2007 measured "hardness" but the abstract gives no value. Taken at the tomato record's value with the same wide band.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'belt rubber',
              value: 0.5,
              low: 0.3,
              high: 0.8,
              note: `${CHERRY_NOT_FOUND} The published figures for 'Forme' are low on hard smooth surfaces (plywood 0.169, glass 0.147, galvanised steel 0.099); rubber grips more, so a higher value is stored with a wide band.`,
            },
            'from memory',
          ),
          {
            quantity: 'friction_coefficient',
            variant: 'galvanised steel',
            value: 0.099,
            note: "Measured on 'Forme'; the commodity record takes it as typical of cherry tomato. Low beside other produce: treat as a smooth-skinned, greenhouse value.",
            source: CHERRY,
          },
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'hard plastic',
              value: 0.2,
              low: 0.1,
              high: 0.4,
              note: `${CHERRY_NOT_FOUND} Set between the published glass (0.147) and plywood (0.169) values of 'Forme' and higher friction rubber; wide band.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'drop_threshold_height',
              variant: 'steel',
              value: 300,
              low: 150,
              high: 600,
              observation: 'recommended-max',
              note: `${CHERRY_NOT_FOUND} Kept below the 60 cm at which mature-green 'Tempest' tomatoes bruised seriously on steel; a small fruit carries less energy per unit contact area, but ripe cherry tomatoes split easily. Wide band.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'drop_threshold_height',
              variant: 'padded surface',
              value: 150,
              low: 100,
              high: 300,
              observation: 'recommended-max',
              note: `${CHERRY_NOT_FOUND} Handling guides commonly keep drops onto padding to about 15 cm, as for the tomato record.`,
            },
            'common practice',
          ),
          {
            quantity: 'bulk_density',
            value: 464.5,
            note: "Measured on 'Forme' (the abstract prints the unit as kg/sq m); the commodity record takes it as typical of cherry tomato.",
            source: CHERRY,
          },
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
            variant: 'rigid plate',
            value: 50,
            observation: 'bruised-at',
            method: 'Impacts onto a flat rigid plate, filmed with a high-speed camera',
            note: 'Bruising began at an impact velocity of 1 m/s, which the paper gives as a bruise threshold drop height of 50 mm (1/(2 × 9.80665) m = 51 mm). It is where bruises first appeared, so stored as bruised-at: the safe height lies just below. The plate material is not named (previously filed under steel, a guessed surface; corrected in 2026-12). Tubers of 160–190 g; restitution coefficient 0.44–0.49 over the velocities tested.',
            source: RAMOS,
          },
          {
            quantity: 'failure_stress',
            value: 900,
            method: 'Impacts onto a flat rigid plate at 1–1.75 m/s',
            note: 'Maximum impact stress, constant at 0.9 MPa from 1 to 1.75 m/s, where bruising had begun (the paper confirms a critical-stress criterion for bruising).',
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
        slug: 'potato-russet-burbank',
        name: 'Russet Burbank',
        values: [
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 0.1744,
            observation: 'bruised-at',
            method:
              'A 100 g steel weight dropped 7 in (177.8 mm) onto the bud and stem ends of each tuber at harvest',
            temperature: '55 °F (12.8 °C) pulp',
            note: 'Energy computed by exact arithmetic: 0.1 kg × 9.80665 m/s² × 0.1778 m = 0.1744 J. The impact was chosen to bruise; blackspot incidence, severity and depth rose in the first month of storage, so this is an upper bound. 675 tubers per cultivar.',
            samples: 675,
            source: IDAHO_STORAGE,
          },
        ],
      },
      {
        slug: 'potato-russet-norkotah',
        name: 'Russet Norkotah',
        values: [
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 0.1744,
            observation: 'bruised-at',
            method:
              'A 100 g steel weight dropped 7 in (177.8 mm) onto the bud and stem ends of each tuber at harvest',
            temperature: '55 °F (12.8 °C) pulp',
            note: 'Energy computed by exact arithmetic: 0.1 kg × 9.80665 m/s² × 0.1778 m = 0.1744 J. The impact was chosen to bruise; blackspot incidence, severity and depth rose in the first month of storage, so this is an upper bound. 675 tubers per cultivar.',
            samples: 675,
            source: IDAHO_STORAGE,
          },
        ],
      },
      {
        slug: 'potato-nicola',
        name: 'Nicola',
        values: [
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 37.3,
            note: 'Published as the mean width; thickness 32.4 mm, volume 42.61 cm³. Tubers grown in Nigeria.',
            source: SALEH,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 66.5,
            note: 'Published as the mean length.',
            source: SALEH,
          },
          {
            quantity: 'angle_of_repose',
            value: 27.2,
            note: 'Published as the mean angle of repose of Nicola tubers (27.20°); the abstract does not say whether by filling or emptying. Small Nigerian-grown tubers (width 37.3 mm).',
            source: SALEH,
          },
        ],
      },
      {
        slug: 'potato-diamant',
        name: 'Diamant',
        values: [
          {
            quantity: 'diameter',
            variant: 'equatorial',
            value: 35.2,
            note: 'Published as the mean width; thickness 31.7 mm, volume 34.08 cm³. Tubers grown in Nigeria.',
            source: SALEH,
          },
          {
            quantity: 'diameter',
            variant: 'axial',
            value: 57.4,
            note: 'Published as the mean length.',
            source: SALEH,
          },
          {
            quantity: 'angle_of_repose',
            value: 26.4,
            note: 'Published as the mean angle of repose of Diamant tubers (26.40°); the abstract does not say whether by filling or emptying. Small Nigerian-grown tubers (width 35.2 mm).',
            source: SALEH,
          },
        ],
      },
      {
        slug: 'potato-type',
        name: 'Potato (commodity record)',
        isType: true,
        values: [
          {
            quantity: 'youngs_modulus',
            variant: 'flesh',
            value: 2,
            note: 'Published as E = 2 × 10⁶ (N/m²) for potato in the material table of a robotic-cutting study, read second-hand in a repository that cites it; 2 × 10⁶ Pa = 2 MPa. The table does not say how it was measured; filed as flesh, like the Finney & Hall value below (cylinders cut from tubers), which it equals. Kept first: of the two equal values this one was read, the other is recalled.',
            source: CUTTING_TABLE,
          },
          {
            quantity: 'youngs_modulus',
            variant: 'flesh',
            value: 2,
            note: 'Recalled, not re-read: about 2 MPa, from Finney & Hall 1967 (a scan of the paper is stored but its tables are not legible in the copy). Filed as flesh since the paper tested cylinders cut from tubers (seen in its figure caption). Kept first: a compressive value of tuber flesh, which the squeeze check needs; the read tensile figure below depends strongly on specimen size and water status.',
            source: 'finney-hall-1967',
          },
          {
            quantity: 'youngs_modulus',
            variant: 'flesh',
            value: 19,
            low: 1.2,
            high: 19,
            method:
              'Uniaxial tension of solid and hollow cylindrical plugs of tuber pith parenchyma',
            note: 'Tensile modulus: 19 MPa for the largest plugs (2.5 cm² section) near full turgor; it fell to 5 MPa for 0.2 cm² plugs and to 1.2 MPa as water potential dropped from −0.4 to −1.4 MPa. A tensile, size-dependent figure: not the one the checks should take.',
            source: 'veg-pith-tensile-modulus',
          },
          {
            quantity: 'poisson_ratio',
            value: 0.45,
            note: 'Published as ν = 0.45 for potato in the robotic-cutting material table (read second-hand). Kept first: read, and inside the 0.45–0.49 recalled from Finney & Hall 1967 below.',
            source: CUTTING_TABLE,
          },
          {
            quantity: 'poisson_ratio',
            value: 0.47,
            low: 0.45,
            high: 0.49,
            note: 'Recalled, not re-read: about 0.45–0.49 from Finney & Hall 1967; the value is the middle.',
            source: 'finney-hall-1967',
          },
          // Density: searched 2026-12 'potato tuber specific gravity typically ranges 1.06 1.10 Russet Burbank
          // specific gravity extension' — Kleinkopf et al. 1987 (Am. Potato J. 64:579) give only the spread of
          // specific gravity within a Russet Burbank field (up to 40 units of 0.001 among tubers), no mean; the
          // WA DPIRD specific-gravity page and Idaho's Dr. Potato page give no figure in the part stored.
          typical(
            {
              quantity: 'density',
              value: 1080,
              low: 1050,
              high: 1110,
              note: `${POTATO_NOT_FOUND} Ware potatoes sink in water and are graded by specific gravity, commonly 1.06–1.10; 1080 kg/m³ is stored.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'diameter',
              variant: 'equatorial',
              value: 55,
              low: 40,
              high: 80,
              note: `${POTATO_NOT_FOUND} Ware grading commonly passes tubers of about 40–80 mm square mesh; one trade specification read gives 40–60 mm. The published widths read (Nicola 37.3 mm, Diamant 35.2 mm, small Nigerian-grown tubers) lie below the ware range and are kept on those cultivars.`,
            },
            'common practice',
          ),
          typical(
            {
              quantity: 'diameter',
              variant: 'axial',
              value: 80,
              low: 55,
              high: 120,
              note: `${POTATO_NOT_FOUND} Tubers are elongated: Nicola and Diamant measure 1.8 and 1.6 times as long as wide (Saleh & Awolola); about 1.5 × the equatorial 55 mm is stored.`,
            },
            'from memory',
          ),
          {
            quantity: 'mass',
            value: 175,
            low: 160,
            high: 190,
            note: "Measured on 'Ramos' (tubers chosen in the 160–190 g class, the value is the middle); the commodity record takes it as typical of potato.",
            source: RAMOS,
          },
          {
            quantity: 'failure_stress',
            value: 900,
            method: 'Impacts onto a flat rigid plate at 1–1.75 m/s',
            note: "Measured on 'Ramos'; the commodity record takes it as typical of potato. Maximum impact stress, constant at 0.9 MPa once bruising had begun (critical-stress criterion). No static bruise threshold for potato was found; the Spunta study gives bioyield forces of 84.25–114.12 N and rupture forces of 100.90–139.78 N, forces without a contact area (veg-almady-2024-spunta), so not stored as stresses.",
            source: RAMOS,
          },
          // Bioyield / failure stress and per-cultivar modulus: searched 2026-12 'Russet Burbank potato tissue
          // modulus of elasticity failure stress', 'potato cultivars Young's modulus failure stress compression
          // cylinders', 'Vivaldi Primura Young's modulus MPa Poisson's ratio' (Bentini et al., Biosyst. Eng. 104:25,
          // 2009, and the 2008 Ragusa paper: E and ν of Vivaldi and Primura measured, no value in the abstract or
          // the part stored), 'Baritelle Hyde potato tissue failure stress', 'Bajema Hyde dynamic failure potato',
          // 'Mathew Hyde potato impact damage thresholds', 'Bintje potato Young's modulus bruise threshold',
          // 'Acta Agrophysica potato modulus', 'potato Holland Favorita elastic modulus'. Read without a storable
          // stress: Sadowska et al., Int. Agrophys. 18:347 (2004), cv. Irga, fracture stress and E in kPa, values
          // not in the abstract; Yurtlu et al. 2012 (Elfe, Marabel, Orlo); Konstankiewicz 2001 (Danusia, Kuba,
          // Triada); King Edward/Record fracture study; Schoorl & Holt, J. Texture Stud. 1983: whole Sebago and
          // Pontiac tubers cracked between flat plates at a stored energy of about 1.6 J and 0.9 J (quasi-static,
          // not an impact, so not stored as impact energy); Molema et al. 1997: repeated 0.3 J pendulum impacts
          // raised discoloured volume (impactor surface not named, not stored); Gharibani et al. 2015 (Agria,
          // Sabalan) and Almady et al. 2024 (Spunta) give forces only.
          typical(
            {
              quantity: 'bioyield_stress',
              value: 500,
              low: 250,
              high: 900,
              note: 'No potato static threshold, bioyield or quasi-static failure stress in kPa found. Searched "potato tuber bioyield stress compression kPa", "potato tissue compressive strength yield stress MPa", "raw potato cylinders failure stress kPa", "potato bioyield rupture stress Marfona Agria Sante", "potato static bruise threshold pressure kPa", "Baritelle Hyde potato failure stress": the abstracts read (Bentini 2009; Lady Rosetta, Misr J. Agric. Eng.; Yurtlu 2012; Konstankiewicz, Int. Agrophys. 2001) print no value; Spunta bioyield forces 84–114 N have no contact area. Recalled: potato flesh yields at several hundred kPa under slow compression. The band tops at the 0.9 MPa at which Ramos tubers began to bruise under impact (read), since tissue is stronger under impact than under a held load. Tubers of four cultivars under a simulated 2.5 m pile for 7 months bruised (Czerko, Biul. IHAR, abstract): a pile height, not a contact pressure, so not stored.',
            },
            'from memory',
          ),
          // Friction: searched 2026-12 'Schaper Yaeger coefficients of friction of Irish potatoes' (cited in the
          // Writtle paper's references only), 'potato static coefficient of friction galvanized iron plywood rubber
          // tubers cultivar values', 'Sante Marfona static coefficient of friction wood galvanized values' (Abedi
          // et al. 2019: wood highest, galvanised sheet lowest, no values in the abstract), 'potato discrete
          // element parameter calibration static friction coefficient steel' (no potato calibration stored).
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'rubber',
              value: 0.5,
              low: 0.35,
              high: 0.7,
              note: `${POTATO_NOT_FOUND} The Writtle/Lincoln study (veg-writtle-2012-potato-friction) ranks the dynamic coefficient of single tubers: mild steel lowest (CV 9.8 %), rubber higher (CV 9.3 %, the most consistent across dry, wet, clean and dirty tubers), plastic highest and most variable (CV 19.2 %); soil and water both lowered it; its chart axis runs to 0.7. The values stored keep that ranking.`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'mild steel',
              value: 0.4,
              low: 0.25,
              high: 0.6,
              note: `${POTATO_NOT_FOUND} Lowest of the three surfaces in the Writtle/Lincoln ranking (veg-writtle-2012-potato-friction); Sante and Marfona tubers also gave their lowest static coefficient on galvanised sheet (Abedi et al., Res. Agr. Eng. 65:77–84, 2019, abstract, values not shown).`,
            },
            'from memory',
          ),
          typical(
            {
              quantity: 'friction_coefficient',
              variant: 'plastic',
              value: 0.55,
              low: 0.3,
              high: 0.7,
              note: `${POTATO_NOT_FOUND} Highest but most variable of the three surfaces in the Writtle/Lincoln ranking (veg-writtle-2012-potato-friction): lowest of all for wet dirty tubers, highest for clean dry ones.`,
            },
            'from memory',
          ),
          {
            quantity: 'drop_threshold_height',
            variant: 'rigid plate',
            value: 50,
            observation: 'bruised-at',
            method: 'Impacts onto a flat rigid plate, filmed with a high-speed camera',
            note: "Measured on 'Ramos' (160–190 g); the commodity record takes it as typical of potato. Bruising began at 1 m/s, given as a 50 mm bruise threshold drop height: bruised at this level, the safe height lies just below. Steel caused the greatest damage among cardboard, wood, steel, plastic and foam in 10–40 cm drops (veg-ejb-2015-potato-impact, no threshold given).",
            source: RAMOS,
          },
          {
            quantity: 'drop_threshold_height',
            variant: 'fruit',
            value: 355.6,
            observation: 'bruised-at',
            method:
              'Drops of an impact recording device onto a bed of potatoes, as reported from a talk',
            note: 'Published as "you may not see a bruise until a drop of 14 inches" onto potatoes; 14 in × 25.4 = 355.6 mm. Bruise appears at this height: an upper bound. The same talk gives a peak of 80–100 g as about the bruise threshold and "about a two inch drop" (50.8 mm) onto unpadded harvester chain; the chain material is not named, so that figure is not stored as a drop height. Secondary (news report) and instrumented-device based.',
            source: 'veg-olsen-2021-potato-bruise-talk',
          },
          {
            quantity: 'impact_threshold_energy',
            variant: 'steel',
            value: 0.1744,
            observation: 'bruised-at',
            method:
              'A 100 g steel weight dropped 7 in (177.8 mm) onto the bud and stem ends of each tuber at harvest',
            temperature: '55 °F (12.8 °C) pulp',
            note: "Measured on 'Russet Burbank' and 'Russet Norkotah'; the commodity record takes it as typical of potato. 0.1 kg × 9.80665 m/s² × 0.1778 m = 0.1744 J, an impact chosen to bruise (an upper bound). Molema et al. 1997 (pendulum) found that lowering impact energy from 0.600 to 0.067 J cut discoloured volume by about 95 % (read second-hand in /work/shared/PROPERTY-SOURCES.md; no threshold given).",
            source: IDAHO_STORAGE,
          },
          {
            quantity: 'drop_threshold_height',
            variant: 'concrete',
            value: 150,
            observation: 'recommended-max',
            method:
              'Boxes and bales of potatoes with an impact recording device, dropped 15–91 cm onto concrete, a plastic slip or a wooden pallet',
            note: 'The study advises keeping drops of boxed potatoes below 15 cm, especially for the first layer of a pallet stack; bottom-layer tubers of boxes dropped onto concrete or a plastic slip read above 100 g. A box drop, not a bare tuber: for a loose tuber on concrete use the rigid-plate figure above.',
            source: 'veg-packaged-potato-ird',
          },
          // Bulk density and angle of repose: searched 2026-12 'potato angle of repose bulk density tubers heap
          // storage', 'aardappel loading density potatoes kg/m3 storage bulk', 'potato tubers angle of repose
          // degrees physical properties' (Saleh & Awolola give the angle; the Agria and Sante/Marfona papers
          // measure bulk density but print no value in the part stored; ASABE EP446 and Willson ARS 52-32 are
          // stored only as their first pages, without the figures).
          {
            quantity: 'bulk_density',
            value: 650,
            method: 'Storage design figure for potatoes in bulk',
            note: 'Published as "the weight of potatoes in bulk is about 650 kg/m3" (1000 t take 1538 m³); the same page gives a 2 m³ Dutch potato box as about 1300 kg, also 650 kg/m³. Two other storage pages agree within 3 % (below). Kept first: the only figure given as a bulk density outright. Replaces the typical 670 kg/m³ (2026-12).',
            source: 'veg-potatobusiness-2018-storage-builders',
          },
          {
            quantity: 'bulk_density',
            value: 666.7,
            note: 'Published as "one tonne of potatoes takes 1.5 m³" with 35 % of the pile voids; 1000 kg ÷ 1.5 m³ = 666.7 kg/m³. The same page notes pressure marks always form on bottom tubers of 3–5 m piles and advises piling ware potatoes no higher than 4 m, seed 3 m.',
            source: 'veg-kiss-kartoffel-lagerung-14',
          },
          {
            quantity: 'bulk_density',
            value: 670,
            note: 'The loading density of potatoes taken in a store-capacity example (20 m² × 3.5 m × 670 kg/m³ = 50 t).',
            source: 'veg-aardappelpagina-stack-ventilation',
          },
          {
            quantity: 'angle_of_repose',
            value: 27.2,
            note: "Measured on 'Nicola' (the only published figures found for the commodity, with 'Diamant' below); the commodity record takes it as typical of potato. Small Nigerian-grown tubers; the method (filling or emptying) is not stated in the abstract. The bin check derives its lateral pressure ratio from it.",
            source: SALEH,
          },
          {
            quantity: 'angle_of_repose',
            value: 26.4,
            note: "Measured on 'Diamant'; the second of the two published figures, 0.8° below Nicola's.",
            source: SALEH,
          },
        ],
      },
    ],
  },
];
