/** The checks an assessment may save (plain data, usable in schemas and clients). */
export const CHECK_NAMES_LIST = ['drop', 'stack', 'squeeze'] as const;
export type CheckNameValue = (typeof CHECK_NAMES_LIST)[number];
