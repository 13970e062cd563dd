import type { SeedSource } from './types';

/** Sources added for the deeper knowledge base (2026-12): see the family's seed file. */
export const CITRUS_TROPICAL_SOURCES: SeedSource[] = [
  {
    key: 'ct-negrin-2013-mango',
    kind: 'paper',
    authors:
      'Negrín Hernández, L. I.; Barros Barbosa, R.; Da Silva Dantas, A. C.; Figueiredo Neto, A.; Cárdenas Olivier, N.',
    year: 2013,
    title:
      'Comportamiento mecánico de dos variedades de mango (Mangifera indica) bajo compresión axial (Mechanical behavior of two varieties of mango under axial compression)',
    venue: 'Revista Ciencias Técnicas Agropecuarias 22(2)',
    url: 'http://scielo.sld.cu/scielo.php?script=sci_arttext&pid=S2071-00542013000200002',
    note: "Read in the abstract (Spanish) on the SciELO page; the stored copy breaks off before the maximum forces. Whole fruit compressed in its natural resting position; moduli for ripening phases 1, 2 and 3 of 'Keitt' and 'Tommy Atkins'.",
  },
  {
    key: 'ct-daf-kensington-pride',
    kind: 'report',
    authors: null,
    year: null,
    title: 'Kensington Pride (mango varieties)',
    venue: 'Department of Agriculture and Fisheries, Queensland Government (web page)',
    url: 'https://www.daf.qld.gov.au/plants/fruit-and-vegetables/fruit-and-nuts/mangoes/mango-varieties/kensington-pride',
    note: 'Read in the stored full page (fruit characteristics list); authors and date not shown.',
  },
  {
    key: 'ct-orange-punch-jiroft',
    kind: 'paper',
    authors: null,
    year: null,
    title:
      'Prediction of Stiffness of Different Orange Cultivars Using Punch Test Method (Case Study: Orange Cultivars in The Southern Region of Kerman Province)',
    venue: 'Iranian Journal of Biosystems Engineering (University of Tehran)',
    url: 'https://ijbse.ut.ac.ir/article_88977.html?lang=en',
    note: "Read in the abstract; authors (University of Jiroft) and year not shown on the stored page, which breaks off mid-sentence after the stress results. Cultivars 'Valencia', 'March', 'Washington Navel', 'Blood' and a local Jiroft orange; punches 4.3–14.3 mm.",
  },
  {
    key: 'ct-rehal-2017-murcott',
    kind: 'paper',
    authors: 'Rehal, J.; Kaur, G. J.; Bons, H. K.',
    year: 2017,
    title: 'Studies on physico-mechanical properties of W. Murcott mandarin',
    venue: 'Journal of Applied and Natural Science 9(1)',
    pages: '80–84',
    doi: '10.31018/jans.v9i1.1154',
    note: 'Read in the abstract. Firmness 1.351–1.650 kgf is given without the probe, so it is not stored as a penetrometer firmness.',
  },
  {
    key: 'ct-khadivi-2013-mandarin',
    kind: 'paper',
    authors: 'Khadivi-Khub, A.',
    year: 2013,
    title:
      'Analysis of Some Technological and Physical Characters of Mandarin (Citrus reticulata) Fruit in Iran',
    venue: 'ISRN Agronomy 2013',
    pages: 'Article ID 891792',
    doi: '10.1155/2013/891792',
    note: "Read in the abstract. Three cultivars ('Page', 'Onsho', 'Clementine'); only the specific gravity of 'Page' is given as a number there.",
  },
  {
    key: 'ct-orhevba-2011-avocado',
    kind: 'paper',
    authors: 'Orhevba, B. A.; Jinadu, A. O.',
    year: 2011,
    title:
      'Determination of physico-chemical properties and nutritional contents of avocado pear (Persea americana M.)',
    venue: 'Academic Research International 1(3)',
    note: "Read in the abstract (four replicates of 'Fuerte'). The diameters printed there (10.075, 9.025, 8.465 mm) cannot be a whole avocado's and are not stored; the units look like cm, but a unit is not guessed.",
  },
  {
    key: 'ct-srilanka-banana-2015',
    kind: 'paper',
    authors: null,
    year: 2015,
    title:
      'Physical and Mechanical Properties of Three Commercially Grown Banana (Musa acuminata Colla) Cultivars in Sri Lanka',
    venue: 'Tropical Agricultural Research (January 2015)',
    url: 'https://doaj.org/article/ced2f28c0c6d404390cac3b901b18100',
    note: "Read in the abstract on the DOAJ page; authors not shown. Cultivars 'Seeni', 'Embul' and 'Kolikuttu' at harvest maturity; bulk density, static friction on wood, steel and Styrofoam were measured but the abstract gives no numbers for them (lowest friction on Styrofoam, highest on wood).",
  },
  {
    key: 'ct-satsuma-packing-injury',
    kind: 'paper',
    authors: null,
    year: null,
    title:
      'Mechanical injury of satsuma mandarin fruit in sorting, washing and packing (title not shown on the page read; described from its abstract)',
    url: 'https://discovery.researcher.life/article/-1/256a32636205383192fc445ea9ddbfb3',
    note: 'Read in the abstract on an index page; title, authors, journal and year not shown there. M-sized satsuma fruit under quasi-static loads: peel rupture above 10 kg, locular membranes above 8 kg, juice sacs above 4 kg (2 kg with rotation). Forces only, no contact area.',
  },
  {
    key: 'ct-cerruto-2003-orange',
    kind: 'paper',
    authors: 'Cerruto, E.; Manetto, G.',
    year: 2003,
    title: 'Mechanical damage to oranges caused by repeated impact against steel',
    url: 'https://www.iris.unict.it/handle/20.500.11769/72680',
    note: "Read in the abstract (university repository page); venue not shown. 'Tarocco' oranges dropped onto steel from heights comparable with packing lines; the abstract gives no heights.",
  },
  {
    key: 'ct-grand-nain-banana-mass',
    kind: 'secondary',
    authors: null,
    year: null,
    title: 'Modelling the mass of banana fruit by geometrical attributes',
    url: 'http://hemmingter.com/essay-on/modelling-the-mass-of-banana-fruit-by-geometrical-attributes',
    note: "Read in the stored full page, a copy of the paper's results on an essay site: Table 1, physical properties of banana var. Grand Nain (mean, SD, min, max, SE, CV). Authors, journal and year not shown on the copy; kept as a secondary source until the original is found.",
  },
  {
    key: 'ct-abidin-2019-nipah',
    kind: 'paper',
    authors: "A'bidin, F. N. Z.; Shamsudin, R.; Basri, M. S. M.; Dom, Z. M.",
    year: 2019,
    title:
      'Physical and Mechanical Properties of Unripe Nipah Banana Fruit (Musa acuminata balbisiana)',
    venue: 'Pertanika Journal of Science and Technology 27',
    url: 'http://120.26.44.124:3004/details/1/913742764',
    note: 'Read in the abstract on an index page. Unripe fruit over five days of ripening; penetration force 6.4–8.3 N (probe not given in the abstract) and whole-fruit compressive force about 1.4–1.7 kN, neither stored.',
  },
  {
    key: 'ct-bermudez-cavendish-thesis',
    kind: 'thesis',
    authors: 'Bermudez Camacho, T. de la C.',
    year: null,
    title:
      'Determinación de los parámetros físico-químicos y mecánicos del banano (Musa spp.) para un óptimo manejo poscosecha',
    venue: 'Universidad Central "Marta Abreu" de Las Villas (thesis)',
    url: 'https://dspace.uclv.edu.cu/items/a728c189-0bde-4505-b18b-1415adada56e',
    note: "Read in the abstract (Spanish, with an English version) on the repository page; year not shown. Cultivar 'Cavendish gigante (Jonson)' from Taguasco, Sancti Spíritus, Cuba.",
  },
];
