import type { SeedCommodity } from './types';
import { storageModulus, typicalJanssenK } from './value-helpers';

const STORAGE_STUDY = 'tjaf-pear-apple-storage';

export const PEAR: SeedCommodity = {
  slug: 'pear',
  name: 'Pear',
  family: 'Pome fruit',
  botanicalName: 'Pyrus communis',
  cultivars: [
    { slug: 'pear-williams', name: 'Williams', values: storageModulus(1.68, 0.51, STORAGE_STUDY) },
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
      slug: 'pear-type',
      name: 'Pear (cultivar not named)',
      isType: true,
      values: [
        {
          quantity: 'bulk_density',
          value: 454.5,
          low: 365.84,
          high: 543.12,
          note: "Range between 'Deveci' and 'Santa Maria'; the abstract does not say which cultivar gave which end. The value is the middle of the range.",
          source: 'ozturk-2009-pear',
        },
        typicalJanssenK(),
      ],
    },
  ],
};
