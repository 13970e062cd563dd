/**
 * The search benchmark: queries people type into the header search, each with the records that
 * answer it. The answers were chosen by reading the seed (seeds/property-data: commodities,
 * cultivars, sources) and the Atlas articles (content/atlas), never from the engine's output.
 *
 * An answer is a record id, or a rule over the published index's records (words compared with
 * case and accents folded; a word also matches its plural, "apple" → "apples", "berry" →
 * "berries"):
 * - `{ title }`: a record whose title holds the phrase (an article section by its heading);
 * - `{ about }`: a record whose title or subtitle holds it (a commodity's cultivars, articles and
 *   the papers whose titles name it);
 * - `{ holds }`: a record holding the phrase anywhere (title, subtitle, keywords or text).
 * `first`: the one record that must lead (an exact name).
 */
export type Answer = string | { title: string } | { about: string } | { holds: string };

export interface QueryCase {
  q: string;
  answers: Answer[];
  first?: string;
}

const cultivar = (q: string, slug: string, ...more: Answer[]): QueryCase => ({
  q,
  first: `cultivar:${slug}`,
  answers: [`cultivar:${slug}`, ...more],
});
const commodity = (q: string, slug: string, name = slug): QueryCase => ({
  q,
  first: `commodity:${slug}`,
  answers: [`commodity:${slug}`, { about: name }],
});

