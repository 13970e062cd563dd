import type { SeedSource } from './types';

/** Grading standards and research definitions of a bruise that the grade rules cite. */
export const GRADE_SOURCES: SeedSource[] = [
  {
    key: 'wac-16-403-174-apple-bruises',
    kind: 'standard',
    authors: 'Washington State Legislature',
    year: null,
    title: 'WAC 16-403-174: Bruises — injury, damage and serious damage (apples)',
    venue: 'Washington Administrative Code, Title 16, Chapter 16-403',
    url: 'https://www.law.cornell.edu/regulations/washington/WAC-16-403-174',
    note: 'Read in the stored full page: injury is a bruise greater than 1/8 in deep or 5/8 in across; damage greater than 3/16 in or 7/8 in; serious damage greater than 3/8 in or 1 1/8 in (each not slight and incident to proper handling and packing).',
  },
  {
    key: 'cfr-7-51-300-apple-grades',
    kind: 'standard',
    authors: 'United States Department of Agriculture, Agricultural Marketing Service',
    year: 2019,
    title: 'United States Standards for Grades of Apples, 7 CFR 51.300–51.302',
    venue: 'Code of Federal Regulations, Title 7, Part 51 (84 FR 51941, 1 October 2019)',
    url: 'https://www.govregs.com/regulations/expand/title7_chapterI_part51_subpartB_subjgrp477_section51.301',
    note: 'Read in the stored full page: U.S. Extra Fancy apples are free from injury caused by bruises; U.S. Fancy free from damage caused by bruises. The sizes of injury and damage are those of the state code read beside it.',
  },
];
