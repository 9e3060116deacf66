/** PostgreSQL twin of 0022: nothing to do, the index went with 0016. The number keeps both backends' versions the same. */
export const version0022 = '';
