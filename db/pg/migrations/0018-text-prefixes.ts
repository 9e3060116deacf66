/**
 * PostgreSQL twin of 0018, which widens SQLite's FTS5 prefix index. PostgreSQL's text search matches
 * prefixes through the GIN index of job_text (0002) and needs no change; the number is kept so that both
 * stores count their schema the same way.
 */
export const version0018 = `SELECT 1;`;
