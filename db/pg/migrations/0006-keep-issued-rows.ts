/**
 * PostgreSQL twin of 0006. PostgreSQL has no INSERT OR REPLACE, and an upsert's DO UPDATE fires the BEFORE
 * UPDATE triggers of 0001 and 0003, which refuse it; a plain INSERT of a key already taken fails on the key.
 * So issued quotes and revisions are already safe from replacement here: the version moves on with no
 * change, and test/integration/db/pg-migrations.test.ts holds the refusals on both backends.
 */
export const version0006 = '';
