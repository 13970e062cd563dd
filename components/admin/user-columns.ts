/** The users list's columns from md up; narrower screens get one stacked card per user. */
export const USER_COLUMNS = 'md:grid-cols-[minmax(0,2fr)_minmax(0,1.5fr)_minmax(0,1.5fr)]';
