import type { SeedSource } from './types';

/** Published sources behind the seeded values (see each `note` for how a value was read). */
export const SOURCES: SeedSource[] = [
  {
    key: 'shahabasi-1979',
    kind: 'thesis',
    authors: 'Shahabasi, Y.',
    year: 1979,
    title:
      'Experimental and numerical techniques related to the maximum allowable depth of apples in a bulk storage',
    venue: 'PhD thesis, Michigan State University',
    note: 'Read in the abstract.',
  },
  {
    key: 'wang-2024-processes',
    kind: 'paper',
    authors: 'Wang, J.; Wang, C.; Wu, J.',
    year: 2024,
    title: 'Static bruising of apples measured with pressure-sensitive film',
    venue: 'Processes 12(3)',
    pages: '543',
    note: 'Read in the abstract; title paraphrased from the abstract.',
  },
  {
    key: 'du-2019-asabe',
    kind: 'paper',
    authors: 'Du, D.; Wang, J.; Wang, B.; Yao, F.',
    year: 2019,
    title: 'Mechanical properties of kiwifruit flesh during ripening',
    venue: 'ASABE Annual International Meeting, paper 1900242',
    note: 'Read in the abstract; title paraphrased from the abstract.',
  },
];
