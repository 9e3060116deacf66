/**
 * PostgreSQL twin of 0020. Nothing changes here: SQLite's R*Tree takes only boxes, so it moves to mixed
 * coordinates whose box fits the search's distance more closely; PostgreSQL's shape indexes (0016) are GiST
 * indexes on the logs, searched with the exact distance as a filter inside them. The number exists so both
 * backends count the same versions.
 */
export const version0020 = '';
