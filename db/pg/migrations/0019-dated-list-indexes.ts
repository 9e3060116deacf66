/**
 * PostgreSQL twin of 0019: one index per date the job list filters on, carrying every column the list filters
 * or sorts by (INCLUDE), so a date range is read by an index-only scan and only the page's jobs are fetched;
 * partial on the date being present, as on SQLite (a comparison on the date implies it).
 */
export const version0019 = `
  CREATE INDEX jobs_dated_created ON jobs (created_at) INCLUDE (archived_at, status, kind, material, updated_at, number, customer_key, id)
    WHERE created_at IS NOT NULL;
  CREATE INDEX jobs_dated_due ON jobs (due_date) INCLUDE (archived_at, status, kind, material, updated_at, number, customer_key, id)
    WHERE due_date IS NOT NULL;
  CREATE INDEX jobs_dated_updated ON jobs (updated_at) INCLUDE (archived_at, status, kind, material, number, customer_key, id)
    WHERE updated_at IS NOT NULL;
`;