export const QUERY_SET: QueryCase[] = [
  // The two cases of issue 18: the avocado studies name 'Hass' (Mazhar et al. 2018, the avocado
  // article); "Mass" and "glass" are other words. "jonatan" is the apple Jonathan.
  {
    q: 'Hass',
    answers: ['commodity:avocado', 'source:mazhar-2018-avocado', { holds: 'hass' }],
  },
  cultivar('jonatan', 'apple-jonathan', { holds: 'jonathan' }),

  // Cultivar names as written in the seed; the answers also take the papers and article
  // sections that name the cultivar.
  cultivar('Jonathan', 'apple-jonathan', { holds: 'jonathan' }),
  cultivar('Granny Smith', 'apple-granny-smith'),
  cultivar('Hayward', 'kiwifruit-hayward', { holds: 'hayward' }),
  cultivar('Williams', 'pear-williams', { holds: 'williams' }),
  cultivar('Fuji', 'apple-fuji', { holds: 'fuji' }),
  cultivar('Gala', 'apple-gala'),
  cultivar('Golden Delicious', 'apple-golden-delicious', { holds: 'golden delicious' }),
  cultivar('Golab', 'apple-golab', { holds: 'golab' }),
  // Sharifi et al. 2007 spell the orange 'Tompson'; Thomson and Lopresti 2008 is about tomatoes.
  cultivar('Thompson', 'orange-thompson', { holds: 'thompson' }, 'source:sharifi-2007-orange'),
  cultivar('Independence', 'nectarine-independence', { holds: 'independence' }),
  cultivar('Deveci', 'pear-deveci', { holds: 'deveci' }),
  cultivar('Forme', 'cherry-tomato-forme', { holds: 'forme' }),
  cultivar('Haden', 'mango-haden', { holds: 'haden' }),
  cultivar('Kent', 'mango-kent', { holds: 'kent' }),
  cultivar('Keitt', 'mango-keitt', { holds: 'keitt' }),
  cultivar('Tommy Atkins', 'mango-tommy-atkins'),
  cultivar('Selva', 'strawberry-selva', { holds: 'selva' }),
  cultivar('Fuerte', 'avocado-fuerte', { holds: 'fuerte' }),
  cultivar('Kinnow', 'mandarin-kinnow', { holds: 'kinnow' }),
  cultivar('Murcott', 'mandarin-w-murcott', { holds: 'murcott' }),
  cultivar('SunGold', 'kiwifruit-zesy002'),
  cultivar('Tempest', 'tomato-tempest', { holds: 'tempest' }),
  cultivar('Carabao', 'mango-carabao', { holds: 'carabao' }),
  cultivar('Russet Burbank', 'potato-russet-burbank'),
  // "page" is also a common word ("product page", "web page"): only the mandarin answers.
  cultivar('Page', 'mandarin-page'),
  cultivar('Duke', 'blueberry-duke', { holds: 'duke' }),
  cultivar('Diamant', 'potato-diamant'),
  cultivar('Luli', 'apple-luli', { holds: 'luli' }),
  cultivar('Suli', 'pear-suli'),
  cultivar("O'Henry", 'peach-ohenry', { holds: 'henry' }),
  cultivar('Santa Maria', 'pear-santa-maria', { holds: 'santa maria' }),

  // Cultivar names misspelt or cut short.
  cultivar('Jonathn', 'apple-jonathan', { holds: 'jonathan' }),
  cultivar('granny smth', 'apple-granny-smith'),
  cultivar('golden delicous', 'apple-golden-delicious', { holds: 'golden delicious' }),
  cultivar('wiliams', 'pear-williams', { holds: 'williams' }),
  cultivar('haywrd', 'kiwifruit-hayward', { holds: 'hayward' }),
  cultivar('braburn', 'apple-braeburn'),
  cultivar('kinow', 'mandarin-kinnow', { holds: 'kinnow' }),
  cultivar('fuerta', 'avocado-fuerte', { holds: 'fuerte' }),
  cultivar('kensignton pride', 'mango-kensington-pride', { holds: 'kensington pride' }),
  cultivar('russet burbnk', 'potato-russet-burbank'),
  cultivar('tommy atkin', 'mango-tommy-atkins'),
  { q: 'cavendsh', answers: [{ holds: 'cavendish' }] },

  // Commodities, their botanical names, and misspellings of them.
  commodity('apple', 'apple'),
  commodity('avocado', 'avocado'),
  commodity('kiwifruit', 'kiwifruit'),
  commodity('potato', 'potato'),
  commodity('cherry tomato', 'cherry-tomato', 'cherry tomato'),
  // A cherry tomato is a tomato (Solanum lycopersicum var. cerasiforme): its records answer too.
  commodity('tomato', 'tomato'),
  commodity('strawberry', 'strawberry'),
  commodity('mandarin', 'mandarin'),
  commodity('pear', 'pear'),
  commodity('peach', 'peach'),
  commodity('banana', 'banana'),
  commodity('mango', 'mango'),
  commodity('avacado', 'avocado'),
  commodity('strawbery', 'strawberry'),
  commodity('kiwfruit', 'kiwifruit'),
  commodity('nectarin', 'nectarine'),
  commodity('tomatoe', 'tomato'),
  commodity('mandrin', 'mandarin'),
  commodity('bananna', 'banana'),
  { q: 'Malus domestica', first: 'commodity:apple', answers: ['commodity:apple'] },
  { q: 'Persea americana', first: 'commodity:avocado', answers: [{ holds: 'persea americana' }] },
  { q: 'Actinidia', first: 'commodity:kiwifruit', answers: ['commodity:kiwifruit'] },

  // Authors and standards, as a reader of a bibliography would look them up.
  { q: 'Wang', answers: ['source:wang-2024-processes', 'source:du-2019-asabe'] },
  { q: 'Shahabasi', first: 'source:shahabasi-1979', answers: ['source:shahabasi-1979'] },
  { q: 'shahabasy', first: 'source:shahabasi-1979', answers: ['source:shahabasi-1979'] },
  { q: 'Mohsenin', first: 'source:mohsenin-1986', answers: ['source:mohsenin-1986'] },
  { q: 'Stropek', answers: [{ holds: 'stropek' }] },
  // "Gołacki" typed on a keyboard without ł.
  { q: 'golacki', answers: [{ holds: 'gołacki' }] },
  { q: 'Vergano', first: 'source:vergano-1991-peach-bruising', answers: [{ holds: 'vergano' }] },
  { q: 'Chappell Hamann', first: 'source:chappell-hamann-1968', answers: [{ holds: 'chappell' }] },
  { q: 'Mazhar', first: 'source:mazhar-2018-avocado', answers: ['source:mazhar-2018-avocado'] },
  { q: 'Crisosto', answers: [{ holds: 'crisosto' }] },
  { q: 'ASAE S368', first: 'source:asae-s368-4', answers: [{ holds: 's368' }] },
  { q: 'Du 2019', first: 'source:du-2019-asabe', answers: ['source:du-2019-asabe'] },

  // Property words, spelt right and wrong.
  { q: 'poisson', answers: [{ holds: 'poisson' }] },
  // International Agrophysics 2012 writes "Poisson ratio", without the apostrophe.
  { q: "Poisson's ratio", answers: [{ holds: "poisson's ratio" }, { holds: 'poisson ratio' }] },
  { q: 'poison ratio', answers: [{ holds: "poisson's ratio" }, { holds: 'poisson ratio' }] },
  { q: 'youngs modulus', answers: [{ holds: "young's modulus" }] },
  { q: 'bruise threshold', answers: [{ holds: 'bruise threshold' }] },
  {
    q: 'drop height',
    answers: [{ holds: 'drop height' }, { holds: 'drop bruise threshold (height)' }],
  },
  { q: 'density', answers: [{ holds: 'density' }] },
  { q: 'desnity', answers: [{ holds: 'density' }] },
  { q: 'bulk density', answers: [{ holds: 'bulk density' }] },
  { q: 'friction coefficient', answers: [{ holds: 'friction coefficient' }] },
  { q: 'frction coefficient', answers: [{ holds: 'friction coefficient' }] },
  { q: 'angle of repose', answers: [{ holds: 'angle of repose' }] },
  { q: 'penetrometer', answers: [{ holds: 'penetrometer' }] },
  { q: 'penetrometre', answers: [{ holds: 'penetrometer' }] },
  { q: 'failure stress', answers: [{ holds: 'failure stress' }] },
  { q: 'bioyield', answers: [{ holds: 'bioyield' }] },
  { q: 'bruise susceptibility', answers: [{ holds: 'bruise susceptibility' }] },
  { q: 'mass', answers: [{ holds: 'mass' }] },
  { q: 'Hertz', answers: [{ holds: 'hertz' }] },
  { q: 'contact pressure', answers: [{ holds: 'contact pressure' }] },

  // Article topics: the stages along the line and the sections every article has.
  { q: 'bin tipping', answers: [{ title: 'bin tipping' }] },
  { q: 'bin tiping', answers: [{ title: 'bin tipping' }] },
  {
    q: 'apple bin tipping',
    first: 'section:apple#receiving-and-bin-tipping',
    answers: ['section:apple#receiving-and-bin-tipping'],
  },
  { q: 'cold chain', answers: [{ title: 'cold chain' }] },
  {
    q: 'pear cold chain',
    first: 'section:pear#cold-chain-and-transport',
    answers: ['section:pear#cold-chain-and-transport'],
  },
  { q: 'palletising', answers: [{ title: 'palletising' }] },
  { q: 'palletizing', answers: [{ title: 'palletising' }] },
  { q: 'singulation', answers: [{ title: 'singulation' }] },
  { q: 'singulaton', answers: [{ title: 'singulation' }] },
  { q: 'water dumping', answers: [{ title: 'water or dry dumping' }] },
  {
    q: 'how apples bruise',
    first: 'section:apple#how-apples-bruise',
    answers: ['section:apple#how-apples-bruise'],
  },
  {
    q: 'avocado chilling',
    first: 'section:avocado#ripeness-temperature-and-storage',
    answers: ['section:avocado#ripeness-temperature-and-storage'],
  },
  { q: 'kiwifruit ethylene', answers: [{ holds: 'ethylene' }] },
  { q: 'pressure-sensitive film', answers: [{ holds: 'pressure-sensitive film' }] },
  {
    q: 'strawberry packing',
    first: 'section:strawberry#packing',
    answers: ['section:strawberry#packing'],
  },
  {
    q: 'mango sizing and grading',
    first: 'section:mango#sizing-and-grading',
    answers: ['section:mango#sizing-and-grading'],
  },
  {
    q: 'transport vibration',
    answers: [
      'source:vergano-1991-peach-bruising',
      ...['apple', 'blueberry', 'kiwifruit', 'nectarine', 'peach', 'strawberry'].map(
        (c) => `section:${c}#cold-chain-and-transport`,
      ),
    ],
  },
  {
    q: 'potato storage',
    answers: [
      'section:potato#ripeness-temperature-and-storage',
      'source:veg-potatobusiness-2018-storage-builders',
      'section:potato#how-potatoes-bruise',
    ],
  },
  { q: 'drop test', answers: [{ holds: 'drop test' }] },
  { q: 'what to measure', answers: [{ title: 'what to measure' }] },

  // Nothing in the index answers these.
  { q: 'zzzzqx', answers: [] },
  { q: 'qwertyuiop', answers: [] },
];
