/** The look of the table's filter fields, shared by the text, commodity and range filters. */
export const INPUT =
  'block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600 aria-invalid:border-red-500 disabled:bg-stone-100';
export const LABEL = 'block text-sm font-medium text-stone-800';
